import { describe, expect, it } from 'vitest';
import { isCi, ptyGate } from './pty-gate.js';

// The end-to-end suites run only where a pseudo-terminal can be created. Under CI a missing one
// is a failure, so a green CI run cannot hide every end-to-end test; elsewhere they skip, saying why.

const none = { ok: false, reason: 'cannot create a pseudo-terminal: ENOENT' };

describe('the pseudo-terminal gate of the end-to-end suites', () => {
  it('runs the suite when a pseudo-terminal can be created, in CI or not', () => {
    expect(ptyGate({ ok: true, reason: '' }, 'e2e tests', { CI: 'true' })).toEqual({ kind: 'run' });
    expect(ptyGate({ ok: true, reason: '' }, 'e2e tests', {})).toEqual({ kind: 'run' });
  });

  it('fails under CI without one, saying why', () => {
    const g = ptyGate(none, 'interview end-to-end tests', { CI: 'true' });
    expect(g.kind).toBe('fail');
    if (g.kind === 'fail') {
      expect(g.message).toMatch(/^interview end-to-end tests need a pseudo-terminal/);
      expect(g.message).toContain('ENOENT');
    }
    expect(ptyGate(none, 'x', { CI: '1' }).kind).toBe('fail');
  });

  it('skips outside CI without one, saying why', () => {
    const g = ptyGate(none, 'terminal edge tests', {});
    expect(g).toEqual({
      kind: 'skip',
      message:
        'terminal edge tests skipped: no pseudo-terminal here (cannot create a pseudo-terminal: ENOENT)',
    });
    expect(ptyGate(none, 'x', { CI: 'false' }).kind).toBe('skip');
    expect(ptyGate(none, 'x', { CI: '' }).kind).toBe('skip');
  });

  it('reads CI as set unless empty, 0 or false', () => {
    expect(
      [undefined, '', '0', 'false', 'FALSE', 'true', '1', 'woodpecker'].map((v) => isCi({ CI: v })),
    ).toEqual([false, false, false, false, false, true, true, true]);
  });
});
