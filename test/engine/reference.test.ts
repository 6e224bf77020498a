import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { solveCase } from '../../src/engine/index.js';
import { oracleCase } from '../solve/contract-oracle.js';
import { caseOf, rel } from './helpers.js';

// The engine against the one deliberately naive implementation of docs/case-file.md's formulas,
// test/solve/contract-oracle.ts (written from that text, not from src/engine): every input is a
// [value, low, high] triple and the low and high speeds are found by brute force over every corner
// of the input box (no monotonicity assumed). The engine must agree on value, low, high and
// minimum, and must fail exactly where some corner cannot be computed.

type Q = number | { value: number; low?: number; high?: number };

// Generators of valid inputs.
const num = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const qty = (min: number, max: number, w: number): fc.Arbitrary<Q> =>
  fc.oneof(
    num(min, max),
    fc
      .tuple(num(min, max), num(0, w), num(0, w))
      .map(([x, a, b]) => ({ value: x, low: Math.max(min, x - a), high: Math.min(max, x + b) })),
  );
const dragArb = fc.oneof(
  fc
    .tuple(num(0.1, 1.2), num(0, 0.15), num(0, 0.15))
    .map(([x, a, b]) => ({ source: 'entered', value: x, low: Math.max(0.05, x - a), high: x + b })),
  fc.tuple(num(0.1, 1.2), num(0, 0.15)).map(([x, a]) => ({
    source: 'table',
    surface: 'asphalt-dry-travelled',
    value: x,
    low: Math.max(0.05, x - a),
  })),
  fc
    .array(fc.record({ speed: num(15, 50), distance: num(10, 120) }), {
      minLength: 1,
      maxLength: 4,
    })
    .map((tests) => ({ source: 'test-skids', tests })),
  fc
    .tuple(num(50, 150), fc.array(num(0.3, 0.9), { minLength: 1, maxLength: 4 }))
    .map(([w, r]) => ({ source: 'sled', weight: w, pulls: r.map((x) => x * w) })),
  fc
    .array(num(0.2, 1.1), { minLength: 1, maxLength: 4 })
    .map((readings) => ({ source: 'decelerometer', readings })),
);
const brakesArb = fc.oneof(
  fc.constant({ mode: 'all' }),
  qty(0.2, 1, 0.1).map((efficiency) => ({ mode: 'estimate', efficiency })),
  fc.tuple(qty(0, 1, 0.2), qty(0, 1, 0.2), qty(0, 1, 0.2), qty(0, 1, 0.2)).map(([a, b, c, d]) => ({
    mode: 'wheels',
    frontLeft: a,
    frontRight: b,
    rearLeft: c,
    rearRight: d,
  })),
);
const skidArb = fc.oneof(
  fc.record({
    id: fc.constant('skid-a'),
    kind: fc.constant('skid'),
    marks: fc.array(qty(5, 200, 3), { minLength: 1, maxLength: 4 }),
    distanceRule: fc.constantFrom('average', 'longest'),
    segments: dragArb.chain((drag) => qty(-15, 15, 3).map((grade) => [{ drag, grade }])),
  }),
  fc.record({
    id: fc.constant('skid-b'),
    kind: fc.constant('skid'),
    segments: fc.array(
      fc.record({ length: qty(2, 100, 2), drag: dragArb, grade: qty(-15, 15, 3) }),
      { minLength: 1, maxLength: 2 },
    ),
    end: fc.oneof(
      fc.constant({ mode: 'stop' }),
      qty(0, 60, 8).map((speed) => ({ mode: 'speed', speed })),
    ),
  }),
);
const yawArb = fc
  .tuple(
    num(10, 60),
    num(0.02, 0.3),
    num(0, 0.03),
    dragArb,
    qty(-8, 10, 2),
    fc.constantFrom('none', 'half-track'),
  )
  .map(([C, ratio, w, drag, superelevation, pathAdjustment]) => ({
    id: 'yaw-a',
    kind: 'yaw',
    chord: { value: C, low: C * 0.99, high: C * 1.01 },
    middleOrdinate: { value: C * ratio, low: C * ratio * (1 - w), high: C * ratio * (1 + w) },
    drag,
    superelevation,
    pathAdjustment,
  }));

describe('engine against the brute-force reference implementation of docs/case-file.md', () => {
  it('agrees on value, low, high and minimum, and on which analyses cannot be computed', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('imperial', 'metric'),
        brakesArb,
        qty(0.45, 0.65, 0.05),
        qty(1.3, 2.0, 0.1),
        skidArb,
        yawArb,
        (units, brakes, share, track, skid, yaw) => {
          const vehicle = { brakes, frontAxleShare: share, trackWidth: track };
          const c = caseOf({
            units: units as 'imperial' | 'metric',
            vehicle,
            analyses: [skid, yaw],
          });
          const solved = solveCase(c).analyses;
          const refs = oracleCase({ units, vehicle, analyses: [skid, yaw] }).analyses;
          refs.forEach((ref, i) => {
            const got = solved[i]!;
            expect(got.ok).toBe(ref.speed !== undefined);
            if (!ref.speed || !got.ok) return;
            const { value, low, high } = ref.speed;
            expect(rel(got.solution.speed.value, value)).toBeLessThan(1e-9);
            expect(rel(got.solution.speed.low, low)).toBeLessThan(1e-9);
            expect(rel(got.solution.speed.high, high)).toBeLessThan(1e-9);
            expect(got.solution.minimum).toBe(Math.floor(low + 1e-9));
          });
        },
      ),
      { numRuns: 300 },
    );
  });
});
