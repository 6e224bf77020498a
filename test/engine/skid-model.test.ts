import { describe, expect, it } from 'vitest';
import { solveCase } from '../../src/engine/index.js';
import { caseOf } from './helpers.js';

// The skid model that sensitivity and sampling call in loops, against the several-surface
// formula (docs/physics.md) written out here: S² = S_end² + 30 Σ d_i (f_i n + G_i/100) (mph, ft). Invented scenario.
const S = (segs: [number, number, number][], n: number, end = 0) =>
  Math.sqrt(end * end + 30 * segs.reduce((a, [d, f, G]) => a + d * (f * n + G / 100), 0));

const model = () => {
  const c = caseOf({
    vehicle: { brakes: { mode: 'estimate', efficiency: { value: 0.9, low: 0.8, high: 1 } } },
    analyses: [
      {
        id: 's',
        kind: 'skid',
        segments: [
          { length: 40, drag: { source: 'entered', value: 0.7, low: 0.6, high: 0.8 }, grade: -2 },
          { length: 20, drag: { source: 'entered', value: 0.5 } },
          { length: 10, drag: { source: 'entered', value: 0.3 }, grade: 1 },
        ],
        end: { mode: 'speed', speed: { value: 12, low: 10, high: 14 } },
      },
    ],
  });
  const r = solveCase(c).analyses[0]!;
  if (!r.ok) throw new Error(r.reason);
  return r.solution.model;
};

describe('the skid model of a three-surface slide', () => {
  it('has the documented keys, a grade key only where a grade was given', () => {
    expect(model().inputs.map((i) => i.key)).toEqual([
      'd[0]',
      'f[0]',
      'G[0]',
      'd[1]',
      'f[1]',
      'd[2]',
      'f[2]',
      'G[2]',
      'n',
      'Send',
    ]);
  });

  it('evaluates any mix of given and missing keys by the formula', () => {
    const m = model();
    const base: [number, number, number][] = [
      [40, 0.7, -2],
      [20, 0.5, 0],
      [10, 0.3, 1],
    ];
    expect(m.evaluate({})).toBeCloseTo(S(base, 0.9, 12), 12);
    expect(m.evaluate({ 'f[0]': 0.6, n: 0.8, Send: 10 })).toBeCloseTo(
      S(
        [
          [40, 0.6, -2],
          [20, 0.5, 0],
          [10, 0.3, 1],
        ],
        0.8,
        10,
      ),
      12,
    );
    // A grade on the level middle segment still counts when a caller sets it.
    expect(m.evaluate({ 'G[1]': 3, 'd[2]': 12 })).toBeCloseTo(
      S(
        [
          [40, 0.7, -2],
          [20, 0.5, 3],
          [12, 0.3, 1],
        ],
        0.9,
        12,
      ),
      12,
    );
    // The same object evaluated again gives the same figure (nothing kept between calls).
    const x = { 'd[1]': 25 };
    expect(m.evaluate(x)).toBe(m.evaluate(x));
  });

  it('a segment that cannot slow the vehicle gives undefined, not NaN', () => {
    // 0.3 × 0.9 + (−40)/100 < 0 on the last segment.
    expect(model().evaluate({ 'G[2]': -40 })).toBeUndefined();
  });
});
