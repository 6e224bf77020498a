import type { Figure, ReportDoc } from './doc.js';
import { renderHtml } from './render-html.js';
import { renderJson } from './render-json.js';
import { renderMarkdown } from './render-markdown.js';
import { renderText } from './render-text.js';

/** The forms a report is rendered in: Markdown, plain text, JSON, printable HTML, PDF. */
export type ReportFormat = 'md' | 'txt' | 'json' | 'html' | 'pdf';
/** Every form, in the order the help lists them. */
export const REPORT_FORMATS: readonly ReportFormat[] = ['md', 'txt', 'json', 'html', 'pdf'];
/** The forms that are text (every one but the PDF, which is binary: see render-pdf.ts). */
export type TextFormat = Exclude<ReportFormat, 'pdf'>;

/**
 * The report in one of its text forms. `figureFile` names each picture's file beside the report (a
 * relative name), for the forms that link or mention it; HTML inlines the pictures and JSON
 * carries them in the document.
 */
export function renderReport(
  doc: ReportDoc,
  format: TextFormat,
  figureFile?: (f: Figure) => string | undefined,
): string {
  const opts = figureFile ? { figureFile } : {};
  switch (format) {
    case 'md':
      return renderMarkdown(doc, figureFile ? { figureHref: figureFile } : {});
    case 'txt':
      return renderText(doc, opts);
    case 'json':
      return renderJson(doc);
    case 'html':
      return renderHtml(doc);
  }
}
