import { spread } from './spread.js';
import type { VehicleInput } from './input.js';
import { formatNumber } from './number-text.js';
import { wheelsBraking } from './formulas.js';
import { fail, ok, type Outcome, type Range, type Step } from './types.js';
import { exact, input, makeStep } from './step.js';

export interface Efficiency {
  n: Range;
  step: Step;
  warnings: string[];
}

/**
 * Per-wheel braking efficiency from static weight shares (common practice):
 * n = s/2 (FL + FR) + (1 − s)/2 (RL + RR), s the front axle share. n rises with every wheel and is
 * linear in s with a slope whose sign depends on the wheels, so low and high are taken over both
 * ends of s with each wheel at its matching end.
 * @example wheelsEfficiency(exact(0.6), exact(1), exact(1), exact(0), exact(0)).value // 0.6
 */
export function wheelsEfficiency(s: Range, fl: Range, fr: Range, rl: Range, rr: Range): Range {
  const n = wheelsBraking;
  const atLow = [s.low, s.high].map((x) => n(x, fl.low, fr.low, rl.low, rr.low));
  const atHigh = [s.low, s.high].map((x) => n(x, fl.high, fr.high, rl.high, rr.high));
  return {
    value: n(s.value, fl.value, fr.value, rl.value, rr.value),
    low: Math.min(...atLow),
    high: Math.max(...atHigh),
  };
}

/**
 * Braking efficiency n (a decimal, 1 = every wheel braking fully) from the vehicle's brakes:
 * `all` gives 1; `estimate` its quantity; `wheels` the per-wheel sum with the front axle share.
 * Fails when the brakes (or, per wheel, the front axle share) are not given.
 * @example brakingEfficiency({ brakes: { mode: 'all' } }) // ok, n = 1
 */
export function brakingEfficiency(vehicle: VehicleInput): Outcome<Efficiency> {
  const b = vehicle.brakes;
  if (!b) return fail('the vehicle’s brakes are not given', 'vehicle.brakes');
  if (b.mode === 'all') {
    const n = exact(1);
    return ok({
      n,
      warnings: [],
      step: makeStep({
        name: 'Braking efficiency',
        formula: 'n = 1 (every wheel braking)',
        substituted: 'n = 1.00',
        inputs: {},
        result: n,
        unit: '',
        why: 'all wheels braked fully (stored as a decimal, common practice)',
      }),
    });
  }
  if (b.mode === 'estimate') {
    const n = spread(b.efficiency);
    return ok({
      n,
      warnings: [],
      step: makeStep({
        name: 'Braking efficiency',
        formula: 'n = estimate',
        substituted: `n = ${formatNumber(n.value, 'efficiency')}`,
        inputs: { n: input(n, '', b.basis ?? n.note ?? 'estimate') },
        result: n,
        unit: '',
        why: b.basis ? `estimated: ${b.basis}` : 'estimated braking efficiency, as entered',
      }),
    });
  }
  if (vehicle.frontAxleShare === undefined)
    return fail('the front axle share is needed for per-wheel brakes', 'vehicle.frontAxleShare');
  const s = spread(vehicle.frontAxleShare);
  const [fl, fr, rl, rr] = [b.frontLeft, b.frontRight, b.rearLeft, b.rearRight].map(spread) as [
    Range,
    Range,
    Range,
    Range,
  ];
  const n = wheelsEfficiency(s, fl, fr, rl, rr);
  const f2 = (r: Range) => formatNumber(r.value, 'efficiency');
  const warnings: string[] = [];
  if (fl.value + fr.value < rl.value + rr.value)
    warnings.push(
      'The front brakes work less than the rear: weight shifts forward under braking, so the static weight shares overstate n here.',
    );
  return ok({
    n,
    warnings,
    step: makeStep({
      name: 'Braking efficiency',
      formula: 'n = s/2 × (FL + FR) + (1 − s)/2 × (RL + RR)',
      substituted: `n = ${f2(s)}/2 × (${f2(fl)} + ${f2(fr)}) + ${formatNumber(1 - s.value, 'efficiency')}/2 × (${f2(rl)} + ${f2(rr)}) = ${formatNumber(n.value, 'efficiency')}`,
      inputs: {
        s: input(s, '', 'front axle share'),
        FL: input(fl, ''),
        FR: input(fr, ''),
        RL: input(rl, ''),
        RR: input(rr, ''),
      },
      result: n,
      unit: '',
      why: 'each wheel’s braking weighted by its static share of the vehicle’s weight (common practice)',
    }),
  });
}
