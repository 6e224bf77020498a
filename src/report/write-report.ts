import path from 'node:path';
import { figuresOf, type Figure, type ReportDoc } from './doc.js';
import { renderReport, type ReportFormat } from './render.js';
import { renderPdf, type Paper } from './render-pdf.js';
import { writeFiles, type OutFile, type WriteResult } from './write-files.js';

/**
 * Where a picture goes beside the report: `report.md` -> `report-speed.svg`.
 * @example figurePath('/cases/out/harbor.md', { name: 'speed', ... }) // '/cases/out/harbor-speed.svg'
 */
export function figurePath(out: string, f: Pick<Figure, 'name'>): string {
  const p = path.parse(out);
  return path.join(p.dir, `${p.name}-${f.name}.svg`);
}

/**
 * The files a report makes: its pictures (Markdown and text forms) and then the report itself.
 * `paper` is the PDF's page size (the other forms have none).
 */
async function reportFiles(
  doc: ReportDoc,
  format: ReportFormat,
  out: string,
  paper: Paper,
): Promise<OutFile[]> {
  // Markdown and text link or name their pictures, written beside them as SVG files.
  const pictures = format === 'md' || format === 'txt' ? figuresOf(doc).filter((f) => f.svg) : [];
  const files: OutFile[] = pictures.map((f) => ({ path: figurePath(out, f), content: f.svg }));
  const name = (f: Figure) =>
    pictures.includes(f) ? path.basename(figurePath(out, f)) : undefined;
  // HTML and PDF draw their pictures inside the file, JSON carries them in the document.
  files.push({
    path: out,
    content: format === 'pdf' ? await renderPdf(doc, paper) : renderReport(doc, format, name),
  });
  return files;
}

/**
 * Writes a built report to `out` with its pictures beside it, atomically; never replaces an
 * existing file unless `force` (then nothing at all is written). For the CLI and the review screen.
 * A PDF is laid out on `paper` (A4 unless told).
 */
export async function writeReport(
  doc: ReportDoc,
  format: ReportFormat,
  out: string,
  force: boolean,
  paper: Paper = 'a4',
): Promise<WriteResult> {
  return writeFiles(await reportFiles(doc, format, out, paper), force);
}
