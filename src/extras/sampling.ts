import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { fail, ok, type AnalysisModel, type Outcome } from '../engine/types.js';
import { quantileSorted } from './percentile.js';

/** How each input is drawn within its range. */
export type SampleShape = 'uniform' | 'normal';

export interface SampleOptions {
  /** Number of draws; default 100,000. */
  n?: number;
  /** Seed of the generator, a whole number 0 to 4294967295; default 1. Same seed, same numbers. */
  seed?: number;
  /** Default 'uniform'. */
  shape?: SampleShape;
}

/** What the draws gave, with what made them (for the report to reproduce them). */
export interface SampleSummary {
  shape: SampleShape;
  seed: number;
  /** Draws made. */
  samples: number;
  /** Draws for which the model gave a speed. */
  count: number;
  /** Draws for which it could not (evaluate gave undefined). */
  skipped: number;
  p5: number;
  p50: number;
  p95: number;
  mean: number;
  min: number;
  max: number;
  /** Keys of the inputs that were drawn (those with a spread). */
  drawn: string[];
  /** One sentence on how the inputs were drawn, for the report. */
  method: string;
}

export const DEFAULT_SAMPLES = 100_000;
export const DEFAULT_SEED = 1;
export const MAX_SAMPLES = 10_000_000;

const METHOD = {
  uniform: 'each input drawn uniformly between its low and high end, independently of the others',
  normal:
    'each input drawn from a normal curve centred on its value with the range as ±2 standard deviations ' +
    '(each side of the value its own half-range / 2), truncated to the range by redrawing outside it',
};

/**
 * Draws the model's inputs within their ranges and summarises the start speeds: 5th, 50th and
 * 95th percentiles (linear interpolation, see quantileSorted), mean, smallest and largest.
 * Inputs without a spread stay at their value. The generator is xoroshiro128+ from pure-rand,
 * seeded, so the same seed and options give the same numbers.
 *
 * - uniform: x = low + u (high - low), u uniform in [0, 1).
 * - normal: z standard normal (Marsaglia's polar method) redrawn until |z| <= 2, then
 *   x = value + z (value - low) / 2 for z < 0 and value + z (high - value) / 2 otherwise, so the
 *   range is ±2 sigma and the value the median even when the range is lopsided.
 *
 * The inner loop reuses one input object and one result array (no allocation per draw).
 * Fails for a bad option or when no draw gives a speed.
 *
 * @example
 * const r = sampleSpeeds(solution.model, { n: 100_000, seed: 7 });
 * if (r.ok) r.value.p5 // e.g. 43.1 (for S = sqrt(30 d f), d 100 ft, f 0.60 to 0.80)
 */
export function sampleSpeeds(
  model: AnalysisModel,
  opts: SampleOptions = {},
): Outcome<SampleSummary> {
  const n = opts.n ?? DEFAULT_SAMPLES;
  const seed = opts.seed ?? DEFAULT_SEED;
  const shape = opts.shape ?? 'uniform';
  if (!Number.isInteger(n) || n < 1 || n > MAX_SAMPLES)
    return fail(`samples must be a whole number from 1 to ${MAX_SAMPLES}`, 'samples');
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff)
    return fail('seed must be a whole number from 0 to 4294967295', 'seed');
  if (shape !== 'uniform' && shape !== 'normal')
    return fail('shape must be uniform or normal', 'shape');

  const x: Record<string, number> = {};
  for (const inp of model.inputs) x[inp.key] = inp.value;
  const drawn = model.inputs.filter((i) => i.high > i.low);
  const k = drawn.length;
  const keys = drawn.map((i) => i.key);
  const low = Float64Array.from(drawn, (i) => i.low);
  const span = Float64Array.from(drawn, (i) => i.high - i.low);
  const value = Float64Array.from(drawn, (i) => i.value);
  const sigLow = Float64Array.from(drawn, (i) => (i.value - i.low) / 2);
  const sigHigh = Float64Array.from(drawn, (i) => (i.high - i.value) / 2);

  const rng = xoroshiro128plus(seed | 0);
  // The polar method makes normals in pairs; the second waits here for the next call.
  let spare = 0;
  let hasSpare = false;
  const normal = (): number => {
    if (hasSpare) {
      hasSpare = false;
      return spare;
    }
    let u: number, v: number, s: number;
    do {
      u = 2 * uniformFloat64(rng) - 1;
      v = 2 * uniformFloat64(rng) - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const m = Math.sqrt((-2 * Math.log(s)) / s);
    spare = v * m;
    hasSpare = true;
    return u * m;
  };
  const truncatedNormal = (): number => {
    let z: number;
    do z = normal();
    while (z < -2 || z > 2);
    return z;
  };

  const out = new Float64Array(n);
  let count = 0;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < k; j++) {
      let xj: number;
      if (shape === 'uniform') xj = low[j]! + uniformFloat64(rng) * span[j]!;
      else {
        const z = truncatedNormal();
        xj = value[j]! + z * (z < 0 ? sigLow[j]! : sigHigh[j]!);
      }
      x[keys[j]!] = xj;
    }
    const s = model.evaluate(x);
    if (s === undefined || !Number.isFinite(s)) continue;
    out[count++] = s;
    sum += s;
  }
  if (count === 0)
    return fail(`none of the ${n} draws gave a speed: the ranges cannot all hold at once`);

  const sorted = out.subarray(0, count).sort();
  return ok({
    shape,
    seed,
    samples: n,
    count,
    skipped: n - count,
    p5: quantileSorted(sorted, 0.05),
    p50: quantileSorted(sorted, 0.5),
    p95: quantileSorted(sorted, 0.95),
    mean: sum / count,
    min: sorted[0]!,
    max: sorted[count - 1]!,
    drawn: keys,
    method: METHOD[shape],
  });
}
