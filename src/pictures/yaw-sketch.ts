import { arcRadius } from '../engine/index.js';
import { blankGrid, clip, gridLines, num, put, textWidth } from './text-fit.js';

export interface SketchOptions {
  /** Length unit for the labels ("ft", "m"); none when left out. */
  unit?: string;
  ascii?: boolean;
}

const GLYPH = {
  unicode: { arc: '•', chord: '─', end: '┼', ord: '│', foot: '┴' },
  ascii: { arc: '*', chord: '-', end: '+', ord: '|', foot: '+' },
};

/**
 * Height of the arc above the chord at distance x from the chord's start, for a chord C with
 * middle ordinate M (circle geometry: R = C²/(8M) + M/2, y = sqrt(R² − (x − C/2)²) − (R − M)).
 */
export function arcOffset(C: number, M: number, x: number): number {
  const R = arcRadius(C, M);
  const h = R * R - (x - C / 2) ** 2;
  return h > 0 ? Math.sqrt(h) - (R - M) : 0;
}

/**
 * A sketch of a yaw mark's arc in plain text: the chord along the bottom with its ends marked,
 * the arc above it, and the middle ordinate as a vertical line from the chord's midpoint to the
 * arc, each labelled with its length. The height is stretched to fill the space (a real middle
 * ordinate is a few percent of the chord), and the sketch says so. `height` counts every line
 * (at least 5); every line is at most `width` characters. Returns one line of text when C and M
 * do not make an arc (M not in (0, C/2)).
 *
 * @example yawArcSketch(45, 3.2, 60, 10, { unit: 'ft' })
 */
export function yawArcSketch(
  C: number,
  M: number,
  width: number,
  height: number,
  opts: SketchOptions = {},
): string[] {
  const w = Math.max(1, Math.floor(width));
  if (!(Number.isFinite(C) && Number.isFinite(M) && C > 0 && M > 0 && M < C / 2))
    return [
      clip('No arc to draw: the middle ordinate must be above 0 and below half the chord.', w),
    ];
  const g = opts.ascii ? GLYPH.ascii : GLYPH.unicode;
  const h = Math.max(5, Math.floor(height));
  const u = opts.unit ? ` ${opts.unit}` : '';
  const plotW = Math.max(3, w);
  const chordRow = h - 3;
  const rows = chordRow; // rows 0 .. chordRow-1 hold the arc above the chord
  const grid = blankGrid(w, h);
  const colX = (c: number) => (c / (plotW - 1)) * C;
  const rowOf = (y: number) => chordRow - Math.round((y / M) * rows);

  put(grid, 0, chordRow, g.end + g.chord.repeat(Math.max(0, plotW - 2)) + g.end);
  let prev = chordRow;
  for (let c = 0; c < plotW; c++) {
    const r = Math.max(0, Math.min(chordRow, rowOf(arcOffset(C, M, colX(c)))));
    // Fill the rows between neighbouring columns so the steep ends stay joined.
    const [a, b] = r < prev ? [r, prev - 1] : [prev + 1, r];
    for (let k = a; k <= b && c > 0; k++) if (k < chordRow) put(grid, c, k, g.arc);
    if (r < chordRow) put(grid, c, r, g.arc);
    prev = r;
  }
  const mid = Math.floor((plotW - 1) / 2);
  for (let r = rowOf(M) + 1; r < chordRow; r++) put(grid, mid, r, g.ord);
  put(grid, mid, chordRow, g.foot);
  const mText = `M ${num(M, 2)}${u}`;
  const mRow = Math.max(1, Math.floor((rowOf(M) + chordRow) / 2));
  put(grid, mid + 2, mRow, mText);
  const cText = `chord C ${num(C, 2)}${u}`;
  put(grid, Math.max(0, Math.floor((w - textWidth(cText)) / 2)), chordRow + 1, cText);
  // Terminal cells are about twice as tall as wide.
  const stretch = (2 * rows) / M / ((plotW - 1) / C);
  if (stretch > 1.5)
    put(
      grid,
      0,
      chordRow + 2,
      clip(`height drawn about ${Math.round(stretch)}× the length scale`, w),
    );
  return gridLines(grid).map((l) => clip(l, w));
}
