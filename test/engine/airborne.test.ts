import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { unit } from 'mathjs';
import { airborneConstant, airborneSpeedOf } from '../../src/engine/airborne.js';
import { solveCase } from '../../src/engine/solve-case.js';
import { caseOf, rel } from './helpers.js';

// Standard gravity 9.80665 m/s² (CGPM 1901, the conventional value NIST uses), through mathjs.
const gSI = unit(9.80665, 'm/s^2');

/**
 * Projectile motion worked from first principles, independently of the engine: the centre of
 * mass leaves at speed v and angle θ, so x(t) = v cos θ t and y(t) = v sin θ t − g t²/2. It lands
 * at x = d, y = −h: t = d / (v cos θ), and −h = d tan θ − g t²/2 gives t = sqrt(2 (d tan θ + h) / g)
 * and v = d / (t cos θ). Lengths in metres, speed in m/s.
 */
function firstPrinciples(dM: number, hM: number, thetaRad: number): number {
  const g = gSI.toNumber('m/s^2');
  const t = Math.sqrt((2 * (dM * Math.tan(thetaRad) + hM)) / g);
  return dM / (t * Math.cos(thetaRad));
}

const ftToM = (x: number) => unit(x, 'ft').toNumber('m');
const mpsToMph = (v: number) => unit(v, 'm/s').toNumber('mi/h');
const mpsToKmh = (v: number) => unit(v, 'm/s').toNumber('km/h');

const airborne = (parts: Record<string, unknown>) => ({ id: 'fall-1', kind: 'airborne', ...parts });

describe('airborne speed against first-principles projectile motion', () => {
  it('level take-off, d = 60 ft, h = 9 ft: v = 80.22 ft/s = 54.7 mph (check value, physics)', () => {
    // Time of flight from h alone (level take-off): t = sqrt(2 h / g); v = d / t.
    const g = gSI.toNumber('ft/s^2'); // 32.174 ft/s²
    const t = Math.sqrt((2 * 9) / g);
    const v = 60 / t;
    expect(v).toBeCloseTo(80.22, 2);
    const mph = unit(v, 'ft/s').toNumber('mi/h');
    expect(mph).toBeCloseTo(54.7, 1);
    expect(airborneSpeedOf(60, 9, 0, 'imperial')).toBeCloseTo(mph, 9);
  });

  it('K_a is sqrt(g/2) converted: 2.7347 mph/√ft and 7.9716 km/h/√m (mathjs units)', () => {
    const kImp = Math.sqrt(gSI.toNumber('ft/s^2') / 2) * unit(1, 'ft/s').toNumber('mi/h');
    const kMet = Math.sqrt(gSI.toNumber('m/s^2') / 2) * unit(1, 'm/s').toNumber('km/h');
    expect(kImp).toBeCloseTo(2.7347, 4);
    expect(kMet).toBeCloseTo(7.9716, 4); // 2.214345 × 3.6 = 7.97164 (quoted as 7.97)
    expect(airborneConstant('imperial')).toBeCloseTo(kImp, 12);
    expect(airborneConstant('metric')).toBeCloseTo(kMet, 12);
  });

  it('agrees with first principles over distances, drops and angles, in both unit systems', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 200, noNaN: true }),
        fc.double({ min: -5, max: 30, noNaN: true }),
        fc.double({ min: -20, max: 40, noNaN: true }),
        (d, h, G) => {
          const theta = Math.atan(G / 100);
          if (!(d * Math.tan(theta) + h > 0.01)) return;
          const imp = airborneSpeedOf(d, h, G, 'imperial')!;
          expect(rel(imp, mpsToMph(firstPrinciples(ftToM(d), ftToM(h), theta)))).toBeLessThan(1e-9);
          const met = airborneSpeedOf(d, h, G, 'metric')!;
          expect(rel(met, mpsToKmh(firstPrinciples(d, h, theta)))).toBeLessThan(1e-9);
        },
      ),
    );
  });

  it('no path reaches the landing when d tan θ + h is not positive: undefined, never NaN', () => {
    expect(airborneSpeedOf(60, -3, 0, 'imperial')).toBeUndefined();
    expect(airborneSpeedOf(60, 3, -5, 'imperial')).toBeUndefined(); // 60 × −0.05 + 3 = 0
    expect(airborneSpeedOf(0, 3, 0, 'imperial')).toBeUndefined();
  });
});

describe('an airborne analysis solved from a case', () => {
  it('range from the corners: metric d 18.0 (17.5 to 18.5) m, h 2.5 (2.4 to 2.6) m, grade −3 (−4 to −2)%', () => {
    const c = caseOf({
      units: 'metric',
      analyses: [
        airborne({
          distance: { value: 18, low: 17.5, high: 18.5 },
          drop: { value: 2.5, low: 2.4, high: 2.6 },
          takeoffGrade: { value: -3, low: -4, high: -2 },
        }),
      ],
    });
    const r = solveCase(c).analyses[0]!;
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const fp = (d: number, h: number, G: number) =>
      mpsToKmh(firstPrinciples(d, h, Math.atan(G / 100)));
    const all = [17.5, 18.5].flatMap((d) =>
      [2.4, 2.6].flatMap((h) => [-4, -2].map((G) => fp(d, h, G))),
    );
    expect(rel(r.solution.speed.value, fp(18, 2.5, -3))).toBeLessThan(1e-9);
    expect(rel(r.solution.speed.low, Math.min(...all))).toBeLessThan(1e-9);
    expect(rel(r.solution.speed.high, Math.max(...all))).toBeLessThan(1e-9);
    expect(r.solution.minimum).toBe(Math.floor(Math.min(...all)));
    const names = r.solution.steps.map((s) => s.name);
    expect(names).toEqual(['Constant of the fall', 'Take-off angle', 'Speed at take-off']);
    const text = r.solution.assumptions.join(' ');
    expect(text).toMatch(/centre of mass/);
    expect(text).toMatch(/Air drag is neglected/);
    expect(text).toMatch(/first contact with the ground/);
    // The model agrees with the solution at every input's value (sensitivity and sampling use it).
    expect(r.solution.model.evaluate({})).toBeCloseTo(r.solution.speed.value, 9);
    expect(r.solution.model.inputs.map((i) => i.key)).toEqual(['d', 'h', 'G']);
  });

  it('a corner with no path fails with the reason, naming the drop', () => {
    const c = caseOf({
      analyses: [airborne({ distance: 40, drop: { value: 1, low: -0.5, high: 1.5 } })],
    });
    const r = solveCase(c).analyses[0]!;
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.path).toBe('analyses[0].drop');
    expect(r.reason).toMatch(/d × tan θ \+ h = -0\.50 ft is not above 0/);
  });
});
