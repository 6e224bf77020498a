/**
 * The case report: a pure document builder, its renderers (Markdown, 80-column text, printable
 * HTML, JSON) and the atomic, no-overwrite writer. No UI imports: safe for the CLI's main chunk.
 */
export { buildReport, type ReportMeta } from './build.js';
export type { ReportExtrasOptions } from './extras-section.js';
export {
  REPORT_FORMAT,
  REPORT_VERSION,
  figuresOf,
  type Block,
  type Figure,
  type Paragraph,
  type ReportDoc,
  type Section,
  type StepBlock,
  type Table,
} from './doc.js';
export { renderMarkdown, type MarkdownOptions } from './render-markdown.js';
export { renderText, TEXT_WIDTH, type TextOptions } from './render-text.js';
export { renderHtml } from './render-html.js';
export { renderJson, parseReportJson } from './render-json.js';
export { renderReport, REPORT_FORMATS, type ReportFormat } from './render.js';
export { writeReport, reportFiles, figurePath } from './write-report.js';
export type { WriteResult, OutFile } from './write-files.js';
export { toolVersion } from './version.js';
