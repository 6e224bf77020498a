import { tradeConstants } from './constants.js';
import type { UnitSystem } from './types.js';

/**
 * The scalar formulas of the trade, one function each, for single numbers. Everything that
 * computes one of these figures calls the function here: the engine's ranges (each end through
 * the same function), the analysis models behind sensitivity and sampling, the limit comparison
 * and the interview's checks. A test in test/engine/one-formula.test.ts fails if a second copy of
 * the effective drag or the radius appears in src/.
 *
 * They run in sampling loops (100,000 calls and more): plain arithmetic, no allocation.
 */

/**
 * Effective drag of a surface, f n + G/100 (trade approximation of f n cos θ + sin θ, θ = atan G;
 * under 0.5% apart below a 10% grade). Braking efficiency multiplies the friction only: gravity
 * does not depend on the brakes. G is signed percent, + uphill. Rising in f, n (f ≥ 0) and G.
 * @example effectiveDrag(0.7, 1, -2) // 0.68
 */
export function effectiveDrag(f: number, n: number, gradePercent: number): number {
  return f * n + gradePercent / 100;
}

/**
 * Squared speed a slide takes off over a distance d at effective drag e: C d e, with C = 30
 * (mph, ft) or 254 (km/h, m) from v² = 2 a d (see tradeConstants). A slide's start speed is
 * S² = S_end² + Σ slideSquaredSpeed(d_i, e_i); braking forward, v_out² = v_in² − slideSquaredSpeed(L, e).
 * @example slideSquaredSpeed(60, 0.75, 30) // 1350
 */
export function slideSquaredSpeed(d: number, effective: number, C: number): number {
  return C * d * effective;
}

/**
 * Distance over which a slide at effective drag e takes off a squared speed v²: v² / (C e), the
 * inverse of slideSquaredSpeed (braking distance to rest from v). Not finite when e is 0.
 * @example slideDistanceFor(1350, 0.75, 30) // 60
 */
export function slideDistanceFor(squaredSpeed: number, effective: number, C: number): number {
  return squaredSpeed / (C * effective);
}

/**
 * Start speed of a slide for single numbers: S² = S_end² + C Σ d_i (f_i n + G_i/100), C = 30
 * (mph, ft) or 254 (km/h, m). Undefined when a segment's f n + G/100 is not positive (it could not
 * slow the vehicle) or the result is not finite. Rising in every d, f, G, in n and in S_end.
 * @example slideStartSpeed([{ d: 60, f: 0.75, G: 0 }], 1, 0, 'imperial') // 36.74…
 */
export function slideStartSpeed(
  segments: readonly { d: number; f: number; G: number }[],
  n: number,
  endSpeed: number,
  system: UnitSystem,
): number | undefined {
  const C = tradeConstants(system).slide;
  let s2 = endSpeed * endSpeed;
  for (const s of segments) {
    const eff = effectiveDrag(s.f, n, s.G);
    if (!(eff > 0)) return undefined;
    s2 += slideSquaredSpeed(s.d, eff, C);
  }
  const S = Math.sqrt(s2);
  return Number.isFinite(S) ? S : undefined;
}

/**
 * Radius of a circle through the ends of a chord C with middle ordinate (sagitta) M:
 * R = C²/(8M) + M/2 (circle geometry). For 0 < M < C/2 it rises with C and falls with M.
 * @example arcRadius(40, 2) // 101
 */
export function arcRadius(chord: number, ordinate: number): number {
  return (chord * chord) / (8 * ordinate) + ordinate / 2;
}

/**
 * Radius of the centre of mass's path, half a track width inside the outside front tire's mark:
 * R_path = R − T/2 (common practice).
 * @example centreRadius(100, 6) // 97
 */
export function centreRadius(radius: number, trackWidth: number): number {
  return radius - trackWidth / 2;
}

/**
 * Critical speed: S = sqrt(K R (f + e)/(1 − f e)), K = 15 (mph, ft) or 127 (km/h, m), e the
 * superelevation as a decimal; undefined outside its domain (R ≤ 0, f + e ≤ 0, 1 − f e ≤ 0).
 * Rising in R, f and e wherever 1 − f e > 0.
 * @example criticalSpeedOf(100, 0.6, 0, 'imperial') // 30
 */
export function criticalSpeedOf(
  R: number,
  f: number,
  e: number,
  system: UnitSystem,
): number | undefined {
  const K = tradeConstants(system).yaw;
  if (!(R > 0) || !(f + e > 0) || !(1 - f * e > 0)) return undefined;
  const S = Math.sqrt((K * R * (f + e)) / (1 - f * e));
  return Number.isFinite(S) ? S : undefined;
}

/**
 * Braking efficiency from each wheel's braking (0 to 1) and the front axle's share s of the
 * static weight: n = s/2 (FL + FR) + (1 − s)/2 (RL + RR) (common practice). Rising in each wheel;
 * linear in s.
 * @example wheelsBraking(0.6, 1, 1, 0, 0) // 0.6
 */
export function wheelsBraking(
  share: number,
  frontLeft: number,
  frontRight: number,
  rearLeft: number,
  rearRight: number,
): number {
  return (share / 2) * (frontLeft + frontRight) + ((1 - share) / 2) * (rearLeft + rearRight);
}

/**
 * Level drag factor from one test skid run with every wheel locked on a grade G_t (signed percent,
 * + uphill in the direction of the test): S² = C d (f + G_t/100) (physics: the work of friction and
 * of gravity along the slope), so f = S² / (C d) − G_t/100, C = 30 (mph, ft) or 254 (km/h, m).
 * Rising in S, falling in d and in G_t. A level test (G_t = 0) gives the ratio itself.
 * @example testSkidDrag(30, 40, 'imperial') // 0.75
 * @example testSkidDrag(30, 40, 'imperial', 5) // 0.70
 */
export function testSkidDrag(
  speed: number,
  distance: number,
  system: UnitSystem,
  testGradePercent = 0,
): number {
  return levelTestDrag(
    (speed * speed) / (tradeConstants(system).slide * distance),
    testGradePercent,
  );
}

/**
 * The test-skid grade rule: a test on a grade G_t (signed percent, + uphill in its direction)
 * gives the ratio f + G_t/100, so the level drag factor is ratio − G_t/100. Every factor from a
 * test, worked out here from speed and distance or typed as already worked out, passes here
 * once. Rising in the ratio, falling in G_t.
 * @example levelTestDrag(0.75, 5) // 0.70
 */
export function levelTestDrag(ratio: number, testGradePercent: number): number {
  return ratio - testGradePercent / 100;
}
