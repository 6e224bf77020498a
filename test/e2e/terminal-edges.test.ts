// Terminal edge cases: no TTY, NO_COLOR, 60 columns, a resize in the middle of a
// question. The built binary, in a real pseudo-terminal where there is one.
import { afterAll, afterEach, describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { BINARY, disposeAll, ptySupport, startTerm, type Term } from './harness.js';
import { childEnv, makeWorkspace, type Workspace } from './env.js';
import { readFileSync } from 'node:fs';
import { caseFiles } from './review.js';
import { loadCaseText } from '../../src/case/load.js';
import { colourCodes } from './ansi.js';
import { FOOTER_GAP, footerLine } from '../../src/ui/keys.js';
import { describeInTerminal } from './pty-gate.js';
import { squash, typeInterview, type Script } from './interview-driver.js';

/** The case questions answered with Enter (all optional) and imperial units. */
const CASE_START: Script = {
  'details.reference': '',
  'details.occurred': '',
  'details.location': '',
  'details.investigator': '',
  'details.notes': '',
  units: 'imperial',
};

const ws = makeWorkspace();

/** How often `part` shows on a screen (lines joined, so a wrapped phrase still counts). */
const times = (screen: string, part: string) => squash(screen).split(part).length - 1;

/**
 * The question footer as laid out for `cols` columns: the frame's last row, so once it shows, the
 * frame drawn for that width is on screen whole (a frame reflowed by the terminal never has it).
 */
const footerFor = (cols: number) => footerLine('question', cols).join(' '.repeat(FOOTER_GAP));
const drawnFor = (cols: number) => (screen: string) =>
  screen.split('\n').some((row) => row.trim() === footerFor(cols));
afterAll(() => ws.cleanup());

/** Runs the binary with pipes (no terminal at all) and collects what it printed. */
function runPiped(args: string[], stdin: 'pipe' | 'ignore') {
  return new Promise<{ code: number | null; out: string; err: string }>((resolve) => {
    const p = spawn(process.execPath, [BINARY, ...args], {
      cwd: ws.root,
      env: childEnv(ws.env),
      stdio: [stdin, 'pipe', 'pipe'],
    });
    let out = '';
    let err = '';
    p.stdout!.on('data', (d) => (out += d));
    p.stderr!.on('data', (d) => (err += d));
    if (stdin === 'pipe') p.stdin!.end('80\n');
    const timer = setTimeout(() => p.kill('SIGKILL'), 15_000);
    p.on('close', (code) => {
      clearTimeout(timer);
      resolve({ code, out, err });
    });
  });
}

describe('without a terminal', () => {
  it.each([
    [[], 'pipe'],
    [[], 'ignore'],
    [['resume'], 'pipe'],
  ] as const)(
    'skidcase %j with stdin %s says to use solve and exits non-zero',
    async (args, stdin) => {
      const r = await runPiped([...args], stdin);
      expect(r.code).not.toBe(0);
      expect(r.code).not.toBeNull(); // ended by itself, not by the 15 s guard
      expect(r.out + r.err).toMatch(/skidcase solve FILE/);
      expect(r.out + r.err).not.toMatch(/\n\s+at\s/); // no stack trace
    },
  );
});

const pty = await ptySupport();

/** Opens the home screen and starts a new case, landing on the first question. */
async function newCase(t: Term, where: Workspace = ws) {
  await t.waitFor(where.sessions.slice(-20), {
    what: 'the home screen naming the sessions folder',
  });
  await t.type('n');
  return t.waitFor(/Case or report reference/, { what: 'the first question' });
}

describeInTerminal('in a terminal', 'terminal edge tests', pty, () => {
  afterEach(disposeAll);

  it('with NO_COLOR set, writes no colour codes on the home screen, a question or an error; without it, does', async () => {
    const plain = await startTerm({ cwd: ws.root, env: { ...ws.env, NO_COLOR: '1' } });
    await newCase(plain);
    // A rejected answer is where colour would be used most (the error message).
    await typeInterview(plain, CASE_START, { stopAt: 'limit' });
    await plain.type('abc');
    await plain.waitFor('abc');
    await plain.press('enter');
    await plain.waitFor(/not a number/i, { what: 'the message for "abc" as a posted limit' });
    expect(colourCodes(plain.raw)).toEqual([]);

    const coloured = await startTerm({ cwd: ws.root, env: ws.env });
    await newCase(coloured);
    expect(colourCodes(coloured.raw).length).toBeGreaterThan(0);
  });

  it('at 60 columns, lays out within the width (no line the terminal had to wrap) and takes answers', async () => {
    const t = await startTerm({ cwd: ws.root, env: ws.env, cols: 60, rows: 24 });
    await t.waitFor(ws.sessions.slice(-20));
    expect(t.wrappedRows()).toEqual([]);
    await t.type('n');
    await t.waitFor(/Case or report reference/);
    expect(t.wrappedRows()).toEqual([]);
    await t.type('NARROW-1');
    await t.waitFor('NARROW-1');
    await t.press('enter');
    const next = await t.waitFor(/When did the crash happen/);
    expect(t.wrappedRows()).toEqual([]);
    expect(next.split('\n').every((l) => l.length <= 60)).toBe(true);
  });

  it('with stdin redirected but the screen a terminal (skidcase < file), says to use solve and exits non-zero', async () => {
    // A parent in the pty starts skidcase with stdin from /dev/null and its output on the pty.
    const parent = [
      "const r = require('node:child_process').spawnSync(process.execPath, [process.argv[1]],",
      "  { stdio: ['ignore', 'inherit', 'inherit'] });",
      'process.exit(r.status ?? 99);',
    ].join('\n');
    const t = await startTerm({ nodeArgs: ['-e', parent, BINARY], cwd: ws.root, env: ws.env });
    const info = await t.waitForExit();
    expect(t.screen()).toMatch(/skidcase solve FILE/);
    expect(info.exitCode).not.toBe(0);
    expect(info.exitCode).not.toBe(99);
  });

  it('Ctrl+C twice in quick succession saves and leaves cleanly: exit 0, the file whole, every answer kept', async () => {
    const own = makeWorkspace();
    try {
      const t = await startTerm({ cwd: own.root, env: own.env });
      await newCase(t, own);
      await typeInterview(
        t,
        { ...CASE_START, 'details.reference': 'CTRL-C-1', limit: '35' },
        { stopAt: 'vehicle.label' },
      );
      await t.press('ctrl-c');
      await t.press('ctrl-c');
      expect((await t.waitForExit()).exitCode).toBe(0);
      const files = caseFiles(own.sessions);
      expect(files).toHaveLength(1);
      const loaded = loadCaseText(readFileSync(files[0]!, 'utf8'));
      expect(loaded.ok).toBe(true);
      if (loaded.ok) {
        expect(loaded.case.details?.reference).toBe('CTRL-C-1');
        expect(loaded.case.postedLimit).toBe(35);
      }
    } finally {
      own.cleanup();
    }
  });

  it('resized from 100 to 60 columns in the middle of an answer, keeps the typed text, redraws once, and takes the answer', async () => {
    const t = await startTerm({ cwd: ws.root, env: ws.env, cols: 100, rows: 30 });
    await newCase(t);
    const header = t.screen().split('\n')[0]!.trim().split(/\s+/)[0]!; // the case id
    await t.type('RESIZE-');
    await t.waitFor('RESIZE-');
    // The footers differ, so each wait below can only end on the frame drawn for the new width.
    expect(footerFor(60)).not.toBe(footerFor(100));
    expect(footerFor(120)).not.toBe(footerFor(60));
    t.resize(60, 24);
    const narrow = await t.waitFor(drawnFor(60), { what: 'the frame drawn for 60 columns' });
    // One frame on screen: no copy of the wider frame (reflowed by the terminal) left behind.
    expect(times(narrow, header), narrow).toBe(1);
    expect(times(narrow, 'Case or report reference'), narrow).toBe(1);
    expect(narrow).toContain('RESIZE-');
    await t.type('42');
    await t.waitFor('RESIZE-42');
    await t.press('enter');
    await t.waitFor(/When did the crash happen/);
    t.resize(120, 30);
    const wide = await t.waitFor(drawnFor(120), { what: 'the frame drawn for 120 columns' });
    expect(times(wide, header), wide).toBe(1);
    expect(times(wide, 'When did the crash happen'), wide).toBe(1);
  });
});
