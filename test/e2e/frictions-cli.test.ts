// Frictions met on the command line (a word that is no command, solve's limit and range notes),
// run through the built binary. Invented cases.
import { afterAll, describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { BINARY } from './harness.js';
import { childEnv, makeWorkspace } from './env.js';

const ws = makeWorkspace();
afterAll(() => ws.cleanup());

/** Runs the binary without a terminal and collects what it printed. */
function run(args: string[]) {
  return new Promise<{ code: number | null; out: string; err: string }>((resolve) => {
    const p = spawn(process.execPath, [BINARY, ...args], {
      cwd: ws.root,
      env: childEnv(ws.env),
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let out = '';
    let err = '';
    p.stdout!.on('data', (d) => (out += d));
    p.stderr!.on('data', (d) => (err += d));
    const timer = setTimeout(() => p.kill('SIGKILL'), 15_000);
    p.on('close', (code) => {
      clearTimeout(timer);
      resolve({ code, out, err });
    });
  });
}

/** A one-surface slide to rest, posted 45 mph; `grade` in percent, `drag` as the file holds it. */
function slideCase(name: string, grade: number, drag: unknown = { source: 'entered', value: 0.7 }) {
  const file = join(ws.root, name);
  writeFileSync(
    file,
    JSON.stringify({
      format: 'skidcase-case',
      version: 1,
      id: name.replace(/\.json$/, ''),
      units: 'imperial',
      postedLimit: 45,
      vehicle: { brakes: { mode: 'all' } },
      analyses: [
        {
          id: 'skid-1',
          kind: 'skid',
          marks: [60],
          segments: [{ drag, grade }],
          end: { mode: 'stop' },
        },
      ],
    }),
  );
  return file;
}

describe('skidcase with a word that is no command', () => {
  it('says the command is unknown and lists the commands', async () => {
    const r = await run(['frobnicate']);
    expect(r.code).toBe(1);
    expect(r.err).toContain("skidcase: unknown command 'frobnicate'. The commands are:");
    for (const c of ['new', 'resume [id]', 'open <file>', 'solve <file>', 'report <case>'])
      expect(r.err).toContain(`skidcase ${c}`);
    expect(r.err).not.toContain('too many arguments');
  });
});

describe('solve', () => {
  it('says nothing about the posted limit when no figure could be computed', async () => {
    // A 75% downhill is steeper than a drag factor of 0.70 can hold: no speed.
    const r = await run(['solve', slideCase('steep.json', -75)]);
    expect(r.code).toBe(3);
    expect(r.out).toContain('cannot be computed');
    expect(r.out).not.toContain('Posted limit');
  });

  it('says a zero range comes from no tolerance entered, in solve and in the report', async () => {
    // 60 ft at 0.70, level: S = sqrt(30 × 60 × 0.70) = 35.5 mph, every input one figure.
    const file = slideCase('exact.json', 0);
    const r = await run(['solve', file]);
    expect(r.code).toBe(0);
    expect(r.out).toContain('Result: at least 35 mph: 35.5 mph');
    expect(r.out).toContain('The range is zero because no tolerance was entered');
    // The comparison at the 45 mph limit starts by saying the vehicle was below it.
    expect(r.out).toContain('This vehicle was below the posted limit: 35.5 mph');
    const rep = await run(['report', file, '--format', 'txt']);
    const flat = rep.out.replace(/\s+/g, ' ');
    expect(flat).toContain('This vehicle was below the posted limit: 35.5 mph');
    expect(flat).toContain(
      '(computed 35.5 mph). The range is zero because no tolerance was entered',
    );
    expect(flat).not.toContain('range 35.5 to 35.5');
    // With a tolerance on the drag factor there is a range and no such sentence.
    const ranged = await run([
      'solve',
      slideCase('ranged.json', 0, { source: 'entered', value: 0.7, low: 0.65, high: 0.75 }),
    ]);
    expect(ranged.out).not.toContain('The range is zero');
  });
});
