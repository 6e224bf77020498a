import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadCase } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { limitComparison } from '../../src/extras/limit-comparison.js';
import { SOLVE_REACTION_ORIGIN } from '../../src/format/solve-extras.js';
import { runSolve } from './run-solve.js';

// What `solve` adds per analysis (docs/case-file.md, "The extras beside the contract's fields"):
// sensitivity, time and distance at the posted limit, sampled percentiles. Invented scenario.

const dir = mkdtempSync(join(tmpdir(), 'skidcase-extras-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const doc = (extra: Record<string, unknown> = {}) => ({
  format: 'skidcase-case',
  version: 1,
  id: 'mill-lane-0917',
  units: 'imperial',
  postedLimit: 30,
  sampling: { samples: 20_000, seed: 2026 },
  vehicle: { brakes: { mode: 'estimate', efficiency: { value: 0.9, low: 0.85, high: 0.95 } } },
  analyses: [
    {
      id: 'skid-1',
      kind: 'skid',
      marks: [{ value: 75, low: 74, high: 76 }],
      segments: [{ drag: { source: 'entered', value: 0.72, low: 0.64, high: 0.8 } }],
      timeDistance: { conflictAt: 50 },
    },
    {
      id: 'yaw-1',
      kind: 'yaw',
      chord: 38,
      middleOrdinate: { value: 1.9, low: 1.85, high: 1.95 },
      drag: { source: 'entered', value: 0.7, low: 0.65, high: 0.75 },
    },
  ],
  ...extra,
});

let n = 0;
function file(d: unknown): string {
  const f = join(dir, `case-${++n}.json`);
  writeFileSync(f, JSON.stringify(d));
  return f;
}
async function json(d: unknown) {
  const r = await runSolve(file(d), true);
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.out) as {
    // eslint-disable-next-line @typescript-eslint/no-explicit-any -- the JSON output, read field by field
    analyses: Record<string, any>[];
    postedLimit: unknown;
    warnings: string[];
  };
}

describe('solve --json: the extras per analysis', () => {
  it('keeps the contract’s fields and adds sensitivity, timeDistance and distribution', async () => {
    const out = await json(doc());
    const [skid, yaw] = out.analyses;
    expect(Object.keys(skid!).slice(0, 7)).toEqual([
      'id',
      'kind',
      'speed',
      'minimum',
      'steps',
      'assumptions',
      'warnings',
    ]);
    expect(skid).toHaveProperty('sensitivity');
    expect(skid).toHaveProperty('timeDistance');
    expect(skid).toHaveProperty('distribution');
    // A yaw analysis has no time-distance comparison; its ordinate check moved beside the rows.
    expect(yaw).not.toHaveProperty('timeDistance');
    expect(yaw!.ordinateSensitivity.text).toMatch(/middle ordinate/);
    expect(out.warnings).toEqual([]); // the new fields are known: no "not a field" warning
  });

  it('sensitivity rows: speeds at each end from S = sqrt(30 d f n) (slide to stop), largest swing first', async () => {
    const rows = (await json(doc())).analyses[0]!.sensitivity as {
      key: string;
      speedAtLow: number;
      speedAtHigh: number;
      swing: number;
    }[];
    const S = (d: number, f: number, nn: number) => Math.sqrt(30 * d * f * nn);
    expect(rows.map((r) => r.key)).toEqual(['f[0]', 'n', 'd']);
    expect(rows[0]!.speedAtLow).toBeCloseTo(S(75, 0.64, 0.9), 9);
    expect(rows[0]!.speedAtHigh).toBeCloseTo(S(75, 0.8, 0.9), 9);
    expect(rows[1]!.speedAtLow).toBeCloseTo(S(75, 0.72, 0.85), 9);
    expect(rows[2]!.speedAtHigh).toBeCloseTo(S(76, 0.72, 0.9), 9);
    expect(rows[0]!.swing).toBeCloseTo(S(75, 0.8, 0.9) - S(75, 0.64, 0.9), 9);
    for (let i = 1; i < rows.length; i++)
      expect(rows[i]!.swing).toBeLessThanOrEqual(rows[i - 1]!.swing);
  });

  it('distribution: the same seed gives the same percentiles; they lie within low..high', async () => {
    const a = (await json(doc())).analyses;
    const b = (await json(doc())).analyses;
    for (const [i, s] of a.entries()) {
      const d = s.distribution;
      expect(d).toEqual(b[i]!.distribution);
      expect(d).toMatchObject({ samples: 20_000, seed: 2026, shape: 'uniform' });
      expect(d.p5).toBeGreaterThanOrEqual(s.speed.low);
      expect(d.p5).toBeLessThan(d.p50);
      expect(d.p50).toBeLessThan(d.p95);
      expect(d.p95).toBeLessThanOrEqual(s.speed.high);
    }
    const other = (await json(doc({ sampling: { samples: 20_000, seed: 7, shape: 'normal' } })))
      .analyses[0]!.distribution;
    expect(other).toMatchObject({ seed: 7, shape: 'normal' });
    expect(other.p5).not.toBe(a[0]!.distribution.p5);
  });

  it('no sampling field: no distribution', async () => {
    const d = doc();
    delete (d as Record<string, unknown>).sampling;
    expect((await json(d)).analyses[0]).not.toHaveProperty('distribution');
  });

  it('timeDistance equals the limit comparison at 1.5 s, and says solve reads no preferences', async () => {
    const out = await json(doc());
    const loaded = loadCase(doc());
    if (!loaded.ok) throw new Error('fixture invalid');
    const r = solveCase(loaded.case).analyses[0]!;
    if (!r.ok) throw new Error(r.reason);
    const expected = limitComparison(loaded.case, r.solution, {
      reactionTime: 1.5,
      reactionOrigin: SOLVE_REACTION_ORIGIN,
      conflictAt: 50,
    });
    if (!expected.ok) throw new Error(expected.reason);
    const td = out.analyses[0]!.timeDistance;
    expect(td).toEqual(JSON.parse(JSON.stringify(expected.value)));
    expect(td.reactionTime).toBe(1.5);
    expect(td.reactionSource).toMatch(/solve does not read the preferences/);
    // Independent figures at the limit (docs/physics.md): reaction distance 1.466 × S × t (5280/3600
    // exactly), braking distance S² / (30 (f n + G)).
    expect(td.atLimit.reactionDistance).toBeCloseTo((5280 / 3600) * 30 * 1.5, 9);
    expect(td.atLimit.brakingDistance.value).toBeCloseTo(30 ** 2 / (30 * 0.72 * 0.9), 9);
    expect(td.conflict.at).toBe(50);
  });

  it('the analysis’s own reaction time wins', async () => {
    const d = doc();
    (d.analyses[0] as Record<string, unknown>).timeDistance = { reactionTime: 2.5 };
    const td = (await json(d)).analyses[0]!.timeDistance;
    expect(td.reactionTime).toBe(2.5);
    expect(td.reactionSource).toMatch(/set in the case file/);
    expect(td.atLimit.reactionDistance).toBeCloseTo((5280 / 3600) * 30 * 2.5, 9);
    expect(td).not.toHaveProperty('conflict');
  });

  it('a conflict point without a posted limit: the part says why, the solve still succeeds', async () => {
    const d = doc();
    delete (d as Record<string, unknown>).postedLimit;
    const out = await json(d);
    expect(out.analyses[0]!.timeDistance).toEqual({
      error: 'the case has no posted limit',
      path: 'postedLimit',
    });
    expect(out).not.toHaveProperty('postedLimit');
  });

  it('the text chain shows the same parts under each result', async () => {
    const r = await runSolve(file(doc()), false);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Sensitivity \(each input at the ends of its range/);
    expect(r.out).toMatch(/Time and distance at the posted limit \(30\.0 mph\):/);
    expect(r.out).toMatch(/the conflict point \(50\.0 ft from the start of the marks\)/);
    expect(r.out).toMatch(/Sampled speeds \(20000 draws, uniform, seed 2026\)/);
    expect(r.out).not.toMatch(/NaN|undefined/);
  });
});
