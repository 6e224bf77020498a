import { stat } from 'node:fs/promises';
import path from 'node:path';
import { describeIssue } from '../case/issues.js';
import { printable, printableIo } from '../case/printable.js';
import { loadCaseText, type Case } from '../case/load.js';
import { solveCase } from '../engine/solve-case.js';
import type { CaseSolution } from '../engine/types.js';
import { caseResult } from '../extras/analysis-extras.js';
import { buildReport } from '../report/build.js';
import { REPORT_FORMATS, renderReport, type ReportFormat } from '../report/render.js';
import { PAPERS, paperFor, type Paper } from '../report/render-pdf.js';
import { toolVersion } from '../report/version.js';
import { writeReport } from '../report/write-report.js';
import { writeFailureText } from '../report/write-files.js';
import { caseFilePath, checkId } from '../store/case-path.js';
import { readCaseFile } from './read-case.js';

/** Exit codes of `skidcase report`: as `solve`, plus 1 when an output file is in the way (or a bad option). */
export const REPORT_EXIT = { done: 0, refused: 1, invalid: 2, uncomputable: 3 } as const;

/** Options of `skidcase report`, as the CLI parsed them. */
export interface ReportOptions {
  format: ReportFormat;
  /** Write here instead of stdout; pictures go beside it as `<out minus extension>-<name>.svg`. */
  out?: string;
  /** Replace existing files. */
  force: boolean;
  /** The PDF's page size; default Letter for an imperial case, A4 for a metric one. */
  paper?: Paper;
  /** Where a case id is looked up. */
  sessionsDir: string;
  /** Perception-reaction time for the time-distance section, seconds (the user's preference). */
  reactionTime?: number;
}

/** Where the command prints: standard output and standard error. */
export interface ReportIo {
  out(s: string): void;
  err(s: string): void;
}

/** What is at a path: a file, a folder, something else, or nothing. */
async function kindAt(p: string): Promise<'file' | 'folder' | 'other' | 'none'> {
  return stat(p).then(
    (s) => (s.isFile() ? 'file' : s.isDirectory() ? 'folder' : 'other'),
    () => 'none' as const,
  );
}

/** A path to a case file, or a case id in the sessions folder; a message when it is neither. */
export async function resolveTarget(
  target: string,
  sessionsDir: string,
): Promise<{ file: string } | { message: string }> {
  const at = await kindAt(target);
  // A folder or a special file gets the message `solve` gives for it.
  if (at !== 'none') return { file: target };
  if (checkId(target) === undefined) {
    const p = caseFilePath(sessionsDir, target);
    if (p.ok && (await kindAt(p.path)) === 'file') return { file: p.path };
    return {
      message: `${target}: no such file, and no case "${target}" in ${printable(path.resolve(sessionsDir))}`,
    };
  }
  return { message: `${printable(target)}: no such file` };
}

type Loaded =
  | { ok: true; case: Case; solution: CaseSolution; file: string; sha256: string }
  | { ok: false; code: number };

/** Reads, validates and solves, with the messages `solve` gives for the same file. */
async function loadAndSolve(target: string, sessionsDir: string, io: ReportIo): Promise<Loaded> {
  const where = await resolveTarget(target, sessionsDir);
  if ('message' in where) {
    io.err(`skidcase: ${where.message}\n`);
    return { ok: false, code: REPORT_EXIT.invalid };
  }
  const read = await readCaseFile(where.file);
  if ('message' in read) {
    io.err(`skidcase: ${read.message}\n`);
    return { ok: false, code: REPORT_EXIT.invalid };
  }
  const loaded = loadCaseText(read.text);
  if (!loaded.ok) {
    // The same order as solve: each issue first, starting with its path; the summary line last.
    for (const issue of loaded.issues) io.err(`${describeIssue(issue)}\n`);
    io.err(`skidcase: ${printable(where.file)} is not a valid case file\n`);
    return { ok: false, code: REPORT_EXIT.invalid };
  }
  const solution = solveCase(loaded.case, loaded.unknownFields, loaded.duplicateKeys);
  const failures = solution.analyses.flatMap((r, i) =>
    r.ok ? [] : [`analyses[${i}] (${r.id}): cannot be computed: ${r.reason}`],
  );
  if (failures.length) {
    for (const f of failures) io.err(`skidcase: ${f}\n`);
    io.err('skidcase: no report written\n');
    return { ok: false, code: REPORT_EXIT.uncomputable };
  }
  return { ok: true, case: loaded.case, solution, file: where.file, sha256: read.sha256 };
}

/**
 * `skidcase report FILE|ID [--format md|txt|json|html|pdf] [--paper a4|letter] [--out PATH]
 * [--force]`. Recomputes every figure from the case file and prints the report, or writes it (and
 * its SVG pictures beside it) atomically; a PDF is binary, so it is only written to --out. Never replaces an existing file without `force`: exit 1 naming the file, nothing
 * written. Exit 2 for a missing or invalid case file, 3 when a figure cannot be computed.
 * @example
 * await reportCommand('harbor-road-0412', { format: 'html', out: 'harbor.html', force: false, sessionsDir: 'sessions' }, io) // 0
 */
export async function reportCommand(
  target: string,
  opts: ReportOptions,
  rawIo: ReportIo,
): Promise<number> {
  const io = printableIo(rawIo);
  if (!REPORT_FORMATS.includes(opts.format)) {
    io.err(`skidcase: --format must be one of ${REPORT_FORMATS.join(', ')}\n`);
    return REPORT_EXIT.refused;
  }
  if (opts.paper !== undefined && !PAPERS.includes(opts.paper)) {
    io.err(`skidcase: --paper must be one of ${PAPERS.join(', ')}\n`);
    return REPORT_EXIT.refused;
  }
  if (opts.format === 'pdf' && opts.out === undefined) {
    io.err('skidcase: a PDF is not printed to standard output: name its file with --out\n');
    return REPORT_EXIT.refused;
  }
  const loaded = await loadAndSolve(target, opts.sessionsDir, io);
  if (!loaded.ok) return loaded.code;
  const settings = opts.reactionTime !== undefined ? { reactionTime: opts.reactionTime } : {};
  const doc = buildReport(caseResult(loaded.case, loaded.solution, settings), {
    toolVersion: toolVersion(),
    generatedAt: new Date().toISOString(),
    caseFile: loaded.file,
    caseSha256: loaded.sha256,
  });
  if (opts.out === undefined) {
    if (opts.format !== 'pdf') io.out(renderReport(doc, opts.format));
    return REPORT_EXIT.done;
  }
  const paper = opts.paper ?? paperFor(loaded.case);
  const r = await writeReport(doc, opts.format, opts.out, opts.force, paper).catch(
    (e: unknown) => ({ ok: false as const, made: e instanceof Error ? e.message : String(e) }),
  );
  if ('made' in r) {
    // The document could not be drawn (a PDF whose fonts are missing): nothing was written.
    io.err(`skidcase: the ${opts.format.toUpperCase()} could not be made: ${r.made}\n`);
    io.err('skidcase: no report written\n');
    return REPORT_EXIT.refused;
  }
  if (!r.ok && r.kind === 'exists') {
    for (const p of r.paths)
      io.err(`skidcase: ${p} already exists; not replaced (use --force to replace it)\n`);
    io.err('skidcase: no report written\n');
    return REPORT_EXIT.refused;
  }
  if (!r.ok) {
    io.err(`skidcase: ${writeFailureText(r)}\n`);
    io.err('skidcase: no report written\n');
    return REPORT_EXIT.refused;
  }
  for (const p of r.written) io.out(`wrote ${p}\n`);
  return REPORT_EXIT.done;
}
