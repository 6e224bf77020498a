import { spread } from './spread.js';
import type { AirborneInput, CaseInput } from './input.js';
import { formatNumber } from './number-text.js';
import { airborneSpeed, airborneSpeedOf } from './airborne.js';
import { unitsOf } from './constants.js';
import { modelInput } from './model-input.js';
import { solvedAnalysis } from './solution.js';
import type { AnalysisModel, AnalysisOutcome, Range, UnitSystem } from './types.js';

/** What the airborne figure leaves out, whatever the case (projectile motion; common practice). */
export const AIRBORNE_ASSUMPTIONS = [
  'The distance and the drop are those of the vehicle’s centre of mass, from where it left the ground to where it first landed; marks of the wheels or the body must be carried to the centre of mass. These two measurements are the usual sources of error (common practice).',
  'Air drag is neglected: at road speeds it slows the flight slightly, so the figure leans low (a minimum).',
  'The landing is the first contact with the ground after take-off, not where the vehicle came to rest.',
  'The take-off angle is that of the path where the vehicle left the ground (the ramp, kerb or road edge), not the vehicle’s pitch.',
];

/** Solves one airborne analysis of a case (index i): take-off speed from projectile motion. */
export function solveAirborne(c: CaseInput, i: number, a: AirborneInput): AnalysisOutcome {
  const system = c.units;
  const u = unitsOf(system);
  const d = spread(a.distance);
  const h = spread(a.drop);
  const G = spread(a.takeoffGrade ?? 0);
  const r = airborneSpeed(d, h, G, system);
  if (!r.ok)
    return {
      ok: false,
      id: a.id,
      kind: 'airborne',
      reason: r.reason,
      path: `analyses[${i}].${r.path ?? 'drop'}`,
    };
  const assumptions = [...AIRBORNE_ASSUMPTIONS];
  if (a.takeoffGrade === undefined)
    assumptions.push('No take-off grade was given: the take-off is taken as level (0%).');
  const warnings: string[] = [];
  if (h.value < 0)
    warnings.push(
      `The vehicle landed ${formatNumber(-h.value, 'length')} ${u.length} higher than it took off: check the drop’s sign (positive when the landing is lower).`,
    );
  return solvedAnalysis(a, 'airborne', r.value.speed, {
    steps: r.value.steps,
    assumptions,
    warnings,
    distance: d,
    model: airborneModel(a, d, h, G, system),
  });
}

/** The airborne analysis as a function of its inputs "d", "h" and (when given) "G". */
function airborneModel(
  a: AirborneInput,
  d: Range,
  h: Range,
  G: Range,
  system: UnitSystem,
): AnalysisModel {
  const L = unitsOf(system).length;
  const inputs = [
    modelInput('d', 'distance, take-off to landing', L, d),
    modelInput('h', 'drop, take-off to landing', L, h),
  ];
  if (a.takeoffGrade !== undefined) inputs.push(modelInput('G', 'take-off grade', '%', G));
  const d0 = d.value;
  const h0 = h.value;
  const g0 = G.value;
  return {
    inputs,
    evaluate: (x) => airborneSpeedOf(x.d ?? d0, x.h ?? h0, x.G ?? g0, system),
  };
}
