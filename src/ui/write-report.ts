/**
 * "Write report" from the review: the report module's Markdown report, written beside the case
 * file under a new name each time (never over an existing file).
 */
import path from 'node:path';
import type { Case } from '../case/load.js';
import { caseResult } from '../extras/analysis-extras.js';
import { buildReport } from '../report/build.js';
import { toolVersion } from '../report/version.js';
import { writeReport } from '../report/write-report.js';
import { writeFailureText } from '../report/write-files.js';
import { solveAsFile } from './interview-live.js';
import type { OpenCase } from './services.js';

/** `<id>-report-20261201-215203.md` in the case file's folder. */
export function reportPath(open: OpenCase, c: Case, at: Date): string {
  const stamp = at.toISOString().slice(0, 19).replace(/[-:]/g, '').replace('T', '-');
  return path.join(path.dirname(open.file), `${c.id}-report-${stamp}.md`);
}

/**
 * Writes the Markdown report and its pictures (SVG, beside it), never over an existing file. The
 * reaction time is the preference, as for `skidcase report`; a case's own wins inside the report.
 */
export async function writeCaseReport(
  open: OpenCase,
  c: Case,
  at = new Date(),
  reactionTime?: number,
) {
  // The same result document the review shows: the same case and the same settings.
  const settings = reactionTime !== undefined ? { reactionTime } : {};
  const doc = buildReport(caseResult(c, solveAsFile(c), settings), {
    toolVersion: toolVersion(),
    generatedAt: at.toISOString(),
    caseFile: open.file,
  });
  const file = reportPath(open, c, at);
  const r = await writeReport(doc, 'md', file, false);
  if (r.ok) return { ok: true as const, path: file };
  return {
    ok: false as const,
    message: writeFailureText(r),
  };
}
