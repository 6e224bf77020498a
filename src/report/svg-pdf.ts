/**
 * The report's SVG pictures drawn as PDF vector graphics. The pictures are the project's own
 * (src/pictures/svg.ts and pictures-svg.ts write them), made of six elements only: `rect`,
 * `line`, `polyline`, `circle`, `text` and the `svg`/`title` frame. This reads exactly those and
 * throws on any other, so a new kind of element fails the PDF tests instead of silently missing.
 */
import type { Figure } from './doc.js';

/** One element of a picture, its attributes as written. */
interface Element {
  tag: string;
  attrs: Record<string, string>;
  text: string;
}

const unescapeXml = (s: string) =>
  s
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&');

function elementsOf(svg: string): Element[] {
  const out: Element[] = [];
  const re = /<([a-z]+)((?:\s+[a-zA-Z][\w:-]*="[^"]*")*)\s*(\/>|>([^<]*)<\/\1>|>)/g;
  for (const m of svg.matchAll(re)) {
    const attrs: Record<string, string> = {};
    for (const a of m[2]!.matchAll(/([a-zA-Z][\w:-]*)="([^"]*)"/g))
      attrs[a[1]!] = unescapeXml(a[2]!);
    out.push({ tag: m[1]!, attrs, text: unescapeXml(m[4] ?? '') });
  }
  // Every element read, or none: an element this reader does not follow is an error.
  const opened = svg.match(/<(?![/?!])/g)?.length ?? 0;
  if (opened !== out.length) throw new Error(`an SVG element could not be read`);
  return out;
}

const n = (e: Element, k: string) => {
  const v = Number(e.attrs[k]);
  if (!Number.isFinite(v)) throw new Error(`<${e.tag}> has no number in ${k}`);
  return v;
};

/** The picture's own size in SVG units (its `width` and `height`). */
export function svgSize(svg: string): { width: number; height: number } {
  const root = elementsOf(svg).find((e) => e.tag === 'svg');
  if (!root) throw new Error('not an SVG picture');
  return { width: n(root, 'width'), height: n(root, 'height') };
}

/**
 * Draws a figure's SVG at (x, y), scaled to `width` points; returns the height it took.
 * `font` is the face its text is set in.
 */
export function drawSvg(
  pdf: PDFKit.PDFDocument,
  f: Pick<Figure, 'name' | 'svg'>,
  x: number,
  y: number,
  width: number,
  font: string,
): number {
  const size = svgSize(f.svg);
  const k = width / size.width;
  const X = (v: number) => x + v * k;
  const Y = (v: number) => y + v * k;
  for (const e of elementsOf(f.svg)) {
    pdf.save();
    switch (e.tag) {
      case 'svg':
      case 'title':
        break;
      case 'rect':
        pdf
          .rect(X(n(e, 'x')), Y(n(e, 'y')), n(e, 'width') * k, n(e, 'height') * k)
          .fill(e.attrs.fill ?? '#000');
        break;
      case 'circle':
        pdf.circle(X(n(e, 'cx')), Y(n(e, 'cy')), n(e, 'r') * k).fill(e.attrs.fill ?? '#000');
        break;
      case 'line':
      case 'polyline': {
        const pts =
          e.tag === 'line'
            ? [
                [n(e, 'x1'), n(e, 'y1')],
                [n(e, 'x2'), n(e, 'y2')],
              ]
            : (e.attrs.points ?? '')
                .trim()
                .split(/\s+/)
                .map((p) => p.split(',').map(Number));
        if (pts.some((p) => p.length !== 2 || !p.every(Number.isFinite)))
          throw new Error(`picture ${f.name}: <${e.tag}> has unreadable points`);
        pdf.lineWidth(Number(e.attrs['stroke-width'] ?? 1) * k);
        const dash = e.attrs['stroke-dasharray']?.split(/[\s,]+/).map(Number);
        if (dash && dash.length === 2) pdf.dash(dash[0]! * k, { space: dash[1]! * k });
        pts.forEach(([px, py], i) =>
          i === 0 ? pdf.moveTo(X(px!), Y(py!)) : pdf.lineTo(X(px!), Y(py!)),
        );
        pdf.stroke(e.attrs.stroke ?? '#000');
        if (dash) pdf.undash();
        break;
      }
      case 'text': {
        pdf
          .font(font)
          .fontSize(Number(e.attrs['font-size'] ?? 12) * k)
          .fillColor('#000');
        const w = pdf.widthOfString(e.text);
        const anchor = e.attrs['text-anchor'];
        const shift = anchor === 'middle' ? w / 2 : anchor === 'end' ? w : 0;
        pdf.text(e.text, X(n(e, 'x')) - shift, Y(n(e, 'y')), {
          lineBreak: false,
          baseline: 'alphabetic',
        });
        break;
      }
      default:
        throw new Error(`picture ${f.name}: <${e.tag}> cannot be drawn in the PDF`);
    }
    pdf.restore();
  }
  return size.height * k;
}
