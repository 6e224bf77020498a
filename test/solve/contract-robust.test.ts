import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runSolve } from './run-solve.js';

// Whatever JSON a file holds, `solve` answers with an exit code and a message, never a stack
// trace, and its text never shows NaN or undefined. Every value of a full case (invented numbers)
// is replaced in turn by values of every JSON type; files that are odd as files come after.

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const dir = mkdtempSync(join(tmpdir(), 'skidcase-robust-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
let n = 0;
function write(content: string | Buffer): string {
  const f = join(dir, `r${n++}.json`);
  writeFileSync(f, content);
  return f;
}

const full = (): Json => ({
  format: 'skidcase-case',
  version: 1,
  id: 'robust-1',
  created: '2026-11-02T08:00:00Z',
  units: 'imperial',
  details: { reference: 'R-7', location: 'Quarry Lane', notes: '' },
  postedLimit: { value: 40, note: 'signed' },
  vehicle: {
    label: 'van',
    frontAxleShare: { value: 0.56, low: 0.54, high: 0.58 },
    trackWidth: 5.6,
    brakes: { mode: 'wheels', frontLeft: 1, frontRight: 1, rearLeft: 0.5, rearRight: 1 },
  },
  analyses: [
    {
      id: 'skid-a',
      kind: 'skid',
      marks: [{ value: 71, low: 70, high: 72 }, 69.5],
      distanceRule: 'average',
      segments: [
        {
          length: 50,
          drag: { source: 'test-skids', tests: [{ speed: 30, distance: 40 }] },
          grade: 1,
        },
        { length: { value: 20, low: 19 }, drag: { source: 'sled', weight: 60, pulls: [33, 35] } },
      ],
      end: { mode: 'speed', speed: { value: 12, low: 10, high: 14 }, basis: 'momentum' },
    },
    {
      id: 'yaw-a',
      kind: 'yaw',
      chord: 45,
      middleOrdinate: { value: 3.6, low: 3.5, high: 3.7 },
      drag: { source: 'decelerometer', readings: [0.7, 0.73] },
      superelevation: -2,
      pathAdjustment: 'half-track',
    },
  ],
});

/** Every path to a value in the case. */
function paths(v: unknown, at: (string | number)[] = []): (string | number)[][] {
  if (typeof v !== 'object' || v === null) return [at];
  const keys = Array.isArray(v) ? v.map((_, i) => i) : Object.keys(v);
  return [at, ...keys.flatMap((k) => paths((v as Json)[k], [...at, k]))];
}
function setAt(root: Json, path: (string | number)[], value: unknown) {
  let o = root;
  for (const k of path.slice(0, -1)) o = o[k];
  o[path[path.length - 1]!] = value;
}
// Nesting is written as text: building it as a value would overflow the test's own stack.
const deep = (k: number) => '['.repeat(k) + ']'.repeat(k);
const MARK = '@@replace-me@@';
/** The case's JSON text with the value at path replaced by raw JSON text. */
function withRaw(path: (string | number)[], raw: string): string {
  const c = full();
  if (path.length === 0) return raw;
  setAt(c, path, MARK);
  return JSON.stringify(c).replace(`"${MARK}"`, () => raw);
}
const REPLACEMENTS: [string, string][] = [
  ['an array', '[1, 2]'],
  ['an empty object', '{}'],
  ['null', 'null'],
  ['text', '"x"'],
  ['a huge number', '1e308'],
  ['a number too big for a double', '1e400'],
  ['a negative number', '-1'],
  ['true', 'true'],
  ['deep nesting', deep(5000)],
];

/** What every run must show, whatever the file holds. */
async function checkRun(file: string) {
  for (const json of [false, true]) {
    const r = await runSolve(file, json);
    expect([0, 2, 3]).toContain(r.code);
    expect(r.err).not.toMatch(/\n\s+at |Error:|internal error/);
    if (!json) expect(r.out).not.toMatch(/NaN|undefined|Infinity/);
    if (r.code === 2) {
      expect(r.out).toBe('');
      // The first line is `path: message`, the path as the contract writes it.
      expect(r.err).toMatch(/^(\(file\)|[A-Za-z]+(\[\d+\]|\.[A-Za-z]+)*): \S/);
    }
    if (r.code === 0 && json) expect(() => JSON.parse(r.out)).not.toThrow();
  }
}

describe('any JSON value at any path gives a clean answer', () => {
  const all = paths(full()).filter((p) => p.length > 0);
  it.each(REPLACEMENTS)('every value replaced by %s', async (_name, raw) => {
    for (const p of all) await checkRun(write(withRaw(p, raw)));
  });
});

describe('odd files', () => {
  const ok = JSON.stringify(full());
  it('a missing file, a folder and an empty file exit 2 with a message', async () => {
    for (const f of [join(dir, 'no-such.json'), dir, write('')]) {
      const r = await runSolve(f, true);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/no such file|is a folder|not valid JSON/);
    }
  });
  it('JSON that is not an object exits 2 naming the file', async () => {
    for (const t of ['[]', 'null', '42', '"case"', '{"format": "skidcase-case"'])
      expect((await runSolve(write(t), true)).err).toMatch(/^\(file\): /);
  });
  it('a UTF-8 byte-order mark is accepted', async () => {
    const r = await runSolve(write(`\uFEFF${ok}`), true);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out).id).toBe('robust-1');
  });
  it('a UTF-16 file with its byte-order mark (little- and big-endian) is read', async () => {
    const le = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(ok, 'utf16le')]);
    const be = Buffer.from(ok, 'utf16le').swap16();
    for (const b of [le, Buffer.concat([Buffer.from([0xfe, 0xff]), be])]) {
      const r = await runSolve(write(b), true);
      expect(r.code).toBe(0);
      expect(JSON.parse(r.out).id).toBe('robust-1');
    }
  });
  it('a 5 MB file solves (a long note), and so do 200 000 unknown fields', async () => {
    const c = full();
    c.details.notes = 'n'.repeat(5 * 1024 * 1024);
    await checkRun(write(JSON.stringify(c)));
    const u = full();
    for (let i = 0; i < 200_000; i++) u[`extra${i}`] = i;
    const r = await runSolve(write(JSON.stringify(u)));
    expect(r.code).toBe(0);
    // The first 25 one by one, the rest in one line: 200 000 lines would drown the figures.
    expect(r.out).toContain('extra24: not a field of the case format');
    expect(r.out).not.toContain('extra25: not a field');
    expect(r.out).toContain(
      '199975 more fields are not of the case format (kept, but not used), the last extra199999',
    );
    expect(r.out.split('\n').length).toBeLessThan(400);
  });
  it('1000 marks (the most a list may hold) with the longest rule give the longest mark; 1001 are refused', async () => {
    const withMarks = (n: number) => {
      const c = full();
      c.analyses = [
        {
          id: 'many',
          kind: 'skid',
          distanceRule: 'longest',
          marks: Array.from({ length: n }, (_, i) => 40 + (i % 9)),
          segments: [{ drag: { source: 'entered', value: 0.75 } }],
        },
      ];
      c.vehicle.brakes = { mode: 'all' };
      return write(JSON.stringify(c));
    };
    const r = await runSolve(withMarks(1000), true);
    expect(r.code).toBe(0);
    // Longest mark 48 ft: sqrt(30 × 48 × 0.75) = sqrt(1080), by hand.
    expect(JSON.parse(r.out).analyses[0].speed.value).toBeCloseTo(Math.sqrt(1080), 9);
    const over = await runSolve(withMarks(1001), true);
    expect(over.code).toBe(2);
    expect(over.err).toMatch(/^analyses\[0\]\.marks: marks must have at most 1000 items\n/);
  });
  it('deep nesting in an unknown field or in the interview is refused (exit 2), never a crash', async () => {
    for (const key of ['extra', 'interview']) {
      const text = JSON.stringify(full()).replace(/}$/, `, "${key}": ${deep(100_000)}}`);
      const r = await runSolve(write(text), true);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/^\(file\): nested too deeply: more than 64 levels/);
      expect(r.out).toBe('');
    }
  });
});
