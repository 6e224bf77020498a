import path from 'node:path';
import { figuresOf, type Figure, type ReportDoc } from './doc.js';
import { renderReport, type ReportFormat } from './render.js';
import { writeFiles, type OutFile, type WriteResult } from './write-files.js';

/**
 * Where a picture goes beside the report: `report.md` -> `report-speed.svg`.
 * @example figurePath('/cases/out/harbor.md', { name: 'speed', ... }) // '/cases/out/harbor-speed.svg'
 */
export function figurePath(out: string, f: Pick<Figure, 'name'>): string {
  const p = path.parse(out);
  return path.join(p.dir, `${p.name}-${f.name}.svg`);
}

/** The files a report makes: its pictures (Markdown and text forms) and then the report itself. */
export function reportFiles(doc: ReportDoc, format: ReportFormat, out: string): OutFile[] {
  // HTML carries its pictures inline and JSON inside the document; the other forms get files.
  const pictures = format === 'md' || format === 'txt' ? figuresOf(doc).filter((f) => f.svg) : [];
  const files: OutFile[] = pictures.map((f) => ({ path: figurePath(out, f), content: f.svg }));
  const name = (f: Figure) =>
    pictures.includes(f) ? path.basename(figurePath(out, f)) : undefined;
  files.push({ path: out, content: renderReport(doc, format, name) });
  return files;
}

/**
 * Writes a built report to `out` with its pictures beside it, atomically; never replaces an
 * existing file unless `force` (then nothing at all is written). For the CLI and the review screen.
 */
export function writeReport(
  doc: ReportDoc,
  format: ReportFormat,
  out: string,
  force: boolean,
): Promise<WriteResult> {
  return writeFiles(reportFiles(doc, format, out), force);
}
