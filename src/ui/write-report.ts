/**
 * "Write report" from the review: the report module's report in the form picked (Markdown unless
 * told), written beside the case file under a new name each time (never over an existing file).
 */
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { sha256Of } from '../io/sha256.js';
import { loadCaseText, type Case } from '../case/load.js';
import { canonicalJson } from '../case/revision-diff.js';
import { caseResult } from '../extras/analysis-extras.js';
import { buildReport } from '../report/build.js';
import { toolVersion } from '../report/version.js';
import { writeReport } from '../report/write-report.js';
import { paperFor } from '../report/render-pdf.js';
import type { ReportFormat } from '../report/render.js';
import { writeFailureText } from '../report/write-files.js';
import { solveAsFile } from './interview-live.js';
import type { OpenCase } from './services.js';

/**
 * The same case apart from the save's own stamps (`created`, `updated`) and the trail of
 * revisions the save keeps (the screen's case never carries it), in any key order.
 */
function sameContent(a: Case, b: Case): boolean {
  const plain = (c: Case) => {
    const { created: _c, updated: _u, revisions: _r, revisionsDropped: _d, ...rest } = c;
    return canonicalJson(rest);
  };
  return plain(a) === plain(b);
}

const withoutUndefined = <T extends object>(o: T): Partial<T> =>
  Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;

/** `<id>-report-20261201-215203.md` (or `.txt`, `.html`, `.pdf`, `.json`) in the case file's folder. */
export function reportPath(open: OpenCase, c: Case, at: Date, form: ReportFormat = 'md'): string {
  const stamp = at.toISOString().slice(0, 19).replace(/[-:]/g, '').replace('T', '-');
  return path.join(path.dirname(open.file), `${c.id}-report-${stamp}.${form}`);
}

/**
 * Writes the report in `form` (Markdown and text with their pictures as SVG beside them; a PDF on
 * the paper the case's units suggest, as `skidcase report` chooses it), never over an existing file. The
 * reaction time is the preference, as for `skidcase report`; a case's own wins inside the report.
 */
export async function writeCaseReport(
  open: OpenCase,
  c: Case,
  at = new Date(),
  reactionTime?: number,
  form: ReportFormat = 'md',
) {
  // The same result document the review shows: the same case and the same settings.
  const settings = reactionTime !== undefined ? { reactionTime } : {};
  // The file's fingerprint, only when the file on disk holds this very case (a failed save
  // leaves an older one there: a report must not claim a file it was not made from).
  const disk = await readFile(open.file).then(
    (bytes) => {
      const loaded = loadCaseText(bytes.toString('utf8'));
      if (!loaded.ok) return undefined;
      return { case: loaded.case, sha: sameContent(loaded.case, c) ? sha256Of(bytes) : undefined };
    },
    () => undefined,
  );
  const sha = disk?.sha;
  // The trail is the file's: the save keeps it, the screen's case does not carry it.
  const trail = disk
    ? { revisions: disk.case.revisions, revisionsDropped: disk.case.revisionsDropped }
    : {};
  const reported = { ...c, ...withoutUndefined(trail) } as Case;
  const doc = buildReport(caseResult(reported, solveAsFile(reported), settings), {
    toolVersion: toolVersion(),
    generatedAt: at.toISOString(),
    caseFile: open.file,
    ...(sha ? { caseSha256: sha } : {}),
  });
  const file = reportPath(open, c, at, form);
  const r = await writeReport(doc, form, file, false, paperFor(c));
  if (r.ok) return { ok: true as const, path: file };
  return {
    ok: false as const,
    message: writeFailureText(r),
  };
}
