/**
 * "Write report" from the review: the report module's Markdown report, written beside the case
 * file under a new name each time (never over an existing file).
 */
import path from 'node:path';
import type { Case } from '../case/load.js';
import { buildReport } from '../report/build.js';
import { renderReport } from '../report/render.js';
import { toolVersion } from '../report/version.js';
import { writeFiles } from '../report/write-files.js';
import { solveAsFile } from './interview-live.js';
import type { OpenCase } from './services.js';

/** `<id>-report-20261201-215203.md` in the case file's folder. */
export function reportPath(open: OpenCase, c: Case, at: Date): string {
  const stamp = at.toISOString().slice(0, 19).replace(/[-:]/g, '').replace('T', '-');
  return path.join(path.dirname(open.file), `${c.id}-report-${stamp}.md`);
}

export async function writeCaseReport(open: OpenCase, c: Case, at = new Date()) {
  const doc = buildReport(c, solveAsFile(c), {
    toolVersion: toolVersion(),
    generatedAt: at.toISOString(),
    caseFile: open.file,
  });
  const file = reportPath(open, c, at);
  const r = await writeFiles([{ path: file, content: renderReport(doc, 'md') }], false);
  if (r.ok) return { ok: true as const, path: file };
  return {
    ok: false as const,
    message:
      r.kind === 'exists' ? `${r.paths.join(', ')} already exists` : `${r.path}: ${r.message}`,
  };
}
