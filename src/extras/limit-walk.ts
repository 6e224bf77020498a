/**
 * The numbers of a stop from a given speed over the slide's surfaces, for one set of inputs.
 * Positions are distances from the start of the marks (negative: before them). Pure arithmetic;
 * limit-comparison.ts turns it into steps.
 */
import { slideDistanceFor, slideSquaredSpeed } from '../engine/index.js';

/** One stretch of road with its effective drag f n + G/100. */
export interface Stretch {
  from: number;
  to: number;
  eff: number;
  /** Index of the slide segment whose surface this is. */
  segment: number;
}

/** The road ahead of a braking vehicle: the segments, the first surface extended back before the
 * marks and the last one extended beyond them. */
export function stretchesFrom(
  brakeAt: number,
  lengths: readonly number[],
  effs: readonly number[],
): Stretch[] {
  const out: Stretch[] = [];
  let start = 0;
  lengths.forEach((d, j) => {
    const from = j === 0 ? Math.min(brakeAt, 0) : start;
    const to = j === lengths.length - 1 ? Infinity : start + d;
    if (to > brakeAt) out.push({ from: Math.max(from, brakeAt), to, eff: effs[j]!, segment: j });
    start += d;
  });
  return out;
}

/** Where the vehicle comes to rest and its squared speed at each stretch's start. */
export interface Walk {
  /** Position of rest, or undefined when it never stops (no drag on the last surface). */
  restAt: number | undefined;
  /** Stretches entered, with the squared speed on entering and where it stopped in it, if it did. */
  legs: { stretch: Stretch; v2In: number; stoppedAt: number | undefined }[];
}

/**
 * Braking from speed V over the stretches (the first starts where braking starts): on each, v_out² = v_in² - C L (f n + G/100)
 * until v² reaches 0 at x = from + v_in² / (C (f n + G/100)). C is the slide constant (30 or 254).
 */
export function walkToRest(V: number, stretches: readonly Stretch[], C: number): Walk {
  let v2 = V * V;
  const legs: Walk['legs'] = [];
  for (const s of stretches) {
    const len = s.to - s.from;
    if (s.eff > 0) {
      const drop = slideDistanceFor(v2, s.eff, C);
      if (drop <= len) {
        legs.push({ stretch: s, v2In: v2, stoppedAt: s.from + drop });
        return { restAt: s.from + drop, legs };
      }
    }
    legs.push({ stretch: s, v2In: v2, stoppedAt: undefined });
    // A surface without drag that goes on for ever: the vehicle never stops.
    if (!Number.isFinite(len)) break;
    v2 -= slideSquaredSpeed(len, s.eff, C);
  }
  return { restAt: undefined, legs };
}

/** Speed at position P on the walk: V before braking starts, 0 once at rest. */
export function speedAt(V: number, brakeAt: number, walk: Walk, P: number, C: number): number {
  if (P <= brakeAt) return V;
  if (walk.restAt !== undefined && P >= walk.restAt) return 0;
  for (const leg of walk.legs) {
    if (P >= leg.stretch.from && P <= leg.stretch.to) {
      const v2 = leg.v2In - slideSquaredSpeed(P - leg.stretch.from, leg.stretch.eff, C);
      return Math.sqrt(Math.max(0, v2));
    }
  }
  return 0;
}
