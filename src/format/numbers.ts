import type { Range } from '../engine/types.js';

/**
 * What a number is, which fixes how many decimals it is shown with. Speeds 1 dp, drag factors
 * and braking efficiency 2 dp, lengths 2 dp below 10 and 1 dp from 10, grades as decimals
 * (`grade`) up to 3 dp, percentages up to 1 dp, seconds 1 dp.
 */
export type NumberKind =
  | 'speed'
  | 'length'
  | 'drag'
  | 'efficiency'
  | 'grade'
  | 'percent'
  | 'seconds'
  | 'ratio'
  | 'integer';

/** Shown instead of a number that is not finite: never "NaN" or "Infinity" on screen. */
export const NOT_A_NUMBER = '—';

function fixed(n: number, dp: number): string {
  const s = n.toFixed(dp);
  // "-0.0" reads as a sign error to a reader; a rounded zero has no sign.
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

function trimmed(n: number, maxDp: number, minDp: number): string {
  let s = fixed(n, maxDp);
  if (s.includes('.')) {
    s = s.replace(/0+$/, '');
    const dp = s.length - s.indexOf('.') - 1;
    if (dp < minDp) s += '0'.repeat(minDp - dp);
    if (s.endsWith('.')) s = s.slice(0, -1);
  }
  return s;
}

/**
 * Formats a number for people: fixed decimals per kind, never "NaN".
 * @example formatNumber(41.63, 'speed') // "41.6"
 * @example formatNumber(0.7, 'drag') // "0.70"
 * @example formatNumber(-0.12, 'grade') // "-0.12"
 */
export function formatNumber(n: number, kind: NumberKind): string {
  if (!Number.isFinite(n)) return NOT_A_NUMBER;
  switch (kind) {
    case 'speed':
    case 'seconds':
      return fixed(n, 1);
    case 'length':
      return fixed(n, Math.abs(n) < 10 ? 2 : 1);
    case 'drag':
    case 'efficiency':
      return fixed(n, 2);
    case 'grade':
      return trimmed(n, 3, 2);
    case 'percent':
      return trimmed(n, 1, 0);
    case 'ratio':
      return trimmed(n, 4, 1);
    case 'integer':
      return fixed(Math.round(n), 0);
  }
}

/** A number with its unit: `41.6 mph`, `80.0 ft`, `0.72` (no unit). */
export function withUnit(n: number, kind: NumberKind, unit: string): string {
  const s = formatNumber(n, kind);
  if (!unit) return s;
  return unit === '%' || unit === '°' ? `${s}${unit}` : `${s} ${unit}`;
}

/**
 * A figure with its range: `41.6 mph (38.9 to 44.0)`; without a spread just `41.6 mph`.
 * @example formatRange({ value: 41.63, low: 38.9, high: 44.04 }, 'speed', 'mph') // "41.6 mph (38.9 to 44.0)"
 */
export function formatRange(r: Range, kind: NumberKind, unit = ''): string {
  const v = withUnit(r.value, kind, unit);
  const lo = formatNumber(r.low, kind);
  const hi = formatNumber(r.high, kind);
  const mid = formatNumber(r.value, kind);
  if (lo === mid && hi === mid) return v;
  return `${v} (${lo} to ${hi})`;
}

/**
 * The sentence shown beside a result whose range is zero: every input was typed as one figure,
 * so nothing says how far the result could move. Undefined when the range has a spread.
 */
export function zeroRangeNote(r: Range): string | undefined {
  if (r.low !== r.high) return undefined;
  return 'The range is zero because no tolerance was entered: give the measurements one (e.g. 94 ± 1 on a mark, 0.70 ± 0.05 on a drag factor) to see how far the figure could move.';
}
