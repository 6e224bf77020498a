import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { oracleCase } from './contract-oracle.js';
import { runSolve } from './run-solve.js';

// An outside checker's view of `skidcase solve --json`: hand-made cases (invented numbers) probing
// the edges a literal reading of docs/case-file.md implies, compared with the
// independent reader in contract-oracle.ts (written from that text, not from src/engine).

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const dir = mkdtempSync(join(tmpdir(), 'skidcase-audit-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
let n = 0;
function write(text: string): string {
  const f = join(dir, `c${n++}.json`);
  writeFileSync(f, text);
  return f;
}
const solveJson = async (c: unknown) => runSolve(write(JSON.stringify(c)), true);

const ALL = { mode: 'all' };
const entered = (value: number, low?: number, high?: number) => ({
  source: 'entered',
  value,
  ...(low !== undefined ? { low } : {}),
  ...(high !== undefined ? { high } : {}),
});
/** Only the required fields, plus what the case needs. */
function kase(
  units: 'imperial' | 'metric',
  analyses: Json[],
  vehicle: Json = { brakes: ALL },
  extra: Json = {},
) {
  return {
    format: 'skidcase-case',
    version: 1,
    id: 'audit-case',
    units,
    vehicle,
    analyses,
    ...extra,
  };
}
const skid = (segments: Json[], more: Json = {}) => ({ id: 's', kind: 'skid', segments, ...more });
const yaw = (chord: unknown, middleOrdinate: unknown, drag: Json, more: Json = {}) => ({
  id: 'y',
  kind: 'yaw',
  chord,
  middleOrdinate,
  drag,
  ...more,
});

/** Relative agreement to 1e-9, far inside the checker's 0.05%: the numbers are unrounded. */
function near(actual: number, expected: number, what: string) {
  const rel = Math.abs(actual - expected) / Math.max(Math.abs(expected), 1e-12);
  expect(rel, `${what}: ${actual} vs ${expected}`).toBeLessThan(1e-9);
}

/** The contract's JSON shape for one solved analysis. */
function checkShape(a: Json) {
  expect(typeof a.id).toBe('string');
  expect(['skid', 'yaw']).toContain(a.kind);
  for (const k of ['value', 'low', 'high']) expect(Number.isFinite(a.speed[k])).toBe(true);
  expect(Number.isInteger(a.minimum)).toBe(true);
  expect(a.steps.length).toBeGreaterThan(0);
  for (const s of a.steps) {
    expect(typeof s.name).toBe('string');
    expect(typeof s.formula).toBe('string');
    expect(typeof s.inputs).toBe('object');
    expect(Number.isFinite(s.result)).toBe(true);
    expect(typeof s.unit).toBe('string');
    expect(typeof s.why).toBe('string');
  }
  expect(Array.isArray(a.assumptions)).toBe(true);
}

/** Solves c and compares every figure with the oracle; returns the JSON for extra checks. */
async function agree(c: Json, minimum?: number[]): Promise<Json> {
  const r = await solveJson(c);
  expect(r.err, 'a valid, computable case prints nothing on stderr').toBe('');
  expect(r.code).toBe(0);
  const j = JSON.parse(r.out);
  const o = oracleCase(c);
  expect(j.id).toBe(c.id);
  expect(j.units).toEqual(o.units);
  expect(j.analyses).toHaveLength(o.analyses.length);
  j.analyses.forEach((a: Json, i: number) => {
    checkShape(a);
    expect(a.id).toBe(c.analyses[i].id);
    expect(a.kind).toBe(c.analyses[i].kind);
    const e = o.analyses[i]!;
    for (const k of ['value', 'low', 'high'] as const)
      near(a.speed[k], e.speed![k], `analyses[${i}].speed.${k}`);
    expect(a.minimum).toBe(minimum?.[i] ?? e.minimum);
    const warned = (re: RegExp) => a.warnings.filter((w: string) => re.test(w)).length;
    expect(warned(/drag factor .*above 1\.0/), `analyses[${i}] drag factor warning`).toBe(
      e.warns.drag ? 1 : 0,
    );
    expect(warned(/marks differ by more than a quarter/), `analyses[${i}] marks warning`).toBe(
      e.warns.marks ? 1 : 0,
    );
    expect(warned(/radius .* under (50 ft|15 m)/), `analyses[${i}] radius warning`).toBe(
      e.warns.radius ? 1 : 0,
    );
    if (e.mismatch !== undefined)
      expect(
        a.warnings.some((w: string) => /5%/.test(w)),
        'marks vs segments warning',
      ).toBe(e.mismatch);
  });
  const text = await runSolve(write(JSON.stringify(c)));
  expect(text.code).toBe(0);
  expect(text.out).not.toMatch(/NaN|undefined|Infinity/);
  // A low end within rounding noise of the limit is checked by hand in its own test.
  if (
    o.postedLimit &&
    Math.abs(
      o.analyses.reduce((m, a) => Math.max(m, a.speed!.low), -Infinity) - o.postedLimit.value,
    ) > 1e-6
  )
    expect(j.postedLimit).toEqual(o.postedLimit);
  else if (o.postedLimit) expect(j.postedLimit.value).toBe(o.postedLimit.value);
  else expect(j.postedLimit).toBeUndefined();
  return j;
}

const flat = (length: unknown, drag: Json = entered(0.7, 0.6, 0.8), grade?: unknown) => ({
  length,
  drag,
  ...(grade !== undefined ? { grade } : {}),
});
const fromMarks = (drag: Json = entered(0.7, 0.6, 0.8), grade?: unknown) => ({
  drag,
  ...(grade !== undefined ? { grade } : {}),
});

describe('solve --json agrees with a literal reading of docs/case-file.md', () => {
  const cases: [string, Json, number[]?][] = [
    ['Q as a plain number', kase('imperial', [skid([fromMarks()], { marks: [64] })])],
    [
      'Q as an object with only value',
      kase('imperial', [skid([fromMarks()], { marks: [{ value: 64 }] })]),
    ],
    [
      'Q with low only',
      kase('imperial', [skid([fromMarks()], { marks: [{ value: 64, low: 62 }] })]),
    ],
    [
      'Q with high only',
      kase('imperial', [skid([fromMarks()], { marks: [{ value: 64, high: 66.5 }] })]),
    ],
    [
      'Q with a note',
      kase('metric', [
        skid([fromMarks()], {
          marks: [{ value: 21.3, low: 21, high: 21.6, note: 'wheel, ±0.3 m' }],
        }),
      ]),
    ],
    [
      'marks averaged with mixed spreads',
      kase('imperial', [
        skid([fromMarks()], {
          marks: [
            58.2,
            { value: 61, low: 60 },
            { value: 63.4, high: 64 },
            { value: 60, low: 59.5, high: 60.5 },
          ],
        }),
      ]),
    ],
    [
      'marks, longest, with mixed spreads (the largest low and high are not the longest mark’s)',
      kase('imperial', [
        skid([fromMarks()], {
          distanceRule: 'longest',
          marks: [{ value: 70, low: 68, high: 70.2 }, { value: 69.5, low: 69.4, high: 73 }, 68],
        }),
      ]),
    ],
    [
      'one segment with a length and no marks',
      kase('imperial', [skid([flat({ value: 55, low: 54, high: 56 })])]),
    ],
    [
      'one segment with a length and marks within 5%',
      kase('imperial', [skid([flat(55)], { marks: [54, 56.5] })]),
    ],
    [
      'one segment with a length and marks more than 5% apart (warning)',
      kase('imperial', [skid([flat(55)], { marks: [60, 62] })]),
    ],
    [
      'three segments with grades and an end speed with a spread',
      kase('metric', [
        skid(
          [
            flat({ value: 12.4, low: 12.2, high: 12.6 }, entered(0.74, 0.7, 0.78), {
              value: -3,
              low: -3.5,
              high: -2.5,
            }),
            flat(
              6.1,
              { source: 'table', surface: 'gravel shoulder', value: 0.5, low: 0.4, high: 0.6 },
              1.5,
            ),
            flat(4.8, entered(0.35), { value: 4, low: 3 }),
          ],
          {
            marks: [23.9, 22.8],
            end: { mode: 'speed', speed: { value: 18, low: 14, high: 22 }, basis: 'momentum' },
          },
        ),
      ]),
    ],
    [
      'several segments 5% off the marks (warning)',
      kase('imperial', [skid([flat(30), flat(20)], { marks: [45, 46] })]),
    ],
    [
      'grade positive with a spread',
      kase('imperial', [skid([flat(80, entered(0.7), { value: 4, low: 3, high: 5 })])]),
    ],
    [
      'grade negative with a spread',
      kase('imperial', [skid([flat(80, entered(0.7), { value: -6, low: -7.5, high: -4 })])]),
    ],
    [
      'brakes estimated with a spread',
      kase('imperial', [skid([flat(80)])], {
        brakes: {
          mode: 'estimate',
          efficiency: { value: 0.8, low: 0.7, high: 0.9 },
          basis: 'rear drum worn',
        },
      }),
    ],
    [
      'brakes per wheel, fractional wheels, share with a spread (front brakes weaker)',
      kase('metric', [skid([flat(26, entered(0.68, 0.62, 0.74))])], {
        frontAxleShare: { value: 0.58, low: 0.55, high: 0.61 },
        brakes: {
          mode: 'wheels',
          frontLeft: 0.25,
          frontRight: { value: 0.5, low: 0.4, high: 0.6 },
          rearLeft: 1,
          rearRight: 0.75,
        },
      }),
    ],
    [
      'brakes per wheel, front stronger',
      kase('imperial', [skid([flat(90)])], {
        frontAxleShare: { value: 0.62, low: 0.6, high: 0.64 },
        brakes: { mode: 'wheels', frontLeft: 1, frontRight: 1, rearLeft: 0, rearRight: 0.5 },
      }),
    ],
    [
      'test skids at several speeds, imperial',
      kase('imperial', [
        skid(
          [
            fromMarks({
              source: 'test-skids',
              tests: [
                { speed: 25, distance: 29.5 },
                { speed: 30, distance: 41.8 },
                { speed: { value: 35 }, distance: 58.1 },
              ],
            }),
          ],
          { marks: [77] },
        ),
      ]),
    ],
    [
      'test skids at several speeds, metric',
      kase('metric', [
        skid(
          [
            fromMarks({
              source: 'test-skids',
              tests: [
                { speed: 40, distance: 8.9 },
                { speed: 50, distance: 14.2 },
              ],
            }),
          ],
          { marks: [24.5] },
        ),
      ]),
    ],
    [
      'drag sled',
      kase('imperial', [
        skid([fromMarks({ source: 'sled', weight: 68, pulls: [47, 49.5, 46] })], { marks: [70] }),
      ]),
    ],
    [
      'decelerometer',
      kase('metric', [
        skid([fromMarks({ source: 'decelerometer', readings: [0.66, 0.71, 0.69] })], {
          marks: [19.7],
        }),
      ]),
    ],
    [
      'table without band or surface',
      kase('imperial', [
        skid([fromMarks({ source: 'table', value: 0.66, low: 0.58 })], { marks: [70] }),
      ]),
    ],
    ['yaw, level', kase('imperial', [yaw(47.5, 3.6, entered(0.7, 0.62, 0.78))])],
    // The three plausibility warnings, each drawn by a figure just past its threshold.
    [
      'a drag factor whose high end is above 1.0 (warned of)',
      kase('imperial', [skid([fromMarks(entered(0.95, 0.9, 1.05))], { marks: [64] })]),
    ],
    [
      'marks whose longest is more than 1.25 times the shortest (warned of)',
      kase('imperial', [skid([fromMarks()], { marks: [60, 76] })]),
    ],
    [
      'a yaw radius under 15 m (warned of)',
      kase('metric', [yaw(10, 0.9, entered(0.7, 0.62, 0.78))]),
    ],
    [
      'yaw with spreads on chord and ordinate',
      kase('metric', [
        yaw(
          { value: 14.6, low: 14.5, high: 14.7 },
          { value: 0.95, low: 0.9, high: 1 },
          entered(0.71, 0.65),
        ),
      ]),
    ],
    [
      'yaw, superelevation positive',
      kase('imperial', [
        yaw(52, 4.1, entered(0.72, 0.66, 0.8), { superelevation: { value: 4, low: 3, high: 5 } }),
      ]),
    ],
    [
      'yaw, superelevation negative',
      kase('metric', [
        yaw(15.2, 1.1, entered(0.7, 0.6, 0.8), {
          superelevation: { value: -3, low: -4, high: -2 },
        }),
      ]),
    ],
    [
      'yaw, half-track with a spread on the track width',
      kase('imperial', [yaw(44, 3.3, entered(0.74), { pathAdjustment: 'half-track' })], {
        trackWidth: { value: 5.2, low: 5.1, high: 5.3 },
      }),
    ],
    [
      'yaw with test skids for the drag (metric)',
      kase('metric', [
        yaw(18, 1.4, {
          source: 'test-skids',
          tests: [
            { speed: 45, distance: 11.6 },
            { speed: 45, distance: 12.3 },
          ],
        }),
      ]),
    ],
    [
      'posted limit as a number',
      kase('imperial', [skid([flat(96)])], undefined, { postedLimit: 35 }),
    ],
    [
      'posted limit as an object',
      kase('metric', [skid([flat(40)])], undefined, {
        postedLimit: { value: 60, note: 'sign at the junction' },
      }),
    ],
    [
      'posted limit above the low end',
      kase('imperial', [skid([flat(40)]), yaw(40, 3, entered(0.7))], undefined, {
        postedLimit: 45,
      }),
    ],
    ['yaw only, vehicle with no fields', kase('metric', [yaw(16.4, 1.2, entered(0.75))], {})],
    [
      'yaw, metric half-track, superelevation spread across zero',
      kase(
        'metric',
        [
          yaw(17.2, { value: 1.3, low: 1.25, high: 1.35 }, entered(0.7, 0.64, 0.76), {
            pathAdjustment: 'half-track',
            superelevation: { value: 1, low: -2, high: 3 },
          }),
        ],
        { trackWidth: 1.62 },
      ),
    ],
    [
      'grade spread across zero',
      kase('metric', [skid([flat(31, entered(0.66), { value: 0.5, low: -1.5, high: 2 })])]),
    ],
    [
      'per wheel with the share at its bounds',
      kase('imperial', [skid([flat(70)])], {
        frontAxleShare: { value: 0.5, low: 0, high: 1 },
        brakes: { mode: 'wheels', frontLeft: 1, frontRight: 0.5, rearLeft: 0, rearRight: 0.25 },
      }),
    ],
    [
      'two analyses, skid and yaw, with a posted limit between their low ends',
      kase('imperial', [skid([flat(40)]), yaw(60, 4, entered(0.75))], undefined, {
        postedLimit: 30,
      }),
    ],
    ['empty analyses', kase('imperial', [])],
    ['empty analyses with a posted limit', kase('metric', [], undefined, { postedLimit: 50 })],
  ];
  it.each(cases)('%s', async (_name, c, minimum) => {
    await agree(c, minimum);
  });

  it('a low end that is exactly an integer gives that integer as the minimum', async () => {
    // Skid, by hand: S² = 30 × 84 × 0.7 = 1764 = 42², so S = 42 exactly: minimum 42, not 41.
    const c1 = kase('imperial', [skid([flat(84, entered(0.7))])]);
    await agree(c1, [42]);
    // Yaw, by hand: chord 60, ordinate 10 → R = 3600/80 + 10/2 = 50; 15 × 50 × 0.972 = 729 = 27².
    const c2 = kase('imperial', [yaw(60, 10, entered(0.972))]);
    await agree(c2, [27]);
  });

  it('exceededAtMinimum is false when the low end equals the limit, true just above', async () => {
    // S_low = 42 exactly (30 × 84 × 0.7 = 1764, by hand).
    const at = await agree(
      kase('imperial', [skid([flat(84, entered(0.7))])], undefined, { postedLimit: 42 }),
      [42],
    );
    expect(at.postedLimit).toEqual({ value: 42, exceededAtMinimum: false });
    const above = await agree(
      kase('imperial', [skid([flat(84, entered(0.7))])], undefined, {
        postedLimit: { value: 41.9 },
      }),
      [42],
    );
    expect(above.postedLimit).toEqual({ value: 41.9, exceededAtMinimum: true });
  });

  it('a low end equal to the limit stays "not above" and keeps its minimum through rounding noise', async () => {
    // By hand: 30 × 25.6 × (0.8 × 0.9 + 3/100) = 768 × 0.75 = 576 = 24²; in floating point the
    // square root comes out a hair above 24. Exactly at the limit is not above it.
    const up = kase(
      'imperial',
      [skid([flat(25.6, entered(0.8), 3)])],
      { brakes: { mode: 'estimate', efficiency: 0.9 } },
      { postedLimit: 24 },
    );
    const j = await agree(up, [24]);
    expect(j.postedLimit).toEqual({ value: 24, exceededAtMinimum: false });
    expect(j.analyses[0].minimum).toBe(24);
    // By hand: 30 × 25 × (0.84 × 0.95 − 3/100) = 750 × 0.768 = 576 = 24²; in floating point a hair
    // below 24, which a bare floor would turn into 23.
    const down = kase(
      'imperial',
      [skid([flat(25, entered(0.84), -3)])],
      { brakes: { mode: 'estimate', efficiency: 0.95 } },
      { postedLimit: 24 },
    );
    const k = await agree(down, [24]);
    expect(k.postedLimit).toEqual({ value: 24, exceededAtMinimum: false });
    const text = await runSolve(write(JSON.stringify(up)));
    expect(text.out).toContain('no analysis’s low end is above it');
  });

  it('unknown fields are warnings naming their paths, and the case still solves', async () => {
    const c = kase(
      'imperial',
      [skid([{ ...flat(60), grad: 2 }], { lable: 'typo' }), yaw(40, 3, entered(0.7), { sup: 2 })],
      { brakes: ALL, colour: 'red' },
      { postedLimt: 30 },
    );
    const j = await agree(c);
    const has = (ws: string[], p: string) => ws.some((w) => w.startsWith(`${p}: `));
    // Where the contract's shape has them: each analysis' warnings carry its own unknown fields
    // and the file's, not another analysis's.
    const [w0, w1] = [j.analyses[0].warnings, j.analyses[1].warnings];
    for (const p of [
      'postedLimt',
      'vehicle.colour',
      'analyses[0].lable',
      'analyses[0].segments[0].grad',
    ])
      expect(has(w0, p), p).toBe(true);
    for (const p of ['postedLimt', 'vehicle.colour', 'analyses[1].sup'])
      expect(has(w1, p), p).toBe(true);
    expect(has(w1, 'analyses[0].lable')).toBe(false);
    expect(has(w0, 'analyses[1].sup')).toBe(false);
    // And the whole list at the top.
    for (const p of ['postedLimt', 'vehicle.colour', 'analyses[0].lable', 'analyses[1].sup'])
      expect(has(j.warnings, p), p).toBe(true);
    // The text output names them too, once each.
    const text = await runSolve(write(JSON.stringify(c)));
    expect(text.code).toBe(0);
    expect(text.out.split('analyses[0].lable:').length - 1).toBe(1);
  });

  it('a file with only the required fields solves', async () => {
    const j = await agree(kase('metric', [skid([flat(30)])]));
    expect(j.analyses[0].speed.value).toBeCloseTo(Math.sqrt(254 * 30 * 0.7), 9);
  });
});

describe('solve refuses an invalid file with exit 2, stderr starting with the path', () => {
  const base = () => kase('imperial', [skid([fromMarks()], { marks: [60, 61, 62] })]);
  const invalid: [string, (c: Json) => void, string][] = [
    [
      'a zero mark',
      (c) => (c.analyses[0].marks[2] = 0),
      'analyses[0].marks[2]: length must be greater than 0',
    ],
    [
      'a mark low above its value',
      (c) => (c.analyses[0].marks[1] = { value: 61, low: 62 }),
      'analyses[0].marks[1].low:',
    ],
    ['a mark given as text', (c) => (c.analyses[0].marks[0] = '60'), 'analyses[0].marks[0]:'],
    [
      'a mark object without value',
      (c) => (c.analyses[0].marks[0] = { low: 59 }),
      'analyses[0].marks[0].value:',
    ],
    ['units missing', (c) => delete c.units, 'units:'],
    ['vehicle missing', (c) => delete c.vehicle, 'vehicle:'],
    ['analyses missing', (c) => delete c.analyses, 'analyses:'],
    ['a case id with capitals', (c) => (c.id = 'Audit'), 'id:'],
    [
      'efficiency above 1',
      (c) => (c.vehicle.brakes = { mode: 'estimate', efficiency: 1.2 }),
      'vehicle.brakes.efficiency:',
    ],
    [
      'a drag factor of 0',
      (c) => (c.analyses[0].segments[0].drag = entered(0)),
      'analyses[0].segments[0].drag.value:',
    ],
    [
      'a drag factor above 2',
      (c) => (c.analyses[0].segments[0].drag = entered(0.7, 0.6, 2.5)),
      'analyses[0].segments[0].drag.high:',
    ],
    ['two analyses with one id', (c) => c.analyses.push({ ...c.analyses[0] }), 'analyses[1].id:'],
    [
      'wheels without a share',
      (c) =>
        (c.vehicle.brakes = {
          mode: 'wheels',
          frontLeft: 1,
          frontRight: 1,
          rearLeft: 1,
          rearRight: 1,
        }),
      'vehicle.frontAxleShare:',
    ],
    [
      'several segments, one without length',
      (c) => (c.analyses[0].segments = [flat(30), fromMarks()]),
      'analyses[0].segments[1].length:',
    ],
    [
      'middle ordinate at half the chord',
      (c) => (c.analyses[0] = yaw(20, 10, entered(0.7))),
      'analyses[0].middleOrdinate:',
    ],
    [
      'half-track without a track width',
      (c) => (c.analyses[0] = yaw(40, 3, entered(0.7), { pathAdjustment: 'half-track' })),
      'vehicle.trackWidth:',
    ],
    [
      'an unknown drag source',
      (c) => (c.analyses[0].segments[0].drag = { source: 'guess', value: 0.7 }),
      'analyses[0].segments[0].drag.source:',
    ],
    [
      'segments as an object',
      (c) => (c.analyses[0].segments = { drag: entered(0.7) }),
      'analyses[0].segments:',
    ],
    [
      'a grade of 100%',
      (c) => (c.analyses[0].segments[0].grade = 100),
      'analyses[0].segments[0].grade:',
    ],
  ];
  it.each(invalid)('%s', async (_name, change, start) => {
    const c = base();
    change(c);
    const r = await solveJson(c);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err.startsWith(start), r.err).toBe(true);
  });
});

describe('solve exits 3 for a valid case it cannot compute', () => {
  const uncomputable: [string, Json][] = [
    // 0.6 × 1 − 0.65 < 0 at the low end (by hand).
    [
      'downhill steeper than the drag factor at the low end',
      kase('imperial', [skid([flat(50, entered(0.7, 0.6), -65)])]),
    ],
    [
      'no braking on a level road',
      kase('imperial', [skid([flat(50)])], { brakes: { mode: 'estimate', efficiency: 0 } }),
    ],
    [
      'banked away from the centre more than f',
      kase('metric', [yaw(15, 1, entered(0.3), { superelevation: -35 })]),
    ],
    [
      'half the track wider than the radius',
      kase('imperial', [yaw(10, 4.9, entered(0.7), { pathAdjustment: 'half-track' })], {
        brakes: ALL,
        trackWidth: 30,
      }),
    ],
  ];
  it.each(uncomputable)('%s', async (_name, c) => {
    expect(oracleCase(c).computable, 'the oracle agrees it cannot be computed').toBe(false);
    const r = await solveJson(c);
    expect(r.code).toBe(3);
    expect(r.out).toBe('');
    expect(r.err).toMatch(/analyses\[0\] \([sy]\): cannot be computed: \S/);
    const text = await runSolve(write(JSON.stringify(c)));
    expect(text.code).toBe(3);
    expect(text.out).not.toMatch(/NaN|undefined|Infinity/);
  });
});
