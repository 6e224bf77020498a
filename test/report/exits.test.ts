import { cpSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { fixture, runReport, runSolve, tempDir } from './helpers.js';

describe('report exit codes and messages', () => {
  let t: ReturnType<typeof tempDir>;
  beforeEach(() => void (t = tempDir()));
  afterEach(() => t.done());

  it('an invalid case file: exit 2, the same field messages as solve, nothing printed', async () => {
    const bad = path.join(t.dir, 'bad.json');
    writeFileSync(
      bad,
      JSON.stringify({
        format: 'skidcase-case',
        version: 1,
        id: 'bad-one',
        units: 'imperial',
        vehicle: { brakes: { mode: 'all' } },
        analyses: [
          {
            id: 's',
            kind: 'skid',
            marks: [40, -3],
            segments: [{ drag: { source: 'entered', value: 0.7 } }],
          },
        ],
      }),
    );
    const solve = await runSolve(bad, true);
    const r = await runReport(bad, { format: 'md' });
    expect(r.code).toBe(2);
    expect(solve.code).toBe(2);
    expect(r.err).toContain('analyses[0].marks[1]: length must be greater than 0');
    expect(r.err).toBe(solve.err);
    expect(r.out).toBe('');
  });

  it('a missing file: exit 2 naming it', async () => {
    const r = await runReport(path.join(t.dir, 'nope.json'));
    expect(r.code).toBe(2);
    expect(r.err).toContain('nope.json');
  });

  it('an uncomputable case: exit 3 with the reason naming the analysis, no report', async () => {
    const out = path.join(t.dir, 'r.md');
    const r = await runReport(fixture('steep-shoulder.json'), { format: 'md', out });
    expect(r.code).toBe(3);
    expect(r.err).toMatch(/analyses\[0\] \(skid-1\): cannot be computed: .*segment 2/);
    expect(r.out).toBe('');
    const solve = await runSolve(fixture('steep-shoulder.json'), true);
    expect(solve.code).toBe(3);
  });

  it('a case id is looked up in the sessions folder', async () => {
    cpSync(fixture('birchfield-yaw.json'), path.join(t.dir, 'birchfield-yaw.json'));
    const r = await runReport('birchfield-yaw', { format: 'txt', sessionsDir: t.dir });
    expect(r.code).toBe(0);
    expect(r.out).toContain('Case birchfield-yaw.');
    const none = await runReport('no-such-case', { format: 'txt', sessionsDir: t.dir });
    expect(none.code).toBe(2);
    expect(none.err).toContain('no-such-case');
  });
});
