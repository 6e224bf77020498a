import type { AnalysisSolution } from '../engine/types.js';
import { profileOf, speedAlong } from './slide-profile.js';
import { blankGrid, clip, gridLines, num, put, textWidth } from './text-fit.js';

/** True when `n` cells of row `r` from column `c` hold nothing but spaces or dotted lines. */
function isFree(grid: string[][], c: number, r: number, n: number, sep: string): boolean {
  const row = grid[r];
  if (!row || c < 0 || c + n > row.length) return false;
  for (let k = c; k < c + n; k++) if (row[k] !== ' ' && row[k] !== sep) return false;
  return true;
}

export interface SlideChartOptions {
  /** The surface of each segment, in order (segmentLabels(case, id) gives the case's names). */
  segmentLabels?: readonly string[];
  speedUnit?: string;
  lengthUnit?: string;
  /** Plain ASCII glyphs instead of box-drawing ones. */
  ascii?: boolean;
}

const GLYPH = {
  unicode: { dot: '•', sep: '┊', axisY: '│', axisX: '─', corner: '└', tick: '┴' },
  ascii: { dot: '*', sep: ':', axisY: '|', axisX: '-', corner: '+', tick: '+' },
};

/**
 * The speed along a slide as a text chart: speed up the side (0 at the axis), distance from the
 * start of the marks along the bottom, a dotted line at each segment boundary with the speed
 * there, and each segment's surface named under its stretch. `height` counts every line,
 * axis and labels included (at least 6); every line is at most `width` characters.
 * Between boundaries the curve follows S² linear in distance (constant deceleration).
 *
 * @example
 * speedAlongSlideChart(solution, 60, 12, { segmentLabels: ['asphalt', 'gravel'], speedUnit: 'mph', lengthUnit: 'ft' })
 */
export function speedAlongSlideChart(
  solution: AnalysisSolution,
  width: number,
  height: number,
  opts: SlideChartOptions = {},
): string[] {
  const w = Math.max(1, Math.floor(width));
  const b = profileOf(solution);
  if (!b)
    return [clip('No speed profile: this analysis is not a slide over measured segments.', w)];
  const g = opts.ascii ? GLYPH.ascii : GLYPH.unicode;
  const h = Math.max(6, Math.floor(height));
  const total = b[b.length - 1]!.at;
  const top = Math.max(...b.map((x) => x.speed.value));
  const su = opts.speedUnit ?? '';
  const lu = opts.lengthUnit ? ` ${opts.lengthUnit}` : '';
  const yLabels = [num(top, 1), su, '0'];
  const yW = Math.max(...yLabels.map(textWidth)) + 1;
  const plotW = Math.max(2, w - yW - 1);
  const plotH = h - 3;
  const grid = blankGrid(w, h);
  const colOf = (x: number) => yW + 1 + Math.round((x / total) * (plotW - 1));
  const rowOf = (s: number) => Math.round((1 - s / top) * (plotH - 1));

  for (let r = 0; r < plotH; r++) put(grid, yW, r, g.axisY);
  put(grid, 0, 0, yLabels[0]!);
  if (plotH > 2) put(grid, 0, 1, su);
  put(grid, 0, plotH - 1, '0');
  put(grid, yW, plotH, g.corner + g.axisX.repeat(plotW));
  // The axis already marks the start of the marks; each later boundary gets a dotted line.
  for (const x of b.slice(1)) {
    const c = colOf(x.at);
    for (let r = 0; r < plotH; r++) put(grid, c, r, g.sep);
    put(grid, c, plotH, g.tick);
  }
  for (let c = 0; c < plotW; c++) {
    const s = speedAlong(b, (c / (plotW - 1)) * total);
    put(grid, yW + 1 + c, rowOf(s), g.dot);
  }
  // Speeds at the boundaries, beside each dotted line, on the first nearby row where they cover
  // neither the curve nor another label (skipped when there is none).
  b.forEach((x, j) => {
    const text = num(x.speed.value, 1);
    const c = colOf(x.at);
    const col = j === b.length - 1 ? c - textWidth(text) : c + 1;
    const r0 = rowOf(x.speed.value);
    for (const dr of [-1, -2, 1, 2, -3, 3]) {
      const r = r0 + dr;
      if (r < 0 || r >= plotH || !isFree(grid, col, r, textWidth(text), g.sep)) continue;
      put(grid, col, r, text);
      break;
    }
  });
  // Distances under the ticks, then surfaces under their stretches; later labels skip overlaps.
  let free = 0;
  b.forEach((x, j) => {
    const text = (j === b.length - 1 ? num(x.at, 1) + lu : num(x.at, 1)).trim();
    const c = Math.min(
      w - textWidth(text),
      Math.max(free, colOf(x.at) - (j === 0 ? 0 : Math.floor(textWidth(text) / 2))),
    );
    if (c < free) return;
    put(grid, c, plotH + 1, text);
    free = c + textWidth(text) + 1;
  });
  for (let j = 0; j + 1 < b.length; j++) {
    const a = colOf(b[j]!.at) + 1;
    const e = colOf(b[j + 1]!.at) - 1;
    const name = clip(opts.segmentLabels?.[j] ?? `segment ${j + 1}`, Math.max(0, e - a + 1));
    put(grid, a + Math.max(0, Math.floor((e - a + 1 - textWidth(name)) / 2)), plotH + 2, name);
  }
  return gridLines(grid).map((l) => clip(l, w));
}
