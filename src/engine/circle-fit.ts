import { inverse3, solve3 } from './solve3.js';

/** A point in the plane. */
export interface Point {
  x: number;
  y: number;
}

/** A circle: centre (a, b) and radius r. */
export interface Circle {
  a: number;
  b: number;
  r: number;
}

/**
 * The circle through three points (the circumcircle), from the perpendicular bisectors:
 * with D = 2 (x1 (y2 - y3) + x2 (y3 - y1) + x3 (y1 - y2)),
 * a = (|p1|² (y2 - y3) + |p2|² (y3 - y1) + |p3|² (y1 - y2)) / D, b likewise with x, r = |p1 - c|.
 * Undefined when the points are on one line.
 * @example circleThroughThree({ x: 0, y: 0 }, { x: 2, y: 2 }, { x: 4, y: 0 }) // { a: 2, b: 0, r: 2 }
 */
export function circleThroughThree(p1: Point, p2: Point, p3: Point): Circle | undefined {
  const d = 2 * (p1.x * (p2.y - p3.y) + p2.x * (p3.y - p1.y) + p3.x * (p1.y - p2.y));
  const span = Math.max(
    Math.abs(p1.x - p3.x),
    Math.abs(p1.y - p3.y),
    Math.abs(p2.x - p1.x),
    Math.abs(p2.y - p1.y),
  );
  if (!(Math.abs(d) > 1e-14 * span * span)) return undefined;
  const s1 = p1.x ** 2 + p1.y ** 2;
  const s2 = p2.x ** 2 + p2.y ** 2;
  const s3 = p3.x ** 2 + p3.y ** 2;
  const a = (s1 * (p2.y - p3.y) + s2 * (p3.y - p1.y) + s3 * (p1.y - p2.y)) / d;
  const b = (s1 * (p3.x - p2.x) + s2 * (p1.x - p3.x) + s3 * (p2.x - p1.x)) / d;
  return { a, b, r: Math.hypot(p1.x - a, p1.y - b) };
}

/** Shifts and scales points to mean 0 and unit size, so the normal equations stay well conditioned. */
function normalise(pts: readonly Point[]) {
  const mx = pts.reduce((s, p) => s + p.x, 0) / pts.length;
  const my = pts.reduce((s, p) => s + p.y, 0) / pts.length;
  const size = Math.max(...pts.map((p) => Math.hypot(p.x - mx, p.y - my)));
  const u = pts.map((p) => ({ x: (p.x - mx) / size, y: (p.y - my) / size }));
  const back = (c: Circle): Circle => ({ a: mx + size * c.a, b: my + size * c.b, r: size * c.r });
  return { u, back };
}

/**
 * Algebraic (Kasa) circle fit: least squares of x² + y² + D x + E y + F = 0 over the points, a
 * linear problem solved by its normal equations; a = -D/2, b = -E/2, r = sqrt(a² + b² - F).
 * Exact for points on a circle; with noise it leans slightly toward smaller circles, which the
 * geometric refinement removes. Undefined for fewer than three points or points on one line.
 */
export function kasaFit(pts: readonly Point[]): Circle | undefined {
  if (pts.length < 3) return undefined;
  const { u, back } = normalise(pts);
  const c = kasaCore(u);
  return c && back(c);
}

/** The Kasa fit of points already normalised. */
function kasaCore(u: readonly Point[]): Circle | undefined {
  const n = [0, 0, 0, 0, 0, 0, 0, 0, 0];
  const rhs = [0, 0, 0];
  for (const p of u) {
    const row = [p.x, p.y, 1];
    const z = -(p.x * p.x + p.y * p.y);
    for (let i = 0; i < 3; i++) {
      rhs[i]! += row[i]! * z;
      for (let j = 0; j < 3; j++) n[3 * i + j]! += row[i]! * row[j]!;
    }
  }
  const sol = solve3(n, rhs);
  if (!sol) return undefined;
  const [D, E, F] = sol;
  const a = -D / 2;
  const b = -E / 2;
  const r2 = a * a + b * b - F;
  if (!(r2 > 0)) return undefined;
  return { a, b, r: Math.sqrt(r2) };
}

/** Sum of squared geometric distances from the points to the circle. */
export function geometricSsr(pts: readonly Point[], c: Circle): number {
  return pts.reduce((s, p) => s + (Math.hypot(p.x - c.a, p.y - c.b) - c.r) ** 2, 0);
}

/** The normal matrix JᵀJ and gradient Jᵀr of the geometric residuals at a circle. */
function normalSystem(pts: readonly Point[], c: Circle) {
  const jtj = [0, 0, 0, 0, 0, 0, 0, 0, 0];
  const jtr = [0, 0, 0];
  for (const p of pts) {
    const d = Math.hypot(p.x - c.a, p.y - c.b);
    if (d === 0) continue;
    const row = [-(p.x - c.a) / d, -(p.y - c.b) / d, -1];
    const r = d - c.r;
    for (let i = 0; i < 3; i++) {
      jtr[i]! += row[i]! * r;
      for (let j = 0; j < 3; j++) jtj[3 * i + j]! += row[i]! * row[j]!;
    }
  }
  return { jtj, jtr };
}

/** A geometric fit: the circle, iterations used and the covariance factor (JᵀJ)⁻¹ at the end. */
export interface GeometricFit {
  circle: Circle;
  iterations: number;
  /** (JᵀJ)⁻¹ in the points' own units (row-major, order a, b, r); times s² it is the covariance. */
  inverseNormal: number[] | undefined;
}

/**
 * Geometric circle fit: minimises the sum of squared distances from the points to the circle,
 * r_i = |p_i - c| - r, by Gauss-Newton from the Kasa circle, halving a step that does not lower
 * the sum. Stops when a step moves the circle by less than 1e-13 of the points' size.
 */
export function geometricFit(pts: readonly Point[], maxIterations = 100): GeometricFit | undefined {
  if (pts.length < 3) return undefined;
  const { u, back } = normalise(pts);
  const start = kasaCore(u);
  if (!start) return undefined;
  let c = start;
  let ssr = geometricSsr(u, c);
  let it = 0;
  for (; it < maxIterations; it++) {
    const { jtj, jtr } = normalSystem(u, c);
    const step = solve3(
      jtj,
      jtr.map((g) => -g),
    );
    if (!step) break;
    let t = 1;
    let next: Circle = c;
    let nextSsr = Infinity;
    for (let h = 0; h < 40; h++, t /= 2) {
      next = { a: c.a + t * step[0], b: c.b + t * step[1], r: c.r + t * step[2] };
      nextSsr = geometricSsr(u, next);
      if (nextSsr <= ssr) break;
    }
    if (!(nextSsr <= ssr)) break;
    const moved = Math.max(Math.abs(next.a - c.a), Math.abs(next.b - c.b), Math.abs(next.r - c.r));
    c = next;
    ssr = nextSsr;
    if (moved < 1e-13 * Math.max(1, c.r)) break;
  }
  // The Jacobian's entries are unit directions and -1, the same in normalised and in real
  // units, so (JᵀJ)⁻¹ needs no rescaling.
  return { circle: back(c), iterations: it, inverseNormal: inverse3(normalSystem(u, c).jtj) };
}

/**
 * Runs of residuals of one sign along a mark, in order (zeros join the run they are in). A
 * least-squares circle leaves at least four runs; as few as that with many points and a scatter
 * above the reading tolerance is the smooth wave of a curvature that changes along the mark.
 * @example signRuns([1, -1, -2, 1]) // 3
 */
export function signRuns(res: readonly number[]): number {
  let runs = 0;
  let last = 0;
  for (const r of res) {
    const s = Math.sign(r);
    if (s !== 0 && s !== last) {
      runs++;
      last = s;
    }
  }
  return runs;
}
