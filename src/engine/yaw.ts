import { factorKind, formatNumber } from './number-text.js';
import { ordinateReadingStep, tradeConstants, unitsOf } from './constants.js';
import { arcRadius, centreRadius, criticalSpeedOf } from './formulas.js';
import {
  fail,
  ok,
  type OrdinateSensitivity,
  type Outcome,
  type Range,
  type Step,
  type UnitSystem,
  type Units,
} from './types.js';
import { input, makeStep } from './step.js';

/** Below this middle ordinate to chord ratio a mark is close to straight: flagged. */
export const NEAR_STRAIGHT_RATIO = 0.01;

/**
 * Radius of a circle through a chord C with middle ordinate (sagitta) M: R = C²/(8M) + M/2.
 * For M < C/2, R rises with C and falls with M, so low R takes C low and M high, high R takes
 * C high and M low. Fails when M is not positive or not below C/2 at any corner.
 * @example radiusFromChord(exact(40), exact(2)).value.radius.value // 101
 */
export function radiusFromChord(
  C: Range,
  M: Range,
  units?: Units,
): Outcome<{ radius: Range; step: Step; warnings: string[] }> {
  const L = units?.length ?? '';
  if (!(M.low > 0)) return fail('the middle ordinate must be greater than 0', 'middleOrdinate');
  if (!(M.high < C.low / 2))
    return fail('the middle ordinate must be less than half the chord', 'middleOrdinate');
  const radius: Range = {
    value: arcRadius(C.value, M.value),
    low: arcRadius(C.low, M.high),
    high: arcRadius(C.high, M.low),
  };
  const warnings: string[] = [];
  if (M.value / C.value < NEAR_STRAIGHT_RATIO)
    warnings.push(
      `The mark is nearly straight (middle ordinate ${formatNumber(M.value, 'length')} ${L} on a ${formatNumber(C.value, 'length')} ${L} chord, under 1%): the radius is very sensitive to the ordinate and may not be measurable with a tape.`,
    );
  const fl = (n: number) => formatNumber(n, 'length');
  return ok({
    radius,
    warnings,
    step: makeStep({
      name: 'Radius of the mark',
      formula: 'R = C²/(8 × M) + M/2',
      substituted: `R = ${fl(C.value)}²/(8 × ${fl(M.value)}) + ${fl(M.value)}/2 = ${fl(radius.value)} ${L}`,
      inputs: { C: input(C, L, 'chord'), M: input(M, L, 'middle ordinate') },
      result: radius,
      unit: L,
      why: 'circle through the ends and the middle of the chord (pure geometry); a larger ordinate gives a smaller radius',
    }),
  });
}

/**
 * Path radius of the centre of mass, half a track width inside the outside front tire's mark:
 * R_path = R − T/2 (common practice). Low end from R low and T high. Fails if not positive.
 * @example pathRadius(exact(100), exact(6)).value.radius.value // 97
 */
export function pathRadius(
  R: Range,
  T: Range,
  units?: Units,
): Outcome<{ radius: Range; step: Step }> {
  const L = units?.length ?? '';
  const radius: Range = {
    value: centreRadius(R.value, T.value),
    low: centreRadius(R.low, T.high),
    high: centreRadius(R.high, T.low),
  };
  if (!(radius.low > 0))
    return fail(
      'half the track width is not smaller than the radius of the mark',
      'vehicle.trackWidth',
    );
  const fl = (n: number) => formatNumber(n, 'length');
  return ok({
    radius,
    step: makeStep({
      name: 'Path radius (centre of mass)',
      formula: 'R_path = R − T/2',
      substituted: `R_path = ${fl(R.value)} − ${fl(T.value)}/2 = ${fl(radius.value)} ${L}`,
      inputs: { R: input(R, L), T: input(T, L, 'track width') },
      result: radius,
      unit: L,
      why: 'the centre of mass runs about half a track width inside the outside front tire’s mark (common practice)',
    }),
  });
}

/**
 * Critical speed of a yaw: S = sqrt(K R (f + e)/(1 − f e)), K = 15 (mph, ft) or 127 (km/h, m),
 * e = superelevation/100 (+ banked toward the curve's centre). With e = 0 it is sqrt(K f R).
 * S rises with R, f and e wherever 1 − f e > 0 (dS²/df ∝ 1 + e², dS²/de ∝ 1 + f²). Uses the full
 * drag factor, no braking efficiency. Fails when f + e ≤ 0 or 1 − f e ≤ 0 anywhere in the ranges.
 * @example criticalSpeed(exact(100), exact(0.6), exact(0), 'imperial').value.speed.value // 30
 */
export function criticalSpeed(
  R: Range,
  f: Range,
  superelevationPercent: Range,
  system: UnitSystem,
): Outcome<{ speed: Range; step: Step }> {
  const K = tradeConstants(system).yaw;
  const u = unitsOf(system);
  const e: Range = {
    value: superelevationPercent.value / 100,
    low: superelevationPercent.low / 100,
    high: superelevationPercent.high / 100,
  };
  if (!(f.low + e.low > 0))
    return fail(
      `the road falls away from the curve's centre (superelevation ${formatNumber(superelevationPercent.low, 'percent')}%) more than the drag factor ${formatNumber(f.low, 'drag')} can hold: no critical speed`,
      'superelevation',
    );
  const corners = [f.low * e.low, f.low * e.high, f.high * e.low, f.high * e.high];
  if (!(1 - Math.max(...corners) > 0))
    return fail(
      'drag factor × superelevation reaches 1: the banked-curve formula does not apply',
      'superelevation',
    );
  const speed: Range = {
    value: criticalSpeedOf(R.value, f.value, e.value, system) ?? NaN,
    low: criticalSpeedOf(R.low, f.low, e.low, system) ?? NaN,
    high: criticalSpeedOf(R.high, f.high, e.high, system) ?? NaN,
  };
  if (![speed.value, speed.low, speed.high].every(Number.isFinite))
    return fail('the critical speed cannot be computed from these numbers', 'radius');
  const level = e.value === 0 && e.low === 0 && e.high === 0;
  const fl = (n: number) => formatNumber(n, 'length');
  // One rule for the factors of a line (factorKind): a bank with a fraction of a percent gives 3.
  const k = factorKind(e.value * 100);
  const fd = (n: number) => formatNumber(n, k);
  const fe = formatNumber(e.value, k);
  return ok({
    speed,
    step: makeStep({
      name: 'Critical speed',
      formula: level ? `S = sqrt(${K} × f × R)` : `S = sqrt(${K} × R × (f + e)/(1 − f × e))`,
      substituted: level
        ? `S = sqrt(${K} × ${fd(f.value)} × ${fl(R.value)} ${u.length}) = ${formatNumber(speed.value, 'speed')} ${u.speed}`
        : `S = sqrt(${K} × ${fl(R.value)} ${u.length} × (${fd(f.value)} + ${fe})/(1 − ${fd(f.value)} × ${fe})) = ${formatNumber(speed.value, 'speed')} ${u.speed}`,
      inputs: { R: input(R, u.length), f: input(f, ''), e: input(e, '') },
      result: speed,
      unit: u.speed,
      why: 'the tires’ sideways friction (and the bank) supplied the force that held the vehicle on the arc: v² = (f + e) g R/(1 − f e)',
    }),
  });
}

/**
 * What a reading error of 1 inch (imperial) or 1 cm (metric) in the middle ordinate does to the
 * radius and the critical speed (dR/R is about −dM/M; S moves about half as much). Undefined when
 * the shifted ordinate leaves the valid arc. `e` is a decimal; `trackWidth` is T when the path
 * adjustment is used.
 * @example ordinateSensitivity(30, 1 / 3, 0.7, 0, 'imperial')?.radiusPercent.plus // about −20
 */
export function ordinateSensitivity(
  C: number,
  M: number,
  f: number,
  e: number,
  system: UnitSystem,
  trackWidth = 0,
): OrdinateSensitivity | undefined {
  const { size, label } = ordinateReadingStep(system);
  const R = (m: number) => centreRadius(arcRadius(C, m), trackWidth);
  const S = (m: number) => criticalSpeedOf(R(m), f, e, system);
  const s0 = S(M);
  const sPlus = M + size < C / 2 ? S(M + size) : undefined;
  if (s0 === undefined || sPlus === undefined) return undefined;
  const pct = (a: number, b: number) => ((a - b) / b) * 100;
  const sMinus = M - size > 0 ? S(M - size) : undefined;
  const radiusPercent = {
    plus: pct(R(M + size), R(M)),
    ...(sMinus !== undefined ? { minus: pct(R(M - size), R(M)) } : {}),
  };
  const speedPercent = {
    plus: pct(sPlus, s0),
    ...(sMinus !== undefined ? { minus: pct(sMinus, s0) } : {}),
  };
  const p = (x: number) => `${x > 0 ? '+' : ''}${formatNumber(x, 'percent')}%`;
  const L = unitsOf(system).length;
  const text =
    `Sensitivity: reading the middle ordinate (${formatNumber(M, 'length')} ${L}) ${label} too large moves the radius ${p(radiusPercent.plus)} and the speed ${p(speedPercent.plus)}` +
    (sMinus !== undefined && radiusPercent.minus !== undefined && speedPercent.minus !== undefined
      ? `; ${label} too small moves them ${p(radiusPercent.minus)} and ${p(speedPercent.minus)}.`
      : '.');
  return { delta: size, label, radiusPercent, speedPercent, text };
}
