import { spread } from './spread.js';
import { modelInput } from './model-input.js';
import type { CaseInput, YawInput } from './input.js';
import { unitsOf } from './constants.js';
import { dragFactor } from './drag.js';
import { dragAboveOne, radiusTooTight } from './plausibility.js';
import { solvedAnalysis } from './solution.js';
import { exact } from './step.js';
import { radiusFromOffsets } from './radius-offsets.js';
import { radiusFromPoints } from './radius-points.js';
import {
  fail,
  ok,
  type AnalysisModel,
  type AnalysisOutcome,
  type ModelInput,
  type OffsetsFit,
  type Outcome,
  type PointsFitSummary,
  type Range,
  type Step,
  type Units,
} from './types.js';
import { arcRadius, centreRadius, criticalSpeedOf } from './formulas.js';
import { criticalSpeed, ordinateSensitivity, pathRadius, radiusFromChord } from './yaw.js';

/** Solves one yaw analysis of a case (index i): radius, path radius, critical speed, sensitivity. */
export function solveYaw(c: CaseInput, i: number, a: YawInput): AnalysisOutcome {
  const system = c.units;
  const u = unitsOf(system);
  const p = `analyses[${i}]`;
  const failed = (reason: string, path?: string): AnalysisOutcome =>
    path === undefined
      ? { ok: false, id: a.id, kind: 'yaw', reason }
      : { ok: false, id: a.id, kind: 'yaw', reason, path };
  const steps: Step[] = [];
  const warnings: string[] = [];
  const assumptions: string[] = [];

  const measured = yawRadius(a, system, u);
  if (!measured.ok) return failed(measured.reason, measured.path ? `${p}.${measured.path}` : p);
  const { C, M } = measured.value;
  steps.push(measured.value.step);
  warnings.push(...measured.value.warnings);
  let R = measured.value.radius;
  const tightMark = radiusTooTight(R, 'of the mark', u);
  if (tightMark) warnings.push(tightMark);

  const halfTrack = a.pathAdjustment === 'half-track';
  let T: Range = exact(0);
  if (halfTrack) {
    if (c.vehicle.trackWidth === undefined)
      return failed(
        'the half-track adjustment needs the vehicle’s track width',
        'vehicle.trackWidth',
      );
    T = spread(c.vehicle.trackWidth);
    const pr = pathRadius(R, T, u);
    if (!pr.ok) return failed(pr.reason, pr.path);
    steps.push(pr.value.step);
    R = pr.value.radius;
    const tightPath = tightMark ? undefined : radiusTooTight(R, 'of the path', u);
    if (tightPath) warnings.push(tightPath);
  }

  const d = dragFactor(a.drag, system);
  if (!d.ok) return failed(d.reason, `${p}.drag`);
  steps.push(d.value.step);
  assumptions.push(...d.value.notes);
  const f = d.value.f;
  const high = dragAboveOne(f, 'the yaw');
  if (high) warnings.push(high);
  const e = spread(a.superelevation ?? 0);
  const s = criticalSpeed(R, f, e, system);
  if (!s.ok) return failed(s.reason, `${p}.superelevation`);
  steps.push(s.value.step);

  assumptions.push(
    'The full drag factor of the surface is used, not reduced by braking efficiency; if the driver braked hard during the yaw, the result is less certain.',
    C && M
      ? 'The chord and middle ordinate were taken on the first part of the outside front tire’s mark, where the vehicle first yawed, and that part is a circular arc.'
      : a.points
        ? 'The points were surveyed along the first part of the outside front tire’s mark, where the vehicle first yawed; the fit’s residuals check that this part is a circular arc.'
        : 'The offsets were taken along a chord on the first part of the outside front tire’s mark, where the vehicle first yawed; the fit’s residuals check that this part is a circular arc.',
    'The critical speed is a minimum estimate for the speed where the yaw mark begins.',
  );
  if (!halfTrack)
    assumptions.push(
      'The radius is the mark’s own; the centre of mass ran slightly inside it (no half-track adjustment).',
    );
  // With offsets there is no single ordinate to misread: the fit's scatter stands in for it.
  const sens =
    C && M
      ? ordinateSensitivity(C.value, M.value, f.value, e.value / 100, system, T.value)
      : undefined;
  if (sens) warnings.push(sens.text);

  const speed = s.value.speed;
  return solvedAnalysis(a, 'yaw', speed, {
    steps,
    assumptions,
    warnings,
    radius: R,
    ...(sens ? { sensitivity: sens } : {}),
    ...(measured.value.fit ? { pointsFit: measured.value.fit } : {}),
    ...(measured.value.offsets ? { offsetsFit: measured.value.offsets } : {}),
    model:
      C && M
        ? yawModel(a, C, M, f, e, T, halfTrack, system)
        : fittedYawModel(a, measured.value.radius, f, e, T, halfTrack, system),
  });
}

/**
 * Radius of the mark, measured either way: chord + middle ordinate (R = C²/(8M) + M/2), or the
 * least-squares circle through offsets, or through surveyed points. Paths are relative to the
 * analysis. The running chain calls it too, with the measure answered so far.
 */
export function yawRadius(
  a: Pick<YawInput, 'chord' | 'middleOrdinate' | 'offsets' | 'points'>,
  system: CaseInput['units'],
  u: Units,
): Outcome<{
  radius: Range;
  step: Step;
  warnings: string[];
  C?: Range;
  M?: Range;
  fit?: PointsFitSummary;
  offsets?: { fit: OffsetsFit; radius: Range };
}> {
  if (a.points) {
    const r = radiusFromPoints(a.points, system, u);
    if (!r.ok) return fail(r.reason, r.path ?? 'points');
    return ok(r.value);
  }
  if (a.offsets) {
    const r = radiusFromOffsets(spread(a.offsets.chord), a.offsets.stations, system, u);
    if (!r.ok) return fail(r.reason, `offsets.${r.path ?? 'stations'}`);
    return ok({
      radius: r.value.radius,
      step: r.value.step,
      warnings: r.value.warnings,
      offsets: { fit: r.value.fit, radius: r.value.radius },
    });
  }
  // The schema guarantees chord and middleOrdinate when there are no offsets.
  if (a.chord === undefined || a.middleOrdinate === undefined)
    return fail('give exactly one of: chord and middleOrdinate, offsets, or points', 'chord');
  const C = spread(a.chord);
  const M = spread(a.middleOrdinate);
  const r = radiusFromChord(C, M, u);
  if (!r.ok) return fail(r.reason, 'middleOrdinate');
  return ok({ ...r.value, C, M });
}

/** The inputs both yaw models share: drag factor, bank (when given) and track width (half-track). */
function frictionInputs(
  a: YawInput,
  f: Range,
  e: Range,
  T: Range,
  halfTrack: boolean,
  L: string,
): ModelInput[] {
  const inputs = [modelInput('f', 'drag factor', '', f)];
  if (a.superelevation !== undefined) inputs.push(modelInput('e', 'superelevation', '%', e));
  if (halfTrack) inputs.push(modelInput('T', 'track width', L, T));
  return inputs;
}

/** The model of a yaw analysis measured by offsets or points: the fitted radius R is one input. */
function fittedYawModel(
  a: YawInput,
  R: Range,
  f: Range,
  e: Range,
  T: Range,
  halfTrack: boolean,
  system: CaseInput['units'],
): AnalysisModel {
  const L = unitsOf(system).length;
  const inputs: ModelInput[] = [
    modelInput('R', a.points ? 'radius from points' : 'radius from offsets', L, R),
    ...frictionInputs(a, f, e, T, halfTrack, L),
  ];
  const base = { R: R.value, f: f.value, e: e.value, T: T.value };
  return {
    inputs,
    evaluate(x) {
      const r = halfTrack ? centreRadius(x.R ?? base.R, x.T ?? base.T) : (x.R ?? base.R);
      return criticalSpeedOf(r, x.f ?? base.f, (x.e ?? base.e) / 100, system);
    },
  };
}

function yawModel(
  a: YawInput,
  C: Range,
  M: Range,
  f: Range,
  e: Range,
  T: Range,
  halfTrack: boolean,
  system: CaseInput['units'],
): AnalysisModel {
  const L = unitsOf(system).length;
  const inputs: ModelInput[] = [
    modelInput('C', 'chord', L, C),
    modelInput('M', 'middle ordinate', L, M),
    ...frictionInputs(a, f, e, T, halfTrack, L),
  ];
  // Plain numbers, no closure per call: evaluate runs in sampling loops.
  const c0 = C.value;
  const m0 = M.value;
  const f0 = f.value;
  const e0 = a.superelevation !== undefined ? e.value : 0;
  const t0 = T.value;
  return {
    inputs,
    evaluate(x) {
      const c = x.C ?? c0;
      const m = x.M ?? m0;
      if (!(m > 0) || !(m < c / 2)) return undefined;
      const R = halfTrack ? centreRadius(arcRadius(c, m), x.T ?? t0) : arcRadius(c, m);
      return criticalSpeedOf(R, x.f ?? f0, (x.e ?? e0) / 100, system);
    },
  };
}
