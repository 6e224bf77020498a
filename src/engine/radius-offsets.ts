import { formatNumber } from './number-text.js';
import { fitCircleToOffsets, type OffsetStation, type OffsetsFit } from './offsets-fit.js';
import { fail, ok, type Outcome, type Range, type Units, type UnitSystem } from './types.js';
import type { Step } from './types.js';

/** How closely an offset is read by default: 1/8 inch (common practice, docs/physics.md) or 3 mm. */
export const OFFSET_READING = { imperial: 0.125 / 12, metric: 0.003 } as const;

/** How many standard errors of a fitted radius either side of it make its range (about 95%). */
export const RADIUS_RANGE_SE = 2;

export interface OffsetsRadius {
  /** The fit at the chord's value. */
  fit: OffsetsFit;
  /** Fitted radius, widened by ± 2 standard errors and by the fits at the chord's two ends. */
  radius: Range;
  /** Standard error of the fitted radius (0 when the fit cannot give one). */
  stdError: number;
  step: Step;
  warnings: string[];
}

/**
 * Radius of a yaw mark from offsets at stations along one chord: the least-squares circle
 * (fitCircleToOffsets) at the chord's value gives R; the range is R ± 2 standard errors of the
 * fit, widened to cover the fits with the chord at its low and high ends. Units: the case's length.
 * Fails, with a path relative to the `offsets` field (`stations[2].at`, `chord`), when a fit is
 * impossible or the range reaches 0.
 * @example
 * // Exact arc of R = 101 ft on a 40 ft chord: offsets 1.5, 2, 1.5 ft (rounded) at 10, 20, 30 ft.
 * radiusFromOffsets({ value: 40, low: 40, high: 40 }, stations, 'imperial', units) // R ≈ 101
 */
export function radiusFromOffsets(
  chord: Range,
  stations: readonly OffsetStation[],
  system: UnitSystem,
  units: Units,
): Outcome<OffsetsRadius> {
  const opts = { tolerance: OFFSET_READING[system], unit: units.length };
  const main = fitCircleToOffsets(chord.value, stations, opts);
  if (!main.ok) return main;
  const fit = main.value;
  const se = fit.radiusStdError ?? 0;
  let low = fit.radius - RADIUS_RANGE_SE * se;
  let high = fit.radius + RADIUS_RANGE_SE * se;
  for (const [end, c] of [
    ['low', chord.low],
    ['high', chord.high],
  ] as const) {
    if (c === chord.value) continue;
    const f = fitCircleToOffsets(c, stations, opts);
    if (!f.ok)
      return fail(`with the chord at its ${end} end (${c}): ${f.reason}`, f.path ?? 'chord');
    low = Math.min(low, f.value.radius - RADIUS_RANGE_SE * se);
    high = Math.max(high, f.value.radius + RADIUS_RANGE_SE * se);
  }
  if (!(low > 0)) return fail('the offsets scatter too much to give a radius', 'stations');
  const L = units.length;
  const spreadWords =
    chord.low !== chord.high ? ' and the fits with the chord at its low and high ends' : '';
  const step: Step = {
    ...fit.step,
    low,
    high,
    why: `${fit.step.why} The range is ± ${RADIUS_RANGE_SE} standard errors of the fit (${formatNumber(se, 'length')} ${L})${spreadWords}; with few stations it understates the doubt.`,
  };
  if (chord.low !== chord.value || chord.high !== chord.value)
    step.inputs = {
      ...step.inputs,
      C: { value: chord.value, low: chord.low, high: chord.high, unit: L },
    };
  return ok({
    fit,
    radius: { value: fit.radius, low, high },
    stdError: se,
    step,
    warnings: fit.warnings,
  });
}
