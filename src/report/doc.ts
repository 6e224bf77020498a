/**
 * The report as a small document model: plain data (no functions, no `undefined`), so that it
 * serialises to JSON and back unchanged and every renderer (Markdown, text, HTML, JSON) reads the
 * same content. Numbers are already formatted into text by the builder: a renderer never formats,
 * rounds or computes a figure.
 */

/** Marker and version of the JSON form, so a reader can tell a report from a case file. */
export const REPORT_FORMAT = 'skidcase-report';
export const REPORT_VERSION = 1;

/** A paragraph of text; `tone` says how much it stands out. */
export interface Paragraph {
  kind: 'paragraph';
  text: string;
  /** `strong` for the "at least" statement and other lines a reader must not miss. */
  tone: 'plain' | 'strong' | 'note';
}

/** A list of items, in order. */
export interface BulletList {
  kind: 'list';
  items: string[];
}

/** A table of text cells; `caption` may be empty. */
export interface Table {
  kind: 'table';
  caption: string;
  columns: string[];
  /** Alignment per column; numbers read best right-aligned. */
  align: ('left' | 'right')[];
  rows: string[][];
}

/** One step of a formula chain, every field already text. */
export interface StepBlock {
  kind: 'step';
  number: number;
  name: string;
  formula: string;
  substituted: string;
  result: string;
  why: string;
}

/**
 * A picture: an SVG (written beside the report as `<base>-<name>.svg`, inlined in HTML) and,
 * where one exists, the same picture as plain text lines for the text and Markdown forms.
 */
export interface Figure {
  kind: 'figure';
  /** File-name part, [a-z0-9-]: `speed`, `yaw-arc`, `skid-1-sensitivity`. */
  name: string;
  caption: string;
  /** The SVG text; empty when the picture exists only as text lines. */
  svg: string;
  textLines: string[];
}

/** Anything a section holds. */
export type Block = Paragraph | BulletList | Table | StepBlock | Figure;

/** A titled part of the report, with its blocks and its own sub-sections. */
export interface Section {
  /** Stable anchor, [a-z0-9-]. */
  id: string;
  title: string;
  blocks: Block[];
  sections: Section[];
}

/** The whole report: what it is, what it was made from and by, and its sections. */
export interface ReportDoc {
  format: typeof REPORT_FORMAT;
  version: typeof REPORT_VERSION;
  title: string;
  caseId: string;
  toolVersion: string;
  generatedAt: string;
  /** The case file's bytes the figures were made from (`skidcase verify` compares them). */
  source?: ReportSource;
  sections: Section[];
}

/** What a report records of the file it was made from. */
export interface ReportSource {
  /** SHA-256 of the case file's bytes, lower-case hex. */
  sha256: string;
  /** The case's last-saved time as the file records it (`updated`), or empty. */
  saved: string;
}

/**
 * The provenance sentence every format prints, and `skidcase verify` reads back (provenanceOf).
 * @example provenanceLine('harbor-1', { sha256: 'ab…', saved: '2026-12-01T10:00:00Z' }, '0.1.0')
 */
export function provenanceLine(caseId: string, s: ReportSource, toolVersion: string): string {
  return `Made from case ${caseId}, case file SHA-256 ${s.sha256}, last saved ${s.saved || 'not recorded'}, by skidcase ${toolVersion}.`;
}

/** The case id and SHA-256 a report's text states (any format), or undefined when it has none. */
export function provenanceOf(
  text: string,
): { caseId: string; sha256: string; saved: string } | undefined {
  // Markdown may escape a character, HTML wraps the line in tags and may break it: read the text.
  const plain = text
    .replace(/<[^>]*>/g, ' ')
    .replace(/\\([^\s])/g, '$1')
    .replace(/\s+/g, ' ');
  const m =
    /Made from case (\S+), case file SHA-256 ([0-9a-f]{64}), last saved (\S+(?: recorded)?),/.exec(
      plain,
    );
  return m ? { caseId: m[1]!, sha256: m[2]!, saved: m[3]! } : undefined;
}

/** Builders that keep every block complete (no missing fields), so JSON round-trips exactly. */
export const para = (text: string, tone: Paragraph['tone'] = 'plain'): Paragraph => ({
  kind: 'paragraph',
  text,
  tone,
});

/** A list block. */
export const list = (items: string[]): BulletList => ({ kind: 'list', items });

/** A table block; columns are left-aligned unless `align` says otherwise. */
export function table(
  caption: string,
  columns: string[],
  rows: string[][],
  align?: ('left' | 'right')[],
): Table {
  return { kind: 'table', caption, columns, align: align ?? columns.map(() => 'left'), rows };
}

/** A section; sub-sections optional. */
export function section(
  id: string,
  title: string,
  blocks: Block[],
  sections: Section[] = [],
): Section {
  return { id, title, blocks, sections };
}

/** A safe file-name part from any label: lower case, [a-z0-9-] only. */
export function fileSafe(s: string): string {
  return (
    s
      .toLowerCase()
      .replace(/[^a-z0-9-]+/g, '-')
      .replace(/^-+|-+$/g, '') || 'figure'
  );
}

/** Every figure in the document, in reading order. */
export function figuresOf(doc: ReportDoc): Figure[] {
  const out: Figure[] = [];
  const walk = (s: Section) => {
    for (const b of s.blocks) if (b.kind === 'figure') out.push(b);
    s.sections.forEach(walk);
  };
  doc.sections.forEach(walk);
  return out;
}
