import type { Range } from '../engine/types.js';
import { formatNumber } from '../engine/number-text.js';
import { withUnit, zeroRangeNote } from '../format/numbers.js';

/** A speed with its unit, 1 dp: `43.3 mph`. */
export function speedText(n: number, unit: string): string {
  return withUnit(n, 'speed', unit);
}

/**
 * The sentence a reader quotes, and the tests read back: the "at least" figure and the range.
 * @example atLeastText(40, { value: 43.3, low: 40.2, high: 46.1 }, 'mph')
 * // 'At least 40 mph at the start of the marks (computed 43.3 mph, range 40.2 to 46.1 mph).'
 */
export function atLeastText(minimum: number, speed: Range, unit: string): string {
  const zero = zeroRangeNote(speed);
  if (zero)
    return `At least ${minimum} ${unit} at the start of the marks (computed ${speedText(speed.value, unit)}). ${zero}`;
  return `At least ${minimum} ${unit} at the start of the marks (computed ${speedText(speed.value, unit)}, range ${formatNumber(speed.low, 'speed')} to ${speedText(speed.high, unit)}).`;
}
