import { describeIssue } from '../case/issues.js';
import { loadCaseText } from '../case/load.js';
import { solveCase } from '../engine/solve-case.js';
import { formatChainText } from '../format/chain-text.js';
import { printable, printableIo } from '../case/printable.js';
import { readCaseFile } from './read-case.js';
import { solutionToJson } from '../format/solution-json.js';
import { caseResult } from '../extras/analysis-extras.js';
import { SOLVE_REACTION_ORIGIN } from '../format/solve-extras.js';

/** Exit codes of `skidcase solve`. */
export const EXIT = { solved: 0, invalid: 2, uncomputable: 3 } as const;

export interface SolveIo {
  out: (s: string) => void;
  err: (s: string) => void;
}

/**
 * `skidcase solve FILE [--json]`: reads a case file (any name), validates it and prints the
 * chain of steps (or the JSON of docs/case-file.md). Returns the exit code: 0 solved; 2 the file
 * is missing or not a valid case (each issue as `path: message` on stderr); 3 valid but some
 * figure cannot be computed (the reason, naming the analysis, on stderr). Writes no files.
 */
export async function solveCommand(
  file: string,
  opts: { json: boolean },
  rawIo: SolveIo,
): Promise<number> {
  const io = printableIo(rawIo);
  const read = await readCaseFile(file);
  if ('message' in read) {
    io.err(`skidcase: ${read.message}\n`);
    return EXIT.invalid;
  }
  const loaded = loadCaseText(read.text);
  if (!loaded.ok) {
    // The issues come first, each starting with its path, so that a script can read the first
    // line as "path: message" (docs/case-file.md); the summary line follows.
    for (const issue of loaded.issues) io.err(`${describeIssue(issue)}\n`);
    io.err(`skidcase: ${printable(file)} is not a valid case file\n`);
    return EXIT.invalid;
  }
  const solution = solveCase(loaded.case, loaded.unknownFields, loaded.duplicateKeys);
  const failures = solution.analyses.flatMap((r, i) =>
    r.ok ? [] : [`analyses[${i}] (${r.id}): cannot be computed: ${r.reason}`],
  );
  // solve reads no preferences: the default reaction time says so.
  const result = caseResult(loaded.case, solution, { defaultReactionNote: SOLVE_REACTION_ORIGIN });
  if (opts.json) {
    if (failures.length === 0) io.out(`${JSON.stringify(solutionToJson(result), null, 2)}\n`);
  } else {
    io.out(formatChainText(result));
  }
  if (failures.length > 0) {
    for (const f of failures) io.err(`skidcase: ${f}\n`);
    return EXIT.uncomputable;
  }
  return EXIT.solved;
}
