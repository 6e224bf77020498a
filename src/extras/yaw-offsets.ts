import { spread } from '../engine/spread.js';
import type { Case } from '../case/load.js';
import { criticalSpeed, dragFactor, pathRadius, unitsOf } from '../engine/index.js';
import type { OffsetsFit } from '../engine/offsets-fit.js';
import { radiusFromOffsets } from '../engine/radius-offsets.js';
import { fail, ok, type Outcome, type Range, type Step } from '../engine/types.js';
import { offsetsFromCase } from './case-fields.js';

export { OFFSET_READING } from '../engine/radius-offsets.js';

export interface YawFromOffsets {
  fit: OffsetsFit;
  /** Radius used: the fitted radius ± 2 standard errors of the fit (no spread with one station). */
  radius: Range;
  speed: Range;
  steps: Step[];
  warnings: string[];
}

/**
 * The critical speed of a yaw analysis from its `offsets` field: the engine's radius from offsets
 * (least-squares circle, ± 2 standard errors, widened by the chord's spread), the half-track
 * path adjustment if the analysis asks for it, then the critical speed with the analysis's drag
 * factor and superelevation. The same chain solveCase now runs for such an analysis; this keeps
 * the fit itself at hand for the report. Ok(undefined) when the analysis has no offsets.
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
  const fitted = radiusFromOffsets(spread(field.value.chord), field.value.stations, c.units, u);
  if (!fitted.ok) return fail(fitted.reason, fitted.path ? `${p}.${fitted.path}` : p);
  const R = fitted.value.radius;
  const steps: Step[] = [fitted.value.step];
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
  return ok({
    fit: fitted.value.fit,
    radius: R,
    speed: speed.value.speed,
    steps,
    warnings: fitted.value.warnings,
  });
}
