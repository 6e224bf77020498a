import { spread } from '../case/quantity.js';
import type { Case } from '../case/load.js';
import { criticalSpeed, dragFactor, pathRadius, unitsOf } from '../engine/index.js';
import { fail, ok, type Outcome, type Range, type Step } from '../engine/types.js';
import { formatNumber } from '../format/numbers.js';
import { offsetsFromCase } from './case-fields.js';
import { fitCircleToOffsets, type OffsetsFit } from './offsets-fit.js';

/** How closely an offset is read by default: 1/8 inch (DOMAIN.md, practitioner guidance) or 3 mm. */
export const OFFSET_READING = { imperial: 0.125 / 12, metric: 0.003 } as const;

export interface YawFromOffsets {
  fit: OffsetsFit;
  /** Radius used: the fitted radius ± 2 standard errors of the fit (no spread with one station). */
  radius: Range;
  speed: Range;
  steps: Step[];
  warnings: string[];
}

/**
 * The critical speed of a yaw analysis from its `offsets` field (proposed: offsets at stations
 * along one chord) instead of its chord and middle ordinate: the least-squares circle
 * (fitCircleToOffsets), its radius ± 2 standard errors, the half-track path adjustment if the
 * analysis asks for it, then the engine's critical speed with the analysis's drag factor and
 * superelevation. Ok(undefined) when the analysis has no offsets.
 * @example yawFromOffsets(c, 'yaw-1') // ok: { radius, speed, steps: [fit, (path,) drag, speed] }
 */
export function yawFromOffsets(c: Case, analysisId: string): Outcome<YawFromOffsets | undefined> {
  const i = c.analyses.findIndex((a) => a.id === analysisId);
  const a = c.analyses[i];
  if (!a || a.kind !== 'yaw') return fail(`there is no yaw analysis "${analysisId}"`);
  const field = offsetsFromCase(c, analysisId);
  if (!field.ok || field.value === undefined) return field as Outcome<undefined>;
  const u = unitsOf(c.units);
  const p = `analyses[${i}].offsets`;
  const fitted = fitCircleToOffsets(field.value.chord, field.value.stations, {
    tolerance: OFFSET_READING[c.units],
    unit: u.length,
  });
  if (!fitted.ok) return fail(fitted.reason, fitted.path ? `${p}.${fitted.path}` : p);
  const fit = fitted.value;
  const se = fit.radiusStdError ?? 0;
  const R: Range = { value: fit.radius, low: fit.radius - 2 * se, high: fit.radius + 2 * se };
  if (!(R.low > 0)) return fail('the offsets scatter too much to give a radius', p);
  const steps: Step[] = [
    {
      ...fit.step,
      low: R.low,
      high: R.high,
      why: `${fit.step.why} The range is ± 2 standard errors of the fit (${formatNumber(se, 'length')} ${u.length}); with few stations it understates the doubt.`,
    },
  ];
  let path = R;
  if (a.pathAdjustment === 'half-track') {
    if (c.vehicle.trackWidth === undefined)
      return fail('track width is required for the half-track adjustment', 'vehicle.trackWidth');
    const adj = pathRadius(R, spread(c.vehicle.trackWidth), u);
    if (!adj.ok) return adj;
    path = adj.value.radius;
    steps.push(adj.value.step);
  }
  const drag = dragFactor(a.drag, c.units);
  if (!drag.ok) return fail(drag.reason, `analyses[${i}].drag`);
  steps.push(drag.value.step);
  const speed = criticalSpeed(path, drag.value.f, spread(a.superelevation ?? 0), c.units);
  if (!speed.ok) return fail(speed.reason, `analyses[${i}].${speed.path ?? 'offsets'}`);
  steps.push(speed.value.step);
  return ok({ fit, radius: R, speed: speed.value.speed, steps, warnings: fit.warnings });
}
