import type { Block, ReportDoc, Section } from './doc.js';

/** Escapes text for HTML element content and attribute values. */
export function escapeHtml(s: string): string {
  return s
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/** An SVG string ready to sit inside HTML: any XML prolog or doctype removed. */
export function inlineSvg(svg: string): string {
  return svg
    .replace(/<\?xml[^>]*\?>/g, '')
    .replace(/<!DOCTYPE[^>]*>/gi, '')
    .trim();
}

// Black on white, serif body, nothing that needs a network or a font download; sized for A4 and
// US Letter alike, with page breaks kept out of tables, steps and pictures.
const CSS = `
:root { color: #111; background: #fff; }
body { font: 11pt/1.45 Georgia, "Times New Roman", serif; margin: 2rem auto; max-width: 48rem; padding: 0 1rem; }
h1 { font-size: 1.6rem; margin-bottom: .2rem; } h2 { font-size: 1.25rem; border-bottom: 1px solid #444; margin-top: 2rem; }
h3 { font-size: 1.08rem; margin-top: 1.4rem; } h4 { font-size: 1rem; margin: .8rem 0 .2rem; }
.meta { color: #333; font-size: .9rem; }
p.strong { font-weight: bold; border-left: 4px solid #111; padding-left: .6rem; }
p.note { font-style: italic; }
table { border-collapse: collapse; width: 100%; margin: .5rem 0 1rem; font-size: .92rem; }
caption { text-align: left; font-style: italic; padding-bottom: .2rem; }
th, td { border: 1px solid #888; padding: .2rem .4rem; vertical-align: top; text-align: left; }
td.r, th.r { text-align: right; font-variant-numeric: tabular-nums; }
.step { margin: .4rem 0 .8rem; } .step dl { display: grid; grid-template-columns: 6rem 1fr; margin: 0; gap: .1rem .6rem; }
.step dt { font-weight: bold; } .step dd { margin: 0; }
code { font: .9rem/1.3 "DejaVu Sans Mono", Menlo, Consolas, monospace; white-space: pre-wrap; }
figure { margin: 1rem 0; } figure svg { max-width: 100%; height: auto; }
figcaption { font-style: italic; font-size: .9rem; }
@page { margin: 18mm 16mm; }
@media print {
  body { margin: 0; max-width: none; padding: 0; font-size: 10pt; }
  h2, h3, h4 { break-after: avoid; }
  table, .step, figure { break-inside: avoid; }
  main > section[id^="analysis-"] { break-before: page; }
}
`.trim();

function blockHtml(b: Block): string {
  switch (b.kind) {
    case 'paragraph':
      return `<p class="${b.tone}">${escapeHtml(b.text)}</p>`;
    case 'list':
      return `<ul>${b.items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul>`;
    case 'table': {
      const cls = (i: number) => (b.align[i] === 'right' ? ' class="r"' : '');
      const head = b.columns.map((c, i) => `<th${cls(i)}>${escapeHtml(c)}</th>`).join('');
      const rows = b.rows
        .map(
          (r) =>
            `<tr>${b.columns.map((_, i) => `<td${cls(i)}>${escapeHtml(r[i] ?? '')}</td>`).join('')}</tr>`,
        )
        .join('\n');
      const cap = b.caption ? `<caption>${escapeHtml(b.caption)}</caption>` : '';
      return `<table>${cap}<thead><tr>${head}</tr></thead><tbody>\n${rows}\n</tbody></table>`;
    }
    case 'step':
      return [
        `<div class="step"><h4>${b.number}. ${escapeHtml(b.name)}</h4><dl>`,
        `<dt>Formula</dt><dd><code>${escapeHtml(b.formula)}</code></dd>`,
        `<dt>Numbers</dt><dd><code>${escapeHtml(b.substituted)}</code></dd>`,
        `<dt>Result</dt><dd>${escapeHtml(b.result)}</dd>`,
        `<dt>Why</dt><dd>${escapeHtml(b.why)}</dd>`,
        `</dl></div>`,
      ].join('\n');
    case 'figure':
      return `<figure id="fig-${escapeHtml(b.name)}">\n${b.svg ? inlineSvg(b.svg) : `<pre>${escapeHtml(b.textLines.join('\n'))}</pre>`}\n<figcaption>${escapeHtml(b.caption)}</figcaption></figure>`;
  }
}

function sectionHtml(s: Section, depth: number): string {
  const h = `h${Math.min(6, depth)}`;
  return [
    `<section id="${escapeHtml(s.id)}">`,
    `<${h}>${escapeHtml(s.title)}</${h}>`,
    ...s.blocks.map(blockHtml),
    ...s.sections.map((sub) => sectionHtml(sub, depth + 1)),
    `</section>`,
  ].join('\n');
}

/**
 * A printable, self-contained HTML page: inline CSS (with print rules) and the SVG pictures
 * inlined, so the one file can be mailed, archived or printed to PDF from any browser.
 */
export function renderHtml(doc: ReportDoc): string {
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<title>${escapeHtml(doc.title)}</title>`,
    `<style>\n${CSS}\n</style>`,
    '</head>',
    '<body>',
    '<main>',
    `<header><h1>${escapeHtml(doc.title)}</h1>`,
    `<p class="meta">Case <code>${escapeHtml(doc.caseId)}</code>. Generated ${escapeHtml(doc.generatedAt)} by skidcase ${escapeHtml(doc.toolVersion)}.</p></header>`,
    ...doc.sections.map((s) => sectionHtml(s, 2)),
    '</main>',
    '</body>',
    '</html>',
    '',
  ].join('\n');
}
