import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { fixture } from './run-solve.js';

// Through the built program, as a script would call it (`npm test` builds dist/ first).
const run = promisify(execFile);
const BIN = 'dist/skidcase.js';

async function solve(args: string[]) {
  try {
    const r = await run(process.execPath, [BIN, 'solve', ...args]);
    return { code: 0, out: r.stdout, err: r.stderr };
  } catch (e) {
    const x = e as { code: number; stdout: string; stderr: string };
    return { code: x.code, out: x.stdout, err: x.stderr };
  }
}

describe('skidcase solve (built binary)', () => {
  it('is built', () => {
    expect(existsSync(BIN), 'run `npm run build` first').toBe(true);
  });
  it('prints the contract JSON and exits 0', async () => {
    // sqrt(30 × 72 × 0.75) = sqrt(1620) = 40.249 mph (hand-worked in hand-worked.test.ts)
    const r = await solve([fixture('skid-imperial-two-marks.json'), '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.analyses[0].speed.value).toBeCloseTo(40.249, 3);
    expect(j.analyses[0].minimum).toBe(38);
  });
  it('exits 2 for a missing file and 3 for an uncomputable case', async () => {
    const missing = await solve(['no-such-file.json']);
    expect(missing.code).toBe(2);
    expect(missing.err).toContain('no-such-file.json: no such file');
    const steep = await solve([fixture('steep-downhill.json')]);
    expect(steep.code).toBe(3);
    expect(steep.err).toContain('analyses[0] (skid-1): cannot be computed: segment 2 (ice)');
  });
});
