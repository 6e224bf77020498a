import fc from 'fast-check';
import { lusolve } from 'mathjs';
import { describe, expect, it } from 'vitest';
import {
  circleThroughThree,
  kasaFit,
  geometricFit,
  type Point,
} from '../../src/extras/circle-fit.js';
import { fitCircleToOffsets, type OffsetStation } from '../../src/extras/offsets-fit.js';
import { rel } from './helpers.js';

const must = <T>(r: { ok: true; value: T } | { ok: false; reason: string }): T => {
  if (!r.ok) throw new Error(r.reason);
  return r.value;
};

/** Exact offsets of a circle of radius R over a chord C (circle geometry, Pythagoras). */
const arcStations = (R: number, C: number, ats: number[]): OffsetStation[] => {
  const h = Math.sqrt(R * R - (C / 2) ** 2);
  return ats.map((at) => ({ at, offset: Math.sqrt(R * R - (at - C / 2) ** 2) - h }));
};

/** Small seeded generator for test noise (Park-Miller), and Box-Muller normals from it. */
const noise = (seed: number) => {
  let s = seed;
  const u = () => (s = (s * 48271) % 2147483647) / 2147483647;
  return () => Math.sqrt(-2 * Math.log(u())) * Math.cos(2 * Math.PI * u());
};

describe('exact arcs: the fitted radius is the true radius (circle geometry)', () => {
  it('to 1e-9 relative, for random circles, chords and stations (property, 300 runs)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 1500, noNaN: true }),
        fc.double({ min: 0.1, max: 0.95, noNaN: true }),
        fc.array(fc.double({ min: 0.02, max: 0.98, noNaN: true }), { minLength: 1, maxLength: 9 }),
        (R, half, fracs) => {
          const C = 2 * R * half; // chord below the diameter: less than half a circle
          const fit = must(
            fitCircleToOffsets(
              C,
              arcStations(
                R,
                C,
                fracs.map((q) => q * C),
              ),
            ),
          );
          expect(rel(fit.radius, R)).toBeLessThan(1e-9);
          expect(Math.abs(fit.centre.x - C / 2) / R).toBeLessThan(1e-9);
          expect(fit.rms / R).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('one station at the middle gives R = C²/(8M) + M/2 (circle geometry) and a warning that nothing checks the shape', () => {
    // Chord 40 ft, middle ordinate 2.0 ft: R = 1600/16 + 1 = 101.0 ft.
    const fit = must(fitCircleToOffsets(40, [{ at: 20, offset: 2 }]));
    expect(fit.radius).toBeCloseTo(101, 9);
    expect(fit.middleOrdinate).toBeCloseTo(2, 9);
    expect(fit.radiusStdError).toBeUndefined();
    expect(fit.warnings.join(' ')).toMatch(/one station/i);
  });

  it('one station anywhere equals the exact three-point circle', () => {
    const pts: Point[] = [
      { x: 0, y: 0 },
      { x: 12, y: 1.7 },
      { x: 45, y: 0 },
    ];
    const three = circleThroughThree(pts[0]!, pts[1]!, pts[2]!)!;
    const fit = must(fitCircleToOffsets(45, [{ at: 12, offset: 1.7 }]));
    expect(rel(fit.radius, three.r)).toBeLessThan(1e-12);
    expect(fit.centre.x).toBeCloseTo(three.a, 9);
    expect(fit.centre.y).toBeCloseTo(three.b, 9);
  });

  it('circleThroughThree on a known circle: (0,0), (2,2), (4,0) -> centre (2,0), r 2', () => {
    const c = circleThroughThree({ x: 0, y: 0 }, { x: 2, y: 2 }, { x: 4, y: 0 })!;
    expect([c.a, c.b, c.r].map((v) => v + 0)).toEqual([2, 0, 2]);
    expect(circleThroughThree({ x: 0, y: 0 }, { x: 1, y: 1 }, { x: 2, y: 2 })).toBeUndefined();
  });
});

describe('noisy arcs against mathjs (outside numerical reference)', () => {
  // Invented arc: R 120 ft, chord 45 ft, 9 stations, offsets read with 0.02 ft of noise.
  const R = 120;
  const C = 45;
  const n = noise(20261201);
  const stations = arcStations(R, C, [4.5, 9, 13.5, 18, 22.5, 27, 31.5, 36, 40.5]).map((s) => ({
    ...s,
    offset: s.offset + 0.02 * n(),
  }));
  const pts: Point[] = [
    { x: 0, y: 0 },
    ...stations.map((s) => ({ x: s.at, y: s.offset })),
    { x: C, y: 0 },
  ];

  it('the algebraic (Kasa) fit equals mathjs lusolve of the normal equations', () => {
    // Normal equations of min Σ (x² + y² + D x + E y + F)², built and solved with mathjs.
    const A = pts.map((p) => [p.x, p.y, 1]);
    const b = pts.map((p) => -(p.x ** 2 + p.y ** 2));
    const AtA = [0, 1, 2].map((i) =>
      [0, 1, 2].map((j) => A.reduce((s, r) => s + r[i]! * r[j]!, 0)),
    );
    const Atb = [0, 1, 2].map((i) => A.reduce((s, r, k) => s + r[i]! * b[k]!, 0));
    const [D, E, F] = (lusolve(AtA, Atb) as number[][]).map((r) => r[0]!);
    const a = -D! / 2;
    const bb = -E! / 2;
    const r = Math.sqrt(a * a + bb * bb - F!);
    const k = kasaFit(pts)!;
    expect(rel(k.r, r)).toBeLessThan(1e-7);
    expect(Math.abs(k.a - a)).toBeLessThan(1e-6);
    expect(Math.abs(k.b - bb)).toBeLessThan(1e-6);
  });

  it('the geometric fit is a minimum: one Gauss-Newton step solved by mathjs does not move it', () => {
    const g = geometricFit(pts)!.circle;
    const J = pts.map((p) => {
      const d = Math.hypot(p.x - g.a, p.y - g.b);
      return [-(p.x - g.a) / d, -(p.y - g.b) / d, -1];
    });
    const r = pts.map((p) => Math.hypot(p.x - g.a, p.y - g.b) - g.r);
    const JtJ = [0, 1, 2].map((i) =>
      [0, 1, 2].map((j) => J.reduce((s, row) => s + row[i]! * row[j]!, 0)),
    );
    const Jtr = [0, 1, 2].map((i) => -J.reduce((s, row, k) => s + row[i]! * r[k]!, 0));
    const step = (lusolve(JtJ, Jtr) as number[][]).map((x) => Math.abs(x[0]!));
    expect(Math.max(...step)).toBeLessThan(1e-8 * g.r);
    // Optimality: the residuals sum to zero (derivative in r).
    expect(Math.abs(r.reduce((s, x) => s + x, 0))).toBeLessThan(1e-9);
  });

  it('the fit lies within a few standard errors of the true radius and warns of nothing', () => {
    const fit = must(fitCircleToOffsets(C, stations, { tolerance: 0.02 }));
    expect(fit.radiusStdError).toBeGreaterThan(0);
    expect(Math.abs(fit.radius - R)).toBeLessThan(4 * fit.radiusStdError!);
    expect(fit.warnings).toEqual([]);
    expect(fit.residuals).toHaveLength(11);
    expect(fit.residuals[0]!.chordEnd).toBe(true);
    expect(fit.step.substituted).toContain('11 points');
  });
});

describe('warnings when the mark is not a circular arc', () => {
  /** A mark whose curvature grows along it (k = k0 + k1 s), integrated in small steps, as offsets from its chord. */
  function spiral(k0: number, k1: number, L: number, count: number) {
    const N = 1000 * (count + 1);
    const ds = L / N;
    const pts: [number, number][] = [];
    let x = 0,
      y = 0,
      th = 0;
    for (let i = 0; i <= N; i++) {
      if (i % 1000 === 0) pts.push([x, y]);
      th += (k0 + k1 * i * ds) * ds;
      x += Math.cos(th) * ds;
      y += Math.sin(th) * ds;
    }
    const [x1, y1] = pts[pts.length - 1]!;
    const C = Math.hypot(x1, y1);
    const ux = x1 / C,
      uy = y1 / C;
    return {
      C,
      stations: pts
        .slice(1, -1)
        .map(([px, py]) => ({ at: px * ux + py * uy, offset: px * uy - py * ux })),
    };
  }

  it('a spiral (curvature from 1/100 to 1/36 per ft over 45 ft) is flagged, both by scatter and by the wave pattern', () => {
    const { C, stations } = spiral(1 / 100, 1 / 2500, 45, 9);
    const fit = must(fitCircleToOffsets(C, stations, { tolerance: 0.01, unit: 'ft' }));
    expect(fit.warnings.some((w) => /scatter/.test(w))).toBe(true);
    expect(fit.warnings.some((w) => /smooth wave/.test(w))).toBe(true);
  });

  it('an exact circle measured at several stations is not flagged', () => {
    const fit = must(fitCircleToOffsets(45, arcStations(90, 45, [5, 10, 15, 20, 25, 30, 35, 40])));
    expect(fit.warnings).toEqual([]);
  });
});

describe('what it refuses (each with the field path)', () => {
  it.each([
    [0, [{ at: 1, offset: 1 }], 'chord'],
    [40, [], 'stations'],
    [40, [{ at: 0, offset: 1 }], 'stations[0].at'],
    [
      40,
      [
        { at: 10, offset: 1 },
        { at: 41, offset: 1 },
      ],
      'stations[1].at',
    ],
    [40, [{ at: 10, offset: -1 }], 'stations[0].offset'],
    [40, [{ at: 20, offset: 25 }], 'stations'], // more than half a circle
  ] as const)('chord %s, stations %j -> %s', (C, st, path) => {
    expect(fitCircleToOffsets(C, st)).toMatchObject({ ok: false, path });
  });
});
