import { describe, expect, it } from 'vitest';
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { fitCircleToPoints, radiusFromPoints } from '../../src/engine/radius-points.js';
import { unitsOf } from '../../src/engine/constants.js';
import { rel } from './helpers.js';

type P = [number, number];

/** Points on a circle of radius r centred at (a, b), from angle t0 to t1 (radians), n of them. */
function onCircle(a: number, b: number, r: number, t0: number, t1: number, n: number): P[] {
  return Array.from({ length: n }, (_, i) => {
    const t = t0 + ((t1 - t0) * i) / (n - 1);
    return [a + r * Math.cos(t), b + r * Math.sin(t)];
  });
}

/** A small seeded generator (mulberry32) and a normal deviate from it (Box-Muller). */
function normals(seed: number) {
  let s = seed >>> 0;
  const u = () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => Math.sqrt(-2 * Math.log(u() || 1e-12)) * Math.cos(2 * Math.PI * u());
}

/**
 * The geometric circle fit by a general-purpose Levenberg-Marquardt solver from npm
 * (ml-levenberg-marquardt), used only here as an outside check: residuals |p_i − c| − R, data y = 0.
 */
function outsideFit(pts: P[], start: [number, number, number]) {
  const res = levenbergMarquardt(
    { x: pts.map((_, i) => i), y: pts.map(() => 0) },
    ([a, b, r]: number[]) =>
      (i: number) =>
        Math.hypot(pts[i]![0] - a!, pts[i]![1] - b!) - r!,
    { initialValues: start, maxIterations: 500, errorTolerance: 1e-14, gradientDifference: 1e-7 },
  );
  return { a: res.parameterValues[0]!, b: res.parameterValues[1]!, r: res.parameterValues[2]! };
}

describe('circle through surveyed points', () => {
  it('exact points on a known circle give its radius to 0.05% (circle geometry)', () => {
    for (const [r, span, n] of [
      [150, 0.3, 5],
      [48, 1.2, 12],
      [420, 0.08, 8],
      [90, 0.5, 3],
    ] as const) {
      const pts = onCircle(1200.5, -310.25, r, 1.1, 1.1 + span, n);
      const f = fitCircleToPoints(pts);
      expect(f.ok).toBe(true);
      if (!f.ok) continue;
      expect(rel(f.value.radius, r)).toBeLessThan(0.0005);
      expect(f.value.rms).toBeLessThan(1e-6 * r);
    }
  });

  it('noisy points on a 160 ft circle: the fit agrees with an npm Levenberg-Marquardt solver', () => {
    const z = normals(20261202);
    const pts = onCircle(35, 160, 160, -Math.PI / 2 - 0.15, -Math.PI / 2 + 0.15, 15).map(
      ([x, y]): P => [x + 0.03 * z(), y + 0.03 * z()],
    );
    const f = fitCircleToPoints(pts);
    expect(f.ok).toBe(true);
    if (!f.ok) return;
    const o = outsideFit(pts, [30, 150, 150]);
    expect(rel(f.value.radius, o.r)).toBeLessThan(1e-5);
    expect(Math.abs(f.value.centre.x - o.a)).toBeLessThan(1e-3);
    // The true radius lies within a few standard errors of the fit.
    expect(Math.abs(f.value.radius - 160)).toBeLessThan(4 * f.value.stdError!);
    // Residuals as the user reads them: RMS and the largest, measured independently here.
    const resid = pts.map(([x, y]) => Math.hypot(x - o.a, y - o.b) - o.r);
    const rms = Math.sqrt(resid.reduce((s, r) => s + r * r, 0) / resid.length);
    expect(f.value.rms).toBeCloseTo(rms, 6);
    expect(Math.abs(f.value.largest.residual)).toBeCloseTo(Math.max(...resid.map(Math.abs)), 6);
  });

  it('the range is ± 2 standard errors, and the step says so', () => {
    const z = normals(7);
    const pts = onCircle(0, 0, 120, 0.2, 0.6, 10).map(([x, y]): P => [
      x + 0.02 * z(),
      y + 0.02 * z(),
    ]);
    const r = radiusFromPoints(pts, 'imperial', unitsOf('imperial'));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const se = r.value.fit.stdError!;
    expect(r.value.radius.low).toBeCloseTo(r.value.fit.radius - 2 * se, 9);
    expect(r.value.radius.high).toBeCloseTo(r.value.fit.radius + 2 * se, 9);
    expect(r.value.step.why).toMatch(/± 2 standard errors/);
    expect(r.value.step.substituted).toMatch(/residuals RMS .* largest .* standard error/);
    expect(r.value.warnings).toEqual([]);
  });

  it('points that do not lie on one arc draw a warning: a mark whose curve tightens', () => {
    // A spiral-like mark: radius falling from 200 ft to 80 ft along it.
    const pts: P[] = Array.from({ length: 14 }, (_, i) => {
      const t = i * 0.05;
      const r = 200 - 120 * (i / 13);
      return [r * Math.cos(t), r * Math.sin(t)];
    });
    const r = radiusFromPoints(pts, 'imperial', unitsOf('imperial'));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.warnings.join(' ')).toMatch(/do not lie on one arc/);
  });

  it('three points: the circle through them, with a warning that nothing checks the arc', () => {
    const r = radiusFromPoints(onCircle(0, 0, 75, 0, 0.5, 3), 'metric', unitsOf('metric'));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.radius.value).toBeCloseTo(75, 6);
    expect(r.value.radius.low).toBe(r.value.radius.value);
    expect(r.value.warnings.join(' ')).toMatch(/three points/);
  });

  it('points on one line fail with a reason, never a NaN', () => {
    const r = fitCircleToPoints([
      [0, 0],
      [10, 1],
      [20, 2],
      [30, 3],
    ]);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.reason).toMatch(/lie on one line/);
  });
});
