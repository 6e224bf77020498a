/**
 * Plausibility checks (common practice: warn, never refuse). Each returns the warning sentence,
 * or undefined when the figure is within what the trade expects. The figure is still computed.
 */
import { formatNumber } from './number-text.js';
import type { DistanceRule } from './distance.js';
import type { Range, Units } from './types.js';

/** Above this, a drag factor is beyond what ordinary tires reach on a road (common practice). */
export const DRAG_PLAUSIBLE_MAX = 1.0;
/** Marks of one vehicle whose longest exceeds the shortest by more than this ratio (common practice). */
export const MARKS_SPREAD_RATIO = 1.25;
/** A yaw radius under this (ft, m) is tighter than a vehicle sliding sideways at speed leaves. */
export const YAW_RADIUS_MIN = { ft: 50, m: 15 } as const;

/**
 * A drag factor any end of which is above 1.0.
 * @example dragAboveOne({ value: 0.9, low: 0.8, high: 1.1 }, 'segment 1') // "… drag factor …"
 */
export function dragAboveOne(f: Range, where: string): string | undefined {
  const top = Math.max(f.value, f.low, f.high);
  if (!(top > DRAG_PLAUSIBLE_MAX)) return undefined;
  return `The drag factor of ${where} reaches ${formatNumber(top, 'drag')}, above 1.0: beyond what ordinary tires reach on a road (racing tires and some fresh dry surfaces at low speed excepted). Record where the figure comes from, and check it.`;
}

/**
 * Marks whose longest value is more than 1.25 times the shortest.
 * @example marksDisagree([{ value: 60, ... }, { value: 80, ... }], units) // "The marks …"
 */
export function marksDisagree(
  marks: readonly Range[],
  units: Units,
  rule?: DistanceRule,
): string | undefined {
  if (marks.length < 2) return undefined;
  const values = marks.map((m) => m.value);
  const shortest = values.reduce((a, b) => Math.min(a, b));
  const longest = values.reduce((a, b) => Math.max(a, b));
  if (!(shortest > 0) || !(longest > MARKS_SPREAD_RATIO * shortest)) return undefined;
  const L = units.length;
  // With the spread rule already chosen, the disagreement is in the range: say so, not to choose it.
  const range =
    rule === 'spread'
      ? 'the distance rule "spread" already carries their disagreement into the range'
      : 'consider the distance rule "spread" so their disagreement shows in the range';
  return `The marks differ by more than a quarter of their length (shortest ${formatNumber(shortest, 'length')} ${L}, longest ${formatNumber(longest, 'length')} ${L}): check that each was measured to the same end point; ${range}.`;
}

/**
 * A yaw radius (of the mark or of the path) under 50 ft or 15 m at its value.
 * @example radiusTooTight({ value: 40, low: 38, high: 42 }, 'of the mark', { length: 'ft', speed: 'mph' })
 */
export function radiusTooTight(R: Range, which: string, units: Units): string | undefined {
  const min = YAW_RADIUS_MIN[units.length];
  if (!(R.value < min)) return undefined;
  const L = units.length;
  return `The radius ${which} is ${formatNumber(R.value, 'length')} ${L}, under ${min} ${L}: tighter than a vehicle sliding sideways at speed leaves. Check the chord and the middle ordinate (a chord across the whole curve, or an ordinate to the wrong mark).`;
}
