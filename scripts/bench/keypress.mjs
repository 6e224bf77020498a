// Key press to frame, measured through the pty (what a person feels, renderer and terminal write
// included): typing into a text field (the first question of a new case) and arrows on the
// 50-case list. Keys are sent GAP_MS apart, closer together than Ink's default 30-frames-a-second
// throttle, as fast typing and a held arrow key send them. Each key's latency runs from its write
// to the first output after which the screen shows it (the typed text so far; the row it selects).
import { copyFileSync, mkdirSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { median, percentile } from './stats.mjs';
import { benchEnv, spawnTimed } from './pty-timer.mjs';
import { startFolders } from './process-figures.mjs';

const GAP_MS = 10;
const PRESSES = 200;
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

/**
 * Sends `steps` ({ key, shown(screen) }) GAP_MS apart and returns each one's latency: from its
 * write to the first parsed output whose screen passes its `shown` (steps are seen in order).
 */
async function timedKeys(s, steps, timeoutMs = 10_000) {
  const sent = [];
  const seen = [];
  let next = 0;
  s.afterParse = (at) => {
    if (next >= sent.length) return;
    const screen = s.screen();
    while (next < sent.length && steps[next].shown(screen)) seen[next] = at - sent[next++];
  };
  for (const step of steps) {
    sent.push(performance.now());
    s.pty.write(step.key);
    await tick(GAP_MS);
  }
  const deadline = performance.now() + timeoutMs;
  while (next < steps.length) {
    if (performance.now() > deadline)
      throw new Error(`key ${next + 1} of ${steps.length} never shown:\n${s.screen()}`);
    await tick(5);
    s.afterParse(performance.now()); // a key whose frame was parsed before it was counted
  }
  s.afterParse = undefined;
  return seen;
}

function result(figure, ms, method) {
  const p95 = percentile(ms, 95);
  return {
    figure,
    available: true,
    measured: p95,
    goal: { kind: 'ms', limit: 16 },
    pass: p95 < 16,
    runs: ms.length,
    method,
    detail: `median ${median(ms).toFixed(1)} ms, max ${Math.max(...ms).toFixed(1)} ms`,
  };
}

/** Typing: rounds of "Q" and 40 letters into the reference question, emptied with Ctrl+U. */
async function typing(ctx) {
  const sessions = join(ctx.tmp, 'keys-typing');
  mkdirSync(sessions, { recursive: true });
  const env = benchEnv({
    SKIDCASE_SESSIONS: sessions,
    SKIDCASE_CONFIG_DIR: ctx.config,
    SKIDCASE_CACHE_DIR: join(ctx.tmp, 'cache-keys'),
  });
  const app = spawnTimed([ctx.binary, 'new'], { cwd: ctx.tmp, env, cols: 120, rows: 40 });
  const all = [];
  try {
    await until(app, (sc) => sc.includes('Case or report reference'), 15_000, 'the first question');
    await tick(300);
    const letters = 'abcdefghijklmnopqrstuvwxyz';
    while (all.length < PRESSES) {
      const text = 'Q' + Array.from({ length: 40 }, (_, i) => letters[i % 26]).join('');
      const steps = [...text].map((ch, i) => ({
        key: ch,
        shown: (sc) => sc.includes(text.slice(0, i + 1)) || i < 2,
      }));
      // the first two keys ("Q", "a") are too short to find for sure: not counted
      all.push(...(await timedKeys(app, steps)).slice(2));
      app.pty.write('\u0015');
      await until(app, (sc) => !sc.includes('Qab'), 5_000, 'the emptied line');
      await tick(200);
    }
  } finally {
    await app.kill();
  }
  return result(
    'key press to frame, typing in a text field (p95)',
    all,
    `through the pty, ${all.length} letters ${GAP_MS} ms apart into the first question of a new case; from the write to the output that shows the text typed so far`,
  );
}

/** Arrows: Down to the 50th case and Up again, on the list of the 50-case folder. */
async function arrows(ctx) {
  const sessions = join(ctx.tmp, 'keys-list');
  mkdirSync(sessions, { recursive: true });
  const from = startFolders(ctx).find((f) => f.name === '50 cases').dir;
  for (const n of readdirSync(from)) copyFileSync(join(from, n), join(sessions, n));
  const env = benchEnv({
    SKIDCASE_SESSIONS: sessions,
    SKIDCASE_CONFIG_DIR: ctx.config,
    SKIDCASE_CACHE_DIR: join(ctx.tmp, 'cache-keys'),
  });
  const app = spawnTimed([ctx.binary], { cwd: ctx.tmp, env, cols: 120, rows: 40 });
  const all = [];
  const at = (sc) => Number(/^> bench-list-(\d\d)\b/m.exec(sc)?.[1] ?? NaN);
  const selected = (i) => (sc) => at(sc) === i;
  // Two keys may share a frame: a key counts as shown once the selection reached its row.
  const reached = (i) => (sc) => at(sc) >= i;
  const cameBack = (i) => (sc) => at(sc) <= i;
  try {
    await until(app, selected(0), 15_000, 'the list with its first case selected');
    await tick(300);
    while (all.length < PRESSES) {
      const down = Array.from({ length: 49 }, (_, i) => ({
        key: '\u001B[B',
        shown: reached(i + 1),
      }));
      const up = Array.from({ length: 49 }, (_, i) => ({
        key: '\u001B[A',
        shown: cameBack(48 - i),
      }));
      all.push(...(await timedKeys(app, down)));
      await tick(200);
      all.push(...(await timedKeys(app, up)));
      await tick(200);
    }
  } finally {
    await app.kill();
  }
  return result(
    'key press to frame, arrows on the 50-case list (p95)',
    all,
    `through the pty, ${all.length} Down/Up keys ${GAP_MS} ms apart; from the write to the output that shows the row it selects`,
  );
}

export async function keypress(ctx) {
  return [await typing(ctx), await arrows(ctx)];
}
