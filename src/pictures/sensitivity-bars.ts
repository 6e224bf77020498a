import type { SensitivityRow } from '../extras/sensitivity.js';
import { clip, padEnd, padStart, signed, textWidth } from './text-fit.js';

export interface BarOptions {
  /** Speed unit shown after the changes ("mph", "km/h"); none when left out. */
  speedUnit?: string;
  /** Draw with `#`, `+` and `|` instead of block characters (terminals without Unicode). */
  ascii?: boolean;
}

const GLYPHS = {
  unicode: { full: '█', leftHalf: '▐', rightHalf: '▌', axis: '│' },
  ascii: { full: '#', leftHalf: '+', rightHalf: '+', axis: '|' },
};

/**
 * A bar of `cells` half-cells, growing away from the axis: to the left for a drop, to the right
 * for a rise. Half-cell resolution because block glyphs that fill a cell from the right come only
 * in halves.
 */
function bar(
  halves: number,
  width: number,
  side: 'left' | 'right',
  g: typeof GLYPHS.unicode,
): string {
  const h = Math.max(0, Math.min(2 * width, halves));
  const full = Math.floor(h / 2);
  const half = h % 2 === 1;
  const body = g.full.repeat(full);
  if (side === 'left') return padStart((half ? g.leftHalf : '') + body, width);
  return padEnd(body + (half ? g.rightHalf : ''), width);
}

/** "-4.1 / +3.8": the drop and the rise, or "— / —" when neither end could be computed. */
export function changeText(r: SensitivityRow): string {
  const none = r.atLow === undefined && r.atHigh === undefined;
  return `${signed(none ? undefined : r.down, 1)} / ${signed(none ? undefined : r.up, 1)}`;
}

/**
 * The sensitivity rows as a horizontal bar chart in plain text: one line per input with its
 * plain name (the model's keys, such as `f[0]`, are internal and never shown), a bar left of the axis for how far the speed drops and right of it for how far it
 * rises, and the two changes in numbers (`-4.1 / +3.8 mph`). The first line says how to read it.
 * Readable without colour; every line is at most `width` characters (labels are cut to fit).
 * Bars share one scale: the largest change fills half the bar area.
 *
 * @example
 * sensitivityBars(sensitivity(solution), 60, { speedUnit: 'mph' })
 * // [ 'Change in speed, each input at its ends (◀ lower │ higher ▶)',
 * //   'middle ordinate     ████████▐│███████▌  -4.1 / +3.8 mph', ... ]
 */
export function sensitivityBars(
  rows: SensitivityRow[],
  width: number,
  opts: BarOptions = {},
): string[] {
  const w = Math.max(1, Math.floor(width));
  const g = opts.ascii ? GLYPHS.ascii : GLYPHS.unicode;
  const unit = opts.speedUnit ? ` ${opts.speedUnit}` : '';
  if (rows.length === 0) return [clip('No input has a range: the speed has no spread to show.', w)];

  const figures = rows.map((r) => changeText(r) + unit);
  const figW = Math.max(...figures.map(textWidth));
  // Room left for the label and the bars, after the figures and the gap before them.
  const room = w - figW - 2;
  // Bars get 4 to 14 cells a side; the label gets what is left, up to 16 characters before the
  // bars grow and up to its full length after.
  const maxLabel = Math.max(...rows.map((r) => textWidth(r.label)));
  const barHalf = Math.max(4, Math.min(14, Math.floor((room - 2 - Math.min(maxLabel, 16)) / 2)));
  const labelW = Math.min(maxLabel, Math.max(0, room - 2 * barHalf - 2));
  const scale = Math.max(...rows.map((r) => Math.max(-r.down, r.up)));

  const arrow = opts.ascii ? '<- lower | higher ->' : '◀ lower │ higher ▶';
  const header = clip(`Change in speed, each input at its ends (${arrow})`, w);
  const lines = rows.map((r, i) => {
    const toHalves = (x: number) => (scale > 0 ? Math.round((x / scale) * 2 * barHalf) : 0);
    const left = bar(toHalves(-r.down), barHalf, 'left', g);
    const right = bar(toHalves(r.up), barHalf, 'right', g);
    const label = labelW > 0 ? padEnd(r.label, labelW) + ' ' : '';
    const line = `${label}${left}${g.axis}${right}  ${figures[i]}`;
    return clip(line.replace(/\s+$/, ''), w);
  });
  return [header, ...lines];
}
