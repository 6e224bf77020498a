/**
 * What the time-distance comparison at the posted limit compares, and when it matters, said
 * before its verdicts: the review, the report and `solve` all print these same sentences.
 */
import { isAboveLimit } from '../engine/solution.js';
import type { Range, Units } from '../engine/types.js';
import type { LimitComparison } from '../extras/limit-comparison.js';
import { formatRange, withUnit } from './numbers.js';

/**
 * The sentences that frame the comparison: first where this vehicle's speed stood against the
 * limit (below it, said first of all, because the comparison then says nothing against it), then
 * what is compared, then, without a conflict point, what the end of the marks does not tell.
 * @example limitFraming(t, { value: 35.5, low: 35.5, high: 35.5 }, units)[0]
 * // 'This vehicle was below the posted limit: 35.5 mph when the marks began, under 45.0 mph. ...'
 */
export function limitFraming(t: LimitComparison, speed: Range, u: Units): string[] {
  const limit = withUnit(t.postedLimit, 'speed', u.speed);
  const own = formatRange(speed, 'speed', u.speed);
  const where =
    speed.high < t.postedLimit
      ? `This vehicle was below the posted limit: ${own} when the marks began, under ${limit}. A vehicle at the limit would have been going faster, so what follows says nothing against this vehicle's speed.`
      : isAboveLimit(speed.low, t.postedLimit)
        ? `This vehicle was above the posted limit: ${own} when the marks began, over ${limit} even at the low end.`
        : `The posted limit of ${limit} lies within this vehicle's speed range, ${own} when the marks began.`;
  const what = `What is compared: where a vehicle at ${limit} would have come to rest had it perceived the hazard at the same point as this one and braked on the same road. It matters when this vehicle was faster than the limit: it shows whether travel at the limit would have stopped short of ${t.conflict ? 'the conflict point' : 'the end of the marks'}.`;
  const out = [where, what];
  if (!t.conflict)
    out.push(
      'No conflict point was given, so only the end of the marks is compared: that is where this slide ended, not necessarily where anything was struck. Give the conflict point for the comparison that matters.',
    );
  return out;
}
