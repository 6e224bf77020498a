/** Small helpers for the self-contained SVG pictures: no external fonts, styles or images. */

/** Text safe inside an SVG element or attribute. */
export function esc(s: string): string {
  return s
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;');
}

/** A coordinate with at most two decimals (never NaN in the markup: non-finite becomes 0). */
export function px(n: number): string {
  return Number.isFinite(n) ? String(Math.round(n * 100) / 100) : '0';
}

/** A text element; `anchor` start, middle or end. */
export function text(
  x: number,
  y: number,
  s: string,
  anchor: 'start' | 'middle' | 'end' = 'start',
  size = 12,
): string {
  return `<text x="${px(x)}" y="${px(y)}" font-size="${size}" text-anchor="${anchor}">${esc(s)}</text>`;
}

/** A line. `dash` draws it dashed. */
export function line(x1: number, y1: number, x2: number, y2: number, dash = false): string {
  return `<line x1="${px(x1)}" y1="${px(y1)}" x2="${px(x2)}" y2="${px(y2)}" stroke="#000" stroke-width="1"${dash ? ' stroke-dasharray="4 3"' : ''}/>`;
}

/** The whole picture: a titled SVG document with a generic font family. */
export function svgDocument(width: number, height: number, title: string, body: string[]): string {
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${px(width)}" height="${px(height)}" viewBox="0 0 ${px(width)} ${px(height)}" font-family="sans-serif" role="img">`,
    `<title>${esc(title)}</title>`,
    `<rect x="0" y="0" width="${px(width)}" height="${px(height)}" fill="#fff"/>`,
    ...body,
    '</svg>',
  ].join('\n');
}
