/**
 * A real terminal for end-to-end tests: the built binary runs in a pseudo-terminal (node-pty) and
 * its output is fed to a headless xterm, so a test reads the screen as a person sees it (after
 * cursor moves and clears), not the raw byte stream. Every wait polls the screen until it matches;
 * there is no fixed sleep to hope for the best.
 *
 * @example
 * const t = await startTerm({ args: ['solve', file], cols: 100, rows: 30 });
 * await t.waitFor(/at least \d+ mph/);
 * await t.type('80 ft');
 * await t.press('enter');
 * t.kill();
 */
import { spawn as ptySpawn } from '@lydell/node-pty';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { childEnv } from './env.js';
import { Term } from './term.js';

export { Term } from './term.js';

/**
 * The built CLI the tests drive (`npm test` builds it before vitest starts). SKIDCASE_E2E_BINARY
 * points the suite at another build of the same CLI (a debugging aid; CI never sets it).
 */
export const BINARY =
  process.env.SKIDCASE_E2E_BINARY ??
  fileURLToPath(new URL('../../dist/skidcase.js', import.meta.url));

export interface TermOptions {
  /** Arguments after the binary, e.g. `['resume', 'case-1']`. */
  args?: string[];
  /** Run `node <nodeArgs>` instead of the binary (harness self-tests, bench baselines). */
  nodeArgs?: string[];
  cwd?: string;
  /** Extra environment; a value of `undefined` removes the variable. */
  env?: Record<string, string | undefined>;
  cols?: number;
  rows?: number;
  /** Milliseconds between typed characters; 0 sends a whole string in one write, like a paste. */
  typingDelayMs?: number;
}

const running = new Set<Term>();

/** Starts the built binary (or `node <nodeArgs>`) in a pseudo-terminal. */
export async function startTerm(opts: TermOptions = {}): Promise<Term> {
  const cols = opts.cols ?? 100;
  const rows = opts.rows ?? 30;
  if (!opts.nodeArgs && !existsSync(BINARY))
    throw new Error(`${BINARY} is missing: run \`npm run build\` (npm test does it before vitest)`);
  const argv = opts.nodeArgs ?? [BINARY, ...(opts.args ?? [])];
  const pty = ptySpawn(process.execPath, argv, {
    name: 'xterm-256color',
    cols,
    rows,
    cwd: opts.cwd ?? process.cwd(),
    env: childEnv(opts.env),
  });
  const t = new Term(pty, cols, rows, opts.typingDelayMs ?? 8);
  running.add(t);
  void t.exited.then(() => running.delete(t));
  return t;
}

/** Kills every terminal a test left running (call it in afterEach). */
export async function disposeAll(): Promise<void> {
  await Promise.all([...running].map((t) => t.dispose()));
  running.clear();
}

let support: Promise<{ ok: boolean; reason: string }> | undefined;

/**
 * Whether a pseudo-terminal can be created here: the only reason an end-to-end test may skip.
 * Checked once by running `node -e 0` in one.
 */
export function ptySupport(): Promise<{ ok: boolean; reason: string }> {
  support ??= (async () => {
    try {
      const p = ptySpawn(process.execPath, ['-e', '0'], { cols: 20, rows: 5, env: childEnv() });
      const code = await new Promise<number>((resolve, reject) => {
        const timer = setTimeout(
          () => reject(new Error('node -e 0 did not end within 10 s in a pty')),
          10_000,
        );
        p.onExit(({ exitCode }) => {
          clearTimeout(timer);
          resolve(exitCode);
        });
      });
      return code === 0
        ? { ok: true, reason: '' }
        : { ok: false, reason: `node -e 0 exited ${code} in a pty` };
    } catch (e) {
      return {
        ok: false,
        reason: `cannot create a pseudo-terminal: ${e instanceof Error ? e.message : String(e)}`,
      };
    }
  })();
  return support;
}
