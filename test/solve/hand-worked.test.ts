import { describe, expect, it } from 'vitest';
import { fixture, runSolve } from './run-solve.js';

// Hand-worked cases with invented numbers. Each expected figure is computed by hand in the
// comment from the formulas in docs/case-file.md (trade constants 30/254 and 15/127), not read
// from the program's output.

interface JsonAnalysis {
  id: string;
  kind: string;
  speed: { value: number; low: number; high: number };
  minimum: number;
  steps: {
    name: string;
    formula: string;
    inputs: object;
    result: number;
    unit: string;
    why: string;
    substituted: string;
  }[];
  assumptions: string[];
  warnings: string[];
  boundaries?: { at: number; speed: { value: number } }[];
  radius?: { value: number; low: number; high: number };
}
interface JsonOut {
  id: string;
  units: { length: string; speed: string };
  analyses: JsonAnalysis[];
  postedLimit?: { value: number; exceededAtMinimum: boolean };
}

async function solveJson(name: string): Promise<JsonOut> {
  const r = await runSolve(fixture(name), true);
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.out) as JsonOut;
}

describe('imperial skid, two marks averaged, stop (hand-worked)', () => {
  // d = (70 + 74)/2 = 72 ft. S = sqrt(30 × 72 × 0.75) = sqrt(1620) = 40.249;
  // low sqrt(30 × 72 × 0.70) = sqrt(1512) = 38.884; high sqrt(1728) = 41.569. At least 38 mph,
  // above the posted 35 at the low end.
  it('gives the speed, range, minimum and posted-limit comparison in the contract’s JSON shape', async () => {
    const j = await solveJson('skid-imperial-two-marks.json');
    expect(j.id).toBe('maple-lane-demo');
    expect(j.units).toEqual({ length: 'ft', speed: 'mph' });
    expect(j.analyses).toHaveLength(1);
    const a = j.analyses[0]!;
    expect(a.id).toBe('skid-1');
    expect(a.kind).toBe('skid');
    expect(a.speed.value).toBeCloseTo(40.249, 3);
    expect(a.speed.low).toBeCloseTo(38.884, 3);
    expect(a.speed.high).toBeCloseTo(41.569, 3);
    expect(a.minimum).toBe(38);
    // numbers are unrounded except the minimum
    expect(a.speed.value).toBeCloseTo(Math.sqrt(1620), 12);
    expect(j.postedLimit).toEqual({ value: 35, exceededAtMinimum: true });
    for (const s of a.steps)
      for (const k of ['name', 'formula', 'inputs', 'result', 'unit', 'why', 'substituted'])
        expect(s).toHaveProperty(k);
    expect(a.assumptions.length).toBeGreaterThan(0);
    // Drag 0.70-0.80, marks 70 and 74 ft (74/70 = 1.06, under 1.25), all brakes: nothing to warn of.
    expect(a.warnings).toEqual([]);
  });
  it('prints the chain with the numbers substituted and "at least"', async () => {
    const r = await runSolve(fixture('skid-imperial-two-marks.json'));
    expect(r.code).toBe(0);
    expect(r.out).toContain('d = (70.0 + 74.0) / 2 = 72.0 ft');
    expect(r.out).toContain('S = sqrt(30 × 72.0 ft × 0.75) = 40.2 mph');
    expect(r.out).toContain('at least 38 mph: 40.2 mph (38.9 to 41.6)');
    expect(r.out).toContain('Posted limit 35.0 mph: the low end of skid-1 (38.9 mph) is above it.');
    expect(r.out).toContain('This tool does not state fault.');
    expect(r.out).not.toMatch(/NaN|Infinity|undefined/);
  });
});

describe('metric skid over two surfaces, one rear brake out, still moving at the end (hand-worked)', () => {
  // n = 0.6/2 × (1 + 1) + 0.4/2 × (0 + 1) = 0.6 + 0.2 = 0.8.
  // Gravel: f n + G = 0.5 × 0.8 − 0.04 = 0.36; S² at its start = 30² + 254 × 10 × 0.36 = 900 + 914.4
  //   = 1814.4 → 42.596 km/h.
  // Asphalt: 0.7 × 0.8 = 0.56; S² = 1814.4 + 254 × 20 × 0.56 = 1814.4 + 2844.8 = 4659.2 → 68.258.
  // Low (gravel f 0.45 → 0.32): 900 + 812.8 + 2844.8 = 4557.6 → 67.510; high (0.55 → 0.40):
  //   900 + 1016 + 2844.8 = 4760.8 → 68.999. At least 67 km/h; above the posted 60.
  it('works back from the end speed through each boundary', async () => {
    const j = await solveJson('skid-metric-two-surfaces.json');
    expect(j.units).toEqual({ length: 'm', speed: 'km/h' });
    const a = j.analyses[0]!;
    expect(a.speed.value).toBeCloseTo(68.258, 3);
    expect(a.speed.low).toBeCloseTo(67.51, 3);
    expect(a.speed.high).toBeCloseTo(68.999, 3);
    expect(a.minimum).toBe(67);
    expect(a.boundaries!.map((b) => b.at)).toEqual([0, 20, 30]);
    expect(a.boundaries![1]!.speed.value).toBeCloseTo(42.596, 3);
    expect(a.boundaries![2]!.speed.value).toBe(30);
    expect(j.postedLimit).toEqual({ value: 60, exceededAtMinimum: true });
    // Both front brakes work: the forward weight shift under braking makes the static n of 0.8 an
    // understatement (the safe side for a minimum), so no overstatement warning here.
    expect(a.warnings).toEqual([]);
  });
});

describe('imperial yaw with the half-track adjustment (hand-worked)', () => {
  // R = 60²/(8 × 3) + 3/2 = 150 + 1.5 = 151.5 ft; path 151.5 − 6/2 = 148.5 ft;
  // S = sqrt(15 × 0.6 × 148.5) = sqrt(1336.5) = 36.558 mph.
  // Low (M 3.1): 3600/24.8 + 1.55 − 3 = 143.711 → sqrt(9 × 143.711) = 35.964.
  // High (M 2.9): 3600/23.2 + 1.45 − 3 = 153.622 → sqrt(9 × 153.622) = 37.183. At least 35 mph.
  it('computes radius, path radius and critical speed with its range', async () => {
    const j = await solveJson('yaw-imperial-half-track.json');
    const a = j.analyses[0]!;
    expect(a.kind).toBe('yaw');
    expect(a.speed.value).toBeCloseTo(36.558, 3);
    expect(a.speed.low).toBeCloseTo(35.964, 3);
    expect(a.speed.high).toBeCloseTo(37.183, 3);
    expect(a.minimum).toBe(35);
    expect(a.radius!.value).toBeCloseTo(148.5, 9);
    expect(j.postedLimit).toBeUndefined();
    expect(a.warnings.join(' ')).toMatch(/1 in too large/);
    expect(a.assumptions.join(' ')).toMatch(/not reduced by braking efficiency/);
  });
});

describe('metric yaw on a banked curve, drag from a decelerometer (hand-worked)', () => {
  // R = 30²/(8 × 1) + 1/2 = 112.5 + 0.5 = 113 m; f = (0.68 + 0.72)/2 = 0.70, e = 0.05.
  // S = sqrt(127 × 113 × 0.75/(1 − 0.035)) = sqrt(14351 × 0.777202) = sqrt(11153.63) = 105.611.
  // Low (f 0.68): 0.73/0.966 = 0.755694 → sqrt(10844.96) = 104.139; high (f 0.72): 0.77/0.964
  // = 0.798755 → sqrt(11462.93) = 107.065. At least 104 km/h, not above the posted 110.
  it('applies the superelevation through (f + e)/(1 − f e)', async () => {
    const j = await solveJson('yaw-metric-banked.json');
    const a = j.analyses[0]!;
    expect(a.speed.value).toBeCloseTo(105.611, 2);
    expect(a.speed.low).toBeCloseTo(104.139, 2);
    expect(a.speed.high).toBeCloseTo(107.065, 2);
    expect(a.minimum).toBe(104);
    expect(j.postedLimit).toEqual({ value: 110, exceededAtMinimum: false });
  });
});

describe('uncomputable but valid cases: exit 3 naming the analysis', () => {
  it('a downhill steeper than the drag factor can hold', async () => {
    const r = await runSolve(fixture('steep-downhill.json'), true);
    expect(r.code).toBe(3);
    expect(r.out).toBe('');
    expect(r.err).toContain(
      'analyses[0] (skid-1): cannot be computed: segment 2 (ice): a 30% downhill grade is steeper than the drag factor 0.25 × n 1.00 can hold; the vehicle could not slow by sliding there',
    );
  });
  it('no braking on level ground (n = 0)', async () => {
    const r = await runSolve(fixture('no-braking-level.json'));
    expect(r.code).toBe(3);
    expect(r.err).toMatch(
      /analyses\[0\] \(skid-1\): cannot be computed: segment 1: the drag factor 0\.70 × n 0\.00 gives no drag/,
    );
    expect(r.out).not.toMatch(/NaN/);
  });
});
