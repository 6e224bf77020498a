import type { Block, Figure, ReportDoc, Section } from './doc.js';

/** Where the Markdown finds each picture; without it, pictures are described, not linked. */
export interface MarkdownOptions {
  /** Relative link to a figure's SVG file (e.g. `report-speed.svg`), or undefined for none. */
  figureHref?: (f: Figure) => string | undefined;
}

/**
 * Escapes what Markdown would read as markup in free text (notes, labels, why lines), and only
 * that, so the file still reads as typed: `Tester #412` stays as it is (a `#` starts a heading
 * only at the start of a line, as `>` starts a quote), and an `_` inside a word (`R_1`) is no
 * emphasis. Backslashes, backticks, `*`, brackets and `<` (an HTML tag) are escaped anywhere.
 * @example escapeMd('Tester #412, *not* bold') // 'Tester #412, \\*not\\* bold'
 */
export function escapeMd(s: string): string {
  return s
    .replace(/\n/g, ' ')
    .replace(/[\\`*[\]<]/g, '\\$&')
    .replace(/(?<![\p{L}\p{N}])_|_(?![\p{L}\p{N}])/gu, '\\_')
    .replace(/^(\s*)(#{1,6}(?=\s|$)|>|[-+](?=\s))/, '$1\\$2');
}

/** Inline code that survives backticks inside it. */
function code(s: string): string {
  const longest = Math.max(0, ...(s.match(/`+/g) ?? []).map((m) => m.length));
  const fence = '`'.repeat(longest + 1);
  return longest ? `${fence} ${s} ${fence}` : `${fence}${s}${fence}`;
}

/** A table cell: a `|` would end it, so it is escaped too. */
function cell(s: string): string {
  return escapeMd(s).replace(/\|/g, '\\|') || ' ';
}

function blockMd(b: Block, opts: MarkdownOptions): string {
  switch (b.kind) {
    case 'paragraph':
      if (b.tone === 'strong') return `**${escapeMd(b.text)}**`;
      if (b.tone === 'note') return `> ${escapeMd(b.text)}`;
      return escapeMd(b.text);
    case 'list':
      return b.items.map((i) => `- ${escapeMd(i)}`).join('\n');
    case 'table': {
      const head = `| ${b.columns.map(cell).join(' | ')} |`;
      const rule = `|${b.align.map((a) => (a === 'right' ? ' ---: ' : ' --- ')).join('|')}|`;
      const rows = b.rows.map(
        (r) => `| ${b.columns.map((_, i) => cell(r[i] ?? '')).join(' | ')} |`,
      );
      const caption = b.caption ? `*${escapeMd(b.caption)}*\n\n` : '';
      return caption + [head, rule, ...rows].join('\n');
    }
    case 'step':
      return [
        `**${b.number}. ${escapeMd(b.name)}**`,
        '',
        `- Formula: ${code(b.formula)}`,
        `- Numbers: ${code(b.substituted)}`,
        `- Result: ${escapeMd(b.result)}`,
        `- Why: ${escapeMd(b.why)}`,
      ].join('\n');
    case 'figure': {
      const href = b.svg ? opts.figureHref?.(b) : undefined;
      const parts = [`*Figure: ${escapeMd(b.caption)}*`];
      if (href) parts.push(`![${escapeMd(b.caption)}](${encodeURI(href)})`);
      if (b.textLines.length > 0) parts.push(['```text', ...b.textLines, '```'].join('\n'));
      if (!href && b.svg)
        parts.push('(The picture is written beside the report as an SVG file with --out.)');
      return parts.join('\n\n');
    }
  }
}

function sectionMd(s: Section, depth: number, opts: MarkdownOptions): string[] {
  const out = [`${'#'.repeat(Math.min(6, depth))} ${escapeMd(s.title)}`];
  for (const b of s.blocks) out.push(blockMd(b, opts));
  for (const sub of s.sections) out.push(...sectionMd(sub, depth + 1, opts));
  return out;
}

/** The report as CommonMark with GitHub-style tables; pictures linked when `figureHref` is given. */
export function renderMarkdown(doc: ReportDoc, opts: MarkdownOptions = {}): string {
  const parts = [
    `# ${escapeMd(doc.title)}`,
    `Case \`${doc.caseId}\`. Generated ${escapeMd(doc.generatedAt)} by skidcase ${escapeMd(doc.toolVersion)}.`,
    ...doc.sections.flatMap((s) => sectionMd(s, 2, opts)),
  ];
  return parts.join('\n\n') + '\n';
}
