// Key press to repainted frame, measured through the pty (what a person feels, renderer and
// terminal write included), on a case with 20 segments whose chain fills the side panel. The
// hand-written case resumes on its review; Esc goes back to its last question (a choice), where
// the keys alternate Down and Up, spaced like a person's, so that each gets its own frame.
import { mkdirSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { median, percentile } from './stats.mjs';
import { benchEnv, keyToFrame, spawnTimed } from './pty-timer.mjs';
import { slideCase } from './cases.mjs';

const PRESSES = 60;
const ECHO = fileURLToPath(new URL('../../test/e2e/fixtures/echo-keys.mjs', import.meta.url));
const tick = (ms) => new Promise((r) => setTimeout(r, ms));

/** Waits until the screen passes `test` (polling), or throws after `ms`. */
async function until(s, test, ms, what) {
  const deadline = performance.now() + ms;
  while (!test(s.screen())) {
    if (performance.now() > deadline)
      throw new Error(`${what} not on screen within ${ms} ms:\n${s.screen()}`);
    await tick(10);
  }
}

/** Latencies of PRESSES keys sent to a settled program. */
async function latencies(s, keys) {
  const out = [];
  for (let i = 0; i < PRESSES; i++) {
    const ms = await keyToFrame(s, keys[i % keys.length]);
    if (ms === undefined) throw new Error(`no repaint after key ${i + 1}`);
    out.push(ms);
    await tick(40);
  }
  return out;
}

export async function keypress(ctx) {
  const figure = 'key press to frame, 20 segments (p95)';
  const c = slideCase(20, 'bench-keys');
  const sessions = join(ctx.tmp, 'keys-sessions');
  mkdirSync(sessions, { recursive: true });
  writeFileSync(join(sessions, `${c.id}.json`), JSON.stringify(c, null, 2));
  const env = benchEnv({ SKIDCASE_SESSIONS: sessions, SKIDCASE_CONFIG_DIR: ctx.config });

  const app = spawnTimed([ctx.binary, 'resume', c.id], { cwd: ctx.tmp, env, cols: 120, rows: 40 });
  let subject;
  try {
    await until(app, (sc) => /Analysis 1 · /.test(sc), 15_000, 'the review of the resumed case');
    await tick(300);
    app.pty.write('\u001B');
    // The last question of the case, a choice (its highlighted option is marked `> [`).
    await until(
      app,
      (sc) => /^\s*> \[/m.test(sc) && !/Analysis 1 · /.test(sc),
      5_000,
      'its last question, a choice',
    );
    await tick(300);
    subject = await latencies(app, ['\u001B[B', '\u001B[A']);
    // The first frame a key causes, and the end of all output it causes (trailing frames too).
  } finally {
    await app.kill();
  }
  const echo = spawnTimed([ECHO], { cwd: ctx.tmp, env: benchEnv(), cols: 120, rows: 40 });
  let baseline;
  try {
    await until(echo, (sc) => sc.includes('ready'), 10_000, 'the echo program');
    baseline = await latencies(echo, ['x', 'y']);
  } finally {
    await echo.kill();
  }
  const frames = subject.map((x) => x.frame);
  const bursts = subject.map((x) => x.burst);
  const p95 = percentile(frames, 95);
  return {
    figure,
    available: true,
    measured: p95,
    baseline: percentile(
      baseline.map((x) => x.frame),
      95,
    ),
    goal: { kind: 'ms', limit: 16 },
    pass: p95 < 16,
    runs: PRESSES,
    method: `through the pty: key written to the end of the first frame it causes, ${PRESSES} presses (Down, Up) on a choice question beside the 20-segment chain; baseline: a bare raw-mode echo program in the same pty`,
    detail: `first frame: median ${median(frames).toFixed(1)} ms, max ${Math.max(...frames).toFixed(1)} ms; all output a key causes: median ${median(bursts).toFixed(1)} ms, p95 ${percentile(bursts, 95).toFixed(1)} ms`,
  };
}
