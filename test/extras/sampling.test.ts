import { erf, quantileSeq } from 'mathjs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { quantileSorted } from '../../src/extras/percentile.js';
import { sampleSpeeds } from '../../src/extras/sampling.js';
import type { AnalysisModel } from '../../src/engine/types.js';
import { caseOf, slideToStopModel, solved } from './helpers.js';

const must = <T>(r: { ok: true; value: T } | { ok: false; reason: string }): T => {
  if (!r.ok) throw new Error(r.reason);
  return r.value;
};

/** A model that returns its one input: the sample percentiles are then the input's own. */
const identity = (value: number, low: number, high: number): AnalysisModel => ({
  inputs: [{ key: 'x', label: 'x', unit: '', value, low, high }],
  evaluate: (x) => x.x ?? value,
});

describe('quantileSorted against mathjs quantileSeq (outside reference, default method)', () => {
  it('agrees on random samples at the 5th, 50th and 95th percentiles', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 1, maxLength: 60 }),
        (xs) => {
          const sorted = Float64Array.from(xs).sort();
          for (const p of [0.05, 0.5, 0.95])
            expect(quantileSorted(sorted, p)).toBeCloseTo(quantileSeq(xs, p) as number, 9);
        },
      ),
    );
  });
});

describe('sampleSpeeds', () => {
  const model = slideToStopModel([100, 98, 102], [0.7, 0.6, 0.8], [1, 0.95, 1]);

  it('is reproducible: the same seed gives the same numbers, another seed others', () => {
    const a = must(sampleSpeeds(model, { n: 20_000, seed: 42 }));
    const b = must(sampleSpeeds(model, { n: 20_000, seed: 42 }));
    const c = must(sampleSpeeds(model, { n: 20_000, seed: 43 }));
    expect(b).toEqual(a);
    expect(c.p50).not.toBe(a.p50);
    const an = must(sampleSpeeds(model, { n: 20_000, seed: 42, shape: 'normal' }));
    expect(must(sampleSpeeds(model, { n: 20_000, seed: 42, shape: 'normal' }))).toEqual(an);
  });

  it.each(['uniform', 'normal'] as const)(
    '%s: percentiles lie within the low and high speeds (the formula is monotone)',
    (shape) => {
      // Low and high ends by hand: sqrt(30 × 98 × 0.6 × 0.95) and sqrt(30 × 102 × 0.8 × 1).
      const low = Math.sqrt(30 * 98 * 0.6 * 0.95);
      const high = Math.sqrt(30 * 102 * 0.8);
      const r = must(sampleSpeeds(model, { n: 50_000, seed: 9, shape }));
      expect(r.count).toBe(50_000);
      expect(r.skipped).toBe(0);
      for (const v of [r.min, r.p5, r.p50, r.p95, r.max]) {
        expect(v).toBeGreaterThanOrEqual(low - 1e-9);
        expect(v).toBeLessThanOrEqual(high + 1e-9);
      }
      expect(r.p5).toBeLessThan(r.p50);
      expect(r.p50).toBeLessThan(r.p95);
      expect(r.drawn).toEqual(['d', 'f[0]', 'n']);
    },
  );

  it('uniform: the percentiles of a uniform input are low + p × span (exact quantiles of the uniform law)', () => {
    const r = must(sampleSpeeds(identity(5, 2, 10), { n: 100_000, seed: 1 }));
    // Standard error of a sample quantile ~ sqrt(p(1-p)/n) × span: 0.0055 at p = 0.05; 0.03 is > 5 SE.
    expect(r.p5).toBeCloseTo(2 + 0.05 * 8, 1);
    expect(Math.abs(r.p50 - 6)).toBeLessThan(0.05);
    expect(Math.abs(r.p95 - (2 + 0.95 * 8))).toBeLessThan(0.03);
    expect(Math.abs(r.mean - 6)).toBeLessThan(0.03);
  });

  it('normal: range = ±2 sigma truncated; percentiles match the truncated normal law (Φ from mathjs erf)', () => {
    // value 10, range 8 to 12: sigma 1. Quantile q of N(0,1) truncated to [-2, 2]:
    // Φ(z) = Φ(-2) + q (Φ(2) - Φ(-2)), solved here by bisection with Φ(z) = (1 + erf(z/√2)) / 2.
    const Phi = (z: number) => (1 + erf(z / Math.SQRT2)) / 2;
    const zOf = (q: number) => {
      const target = Phi(-2) + q * (Phi(2) - Phi(-2));
      let a = -2,
        b = 2;
      for (let i = 0; i < 60; i++) {
        const m = (a + b) / 2;
        if (Phi(m) < target) a = m;
        else b = m;
      }
      return (a + b) / 2;
    };
    const r = must(sampleSpeeds(identity(10, 8, 12), { n: 100_000, seed: 5, shape: 'normal' }));
    expect(r.min).toBeGreaterThanOrEqual(8);
    expect(r.max).toBeLessThanOrEqual(12);
    expect(Math.abs(r.p5 - (10 + zOf(0.05)))).toBeLessThan(0.03); // about 8.47
    expect(Math.abs(r.p50 - 10)).toBeLessThan(0.02);
    expect(Math.abs(r.p95 - (10 + zOf(0.95)))).toBeLessThan(0.03); // about 11.53
  });

  it('normal with a lopsided range keeps the value as the median, each side its own sigma', () => {
    const r = must(sampleSpeeds(identity(10, 9, 14), { n: 100_000, seed: 11, shape: 'normal' }));
    expect(Math.abs(r.p50 - 10)).toBeLessThan(0.02);
    expect(r.min).toBeGreaterThanOrEqual(9);
    expect(r.max).toBeLessThanOrEqual(14);
  });

  it('counts draws the model cannot compute as skipped', () => {
    const half: AnalysisModel = {
      ...identity(0.5, 0, 1),
      evaluate: (x) => ((x.x ?? 0.5) < 0.25 ? undefined : x.x),
    };
    const r = must(sampleSpeeds(half, { n: 40_000, seed: 3 }));
    expect(r.count + r.skipped).toBe(40_000);
    expect(Math.abs(r.skipped / 40_000 - 0.25)).toBeLessThan(0.01);
    expect(r.min).toBeGreaterThanOrEqual(0.25);
  });

  it('fails rather than inventing numbers', () => {
    const never: AnalysisModel = { ...identity(1, 0, 2), evaluate: () => undefined };
    expect(sampleSpeeds(never, { n: 100 }).ok).toBe(false);
    expect(sampleSpeeds(model, { n: 0 })).toMatchObject({ ok: false, path: 'samples' });
    expect(sampleSpeeds(model, { seed: -1 })).toMatchObject({ ok: false, path: 'seed' });
    expect(sampleSpeeds(model, { seed: 1.5 })).toMatchObject({ ok: false, path: 'seed' });
  });

  it('reuses one input object for every draw (no allocation per draw)', () => {
    const seen = new Set<object>();
    const spy: AnalysisModel = { ...model, evaluate: (x) => (seen.add(x), model.evaluate(x)) };
    must(sampleSpeeds(spy, { n: 1000, seed: 2 }));
    expect(seen.size).toBe(1);
  });

  it('through the engine: a two-segment slide, percentiles inside the solution range', () => {
    const c = caseOf({
      analyses: [
        {
          id: 'skid-a',
          kind: 'skid',
          segments: [
            {
              length: { value: 55, low: 54, high: 56 },
              drag: { source: 'entered', value: 0.72, low: 0.66, high: 0.78 },
            },
            {
              length: { value: 18, low: 17.5, high: 18.5 },
              drag: { source: 'entered', value: 0.45, low: 0.4, high: 0.5 },
              grade: { value: -2, low: -3, high: -1 },
            },
          ],
        },
      ],
    });
    const s = solved(c);
    for (const shape of ['uniform', 'normal'] as const) {
      const r = must(sampleSpeeds(s.model, { n: 20_000, seed: 8, shape }));
      expect(r.p5).toBeGreaterThanOrEqual(s.speed.low);
      expect(r.p95).toBeLessThanOrEqual(s.speed.high);
      expect(r.p50).toBeGreaterThan(r.p5);
    }
  });
});
