import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { oracleCase } from './contract-oracle.js';
import { runSolve } from './run-solve.js';

// `solve --json` on the case fields testGrade and the distance rules shortest and spread: figures
// worked by hand from docs/case-file.md (invented numbers), and the independent reader
// contract-oracle.ts.

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const dir = mkdtempSync(join(tmpdir(), 'skidcase-fields-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
let count = 0;
async function solve(c: unknown) {
  const f = join(dir, `c${count++}.json`);
  writeFileSync(f, JSON.stringify(c));
  return runSolve(f, true);
}
async function solved(c: Json): Promise<Json> {
  const r = await solve(c);
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
  const j = JSON.parse(r.out);
  const o = oracleCase(c);
  j.analyses.forEach((a: Json, i: number) => {
    for (const k of ['value', 'low', 'high'])
      expect(a.speed[k]).toBeCloseTo(o.analyses[i]!.speed![k as 'value'], 9);
  });
  return j;
}
const kase = (analyses: Json[]) => ({
  format: 'skidcase-case',
  version: 1,
  id: 'fields-case',
  units: 'imperial',
  vehicle: { brakes: { mode: 'all' } },
  analyses,
});
const tests = [
  { speed: 30, distance: 40 },
  { speed: 32, distance: 48 },
];
const marks = [{ value: 60, low: 59, high: 61 }, { value: 66, low: 65.5, high: 67 }, 63];

describe('solve --json on testGrade and the new distance rules', () => {
  it('test skids on a 1 to 3% grade on a level slide: the tests’ grade is taken off', async () => {
    // f = 0.730556 − 0.02 = 0.710556 (low 0.711111 − 0.03, high 0.75 − 0.01); d = 80 ft, level:
    // S = sqrt(30 × 80 × 0.710556) = 41.296; low sqrt(2400 × 0.681111) = 40.431;
    // high sqrt(2400 × 0.74) = 42.143 (by hand).
    const drag = { source: 'test-skids', tests, testGrade: { value: 2, low: 1, high: 3 } };
    const j = await solved(kase([{ id: 's', kind: 'skid', marks: [80], segments: [{ drag }] }]));
    const a = j.analyses[0];
    expect(a.speed.value).toBeCloseTo(41.296, 3);
    expect(a.speed.low).toBeCloseTo(40.431, 3);
    expect(a.speed.high).toBeCloseTo(42.143, 3);
    expect(a.minimum).toBe(40);
    const step = a.steps.find((s: Json) => s.name === 'Drag factor from test skids');
    expect(step.why).toMatch(/grade was taken off/);
  });

  it('shortest: the smallest of each end', async () => {
    // d = 60 (59 to 61), f = 0.7: S = sqrt(1260) = 35.496; low sqrt(1239) = 35.199;
    // high sqrt(1281) = 35.791 (by hand).
    const drag = { source: 'entered', value: 0.7 };
    const j = await solved(
      kase([{ id: 's', kind: 'skid', marks, distanceRule: 'shortest', segments: [{ drag }] }]),
    );
    expect(j.analyses[0].speed.value).toBeCloseTo(35.496, 3);
    expect(j.analyses[0].speed.low).toBeCloseTo(35.199, 3);
    expect(j.analyses[0].speed.high).toBeCloseTo(35.791, 3);
    expect(j.analyses[0].steps[0].why).toMatch(/cautious choice for a minimum/);
  });

  it('spread: the mean as value, smallest low to largest high', async () => {
    // d = 63 (59 to 67), f = 0.7: S = sqrt(1323) = 36.373; low sqrt(1239) = 35.199;
    // high sqrt(1407) = 37.510 (by hand).
    const drag = { source: 'entered', value: 0.7 };
    const j = await solved(
      kase([{ id: 's', kind: 'skid', marks, distanceRule: 'spread', segments: [{ drag }] }]),
    );
    expect(j.analyses[0].speed.value).toBeCloseTo(36.373, 3);
    expect(j.analyses[0].speed.low).toBeCloseTo(35.199, 3);
    expect(j.analyses[0].speed.high).toBeCloseTo(37.51, 3);
    expect(j.analyses[0].minimum).toBe(35);
  });

  it('an unknown rule is refused with a message naming all four', async () => {
    const drag = { source: 'entered', value: 0.7 };
    const r = await solve(
      kase([{ id: 's', kind: 'skid', marks, distanceRule: 'median', segments: [{ drag }] }]),
    );
    expect(r.code).toBe(2);
    expect(r.err).toMatch(
      /^analyses\[0\]\.distanceRule: distanceRule must be average, longest, shortest or spread/,
    );
  });

  it('a test grade out of bounds is refused naming its path', async () => {
    const drag = { source: 'test-skids', tests, testGrade: 120 };
    const r = await solve(kase([{ id: 's', kind: 'skid', marks: [80], segments: [{ drag }] }]));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^analyses\[0\]\.segments\[0\]\.drag\.testGrade: test grade must be/);
  });
});

describe('files written before testGrade solve to the same figures', () => {
  const folders = ['../fixtures/cases/', '../../sessions/'].map((p) =>
    fileURLToPath(new URL(p, import.meta.url)),
  );
  const files = folders.flatMap((f) =>
    readdirSync(f)
      .filter((n) => n.endsWith('.json'))
      .map((n) => join(f, n)),
  );
  it.each(files)('%s: as level tests, and as the contract reads', async (file) => {
    const c = JSON.parse(readFileSync(file, 'utf8'));
    const before = await solve(c);
    const level = structuredClone(c);
    const drags: Json[] = level.analyses.flatMap((a: Json) =>
      a.kind === 'skid' ? a.segments.map((s: Json) => s.drag) : a.kind === 'yaw' ? [a.drag] : [],
    );
    for (const d of drags) if (d.source === 'test-skids') d.testGrade = 0;
    const after = await solve(level);
    expect(after.code).toBe(before.code);
    if (before.code !== 0) return;
    const [b, a] = [JSON.parse(before.out), JSON.parse(after.out)];
    expect(a.analyses.map((x: Json) => x.speed)).toEqual(b.analyses.map((x: Json) => x.speed));
    // The contract oracle reads skids that end at rest or at a speed, and yaws by chord or offsets;
    // chains, airborne analyses and surveyed points have their own checks (chain, airborne, points tests).
    const oracleReads = c.analyses.every(
      (x: Json) =>
        (x.kind === 'skid' && x.end?.mode !== 'analysis') || (x.kind === 'yaw' && !x.points),
    );
    if (!oracleReads) return;
    const o = oracleCase(c);
    b.analyses.forEach((x: Json, i: number) => {
      if (o.analyses[i]?.speed) expect(x.speed.low).toBeCloseTo(o.analyses[i]!.speed!.low, 9);
    });
  });
});
