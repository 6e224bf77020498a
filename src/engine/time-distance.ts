import { formatNumber } from './number-text.js';
import { gravityOf, speedUnitToLengthPerSecond, tradeConstants, unitsOf } from './constants.js';
import { effectiveDrag, slideDistanceFor } from './formulas.js';
import { fail, ok, type Outcome, type Step, type UnitSystem } from './types.js';
import { exact, makeStep } from './step.js';

/**
 * Distance covered during perception-reaction: d = k S t, with k = 5280/3600 = 1.4667 ft/s per
 * mph exactly (the trade writes 1.466 or 1.47), or 1/3.6 m/s per km/h (d = S t / 3.6).
 * @example reactionDistance(40, 1.5, 'imperial').distance // 88
 */
export function reactionDistance(
  speed: number,
  t: number,
  system: UnitSystem,
): { distance: number; step: Step } {
  const u = unitsOf(system);
  const k = speedUnitToLengthPerSecond(system);
  const distance = k * speed * t;
  const kText = system === 'imperial' ? '1.4667' : '1/3.6';
  return {
    distance,
    step: makeStep({
      name: 'Distance during perception-reaction',
      formula: system === 'imperial' ? 'd = 1.4667 × S × t' : 'd = S × t / 3.6',
      substituted:
        system === 'imperial'
          ? `d = ${kText} × ${formatNumber(speed, 'speed')} × ${formatNumber(t, 'seconds')} = ${formatNumber(distance, 'length')} ${u.length}`
          : `d = ${formatNumber(speed, 'speed')} × ${formatNumber(t, 'seconds')} / 3.6 = ${formatNumber(distance, 'length')} ${u.length}`,
      inputs: { S: { value: speed, unit: u.speed }, t: { value: t, unit: 's' } },
      result: exact(distance),
      unit: u.length,
      why: 'the vehicle keeps its speed until the driver has perceived the hazard and begun to brake',
    }),
  };
}

function noSlowing(f: number, n: number, gradePercent: number): string {
  return gradePercent < 0
    ? `a ${formatNumber(-gradePercent, 'percent')}% downhill grade is steeper than the drag factor ${formatNumber(f, 'drag')} × n ${formatNumber(n, 'efficiency')} can hold: the vehicle would not stop`
    : `the drag factor ${formatNumber(f, 'drag')} × n ${formatNumber(n, 'efficiency')} gives no deceleration: the vehicle would not stop`;
}

/**
 * Braking distance from a speed to a stop: d = S² / (C (f n + G/100)), C = 30 or 254. Fails when
 * f n + G/100 ≤ 0 (the vehicle would not stop).
 * @example brakingDistance(30, 0.75, 1, 0, 'imperial') // ok, distance 40 ft
 */
export function brakingDistance(
  speed: number,
  f: number,
  n: number,
  gradePercent: number,
  system: UnitSystem,
): Outcome<{ distance: number; step: Step }> {
  const eff = effectiveDrag(f, n, gradePercent);
  if (!(eff > 0)) return fail(noSlowing(f, n, gradePercent));
  const C = tradeConstants(system).slide;
  const u = unitsOf(system);
  const distance = slideDistanceFor(speed * speed, eff, C);
  return ok({
    distance,
    step: makeStep({
      name: 'Braking distance',
      formula: `d = S² / (${C} × (f × n + G/100))`,
      substituted: `d = ${formatNumber(speed, 'speed')}² / (${C} × ${formatNumber(eff, 'ratio')}) = ${formatNumber(distance, 'length')} ${u.length}`,
      inputs: {
        S: { value: speed, unit: u.speed },
        f: { value: f, unit: '' },
        n: { value: n, unit: '' },
        G: { value: gradePercent, unit: '%' },
      },
      result: exact(distance),
      unit: u.length,
      why: 'the distance sliding friction (and the grade) takes to remove the speed',
    }),
  });
}

/**
 * Time to slide from a speed to a stop at constant deceleration: t = v / a, v = k S (k = 5280/3600
 * or 1/3.6), a = (f n + G/100) g, g = 9.80665 m/s² or 32.174 ft/s². Fails when f n + G/100 ≤ 0.
 * @example slideDuration(36, 0.7, 1, 0, 'metric') // ok, about 1.46 s
 */
export function slideDuration(
  speed: number,
  f: number,
  n: number,
  gradePercent: number,
  system: UnitSystem,
): Outcome<{ seconds: number; step: Step }> {
  const eff = effectiveDrag(f, n, gradePercent);
  if (!(eff > 0)) return fail(noSlowing(f, n, gradePercent));
  const u = unitsOf(system);
  const v = speedUnitToLengthPerSecond(system) * speed;
  const g = gravityOf(system);
  const a = eff * g;
  const seconds = v / a;
  return ok({
    seconds,
    step: makeStep({
      name: 'Duration of the slide',
      formula: 't = v / ((f × n + G/100) × g)',
      substituted: `t = ${formatNumber(v, 'length')} ${u.length}/s / (${formatNumber(eff, 'ratio')} × ${formatNumber(g, 'ratio')} ${u.length}/s²) = ${formatNumber(seconds, 'seconds')} s`,
      inputs: {
        v: { value: v, unit: `${u.length}/s` },
        f: { value: f, unit: '' },
        n: { value: n, unit: '' },
        G: { value: gradePercent, unit: '%' },
      },
      result: exact(seconds),
      unit: 's',
      why: 'at a constant deceleration the speed falls to zero in v / a',
    }),
  });
}
