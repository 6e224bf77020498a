import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { solveCase, type AnalysisModel, type Range } from '../../src/engine/index.js';
import { caseOf, rel } from './helpers.js';

// The model of an analysis must agree with its solved figure: at the inputs' values it gives the
// speed's value, at the matching ends it gives the low and high, and anywhere inside the input
// box it stays between them (the ranges are the true extremes of a monotone formula).

const num = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const q = (min: number, max: number, spreadMax: number) =>
  fc.tuple(num(min, max), num(0, spreadMax), num(0, spreadMax)).map(([v, a, b]) => ({
    value: v,
    low: Math.max(min, v - a),
    high: Math.min(max, v + b),
  }));

const FALLING = new Set(['M', 'T']); // the speed falls as these rise

function corner(m: AnalysisModel, end: 'low' | 'high'): Record<string, number> {
  const other = end === 'low' ? 'high' : 'low';
  return Object.fromEntries(m.inputs.map((i) => [i.key, FALLING.has(i.key) ? i[other] : i[end]]));
}

function checkModel(speed: Range, m: AnalysisModel, t: number[]) {
  const values = Object.fromEntries(m.inputs.map((i) => [i.key, i.value]));
  expect(rel(m.evaluate(values)!, speed.value)).toBeLessThan(1e-9);
  expect(rel(m.evaluate({})!, speed.value)).toBeLessThan(1e-9);
  expect(rel(m.evaluate(corner(m, 'low'))!, speed.low)).toBeLessThan(1e-9);
  expect(rel(m.evaluate(corner(m, 'high'))!, speed.high)).toBeLessThan(1e-9);
  const inside = Object.fromEntries(
    m.inputs.map((i, k) => [i.key, i.low + (t[k % t.length] ?? 0.5) * (i.high - i.low)]),
  );
  const s = m.evaluate(inside);
  expect(s).toBeDefined();
  expect(s!).toBeGreaterThanOrEqual(speed.low * (1 - 1e-12));
  expect(s!).toBeLessThanOrEqual(speed.high * (1 + 1e-12));
}

describe('skid model agrees with the solved range', () => {
  it('for random multi-segment slides with grades, wheel brakes and an end speed', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ length: q(1, 200, 5), drag: q(0.3, 1.2, 0.1), grade: q(-8, 8, 2) }), {
          minLength: 1,
          maxLength: 3,
        }),
        q(0.45, 0.7, 0.05),
        fc.constantFrom(0, 0.5, 1),
        q(0, 60, 10),
        fc.boolean(),
        fc.array(num(0, 1), { minLength: 8, maxLength: 8 }),
        fc.constantFrom('imperial' as const, 'metric' as const),
        (segs, share, rear, endSpeed, moving, t, units) => {
          const c = caseOf({
            units,
            vehicle: {
              frontAxleShare: share,
              brakes: { mode: 'wheels', frontLeft: 1, frontRight: 1, rearLeft: rear, rearRight: 1 },
            },
            analyses: [
              {
                id: 'skid-x',
                kind: 'skid',
                segments: segs.map((s) => ({
                  length: s.length,
                  grade: s.grade,
                  drag: { source: 'entered', ...s.drag },
                })),
                ...(moving ? { end: { mode: 'speed', speed: endSpeed } } : {}),
              },
            ],
          });
          const r = solveCase(c).analyses[0]!;
          if (!r.ok) return; // a steep downhill corner: a typed failure, tested elsewhere
          checkModel(r.solution.speed, r.solution.model, t);
          expect(r.solution.minimum).toBe(Math.floor(r.solution.speed.low + 1e-9));
        },
      ),
      { numRuns: 150 },
    );
  });
});

describe('yaw model agrees with the solved range', () => {
  it('for random arcs with superelevation and the half-track adjustment', () => {
    fc.assert(
      fc.property(
        num(10, 60),
        num(0.02, 0.2),
        q(0.3, 1.0, 0.1),
        q(-6, 10, 2),
        q(1.4, 2.0, 0.1),
        fc.array(num(0, 1), { minLength: 6, maxLength: 6 }),
        fc.constantFrom('imperial' as const, 'metric' as const),
        (chord, ratio, drag, e, track, t, units) => {
          const M = chord * ratio;
          const c = caseOf({
            units,
            vehicle: { trackWidth: track },
            analyses: [
              {
                id: 'yaw-x',
                kind: 'yaw',
                chord: { value: chord, low: chord * 0.99, high: chord * 1.01 },
                middleOrdinate: { value: M, low: M * 0.95, high: M * 1.05 },
                drag: { source: 'entered', ...drag },
                superelevation: e,
                pathAdjustment: 'half-track',
              },
            ],
          });
          const r = solveCase(c).analyses[0]!;
          if (!r.ok) return;
          expect(r.solution.model.inputs.map((i) => i.key)).toEqual(['C', 'M', 'f', 'e', 'T']);
          checkModel(r.solution.speed, r.solution.model, t);
        },
      ),
      { numRuns: 150 },
    );
  });
});
