import fs from 'node:fs';
import path from 'node:path';
import chalk from 'chalk';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { loadCaseText } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { applyColorPolicy } from '../../src/ui/theme.js';
import { DOWN, ENTER, ESC, ctrl, renderApp } from './render-app.js';
import { finishedSlide, halfDone } from './fixtures.js';

afterEach(() => cleanup());

/** A new case, on its first question. */
async function newCase(o: Parameters<typeof renderApp>[0] = {}) {
  const app = renderApp(o);
  await app.waitText('No cases here yet');
  await app.press('n', 'Case or report reference');
  return app;
}

/** From a new case's first question to the posted limit. */
async function toLimit(app: Awaited<ReturnType<typeof newCase>>) {
  await app.answer('UI-7', 'When did the crash happen?');
  for (let i = 0; i < 4; i++) await app.press(ENTER);
  await app.waitText('Which units');
  await app.press('f', 'Posted speed limit');
}

describe('interview screen', () => {
  it('shows the case, section and progress, and saves after an answer', async () => {
    const app = await newCase();
    let f = app.frame();
    expect(f).toMatch(/Case · 0 of \d+ answered · guided mode/);
    expect(f).toContain('no changes yet');
    f = await app.answer('UI-7', /saved \d\d:\d\d:\d\d/);
    expect(f).toMatch(/Case · 1 of \d+ answered/);
    const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
    const saved = loadCaseText(fs.readFileSync(path.join(app.dir, file), 'utf8'));
    expect(saved.ok && saved.case.details?.reference).toBe('UI-7');
  });

  it('shows a rejected answer’s message in place and keeps what was typed', async () => {
    const app = await newCase();
    await toLimit(app);
    const f = await app.answer('fast', /✗/);
    expect(f).toContain('> fast');
    expect(f).toContain('Posted speed limit');
    expect(f).toMatch(/✗ .*not a number/);
  });

  it('says when it converts a unit', async () => {
    const app = await newCase();
    await toLimit(app);
    // 56 km/h ÷ 1.609344 km per mile (international mile, 1959) = 34.797 mph.
    const f = await app.answer('56 km/h', 'Which vehicle');
    expect(f).toMatch(/56 km\/h = 34\.8 mph/);
  });

  it('shows the why/how panel in guided mode and hides it in brisk mode', async () => {
    const app = await newCase();
    expect(app.frame()).toContain('Why:');
    const f = await app.press(ctrl('t'), 'brisk mode');
    expect(f).not.toContain('Why:');
    expect(f).toContain('Ctrl+E shows why');
  });

  it('resumes on the first open question with a summary of what is done', async () => {
    const app = renderApp({ files: { 'half-done.json': halfDone }, start: { kind: 'resume' } });
    const f = await app.waitText('Resumed. Already done:');
    expect(f).toContain('Which units were the measurements taken in?');
    expect(f).toContain('Case UI-TEST-HALF');
    expect(f).toMatch(/5 of \d+ answered/);
  });

  it('a new case left before its first answer resumes on its first question, with nothing made up', async () => {
    const first = renderApp();
    await first.waitText('No cases here yet');
    await first.press('n', 'Case or report reference');
    first.stdin.write(ctrl('q'));
    await first.waitFor(() => first.exits.length > 0, 'exit');
    const name = fs.readdirSync(first.dir).find((n) => n.endsWith('.json'))!;
    const text = fs.readFileSync(path.join(first.dir, name), 'utf8');
    cleanup();
    const again = renderApp({ files: { [name]: text }, start: { kind: 'resume' } });
    const f = await again.waitText('Case or report reference');
    expect(f).toMatch(/ 0 of \d+ answered/);
    expect(f).not.toContain('Already done');
    // On through the case questions: each is asked, none was filled in behind the user's back.
    await again.press(ENTER, 'When did the crash happen?');
  });

  it('resume without an id opens the newest unfinished case, not a newer finished one', async () => {
    const older = { ...halfDone, updated: '2026-11-01T10:00:00.000Z' };
    const newer = { ...finishedSlide, updated: '2026-11-20T10:00:00.000Z' };
    const app = renderApp({
      files: { 'half-done.json': older, 'finished-slide.json': newer },
      start: { kind: 'resume' },
    });
    const f = await app.waitText('Resumed. Already done:');
    expect(f).toContain('half-done');
    expect(f).toContain('Which units were the measurements taken in?');
  });

  it('resume without an id, when every case is finished, says so on the list', async () => {
    const app = renderApp({
      files: { 'finished-slide.json': finishedSlide },
      start: { kind: 'resume' },
    });
    const f = await app.waitText('Every case here is finished');
    expect(f).toContain('finished-slide');
  });

  it('Ctrl+Q with text typed but not accepted says so, and leaves on the second press', async () => {
    const app = await newCase();
    for (const ch of 'HALF-TYPED') app.stdin.write(ch);
    await app.waitText('> HALF-TYPED');
    const f = await app.press(ctrl('q'), 'is typed but not accepted');
    expect(f).toContain(
      '"HALF-TYPED" is typed but not accepted: Enter accepts it; Ctrl+Q / Ctrl+C again leaves without it.',
    );
    expect(app.exits).toEqual([]);
    app.stdin.write(ctrl('q'));
    await app.waitFor(() => app.exits.length > 0, 'exit');
    expect(app.exits).toEqual([0]);
  });

  it('a pasted line of 1,851 characters scrolls within its row: header and question stay on a 24-row screen', async () => {
    const app = await newCase({ columns: 80, rows: 24 });
    const paste = Array.from({ length: 1851 }, (_, i) => 'abcdefghij'[i % 10]).join('');
    app.stdin.write(paste);
    const f = await app.waitText('…');
    const lines = f.split('\n');
    expect(lines.length).toBeLessThanOrEqual(24);
    expect(lines[0]).toMatch(/^case-/);
    expect(f).toContain('Case or report reference');
    const input = lines.filter((l) => l.startsWith('> '));
    expect(input).toHaveLength(1);
    expect(input[0]!.length).toBeLessThanOrEqual(80);
    // The end of what was pasted is in view, where the cursor is.
    expect(input[0]).toMatch(/^> …[a-j]+_/);
    expect(input[0]).toContain(`${paste.slice(-20)}_`);
  });

  it('keeps answers in memory, says so and stays on the question when a save fails', async () => {
    let full = true;
    const app = renderApp({
      services: (s) => ({
        ...s,
        saveCase: (...args) =>
          full ? { ok: false, message: 'disk is full' } : s.saveCase(...args),
      }),
    });
    await app.waitText('No cases here yet');
    await app.press('n', 'Case or report reference');
    const f = await app.answer('UI-8', 'disk is full');
    // The answer is taken (counted) but the screen has not moved past it: it is not on disk.
    expect(f).toMatch(/Case · 1 of \d+ answered/);
    expect(f).toContain('Case or report reference');
    expect(f).toContain('UI-8');
    // Space freed: the save key writes it, and Enter goes on from the question.
    full = false;
    const saved = await app.press(ctrl('s'), 'saved');
    expect(saved).not.toContain('disk is full');
    const next = await app.press(ENTER, 'Date and time');
    expect(next).not.toContain('Case or report reference');
  });

  it('does not leave with unsaved answers until asked twice', async () => {
    const app = renderApp({
      services: (s) => ({ ...s, saveCase: () => ({ ok: false, message: 'disk is full' }) }),
    });
    await app.waitText('No cases here yet');
    await app.press('n', 'Case or report reference');
    await app.answer('UI-9', 'disk is full');
    await app.press(ctrl('q'), 'again to leave without saving');
    expect(app.exits).toEqual([]);
    app.stdin.write(ctrl('q'));
    await app.waitFor(() => app.exits.length > 0, 'exit');
    expect(app.exits).toEqual([0]);
  });

  it('shows a read-only banner when the case is open elsewhere', async () => {
    const app = renderApp({
      files: { 'half-done.json': halfDone },
      start: { kind: 'resume', id: 'half-done' },
      services: (s) => ({
        ...s,
        openCase: async (ref) => {
          const o = await s.openCase(ref);
          if (o.ok) o.open.readOnly = 'this case is open in another skidcase (pid 4242).';
          return o;
        },
      }),
    });
    const f = await app.waitText('READ-ONLY');
    expect(f).toContain('pid 4242');
    expect(f).toContain('not saved (read-only)');
    expect(f).toContain('Ctrl+Q leave (not saved)');
    expect(f).not.toContain('save & leave');
  });

  it('a read-only window does not drop typed answers on Ctrl+Q: it offers them as a new case', async () => {
    const app = renderApp({
      files: { 'half-done.json': halfDone },
      start: { kind: 'resume', id: 'half-done' },
      services: (s) => ({
        ...s,
        openCase: async (ref) => {
          const o = await s.openCase(ref);
          if (o.ok) o.open.readOnly = 'this case is open in another skidcase (pid 4242).';
          return o;
        },
      }),
    });
    await app.waitText('Which units were the measurements taken in?');
    await app.press('m', 'Posted speed limit');
    let f = await app.press(ctrl('q'), 'to save them as a new case');
    expect(f.replace(/\s+/g, ' ')).toContain(
      'these answers are not saved (read-only: this case is open in another skidcase (pid 4242)); press Ctrl+S to save them as a new case, or Ctrl+Q / Ctrl+C again to leave without saving',
    );
    expect(app.exits).toEqual([]);
    f = await app.press(ctrl('s'), 'Saved as a new case half-done-copy');
    expect(f).not.toContain('READ-ONLY');
    const copy = JSON.parse(fs.readFileSync(path.join(app.dir, 'half-done-copy.json'), 'utf8'));
    expect(copy.units).toBe('metric');
    // The original was not touched by this window.
    expect(fs.readFileSync(path.join(app.dir, 'half-done.json'), 'utf8')).toBe(
      JSON.stringify(halfDone, null, 2),
    );
  });

  it('stacks the panels at 60 columns and keeps every line inside them', async () => {
    const app = await newCase({ columns: 60 });
    const f = app.frame();
    const lines = f.split('\n');
    const prompt = lines.findIndex((l) => l.includes('Case or report reference'));
    const chain = lines.findIndex((l) => l.includes('Chain so far'));
    expect(chain).toBeGreaterThan(prompt);
    // Stacked: nothing sits beside the prompt.
    expect(lines[prompt]).not.toContain('│');
    for (const l of lines) expect([...l].length).toBeLessThanOrEqual(60);
  });

  it('puts the chain beside the question at 80 columns', async () => {
    const app = await newCase({ columns: 80, rows: 24 });
    const line = app
      .frame()
      .split('\n')
      .find((l) => l.includes('Case or report reference'))!;
    // The panel's border is on the prompt's own line: side by side.
    expect(line).toMatch(/[│┌]/);
  });
});

describe('NO_COLOR', () => {
  it('draws with colour codes normally and none at all under NO_COLOR', async () => {
    const level = chalk.level;
    try {
      chalk.level = 3;
      const coloured = renderApp({ color: true });
      await coloured.waitText('No cases here yet');
      // eslint-disable-next-line no-control-regex -- a colour code begins with ESC [
      expect(coloured.lastFrame()).toMatch(/\u001B\[/);
      cleanup();
      expect(applyColorPolicy({ NO_COLOR: '1' })).toBe(false);
      const plain = renderApp({ color: false });
      await plain.waitText('No cases here yet');
      await plain.press('n', 'Case or report reference');
      // eslint-disable-next-line no-control-regex -- no escape code at all
      expect(plain.lastFrame()).not.toMatch(/\u001B/);
    } finally {
      chalk.level = level;
    }
  });

  it('leaves colour alone when NO_COLOR is empty', () => {
    const level = chalk.level;
    chalk.level = 2;
    expect(applyColorPolicy({ NO_COLOR: '' })).toBe(true);
    chalk.level = level;
  });
});

describe('review', () => {
  it('shows the figures solve gives for the saved case, the limit and the cautions', async () => {
    const app = renderApp({ rows: 200, columns: 100 });
    await app.waitText('No cases here yet');
    // The yaw demo is complete: it opens on its review, with nothing left to ask.
    await app.press('d', 'Review');
    let f = await app.waitText('Cautions');
    // Solve the file as it is on disk, as `skidcase solve` would.
    const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
    const loaded = loadCaseText(fs.readFileSync(path.join(app.dir, file), 'utf8'));
    if (!loaded.ok) throw new Error('saved demo copy does not load');
    const sol = solveCase(loaded.case);
    const a = sol.analyses[0]!;
    if (!a.ok) throw new Error(a.reason);
    const flat = f.replace(/\s+/g, ' ');
    for (const s of a.solution.steps) {
      expect(flat).toContain(s.name);
      expect(flat).toContain(s.substituted.replace(/\s+/g, ' '));
    }
    expect(flat).toContain(`at least ${a.solution.minimum} ${sol.units.speed}`);
    expect(flat).toContain(`${a.solution.speed.value.toFixed(1)} ${sol.units.speed}`);
    expect(flat).toMatch(/Posted limit \d+ km\/h/);
    expect(flat).toContain('This tool does not state fault.');
    await app.press('w', 'Write the report as');
    await app.press('m', /Writing the report|Report written to/);
    f = await app.waitText('Report written to', 30_000);
    expect(fs.readdirSync(app.dir).some((n) => n.endsWith('.md'))).toBe(true);
  });
});

describe('go-to list', () => {
  it('shows each question’s state, keeping answers of a branch that no longer applies as unused', async () => {
    const app = await newCase();
    await toLimit(app);
    await app.press(ENTER, 'Which vehicle');
    await app.press(ENTER, 'What do the marks look like?');
    // The brakes are asked once the marks are a slide, inside that analysis.
    await app.press('d', 'Were all four brakes working?');
    await app.press('e', 'Braking efficiency n');
    await app.answer('0.8', 'What is the estimate based on?');
    // Back to the brakes question, and change the answer: the estimate no longer applies.
    await app.press(ctrl('b'), 'Braking efficiency n');
    await app.press(ctrl('b'), 'Were all four brakes working?');
    await app.press('a', 'A short label');
    await app.press(ctrl('g'), 'Go to:');
    for (const ch of 'brak') app.stdin.write(ch);
    const f = await app.waitText('Go to: brak');
    // Each row shows its answer, so the list doubles as a summary to jump from.
    expect(f).toMatch(/answered\s+Brakes: all working · Analysis 1 - slide/);
    expect(f).toMatch(/not used now\s+Braking efficiency: 0\.8 · Analysis 1 - slide/);
    await app.press(ESC, 'A short label');
  });

  it('says when nothing matches', async () => {
    const app = await newCase();
    await app.press(ctrl('g'), 'Go to:');
    for (const ch of 'zzqx') app.stdin.write(ch);
    await app.waitText('No question matches "zzqx".');
  });
});

describe('choices', () => {
  it('takes keys typed ahead in one read through a choice and on into the next answer', async () => {
    const app = await newCase();
    app.stdin.write('REF-9\r\r\r\r\rf56\r');
    await app.waitText('Which vehicle left the marks?');
    await app.waitText(/saved \d/);
    await app.waitFor(() => {
      const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
      const c = JSON.parse(fs.readFileSync(path.join(app.dir, file), 'utf8'));
      return c.postedLimit === 56 && c.details?.reference === 'REF-9';
    }, 'the typed-ahead answers on disk');
  });

  it('Enter picks the highlighted choice after moving with the arrows', async () => {
    const app = await newCase();
    for (let i = 0; i < 5; i++) await app.press(ENTER);
    await app.waitText('> [f]');
    await app.press(DOWN, '> [m]');
    const f = await app.press(ENTER, 'Posted speed limit');
    expect(f).toContain('in km/h');
  });
});

describe('a case reopened', () => {
  it('says when it was last saved instead of "no changes yet"', async () => {
    const app = renderApp({ files: { 'half-done.json': halfDone } });
    await app.waitText('half-done');
    const f = await app.press(ENTER, 'Resumed');
    // halfDone was saved 2026-11-29T09:00:00Z (fixtures.ts), shown in local time to the minute.
    const at = new Date('2026-11-29T09:00:00Z');
    const p = (n: number) => String(n).padStart(2, '0');
    expect(f).toContain(`last saved 2026-11-${p(at.getDate())} ${p(at.getHours())}:00`);
    expect(f).not.toContain('no changes yet');
  });
});

describe('what Enter gives', () => {
  it('on a choice, names the choice marked >, following the arrows', async () => {
    const app = await newCase();
    for (let i = 0; i < 5; i++) await app.press(ENTER);
    let f = await app.waitText('Which units');
    expect(f).toContain('Enter accepts: feet and mph');
    f = await app.press(DOWN, 'Enter accepts: metres and km/h');
    expect(f).toMatch(/> \[m\] metres and km\/h/);
    await app.press(ENTER, 'Posted speed limit');
    // Back on the units: the answer given is marked and named, not the offered default.
    f = await app.press(ctrl('b'), 'Which units');
    expect(f).toContain('Enter accepts: metres and km/h');
  });
});

describe('keys pressed by mistake', () => {
  it('a letter that is no choice says which letters are', async () => {
    const app = await newCase();
    for (let i = 0; i < 5; i++) await app.press(ENTER);
    await app.waitText('Which units');
    // The letter is typed on the choice's line and read on Enter.
    await app.press('x', '> x');
    const f = await app.press(ENTER, 'is not one of the choices');
    expect(f).toContain('"x" is not one of the choices: press f (feet and mph), m');
    // Esc takes the message away and the question is as it was.
    app.stdin.write(ESC);
    const g = await app.waitFor(
      (t) => !t.includes('is not one of the choices'),
      'the message gone',
    );
    expect(g).toContain('Which units');
  });

  it('Esc on a typed question puts back the answer as it was before typing', async () => {
    const app = await newCase();
    await toLimit(app);
    await app.answer('45', 'Which vehicle');
    await app.press(ctrl('b'), 'Posted speed limit');
    for (const ch of '9x') app.stdin.write(ch);
    await app.waitText('459x');
    app.stdin.write(ESC);
    const f = await app.waitFor((t) => !t.includes('459x'), 'the typing put back');
    expect(f).toMatch(/> 45/);
    expect(f).toContain('Posted speed limit');
  });
});
