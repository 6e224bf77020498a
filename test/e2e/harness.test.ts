// The harness's own tests, against a tiny program of ours (fixtures/echo-keys.mjs), so that a
// failing end-to-end test of skidcase points at skidcase and not at the harness.
import { afterEach, expect, it } from 'vitest';
import { fileURLToPath } from 'node:url';
import { disposeAll, ptySupport, startTerm } from './harness.js';
import { colourCodes, stripAnsi } from './ansi.js';
import { describeInTerminal } from './pty-gate.js';

const ECHO = fileURLToPath(new URL('./fixtures/echo-keys.mjs', import.meta.url));
const pty = await ptySupport();

describeInTerminal('terminal harness', 'end-to-end harness tests', pty, () => {
  afterEach(disposeAll);

  it('shows the screen as drawn, after the program overwrote text in place', async () => {
    const t = await startTerm({ nodeArgs: [ECHO], cols: 40, rows: 8 });
    const screen = await t.waitFor(/ready size 40x8/);
    const lines = screen.split('\n');
    // "AAAAAA", carriage return, "BB": a person sees BBAAAA, the byte stream holds both.
    expect(lines[0]).toBe('BBAAAA');
    expect(lines[1]).toBe('red plain');
    expect(t.raw).toContain('AAAAAA\rBB');
  });

  it('delivers typed text and named keys as the bytes a terminal sends, and counts them', async () => {
    const t = await startTerm({ nodeArgs: [ECHO], cols: 60, rows: 20 });
    await t.waitFor('ready');
    await t.type('ab');
    await t.press('enter');
    await t.press('down');
    await t.press('ctrl-c');
    // the last byte, on a line of its own or joined to the bytes before it
    const screen = await t.waitFor(/^key (.* )?03$/m);
    const keys = screen.split('\n').filter((l) => l.startsWith('key '));
    // a, b, CR, ESC [ B, ETX: each arrives in order (a pty may join bytes that came close together)
    expect(keys.join(' ').replace(/key /g, '')).toBe('61 62 0d 1b 5b 42 03');
    expect(t.keyCount).toBe(5);
  });

  it('resizes the terminal: the program is told and later lines wrap at the new width', async () => {
    const t = await startTerm({ nodeArgs: [ECHO], cols: 80, rows: 10 });
    await t.waitFor('ready size 80x10');
    t.resize(60, 12);
    await t.waitFor('resized size 60x12');
    expect(t.cols).toBe(60);
  });

  it('reports the exit code, and a SIGKILL as a signal', async () => {
    const a = await startTerm({ nodeArgs: [ECHO] });
    await a.waitFor('ready');
    await a.type('q');
    expect((await a.waitForExit()).exitCode).toBe(7);
    expect(a.screen()).toContain('bye');

    const b = await startTerm({ nodeArgs: [ECHO] });
    await b.waitFor('ready');
    b.kill();
    expect((await b.waitForExit()).signal).toBe(9);
  });

  it('fails a wait with the screen in the message, not a bare timeout', async () => {
    const t = await startTerm({ nodeArgs: [ECHO], cols: 30, rows: 6 });
    await t.waitFor('ready');
    await expect(t.waitFor('never shown', { timeoutMs: 300 })).rejects.toThrow(
      /timed out waiting for never shown[\s\S]*\| ready size 30x6/,
    );
  });

  it('fails a wait at once when the program has exited without showing the text', async () => {
    const t = await startTerm({ nodeArgs: ['-e', 'console.log("short life")'] });
    await expect(t.waitFor('never shown', { timeoutMs: 5_000 })).rejects.toThrow(
      /exited \(code 0\)[\s\S]*short life/,
    );
  });

  it('finds colour codes and only colour codes', async () => {
    const t = await startTerm({ nodeArgs: [ECHO] });
    await t.waitFor('ready');
    expect(colourCodes(t.raw)).toEqual(['\u001B[31m', '\u001B[39m']);
    expect(colourCodes('\u001B[1mbold\u001B[22m \u001B[2J\u001B[3A')).toEqual([]);
    expect(colourCodes('\u001B[1;38;5;208mx\u001B[0m')).toEqual(['\u001B[1;38;5;208m']);
    expect(stripAnsi('\u001B[31mred\u001B[39m \u001B[2Kok')).toBe('red ok');
  });
});
