/**
 * The one wording of "would a vehicle at the posted limit have stopped before this point": the
 * review, `solve`'s text and every report say it with these words. The verdict itself (yes, no,
 * or depends on the inputs) is worked out in src/extras/limit-steps.ts. The comparison of a
 * range's low end with the posted limit is said here too, from the engine's one comparison,
 * and so is what the comparison compares and when it matters (limitFraming).
 */
import { isAboveLimit } from '../engine/solution.js';
import type { Range, Units } from '../engine/types.js';
import type { LimitComparison } from '../extras/limit-comparison.js';
import type { Verdict } from '../extras/limit-steps.js';
import { formatRange, withUnit } from './numbers.js';

const WORD = { yes: 'yes', no: 'no', depends: 'depends on the inputs' } as const;

/** A distance from the point, named by its side: "12.0 ft short of it" or "3.1 ft beyond it". */
function side(margin: number, u: Units): string {
  const d = withUnit(Math.abs(margin), 'length', u.length);
  return margin >= 0 ? `${d} short of it` : `${d} beyond it`;
}

/** The verdict as a headline (the question and its answer) and a detail saying where it stops. */
export interface VerdictWords {
  headline: string;
  detail: string;
}

/**
 * @example verdictWords(t.endOfMarks, { length: 'ft', speed: 'mph' }).headline
 * // "Would have stopped before the end of the marks (100.0 ft from the start of the marks): yes"
 */
export function verdictWords(v: Verdict, u: Units): VerdictWords {
  const at = withUnit(v.at, 'length', u.length);
  const headline = `Would have stopped before ${v.what} (${at} from the start of the marks): ${WORD[v.stops]}`;
  const margin = formatRange(v.margin, 'length', u.length);
  const beyond = formatRange(
    { value: -v.margin.value, low: -v.margin.high, high: -v.margin.low },
    'length',
    u.length,
  );
  const there = formatRange(v.speedThere, 'speed', u.speed);
  // Said in the direction it goes, so no distance is read as a negative "short of it".
  const detail =
    v.stops === 'yes'
      ? `it comes to rest ${margin} short of it`
      : v.stops === 'no'
        ? `it reaches it still moving at ${there} and comes to rest ${beyond} beyond it`
        : `over the input ranges it comes to rest anywhere from ${side(v.margin.low, u)} to ${side(v.margin.high, u)} (at the values: ${side(v.margin.value, u)}); speed there ${there}`;
  return { headline, detail };
}

/** Headline and detail in one sentence, for outputs that print the verdict as one line. */
export function verdictSentence(v: Verdict, u: Units): string {
  const w = verdictWords(v, u);
  return `${w.headline}: ${w.detail}.`;
}

/**
 * Whether a low end is above the posted limit, in the words every output uses. A low end equal
 * to the limit (within rounding noise) is not above it (engine/solution.ts, `isAboveLimit`).
 * @example limitWord(41.2, 40) // "above"
 */
export function limitWord(low: number, limit: number): 'above' | 'not above' {
  return isAboveLimit(low, limit) ? 'above' : 'not above';
}

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
