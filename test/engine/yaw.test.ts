import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  criticalSpeed,
  exact,
  ordinateSensitivity,
  pathRadius,
  radiusFromChord,
} from '../../src/engine/index.js';
import { rel } from './helpers.js';

const r = (value: number, low = value, high = value) => ({ value, low, high });

describe('radius from chord and middle ordinate (circle geometry)', () => {
  it('recovers the radius of random circles (property: chord of a circle, its sagitta, back to R)', () => {
    // Pure geometry: a chord subtending angle 2θ on a circle of radius R has length 2R sin θ and
    // sagitta R (1 − cos θ). Any circle is a check value.
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 5000, noNaN: true }),
        fc.double({ min: 0.01, max: 1.5, noNaN: true }), // θ below π/2: less than a half circle
        (R, theta) => {
          const C = 2 * R * Math.sin(theta);
          const M = R * (1 - Math.cos(theta));
          const out = radiusFromChord(exact(C), exact(M));
          expect(out.ok).toBe(true);
          if (out.ok) expect(rel(out.value.radius.value, R)).toBeLessThan(1e-9);
        },
      ),
    );
  });

  it('low radius from chord low and ordinate high, high radius from chord high and ordinate low', () => {
    // Invented arc: C 40 ± 0.5 ft, M 2.0 ± 0.1 ft. By hand: R = 1600/16 + 1 = 101.0;
    // low = 39.5²/(8 × 2.1) + 1.05 = 1560.25/16.8 + 1.05 = 92.872 + 1.05 = 93.922;
    // high = 40.5²/(8 × 1.9) + 0.95 = 1640.25/15.2 + 0.95 = 107.911 + 0.95 = 108.861.
    const out = radiusFromChord(r(40, 39.5, 40.5), r(2, 1.9, 2.1), { length: 'ft', speed: 'mph' });
    if (!out.ok) throw new Error(out.reason);
    expect(out.value.radius.value).toBeCloseTo(101, 9);
    expect(out.value.radius.low).toBeCloseTo(93.922, 3);
    expect(out.value.radius.high).toBeCloseTo(108.861, 3);
    expect(out.value.step.substituted).toBe('R = 40.0²/(8 × 2.00) + 2.00/2 = 101.0 ft');
  });

  it('an ordinate of half the chord or more is a typed failure, not a number', () => {
    const half = radiusFromChord(exact(10), exact(5));
    expect(half).toEqual({
      ok: false,
      reason: 'the middle ordinate must be less than half the chord',
      path: 'middleOrdinate',
    });
    expect(radiusFromChord(exact(10), r(4, 4, 5.2)).ok).toBe(false);
    expect(radiusFromChord(exact(10), exact(0)).ok).toBe(false);
  });

  it('flags a near-straight mark (M/C under 1%)', () => {
    const out = radiusFromChord(exact(100), exact(0.5));
    if (!out.ok) throw new Error(out.reason);
    expect(out.value.warnings.join(' ')).toMatch(/nearly straight/);
    const curved = radiusFromChord(exact(100), exact(2));
    if (!curved.ok) throw new Error(curved.reason);
    expect(curved.value.warnings).toEqual([]);
  });
});

describe('half-track path radius (common practice: R − T/2)', () => {
  it('subtracts half the track width; a wider track gives the low end', () => {
    // By hand: R 150 (148 to 152), T 6 (5.8 to 6.2): 147; low 148 − 3.1 = 144.9; high 152 − 2.9 = 149.1.
    const out = pathRadius(r(150, 148, 152), r(6, 5.8, 6.2));
    if (!out.ok) throw new Error(out.reason);
    expect(out.value.radius).toEqual({ value: 147, low: 144.9, high: 149.1 });
  });
  it('fails when half the track is not below the radius', () => {
    expect(pathRadius(exact(3), exact(6)).ok).toBe(false);
  });
});

describe('critical speed', () => {
  it('S = sqrt(15 f R) on a flat curve (hand-worked, invented numbers)', () => {
    // R 151.5 ft, f 0.6: 15 × 0.6 × 151.5 = 1363.5, sqrt = 36.926 mph.
    const out = criticalSpeed(exact(151.5), exact(0.6), exact(0), 'imperial');
    if (!out.ok) throw new Error(out.reason);
    expect(out.value.speed.value).toBeCloseTo(36.926, 3);
    expect(out.value.step.formula).toBe('S = sqrt(15 × f × R)');
  });
  it('with superelevation (metric, hand-worked): sqrt(127 R (f + e)/(1 − f e))', () => {
    // R 113 m, f 0.7, e 5%: 127 × 113 = 14351; × 0.75 = 10763.25; / (1 − 0.035) = 11153.63; sqrt = 105.611 km/h.
    const out = criticalSpeed(exact(113), exact(0.7), exact(5), 'metric');
    if (!out.ok) throw new Error(out.reason);
    expect(out.value.speed.value).toBeCloseTo(105.611, 2);
  });
  it('fails when the bank falls away more than the drag factor holds, or f e reaches 1', () => {
    expect(criticalSpeed(exact(100), exact(0.3), exact(-40), 'imperial').ok).toBe(false);
    expect(criticalSpeed(exact(100), r(1.5, 1.2, 2), exact(50), 'imperial').ok).toBe(false);
  });
});

describe('sensitivity to the middle ordinate', () => {
  it('1 inch on a 4-inch ordinate moves R by about 25% and S by about 12% (dR/R ≈ −dM/M, from R = C²/(8M) + M/2)', () => {
    // M = 4 in = 1/3 ft on a 30 ft chord; dR/R ≈ −dM/M = −25%; S ∝ sqrt(R) → about −11 to −13%.
    const s = ordinateSensitivity(30, 4 / 12, 0.7, 0, 'imperial');
    if (!s) throw new Error('no sensitivity');
    expect(s.label).toBe('1 in');
    expect(s.radiusPercent.plus).toBeGreaterThan(-21);
    expect(s.radiusPercent.plus).toBeLessThan(-19); // 4/(4+1) − 1 = −20% when read too large
    expect(s.radiusPercent.minus!).toBeGreaterThan(32); // 4/3 − 1 = +33% when read too small
    expect(s.radiusPercent.minus!).toBeLessThan(34);
    expect(s.speedPercent.plus).toBeCloseTo((Math.sqrt(0.8) - 1) * 100, 0);
    expect(s.text).toMatch(/1 in too large/);
  });
  it('uses 1 cm in metric', () => {
    expect(ordinateSensitivity(15, 0.4, 0.7, 0, 'metric')?.label).toBe('1 cm');
  });
});
