// Figures measured on whole processes: the start screen in a pty, and `solve --json`.
import { spawn } from 'node:child_process';
import { existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { interleaved, median } from './stats.mjs';
import { benchEnv, timeToSettledScreen } from './pty-timer.mjs';
import { slideCase } from './cases.mjs';

/** Wall time of `node ...argv` with piped output, in ms, and what it printed. */
function runNode(argv, opts = {}) {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const p = spawn(process.execPath, argv, {
      stdio: ['ignore', 'pipe', 'pipe'],
      env: benchEnv(),
      ...opts,
    });
    let out = '';
    let err = '';
    p.stdout.on('data', (d) => (out += d));
    p.stderr.on('data', (d) => (err += d));
    p.on('error', reject);
    p.on('close', (code) => resolve({ ms: performance.now() - t0, code, out, err }));
  });
}

/** Start screen painted in a pty vs `node -e "console.log('x')"` in the same pty; goal <= 2.0x. */
export async function startScreen(ctx) {
  const figure = 'start screen painted (pty)';
  if (!existsSync(join(ctx.root, 'src/ui/run.tsx')))
    return {
      figure,
      available: false,
      note: 'src/ui/run.tsx (the interactive entry) does not exist yet',
    };
  const env = benchEnv({ SKIDCASE_SESSIONS: ctx.sessions, SKIDCASE_CONFIG_DIR: ctx.config });
  let lastScreen = '';
  const { subject, baseline } = await interleaved(
    async () => {
      const r = await timeToSettledScreen([ctx.binary], { cwd: ctx.tmp, env });
      lastScreen = r.screen;
      return r.ms;
    },
    async () => (await timeToSettledScreen(['-e', "console.log('x')"], { cwd: ctx.tmp, env })).ms,
    { runs: ctx.processRuns },
  );
  const measured = median(subject);
  const base = median(baseline);
  return {
    figure,
    available: true,
    measured,
    baseline: base,
    goal: { kind: 'ratio', limit: 2.0 },
    pass: measured / base <= 2.0,
    runs: ctx.processRuns,
    method:
      'spawn to last byte of the first screen followed by 400 ms of silence, headless xterm 120x40',
    firstLine: lastScreen
      .split('\n')
      .find((l) => l.trim() !== '')
      ?.trim(),
  };
}

/** `skidcase solve FILE --json` on a three-segment case vs `node -e 0`; goal <= 1.3x. */
export async function solveJson(ctx) {
  const figure = 'solve --json, 3 segments';
  const file = join(ctx.tmp, 'three-segment.json');
  writeFileSync(file, JSON.stringify(slideCase(3, 'bench-three'), null, 2));
  const probe = await runNode([ctx.binary, 'solve', file, '--json']);
  let solved = false;
  try {
    solved =
      probe.code === 0 && typeof JSON.parse(probe.out).analyses?.[0]?.speed?.value === 'number';
  } catch {
    solved = false;
  }
  if (!solved)
    return {
      figure,
      available: false,
      note: `solve --json did not print a solution yet (exit ${probe.code})`,
    };
  const { subject, baseline } = await interleaved(
    async () => (await runNode([ctx.binary, 'solve', file, '--json'])).ms,
    async () => (await runNode(['-e', '0'])).ms,
    { runs: ctx.processRuns * 2 },
  );
  const measured = median(subject);
  const base = median(baseline);
  return {
    figure,
    available: true,
    measured,
    baseline: base,
    goal: { kind: 'ratio', limit: 1.3 },
    pass: measured / base <= 1.3,
    runs: ctx.processRuns * 2,
    method: 'wall time of the child process, output piped',
  };
}
