// Timing through a real pseudo-terminal: what a person at a terminal waits for. The screen is
// kept by a headless xterm so that "painted" means the text is on the screen, not just written.
import pty from '@lydell/node-pty';
import xterm from '@xterm/headless';

const { Terminal } = xterm;

/** Environment for a measured child: no CI variables (Ink would hold back its frames). */
export function benchEnv(extra = {}) {
  const env = {};
  for (const [k, v] of Object.entries(process.env)) {
    if (v === undefined || k === 'CI' || k === 'CONTINUOUS_INTEGRATION' || k.startsWith('CI_'))
      continue;
    if (k === 'FORCE_COLOR' || k.startsWith('SKIDCASE_')) continue;
    env[k] = v;
  }
  env.TERM = 'xterm-256color';
  return { ...env, ...extra };
}

/** A program in a pty, with its screen and the time of each output chunk. */
export function spawnTimed(
  argv,
  { cols = 120, rows = 40, cwd = process.cwd(), env = benchEnv() } = {},
) {
  const term = new Terminal({ cols, rows, allowProposedApi: true, scrollback: 100 });
  const t0 = performance.now();
  const p = pty.spawn(process.execPath, argv, { name: 'xterm-256color', cols, rows, cwd, env });
  const state = { t0, lastData: undefined, chunks: 0, exited: false, term, pty: p };
  term.onData((d) => p.write(d));
  p.onData((d) => {
    const now = performance.now();
    state.lastData = now;
    state.chunks++;
    // End of a synchronized-output frame (DEC mode 2026, which Ink uses where supported).
    if (d.includes('\u001B[?2026l')) {
      state.lastFrameEnd = now;
      (state.frameEnds ??= []).push(now);
      if (state.frameEnds.length > 64) state.frameEnds.shift();
    }
    // The first output that puts something visible on the screen: the first frame.
    if (state.firstVisible === undefined && /[^\s]/.test(stripAnsi(d))) state.firstVisible = now;
    // Once xterm has parsed the chunk, `afterParse` may look at the screen it made.
    term.write(d, () => state.afterParse?.(now));
  });
  state.exit = new Promise((resolve) =>
    p.onExit((e) => {
      state.exited = true;
      resolve(e);
    }),
  );
  state.screen = () => {
    const buf = term.buffer.active;
    const lines = [];
    for (let i = 0; i < term.rows; i++)
      lines.push(buf.getLine(buf.baseY + i)?.translateToString(true) ?? '');
    return lines.join('\n').trimEnd();
  };
  state.kill = () => {
    if (!state.exited) {
      try {
        process.kill(p.pid, 'SIGKILL');
      } catch {
        /* gone */
      }
    }
    return state.exit.then(() => term.dispose());
  };
  return state;
}

const tick = (ms) => new Promise((r) => setTimeout(r, ms));

const stripAnsi = (d) =>
  // eslint-disable-next-line no-control-regex
  d.replace(/\u001B(\[[0-9;?]*[ -/]*[@-~]|\][^\u0007\u001B]*(\u0007|\u001B\\)|[@-Z\\-_])/g, '');

/**
 * Milliseconds from spawn to the last byte of the first settled screen: output that is followed
 * by `quietMs` of silence (or by the program's exit). The quiet wait itself is not counted.
 * `first`: milliseconds to the first output that shows anything (the first frame).
 */
export async function timeToSettledScreen(argv, opts = {}) {
  const quietMs = opts.quietMs ?? 400;
  const s = spawnTimed(argv, opts);
  const deadline = performance.now() + (opts.timeoutMs ?? 15_000);
  for (;;) {
    await tick(5);
    const now = performance.now();
    const settled = s.lastData !== undefined && (s.exited || now - s.lastData >= quietMs);
    // `done(screen)`: what the settled screen must show (the case list, not its placeholder)
    if (settled && s.screen().trim() !== '' && (!opts.done || s.exited || opts.done(s.screen())))
      break;
    if (now > deadline) {
      await s.kill();
      throw new Error(
        `no settled screen within ${opts.timeoutMs ?? 15_000} ms for node ${argv.join(' ')}`,
      );
    }
  }
  const ms = s.lastData - s.t0;
  const first = (s.firstVisible ?? s.lastData) - s.t0;
  const screen = s.screen();
  await s.kill();
  return { ms, first, screen };
}
