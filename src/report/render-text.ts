import type { Block, Figure, ReportDoc, Section } from './doc.js';
import { textTable } from './text-table.js';
import { hang, width, wrap } from './wrap.js';

/** Line width of the plain-text report. */
export const TEXT_WIDTH = 80;

/** Options of the text form. */
export interface TextOptions {
  /** Line width; default 80. */
  width?: number;
  /** The picture file written beside the report, to name under the figure. */
  figureFile?: (f: Figure) => string | undefined;
}

function blockLines(b: Block, w: number, o: TextOptions): string[] {
  switch (b.kind) {
    case 'paragraph': {
      if (b.tone === 'strong') return hang('>> ', b.text, w);
      if (b.tone === 'note') return hang('Note: ', b.text, w);
      return wrap(b.text, w);
    }
    case 'list':
      return b.items.flatMap((item) => hang('  - ', item, w));
    case 'table':
      return [...(b.caption ? wrap(b.caption + ':', w) : []), ...textTable(b, w)];
    case 'step': {
      const lab = (label: string, text: string) => hang(`      ${label}`, text, w, 17);
      return [
        ...hang(`  ${b.number}. `, b.name, w, 6),
        ...lab('Formula:', b.formula),
        ...lab('Numbers:', b.substituted),
        ...lab('Result:', b.result),
        ...lab('Why:', b.why),
      ];
    }
    case 'figure': {
      // A picture wider than the page is left out of the text form rather than cut.
      const fits = b.textLines.length > 0 && b.textLines.every((l) => width(l) <= w);
      return [
        ...wrap(`Figure: ${b.caption}`, w),
        ...(fits ? b.textLines : []),
        ...(b.svg
          ? wrap(`(Picture: ${o.figureFile?.(b) ?? `written beside the report with --out`}.)`, w)
          : []),
      ];
    }
  }
}

function sectionLines(s: Section, number: string, w: number, o: TextOptions): string[] {
  const top = !number.includes('.');
  const title = top ? `${number}. ${s.title.toUpperCase()}` : `${number} ${s.title}`;
  const out = ['', ...wrap(title, w)];
  out.push('-'.repeat(Math.min(w, width(title))), '');
  for (const b of s.blocks) out.push(...blockLines(b, w, o), '');
  s.sections.forEach((sub, i) => out.push(...sectionLines(sub, `${number}.${i + 1}`, w, o)));
  return out;
}

/**
 * The report as plain text, every line at most 80 columns, no colour or markup: for printing,
 * pasting into an agency's form, or reading in any terminal.
 */
export function renderText(doc: ReportDoc, o: TextOptions = {}): string {
  const w = o.width ?? TEXT_WIDTH;
  const lines = [
    ...wrap(doc.title, w),
    '='.repeat(Math.min(w, width(doc.title))),
    ...wrap(`Case ${doc.caseId}. Generated ${doc.generatedAt} by skidcase ${doc.toolVersion}.`, w),
  ];
  doc.sections.forEach((s, i) => lines.push(...sectionLines(s, `${i + 1}`, w, o)));
  // Collapse runs of blank lines left by empty blocks.
  const tidy = lines.filter((l, i) => !(l.trim() === '' && (lines[i - 1] ?? 'x').trim() === ''));
  return (
    tidy
      .map((l) => l.trimEnd())
      .join('\n')
      .trim() + '\n'
  );
}
