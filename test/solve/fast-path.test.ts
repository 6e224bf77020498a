import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { fixture } from './run-solve.js';

// `skidcase solve FILE [--json]` skips commander (start-up speed). Through the built program, what
// it prints and its exit code must be exactly those of the same command parsed by commander
// (`--sessions` before the command sends it there), and every other command line is unchanged.
const run = promisify(execFile);
const BIN = 'dist/skidcase.js';

async function skidcase(args: string[]) {
  try {
    const r = await run(process.execPath, [BIN, ...args], {
      env: { ...process.env, NO_COLOR: '1' },
    });
    return { code: 0, out: r.stdout, err: r.stderr };
  } catch (e) {
    const x = e as { code: number; stdout: string; stderr: string };
    return { code: x.code, out: x.stdout, err: x.stderr };
  }
}

describe('solve without commander', () => {
  const cases: [string, string[]][] = [
    ['a solvable case as JSON', [fixture('skid-imperial-two-marks.json'), '--json']],
    ['--json before the file', ['--json', fixture('skid-imperial-two-marks.json')]],
    ['a solvable case as text', [fixture('skid-imperial-two-marks.json')]],
    ['a missing file', ['no-such-file.json', '--json']],
    ['an uncomputable case', [fixture('steep-downhill.json')]],
  ];
  it.each(cases)('%s: same output and exit code as through commander', async (_name, args) => {
    const fast = await skidcase(['solve', ...args]);
    const parsed = await skidcase(['--sessions', '.', 'solve', ...args]);
    expect(fast.out.length + fast.err.length).toBeGreaterThan(0);
    expect(fast).toEqual(parsed);
  });

  it('an unknown option still gets commander’s message', async () => {
    const r = await skidcase(['solve', fixture('skid-imperial-two-marks.json'), '--jsn']);
    expect(r.code).toBe(1);
    expect(r.err).toContain("unknown option '--jsn'");
  });

  it('a word that is no command is still called unknown, with the commands listed', async () => {
    const r = await skidcase(['frobnicate']);
    expect(r.code).toBe(1);
    expect(r.err).toContain("skidcase: unknown command 'frobnicate'. The commands are:");
    expect(r.err).toMatch(/skidcase solve <file>\s+print the formula chain/);
  });

  it('--help and --version still come from commander', async () => {
    const help = await skidcase(['--help']);
    expect(help.code).toBe(0);
    expect(help.out).toMatch(/^Usage: skidcase \[options\] \[command\]/);
    expect(help.out).toContain('report [options] <case>');
    const version = await skidcase(['--version']);
    expect(version.out.trim()).toMatch(/^\d+\.\d+\.\d+/);
  });
});
