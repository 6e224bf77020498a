import { describe, it } from 'vitest';

/** What `ptySupport()` found: whether a pseudo-terminal can be created here, and if not why. */
export interface PtyCheck {
  ok: boolean;
  reason: string;
}

export type PtyGate =
  { kind: 'run' } | { kind: 'fail'; message: string } | { kind: 'skip'; message: string };

/** Whether the environment says it is CI: `CI` set to anything but empty, `0` or `false`. */
export function isCi(env: NodeJS.ProcessEnv = process.env): boolean {
  const v = env.CI?.trim().toLowerCase();
  return v !== undefined && v !== '' && v !== '0' && v !== 'false';
}

/**
 * What a suite that needs a pseudo-terminal does here: run when there is one; under CI, fail
 * (a green run must not hide every end-to-end test); elsewhere skip, saying why.
 */
export function ptyGate(pty: PtyCheck, what: string, env = process.env): PtyGate {
  if (pty.ok) return { kind: 'run' };
  if (isCi(env))
    return {
      kind: 'fail',
      message: `${what} need a pseudo-terminal and CI must run them, but none can be created here: ${pty.reason}`,
    };
  return { kind: 'skip', message: `${what} skipped: no pseudo-terminal here (${pty.reason})` };
}

/** `describe` for a suite that needs a pseudo-terminal, gated by `ptyGate`. */
export function describeInTerminal(title: string, what: string, pty: PtyCheck, body: () => void) {
  const gate = ptyGate(pty, what);
  if (gate.kind === 'run') return describe(title, body);
  if (gate.kind === 'fail')
    return describe(title, () => {
      it('has a pseudo-terminal to run in (required under CI)', () => {
        throw new Error(gate.message);
      });
    });
  console.warn(gate.message);
  return describe.skip(`${title} (skipped: ${pty.reason})`, body);
}
