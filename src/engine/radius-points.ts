import { formatNumber } from './number-text.js';
import { geometricFit, geometricSsr, signRuns, type Point } from './circle-fit.js';
import { RADIUS_RANGE_SE } from './radius-offsets.js';
import {
  fail,
  ok,
  type Outcome,
  type PointsFitSummary,
  type Range,
  type Step,
  type UnitSystem,
  type Units,
} from './types.js';

/**
 * How closely a surveyed point can be put on a tire mark's edge (about 5/8 in or 1.5 cm): the
 * tool's own default, set wider than a total station's own precision because the mark's edge
 * itself is not sharp. The fit warns when the points scatter well beyond it.
 */
export const POINT_PLACEMENT = { imperial: 0.05, metric: 0.015 } as const;

/**
 * The least-squares circle through surveyed points: Kasa's algebraic fit as the start, then
 * Gauss-Newton on the geometric distances |p_i − c| − R (geometricFit). Residuals are the signed
 * distances from each point to the circle (+ outside); the radius's standard error is
 * sqrt(s² [(JᵀJ)⁻¹]_RR) with s² = Σ r_i² / (m − 3), undefined with exactly three points (the
 * circle then passes through them). Fails when the points lie on one line or repeat one point.
 * @example
 * // Three points on a circle of radius 100 centred at (0, 0):
 * fitCircleToPoints([[100, 0], [0, 100], [-100, 0]]) // ok: radius 100, rms 0
 */
export function fitCircleToPoints(
  points: readonly (readonly [number, number])[],
): Outcome<PointsFitSummary> {
  if (points.length < 3) return fail('at least 3 points are needed for a circle', 'points');
  const pts: Point[] = points.map(([x, y]) => ({ x, y }));
  const fit = geometricFit(pts);
  if (!fit)
    return fail(
      'the points do not define a circle (they lie on one line, or repeat the same point)',
      'points',
    );
  const { a, b, r } = fit.circle;
  const residuals = pts.map((p) => Math.hypot(p.x - a, p.y - b) - r);
  const m = pts.length;
  const ssr = geometricSsr(pts, fit.circle);
  const varR = fit.inverseNormal?.[8];
  const stdError =
    m > 3 && varR !== undefined && varR >= 0 ? Math.sqrt((ssr / (m - 3)) * varR) : undefined;
  let largest = { index: 0, residual: residuals[0]! };
  residuals.forEach((res, index) => {
    if (Math.abs(res) > Math.abs(largest.residual)) largest = { index, residual: res };
  });
  return ok({
    radius: r,
    stdError,
    centre: { x: a, y: b },
    rms: Math.sqrt(ssr / m),
    largest,
    residuals,
    count: m,
  });
}

/** Residuals in order along the arc (by angle about the centre), for the wave check. */
function alongTheArc(points: readonly (readonly [number, number])[], fit: PointsFitSummary) {
  const at = points.map(([x, y], i) => ({
    t: Math.atan2(y - fit.centre.y, x - fit.centre.x),
    r: fit.residuals[i]!,
  }));
  // Start the angles after the widest gap, so an arc across ±180° is not cut in two.
  at.sort((p, q) => p.t - q.t);
  let cut = 0;
  let gap = at[0]!.t + 2 * Math.PI - at[at.length - 1]!.t;
  for (let i = 1; i < at.length; i++)
    if (at[i]!.t - at[i - 1]!.t > gap) {
      gap = at[i]!.t - at[i - 1]!.t;
      cut = i;
    }
  return [...at.slice(cut), ...at.slice(0, cut)].map((p) => p.r);
}

/** Why the points may not lie on one arc, if they seem not to. */
function arcWarnings(
  points: readonly (readonly [number, number])[],
  fit: PointsFitSummary,
  tol: number,
  L: string,
): string[] {
  const fl = (n: number) => formatNumber(n, 'ratio');
  const out: string[] = [];
  if (fit.count === 3)
    out.push(
      'With three points the circle passes exactly through them: nothing checks that the mark is a circular arc, and the radius has no spread from the fit. Survey more points along the mark.',
    );
  if (fit.rms > 2 * tol)
    out.push(
      `The points do not lie on one arc: they scatter ${fl(fit.rms)} ${L} (RMS) about the best circle, the largest ${fl(Math.abs(fit.largest.residual))} ${L} at point ${fit.largest.index + 1}, more than twice the ${fl(tol)} ${L} a point on a mark can be placed to. Check for points past where the yaw mark turns into a scuff, or a misread point.`,
    );
  else if (points.length >= 6 && fit.rms > tol && signRuns(alongTheArc(points, fit)) <= 4)
    out.push(
      'The points do not lie on one arc: the residuals rise and fall in one smooth wave along the mark rather than scattering, so the curvature changes along it. Fit only the first part of the mark.',
    );
  return out;
}

/**
 * Radius of a yaw mark from points surveyed along it, in the case's length unit: the fitted
 * radius is the value, and the range is ± 2 standard errors of the fit (stated in the step; none
 * with three points). Warns when the points do not lie on an arc. Fails (path `points`) when the
 * points define no circle or the range reaches 0.
 * @example radiusFromPoints([[0, 0], [20, 2.02], [40, 0], [10, 1.52]], 'imperial', units) // R ≈ 100 ft
 */
export function radiusFromPoints(
  points: readonly (readonly [number, number])[],
  system: UnitSystem,
  units: Units,
): Outcome<{ radius: Range; step: Step; warnings: string[]; fit: PointsFitSummary }> {
  const r = fitCircleToPoints(points);
  if (!r.ok) return r;
  const fit = r.value;
  const se = fit.stdError ?? 0;
  const radius: Range = {
    value: fit.radius,
    low: fit.radius - RADIUS_RANGE_SE * se,
    high: fit.radius + RADIUS_RANGE_SE * se,
  };
  if (!(radius.low > 0)) return fail('the points scatter too much to give a radius', 'points');
  const L = units.length;
  const fl = (n: number) => formatNumber(n, 'length');
  const fr = (n: number) => formatNumber(n, 'ratio');
  const step: Step = {
    name: 'Radius from surveyed points (least-squares circle)',
    formula: 'R minimising Σ (|p_i − c| − R)² over the points (algebraic start, then Gauss-Newton)',
    substituted: `R = ${fl(fit.radius)} ${L} from ${fit.count} points, centre (${fl(fit.centre.x)}, ${fl(fit.centre.y)}); residuals RMS ${fr(fit.rms)} ${L}, largest ${fr(Math.abs(fit.largest.residual))} ${L} (point ${fit.largest.index + 1}); standard error ${fit.stdError === undefined ? 'none (3 points)' : `${fr(se)} ${L}`}`,
    inputs: Object.fromEntries(
      points.map(([x, y], i) => [
        `p${i + 1}`,
        { value: y, unit: L, source: `point ${i + 1} (${x}, ${y})` },
      ]),
    ),
    result: radius.value,
    low: radius.low,
    high: radius.high,
    unit: L,
    why: `the circle closest to every surveyed point at once (geometric least squares); the range is ± ${RADIUS_RANGE_SE} standard errors of the fitted radius, from the points' scatter about it, so with few points it understates the doubt`,
  };
  return ok({
    radius,
    step,
    warnings: arcWarnings(points, fit, POINT_PLACEMENT[system], L),
    fit,
  });
}
