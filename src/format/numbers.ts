import type { Range } from '../engine/types.js';
import { formatNumber, type NumberKind } from '../engine/number-text.js';

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
