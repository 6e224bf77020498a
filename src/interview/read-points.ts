/**
 * Surveyed points of a yaw mark, pasted as lines: one point a line, `x y`, `x,y`, `x;y` or
 * `x<TAB>y` (as a total station's or a spreadsheet's export gives them). A first line without a
 * number is taken as a header and skipped. Each number goes through src/input/, so a unit may be
 * glued to it (`12.5m`) and is converted to the case's length unit. Pure: no file is read here.
 */
import type { UnitSystem } from '../engine/types.js';
import { readQuantity, type QuantitySpec } from './read-quantity.js';

/** One point as the case stores it (`points[]`): `[x, y]` in the case's length unit. */
export type PointValue = [number, number];

export type PointsRead =
  { ok: true; value: PointValue[]; notice?: string } | { ok: false; message: string };

/** How the syntax is explained in the help and the error messages. */
export const POINTS_SYNTAX =
  'one point a line, x then y, separated by a space, a comma, a semicolon or a tab (e.g. 0 0, then 8 0.2, then 16 0.81); typed on one line, put a semicolon between points (0 0; 8 0.2; 16 0.81)';

/** Largest coordinate, as the case file allows it. */
const LIMIT = 10_000_000;
const coord = (what: string): QuantitySpec => ({
  kind: 'length',
  rule: { what, min: -LIMIT, max: LIMIT },
  range: false,
});

/** The two parts of one line: split at a tab, semicolon or comma, else at whitespace. */
function partsOf(line: string): string[] {
  const t = line.trim();
  const bits = /[\t;,]/.test(t) ? t.split(/\s*[\t;,]\s*/) : t.split(/\s+/);
  return bits.filter((b) => b !== '');
}

/**
 * The lines of a text as points are read from them: a line holding semicolons whose every part
 * has two numbers (`0 0; 8 0.2; 16 0.81`, typed by hand) is one point per part, each part keeping
 * the line's number; any other line is one point (`8;0.2` is x;y).
 */
function pointLines(text: string): { n: number; raw: string }[] {
  return text.split(/\r\n|\r|\n/).flatMap((raw, n) => {
    const parts = raw.split(';');
    const several = parts.length > 1 && parts.every((x) => x.trim().split(/[\s,\t]+/).length === 2);
    return several ? parts.map((x) => ({ n, raw: x })) : [{ n, raw }];
  });
}

/**
 * Reads pasted points. Fails naming the line (its number in the text, counting blank ones) and
 * what is wrong there; fewer than 3 points is refused.
 * @example readPoints('x,y\n0,0\n8,0.2\n16,0.81', 'imperial')
 * // { ok: true, value: [[0, 0], [8, 0.2], [16, 0.81]], notice: 'line 1 ("x,y") taken as a header; 3 points read' }
 */
export function readPoints(text: string, units: UnitSystem): PointsRead {
  const value: PointValue[] = [];
  const notes: string[] = [];
  let first = true;
  for (const { n, raw } of pointLines(text)) {
    if (raw.trim() === '') continue;
    const where = `line ${n + 1} ("${raw.trim()}")`;
    if (first && !/\d/.test(raw)) {
      notes.push(`${where} taken as a header`);
      first = false;
      continue;
    }
    first = false;
    const parts = partsOf(raw);
    if (parts.length !== 2)
      return {
        ok: false,
        message: `${where}: write one point as x y (two numbers), e.g. 8 0.2 or 8,0.2`,
      };
    const x = readQuantity(parts[0]!, coord('x'), units);
    if (!x.ok) return { ok: false, message: `${where}: ${x.message}` };
    const y = readQuantity(parts[1]!, coord('y'), units);
    if (!y.ok) return { ok: false, message: `${where}: ${y.message}` };
    for (const note of [x.notice, y.notice]) if (note) notes.push(`${where}: ${note}`);
    value.push([x.value as number, y.value as number]);
  }
  if (value.length < 3)
    return {
      ok: false,
      message: `${value.length === 0 ? 'no points read' : `only ${value.length} point${value.length === 1 ? '' : 's'} read`}: at least 3 are needed for a circle; give ${POINTS_SYNTAX}`,
    };
  notes.push(`${value.length} points read`);
  return { ok: true, value, notice: notes.join('; ') };
}

/**
 * The point numbers (1-based, as shown) named in `drop`: `3 7`, `3, 7` or a range `12-14`, in
 * order and once each. Fails naming a word that is no point number among `count` points.
 * @example pointNumbers('1, 4-6', 8) // { ok: true, value: [1, 4, 5, 6] }
 */
export function pointNumbers(
  drop: string,
  count: number,
): { ok: true; value: number[] } | { ok: false; message: string } {
  const out = new Set<number>();
  const words = drop
    .replace(/\s*-\s*/g, '-')
    .split(/[\s,;]+/)
    .filter(Boolean);
  for (const w of words) {
    const m = /^(\d+)(?:-(\d+))?$/.exec(w);
    const a = m ? Number(m[1]) : NaN;
    const b = m?.[2] !== undefined ? Number(m[2]) : a;
    if (!m || a < 1 || b > count || b < a)
      return {
        ok: false,
        message: `"${w}" is not a point number: give numbers from 1 to ${count}, e.g. 3 7 or 12-14`,
      };
    for (let k = a; k <= b; k++) out.add(k);
  }
  return { ok: true, value: [...out].sort((x, y) => x - y) };
}

/**
 * The points left after dropping those numbered in `drop` (1-based, as shown), e.g. `3 7`,
 * `3, 7` or `12-14`. Fails naming a number that is no point, or when fewer than 3 would remain.
 * @example dropPoints([[0, 0], [1, 1], [2, 0], [3, 5]], '4') // { ok: true, value: [[0, 0], [1, 1], [2, 0]] }
 */
export function dropPoints(points: readonly PointValue[], drop: string): PointsRead {
  const numbers = pointNumbers(drop, points.length);
  if (!numbers.ok) return numbers;
  const out = new Set(numbers.value.map((n) => n - 1));
  const value = points.filter((_, k) => !out.has(k));
  if (value.length < 3)
    return {
      ok: false,
      message: `dropping ${[...out].map((k) => k + 1).join(', ')} leaves ${value.length} of ${points.length} points: at least 3 are needed for a circle`,
    };
  return { ok: true, value: value.map((p) => [p[0], p[1]]) };
}
