/**
 * A PDF read back as a reader's program sees it, with pdf.js (Mozilla's PDF reader, used here
 * only): each page's text, its MediaBox, the drawing operators it runs, and the Subject entry.
 */
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';

export interface ReadPdf {
  /** Each page's text, its runs and lines joined by spaces (a word broken after a hyphen joined again). */
  pages: string[];
  /** Each page's MediaBox, [width, height] in points. */
  sizes: [number, number][];
  /** The names of the operators each page runs (pdf.js's OPS names: constructPath, ...). */
  ops: string[][];
  /** Each page's paths: how many straight and curved segments each has. */
  paths: { lines: number; curves: number }[][];
  /** The document information's Subject, as pdf.js reads it. */
  subject: string | undefined;
}

const OP_NAME = new Map(Object.entries(OPS).map(([name, code]) => [code, name]));

/**
 * A path's segments from pdf.js's constructPath arguments ([paint, [data], box]; data is a run of
 * a drawing op followed by its coordinates: 0 moveTo x y, 1 lineTo x y, 2 curveTo x1 y1 x2 y2 x y,
 * 3 quadraticCurveTo x1 y1 x y, 4 closePath).
 */
function segments(args: unknown): { lines: number; curves: number } {
  const data = (args as [number, ArrayLike<number>[]])[1]?.[0] ?? [];
  const width: Record<number, number> = { 0: 2, 1: 2, 2: 6, 3: 4, 4: 0 };
  let lines = 0;
  let curves = 0;
  for (let i = 0; i < data.length;) {
    const op = data[i]!;
    if (!(op in width)) throw new Error(`unknown path op ${op}`);
    if (op === 1) lines++;
    if (op === 2 || op === 3) curves++;
    i += 1 + width[op]!;
  }
  return { lines, curves };
}

export async function readPdf(bytes: Uint8Array): Promise<ReadPdf> {
  const doc = await getDocument({ data: new Uint8Array(bytes), useSystemFonts: false }).promise;
  const out: ReadPdf = { pages: [], sizes: [], ops: [], paths: [], subject: undefined };
  try {
    for (let i = 1; i <= doc.numPages; i++) {
      const page = await doc.getPage(i);
      const content = await page.getTextContent();
      const lines = content.items
        .map((it) => ('str' in it ? it.str + (it.hasEOL ? '\n' : ' ') : ''))
        .join('')
        .split('\n');
      out.pages.push(
        lines
          .reduce((acc, l) => (acc.endsWith('-') ? acc + l.trim() : `${acc} ${l.trim()}`), '')
          .replace(/\s+/g, ' ')
          .trim(),
      );
      const [x0, y0, x1, y1] = page.view as [number, number, number, number];
      out.sizes.push([x1 - x0, y1 - y0]);
      const list = await page.getOperatorList();
      out.ops.push(list.fnArray.map((f) => OP_NAME.get(f) ?? String(f)));
      out.paths.push(
        list.fnArray.flatMap((f, k) =>
          f === OPS.constructPath ? [segments(list.argsArray[k])] : [],
        ),
      );
    }
    const meta = await doc.getMetadata();
    const subject = (meta.info as { Subject?: unknown }).Subject;
    out.subject = typeof subject === 'string' ? subject : undefined;
  } finally {
    await doc.destroy();
  }
  return out;
}
