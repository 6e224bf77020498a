import { REPORT_FORMAT, REPORT_VERSION, type ReportDoc } from './doc.js';

/** The document model as pretty-printed JSON; `JSON.parse` of it gives the same document back. */
export function renderJson(doc: ReportDoc): string {
  return JSON.stringify(doc, null, 2) + '\n';
}

/** Reads a JSON report back, checking only that it is one (the model is plain data). */
export function parseReportJson(text: string): ReportDoc | undefined {
  try {
    const o = JSON.parse(text) as Partial<ReportDoc>;
    if (
      o &&
      o.format === REPORT_FORMAT &&
      o.version === REPORT_VERSION &&
      Array.isArray(o.sections)
    )
      return o as ReportDoc;
  } catch {
    // not JSON: the caller says so
  }
  return undefined;
}
