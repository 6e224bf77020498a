// Random damage to valid case files, fed to `solve`: the bulk in-process through solveCommand,
// a few dozen through the built binary (where a crash would print a stack trace and exit 1).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { execFile } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { solveCommand } from '../../src/commands/solve.js';
import { BINARY } from '../e2e/harness.js';
import { childEnv } from '../e2e/env.js';
import { SEEDS } from './seeds.js';
import { soakCount } from '../soak.js';
import { mutatedCaseArb, type MutatedCase } from './mutations.js';
import { solveProblems, type SolveRun } from './solve-checks.js';

// `npm test` runs the small counts, `npm run soak` the full ones (test/soak.ts).
const IN_PROCESS_RUNS = soakCount('SKIDCASE_FUZZ_RUNS', 200, 1000);
const BINARY_RUNS = soakCount('SKIDCASE_FUZZ_BINARY_RUNS', 10, 40);

let dir = '';
let n = 0;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'skidcase-fuzz-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const fileFor = (text: string) => {
  const f = join(dir, `case-${n++}.json`);
  writeFileSync(f, text);
  return f;
};

async function inProcess(file: string, json: boolean): Promise<SolveRun> {
  let out = '';
  let err = '';
  const code = await solveCommand(
    file,
    { json },
    { out: (s) => (out += s), err: (s) => (err += s) },
  );
  return { code, out, err };
}

function viaBinary(file: string): Promise<SolveRun> {
  return new Promise((resolve) =>
    execFile(
      process.execPath,
      [BINARY, 'solve', file, '--json'],
      { env: childEnv({ NO_COLOR: '1' }) },
      (e, out, err) =>
        resolve({ code: e ? Number((e as { code?: number }).code ?? 1) : 0, out, err }),
    ),
  );
}

const explain = (m: MutatedCase, problems: string[]) =>
  `${m.seed}: ${m.did.join('; ')}\n${problems.join('\n')}`;

describe('solve on damaged case files', () => {
  it('every seed is a valid case that solves (exit 0), so the mutations start from good files', async () => {
    for (const [name, doc] of Object.entries(SEEDS)) {
      const r = await inProcess(fileFor(JSON.stringify(doc)), true);
      expect(r.code, `${name}: ${r.err}`).toBe(0);
      expect(JSON.parse(r.out).analyses.length).toBeGreaterThan(0);
    }
  });

  it(`${IN_PROCESS_RUNS} random mutations in process, JSON and text output: exit 0, 2 or 3, no stack trace, a real path on exit 2`, async () => {
    const codes = { 0: 0, 2: 0, 3: 0 } as Record<number, number>;
    await fc.assert(
      fc.asyncProperty(mutatedCaseArb, fc.boolean(), async (m, json) => {
        const r = await inProcess(fileFor(m.text), json);
        codes[r.code] = (codes[r.code] ?? 0) + 1;
        const problems = solveProblems(m, r, json);
        if (problems.length) throw new Error(explain(m, problems));
      }),
      { numRuns: IN_PROCESS_RUNS },
    );
    // The mix must exercise every outcome, or the mutations are too tame (or too wild) to mean much.
    console.log(
      `solve fuzz, ${IN_PROCESS_RUNS} runs in process: exit 0 x${codes[0]}, exit 2 x${codes[2]}, exit 3 x${codes[3]}`,
    );
    expect(codes[2]).toBeGreaterThan(IN_PROCESS_RUNS / 4);
    expect(codes[0]).toBeGreaterThan(10);
  });

  // Found by the fuzzer: the schema's cross-field check read the chord before knowing it was there.
  it.each([
    ['chord', 'deleted'],
    ['chord', null],
    ['middleOrdinate', 'deleted'],
    ['middleOrdinate', 'x'],
  ] as const)(
    'a yaw analysis whose %s is %s is exit 2 naming that field, not a crash',
    async (field, value) => {
      const doc = structuredClone(
        SEEDS['metric banked yaw with half-track path and a table drag factor'],
      ) as {
        analyses: Record<string, unknown>[];
      };
      if (value === 'deleted') delete doc.analyses[0]![field];
      else doc.analyses[0]![field] = value;
      const r = await inProcess(fileFor(JSON.stringify(doc)), true);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(new RegExp(`^analyses\\[0\\]\\.${field}: `, 'm'));
    },
  );

  it('a downhill steeper than the drag factor is exit 3 naming the analysis, with no JSON printed', async () => {
    const doc = structuredClone(SEEDS['imperial skid, four marks, per-wheel brakes']) as {
      analyses: { segments: { grade: number }[] }[];
    };
    // drag factor 0.64 at its low end, n under 1: a 70% downhill cannot be slowed by sliding
    doc.analyses[0]!.segments[0]!.grade = -70;
    const r = await inProcess(fileFor(JSON.stringify(doc)), true);
    expect(r.code).toBe(3);
    expect(r.err).toMatch(/analyses\[0\]/);
    expect(r.out).toBe('');
  });

  it('a missing file and a folder are exit 2 naming the file, not a crash', async () => {
    const missing = await inProcess(join(dir, 'nope.json'), true);
    expect(missing.code).toBe(2);
    expect(missing.err).toContain('nope.json');
    const folder = await inProcess(dir, true);
    expect(folder.code).toBe(2);
    expect(folder.err).toContain(dir);
  });
});

describe('solve through the built binary', () => {
  it('the built binary exists and its solve reads the file named (exit 2 naming a missing file)', async () => {
    expect(existsSync(BINARY), `${BINARY} is missing: run \`npm run -s build\` first`).toBe(true);
    const r = await viaBinary('/nonexistent.json');
    expect(r.code).toBe(2);
    expect(r.err).toContain('/nonexistent.json: no such file');
  });

  it(`${BINARY_RUNS} random mutations through dist/skidcase.js: exit 0, 2 or 3, never a stack trace`, async () => {
    await fc.assert(
      fc.asyncProperty(mutatedCaseArb, async (m) => {
        const r = await viaBinary(fileFor(m.text));
        const problems = solveProblems(m, r, true);
        if (problems.length) throw new Error(explain(m, problems));
      }),
      { numRuns: BINARY_RUNS },
    );
  }, 120_000);
});
