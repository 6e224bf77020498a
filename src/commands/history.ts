import { describeIssue } from '../case/issues.js';
import { loadCaseText } from '../case/load.js';
import { printable, printableIo } from '../case/printable.js';
import { revisionHeading, revisionLines, trailSummary } from '../format/revision-text.js';
import { readCaseFile } from './read-case.js';
import { resolveTarget } from './report.js';

/** Exit codes of `skidcase history`. */
export const HISTORY_EXIT = { done: 0, invalid: 2 } as const;

/** Where the command prints. */
export interface HistoryIo {
  out(s: string): void;
  err(s: string): void;
}

/**
 * `skidcase history FILE|ID`: the case's trail of revisions, one block per revision (its time,
 * who made it, each change `field: from → to`), oldest first. Exit 0; 2 when there is no such
 * case or the file is not a valid case (the issues as `solve` gives them). Writes nothing.
 * @example await historyCommand('harbor-road-0412', 'sessions', io) // 0
 */
export async function historyCommand(
  target: string,
  sessionsDir: string,
  rawIo: HistoryIo,
): Promise<number> {
  const io = printableIo(rawIo);
  const where = await resolveTarget(target, sessionsDir);
  if ('message' in where) {
    io.err(`skidcase: ${where.message}\n`);
    return HISTORY_EXIT.invalid;
  }
  const read = await readCaseFile(where.file);
  if ('message' in read) {
    io.err(`skidcase: ${read.message}\n`);
    return HISTORY_EXIT.invalid;
  }
  const loaded = loadCaseText(read.text);
  if (!loaded.ok) {
    for (const issue of loaded.issues) io.err(`${describeIssue(issue)}\n`);
    io.err(`skidcase: ${printable(where.file)} is not a valid case file\n`);
    return HISTORY_EXIT.invalid;
  }
  const c = loaded.case;
  const out = [`Revisions of case ${c.id} (${where.file})`, trailSummary(c)];
  (c.revisions ?? []).forEach((r, i) => {
    out.push('', revisionHeading(r, i + 1 + (c.revisionsDropped ?? 0)));
    for (const line of revisionLines(r)) out.push(`   ${line}`);
  });
  io.out(`${out.join('\n')}\n`);
  return HISTORY_EXIT.done;
}
