// Figures measured on whole processes: the start screen in a pty, and `solve --json`.
import { spawn } from 'node:child_process';
import { copyFileSync, mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { interleaved, median } from './stats.mjs';
import { benchEnv, spawnTimed, timeToSettledScreen } from './pty-timer.mjs';
import { slideCase } from './cases.mjs';

/** Wall time of `node ...argv` with piped output, in ms, and what it printed. */
function runNode(argv, { env } = {}) {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const p = spawn(process.execPath, argv, {
      stdio: ['ignore', 'pipe', 'pipe'],
      env: benchEnv(env),
    });
    let out = '';
    let err = '';
    p.stdout.on('data', (d) => (out += d));
    p.stderr.on('data', (d) => (err += d));
    p.on('error', reject);
    p.on('close', (code) => resolve({ ms: performance.now() - t0, code, out, err }));
  });
}

/**
 * A session as a person has it before the warm runs: the list shown, then `q`. The program
 * makes its code cache at exit (or 1.5 s after start), which the measured runs, killed as soon
 * as their screen settles, would never reach.
 */
async function quitAfterStart(ctx, env) {
  const s = spawnTimed([ctx.binary], { cwd: ctx.tmp, env });
  try {
    const deadline = performance.now() + 15_000;
    while (!(s.screen().includes('q quit') && listed(s.screen()))) {
      if (performance.now() > deadline) throw new Error(`no case list:\n${s.screen()}`);
      await new Promise((r) => setTimeout(r, 20));
    }
    s.pty.write('q');
    await Promise.race([s.exit, new Promise((r) => setTimeout(r, 5_000))]);
  } finally {
    await s.kill();
  }
}

function ensureDir(d) {
  mkdirSync(d, { recursive: true });
  return d;
}

/** The start screen is settled once the list (or "No cases here yet") replaced its placeholder. */
const listed = (screen) => !screen.includes('Reading the cases');

/** The sessions folders the start screen is measured with: empty, the two demo cases, 50 cases. */
export function startFolders(ctx) {
  const make = (name) => ensureDir(join(ctx.tmp, `start-${name}`));
  const empty = make('empty');
  const demo = make('demo');
  for (const n of readdirSync(join(ctx.root, 'sessions')).filter((n) => /^demo.*\.json$/.test(n)))
    copyFileSync(join(ctx.root, 'sessions', n), join(demo, n));
  const fifty = make('50');
  for (let i = 0; i < 50; i++) {
    const c = slideCase(1 + (i % 6), `bench-list-${String(i).padStart(2, '0')}`);
    // newest first is bench-list-00, -01, ...: the key press bench relies on that order
    c.updated = new Date(Date.UTC(2026, 9, 3, 12, 0) - i * 60_000).toISOString();
    writeFileSync(join(fifty, `${c.id}.json`), JSON.stringify(c, null, 2));
  }
  return [
    { name: 'no cases', dir: empty, goal: false },
    { name: '2 demo cases', dir: demo, goal: true },
    { name: '50 cases', dir: fifty, goal: true },
  ];
}

/**
 * The start screen in a pty, beside bare node printing one line in the same pty: for an empty
 * folder, the two demo cases and 50 cases, with the cache folder (V8 code cache, list index)
 * warm (kept from the run before) and cold (emptied before each run); the first frame (first
 * visible output) and the settled frame (the last byte before 400 ms of quiet). Goal <= 2.0x
 * bare node, warm, with 2 and with 50 cases.
 */
export async function startScreen(ctx) {
  const out = [];
  for (const folder of startFolders(ctx)) {
    for (const warm of [true, false]) {
      const cache = join(ctx.tmp, `cache-${out.length}`);
      const env = benchEnv({
        SKIDCASE_SESSIONS: folder.dir,
        SKIDCASE_CONFIG_DIR: ctx.config,
        SKIDCASE_CACHE_DIR: cache,
      });
      if (warm) await quitAfterStart(ctx, env);
      let lastScreen = '';
      const firsts = [];
      const baseFirsts = [];
      const { subject, baseline } = await interleaved(
        async () => {
          if (!warm) rmSync(cache, { recursive: true, force: true });
          const r = await timeToSettledScreen([ctx.binary], { cwd: ctx.tmp, env, done: listed });
          lastScreen = r.screen;
          firsts.push(r.first);
          return r.ms;
        },
        async () => {
          const r = await timeToSettledScreen(['-e', "console.log('x')"], { cwd: ctx.tmp, env });
          baseFirsts.push(r.first);
          return r.ms;
        },
        { runs: ctx.processRuns },
      );
      const base = median(baseline);
      // the warm-up run is not counted
      const first = median(firsts.slice(-ctx.processRuns));
      const settled = median(subject);
      const label = `start screen, ${folder.name}, ${warm ? 'warm' : 'cold'} cache`;
      const goal = { kind: folder.goal && warm ? 'ratio' : 'none', limit: 2.0 };
      const common = {
        available: true,
        baseline: base,
        goal,
        runs: ctx.processRuns,
        method:
          'spawn to first visible output (first frame) and to the last byte before 400 ms of silence (settled), headless xterm 120x40; baseline: node printing one line',
      };
      out.push({
        ...common,
        figure: `${label}: first frame`,
        measured: first,
        pass: goal.kind === 'ratio' ? first / base <= 2.0 : undefined,
      });
      out.push({
        ...common,
        figure: `${label}: settled`,
        measured: settled,
        pass: goal.kind === 'ratio' ? settled / base <= 2.0 : undefined,
        firstLine: lastScreen
          .split('\n')
          .find((l) => l.trim() !== '')
          ?.trim(),
      });
    }
  }
  return out;
}

/** `skidcase solve FILE --json` on a three-segment case vs `node -e 0`; goal <= 1.3x. */
export async function solveJson(ctx) {
  const figure = 'solve --json, 3 segments';
  const file = join(ctx.tmp, 'three-segment.json');
  writeFileSync(file, JSON.stringify(slideCase(3, 'bench-three'), null, 2));
  const probe = await runNode([ctx.binary, 'solve', file, '--json'], {
    env: { SKIDCASE_CACHE_DIR: join(ctx.tmp, 'cache-probe') },
  });
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
  const out = [];
  for (const warm of [true, false]) {
    const cache = join(ctx.tmp, `cache-solve-${warm ? 'warm' : 'cold'}`);
    const env = { SKIDCASE_CACHE_DIR: cache };
    const { subject, baseline } = await interleaved(
      async () => {
        if (!warm) rmSync(cache, { recursive: true, force: true });
        return (await runNode([ctx.binary, 'solve', file, '--json'], { env })).ms;
      },
      async () => (await runNode(['-e', '0'])).ms,
      { runs: ctx.processRuns * 2 },
    );
    const measured = median(subject);
    const base = median(baseline);
    out.push({
      figure: `${figure}, ${warm ? 'warm' : 'cold'} cache`,
      available: true,
      measured,
      baseline: base,
      goal: { kind: warm ? 'ratio' : 'none', limit: 1.3 },
      pass: warm ? measured / base <= 1.3 : undefined,
      runs: ctx.processRuns * 2,
      method: 'wall time of the child process, output piped; baseline: node -e 0',
    });
  }
  return out;
}
