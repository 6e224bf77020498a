import { spread } from '../case/quantity.js';
import type { CaseV1, YawV1 } from '../case/v1/schema.js';
import { unitsOf } from './constants.js';
import { dragFactor } from './drag.js';
import { minimumOf } from './solve-skid.js';
import { exact } from './step.js';
import type { AnalysisModel, AnalysisOutcome, ModelInput, Range, Step } from './types.js';
import {
  criticalSpeed,
  criticalSpeedOf,
  ordinateSensitivity,
  pathRadius,
  radiusFromChord,
} from './yaw.js';

const modelInput = (key: string, label: string, unit: string, r: Range): ModelInput => ({
  key,
  label,
  unit,
  value: r.value,
  low: r.low,
  high: r.high,
});

/** Solves one yaw analysis of a case (index i): radius, path radius, critical speed, sensitivity. */
export function solveYaw(c: CaseV1, i: number, a: YawV1): AnalysisOutcome {
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

  const C = spread(a.chord);
  const M = spread(a.middleOrdinate);
  const r = radiusFromChord(C, M, u);
  if (!r.ok) return failed(r.reason, `${p}.middleOrdinate`);
  steps.push(r.value.step);
  warnings.push(...r.value.warnings);
  let R = r.value.radius;

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
  }

  const d = dragFactor(a.drag, system);
  if (!d.ok) return failed(d.reason, `${p}.drag`);
  steps.push(d.value.step);
  assumptions.push(...d.value.notes);
  const f = d.value.f;
  const e = spread(a.superelevation ?? 0);
  const s = criticalSpeed(R, f, e, system);
  if (!s.ok) return failed(s.reason, `${p}.superelevation`);
  steps.push(s.value.step);

  assumptions.push(
    'The full drag factor of the surface is used, not reduced by braking efficiency; if the driver braked hard during the yaw, the result is less certain.',
    'The chord and middle ordinate were taken on the first part of the outside front tire’s mark, where the vehicle first yawed, and that part is a circular arc.',
    'The critical speed is a minimum estimate for the speed where the yaw mark begins.',
  );
  if (!halfTrack)
    assumptions.push(
      'The radius is the mark’s own; the centre of mass ran slightly inside it (no half-track adjustment).',
    );
  const sens = ordinateSensitivity(C.value, M.value, f.value, e.value / 100, system, T.value / 2);
  if (sens) warnings.push(sens.text);

  const speed = s.value.speed;
  return {
    ok: true,
    solution: {
      id: a.id,
      kind: 'yaw',
      ...(a.label !== undefined ? { label: a.label } : {}),
      speed,
      minimum: minimumOf(speed.low),
      steps,
      assumptions,
      warnings,
      radius: R,
      ...(sens ? { sensitivity: sens } : {}),
      model: yawModel(a, C, M, f, e, T, halfTrack, system),
    },
  };
}

function yawModel(
  a: YawV1,
  C: Range,
  M: Range,
  f: Range,
  e: Range,
  T: Range,
  halfTrack: boolean,
  system: CaseV1['units'],
): AnalysisModel {
  const L = unitsOf(system).length;
  const inputs: ModelInput[] = [
    modelInput('C', 'chord', L, C),
    modelInput('M', 'middle ordinate', L, M),
    modelInput('f', 'drag factor', '', f),
  ];
  if (a.superelevation !== undefined) inputs.push(modelInput('e', 'superelevation', '%', e));
  if (halfTrack) inputs.push(modelInput('T', 'track width', L, T));
  const base: Record<string, number> = Object.fromEntries(inputs.map((m) => [m.key, m.value]));
  return {
    inputs,
    evaluate(x) {
      const get = (k: string) => x[k] ?? base[k] ?? 0;
      const c = get('C');
      const m = get('M');
      if (!(m > 0) || !(m < c / 2)) return undefined;
      const R = (c * c) / (8 * m) + m / 2 - (halfTrack ? get('T') / 2 : 0);
      return criticalSpeedOf(R, get('f'), get('e') / 100, system);
    },
  };
}
