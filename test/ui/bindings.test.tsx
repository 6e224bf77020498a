import fs from 'node:fs';
import path from 'node:path';
import { trackedTempDir } from '../temp-dirs.js';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { KEY_TABLE, bindingKeys, keyLabel, type Command } from '../../src/ui/keys.js';
import { QUICK_ENTRY_HELP } from '../../src/input/index.js';
import { DOWN, ENTER, ESC, PAGE_DOWN, UP, ctrl, renderApp } from './render-app.js';
import { finishedSlide, halfDone, truncated } from './fixtures.js';
import { readPdf } from '../report/pdf-read.js';

afterEach(() => cleanup());

type App = ReturnType<typeof renderApp>;
const flat = (s: string) => s.replace(/[│╭╮╰╯─]/g, ' ').replace(/\s+/g, ' ');

async function home(o: Parameters<typeof renderApp>[0] = {}): Promise<App> {
  const app = renderApp(o);
  await app.waitFor((f) => f.includes('Cases in'), 'the case list');
  return app;
}
async function fresh(o: Parameters<typeof renderApp>[0] = {}): Promise<App> {
  const app = await home(o);
  await app.press('n', 'Case or report reference');
  return app;
}
/** The finished case, opened on its review. */
async function review(rows = 30): Promise<App> {
  const app = await home({ files: { 'finished-slide.json': finishedSlide }, rows });
  await app.waitText('finished-slide');
  await app.press(ENTER, 'Analysis 1 · slide · skid-1');
  return app;
}
async function exited(app: App) {
  await app.waitFor(() => app.exits.length > 0, 'the app to exit');
  return app.exits;
}

/**
 * The half-done case opened, then changed outside skidcase (a new reference typed in an editor),
 * then an answer given here: the save finds the outside change and waits for a choice.
 */
async function conflicted(): Promise<
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- a saved case file, read field by field
  App & { file: string; read(name?: string): Record<string, any> }
> {
  const app = await home({
    files: { 'half-done.json': halfDone },
    start: { kind: 'resume', id: 'half-done' },
  });
  await app.waitText('Which units were the measurements taken in?');
  const file = path.join(app.dir, 'half-done.json');
  const theirs = JSON.parse(fs.readFileSync(file, 'utf8'));
  theirs.details.reference = 'CHANGED-IN-EDITOR';
  fs.writeFileSync(file, JSON.stringify(theirs, null, 2));
  const f = await app.press('m', 'was changed outside skidcase');
  expect(f).toContain(
    'not saved: half-done.json was changed outside skidcase since it was last saved here',
  );
  expect(f).toMatch(/l load theirs/);
  // Nothing was written over their version.
  expect(JSON.parse(fs.readFileSync(file, 'utf8')).details.reference).toBe('CHANGED-IN-EDITOR');
  const read = (name = 'half-done.json') =>
    JSON.parse(fs.readFileSync(path.join(app.dir, name), 'utf8'));
  return Object.assign(app, { file, read });
}

/** Picks a report form with `key` and returns the file written, checking its extension. */
async function written(app: App, key: string, ext: string): Promise<string> {
  // "Writing the report" shows while it is written; a quick report may already be done.
  await app.press(key, /Writing the report|Report written to/);
  // The report runs the sampling extras: give it longer than a key press.
  const f = await app.waitText('Report written to', 30_000);
  const name = /Report written to (\S+)/.exec(f)![1]!;
  expect(path.extname(name)).toBe(ext);
  return name;
}

/** What each command must do, checked through the keys the table gives it. */
const CHECKS: Record<Command, (keys: string) => Promise<void>> = {
  async help(k) {
    const app = await fresh();
    let f = await app.press(k, 'Show or hide this list of keys');
    expect(f).toContain('Keys');
    f = await app.press(k, 'Case or report reference');
    expect(f).not.toContain('Show or hide this list of keys');
  },
  async 'save-leave'(k) {
    const app = await fresh();
    await app.answer('LEAVE-1', /saved \d/);
    app.stdin.write(k);
    app.stdin.write(k); // a second press while leaving changes nothing
    expect(await exited(app)).toEqual([0]);
    const names = fs.readdirSync(app.dir);
    expect(names.some((n) => n.endsWith('.lock'))).toBe(false);
    const file = names.find((n) => n.endsWith('.json'))!;
    expect(JSON.parse(fs.readFileSync(path.join(app.dir, file), 'utf8')).details.reference).toBe(
      'LEAVE-1',
    );
  },
  async 'save-now'(k) {
    // The first save meets a full disk; after space is freed the save key writes the answer.
    let full = true;
    const app = await fresh({
      services: (s) => ({
        ...s,
        saveCase: (open, c, o) =>
          full
            ? { ok: false, message: 'not saved: the disk is full', problem: 'full' }
            : s.saveCase(open, c, o),
      }),
    });
    let f = await app.answer('SAVE-NOW-1', 'the disk is full');
    expect(flat(f)).toContain(
      'the answers are kept in memory; free space, then press Ctrl+S to save again',
    );
    full = false;
    f = await app.press(k, /saved \d\d:\d\d:\d\d/);
    const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
    expect(JSON.parse(fs.readFileSync(path.join(app.dir, file), 'utf8')).details.reference).toBe(
      'SAVE-NOW-1',
    );
  },
  async 'load-theirs'(k) {
    const app = await conflicted();
    const f = await app.press(k, 'Loaded the version changed outside skidcase');
    expect(f).toContain('CHANGED-IN-EDITOR');
    expect(app.read().details.reference).toBe('CHANGED-IN-EDITOR');
    expect(app.read().units).not.toBe('metric'); // the answer given here was dropped, as offered
  },
  async 'keep-mine'(k) {
    const app = await conflicted();
    const f = await app.press(
      k,
      /The version changed outside skidcase was kept beside it as half-done\.outside-/,
    );
    expect(f).toMatch(/saved \d\d:\d\d:\d\d/);
    expect(app.read().units).toBe('metric');
    const kept = fs.readdirSync(app.dir).find((n) => n.startsWith('half-done.outside-'))!;
    expect(app.read(kept).details.reference).toBe('CHANGED-IN-EDITOR');
  },
  async 'copy-mine'(k) {
    const app = await conflicted();
    const f = await app.press(k, 'Saved as a new case half-done-copy');
    expect(f).toContain('was left as it is');
    expect(app.read('half-done-copy.json').units).toBe('metric');
    expect(app.read().details.reference).toBe('CHANGED-IN-EDITOR');
    expect(app.read().units).not.toBe('metric');
    // The work goes on in the copy: the next answer lands there.
    expect(fs.existsSync(path.join(app.dir, 'half-done-copy.json.lock'))).toBe(true);
    expect(fs.existsSync(path.join(app.dir, 'half-done.json.lock'))).toBe(false);
  },
  async quit(k) {
    const app = await home();
    app.stdin.write(k);
    expect(await exited(app)).toEqual([0]);
  },
  async submit(k) {
    const app = await fresh();
    await app.press(k, 'When did the crash happen?');
  },
  async pick() {
    const app = await fresh();
    for (let i = 0; i < 5; i++) await app.press(ENTER);
    await app.waitText('Which units');
    const f = await app.press('m', 'Posted speed limit');
    expect(f).toContain('in km/h');
  },
  async back(k) {
    const app = await fresh();
    await app.press(ENTER, 'When did the crash happen?');
    await app.press(k, 'Case or report reference');
  },
  async forward(k) {
    const app = await fresh();
    await app.press(ENTER, 'When did the crash happen?');
    await app.press(ctrl('b'), 'Case or report reference');
    const f = await app.press(k, 'When did the crash happen?');
    expect(f).toMatch(/1 of \d+ answered/);
  },
  async jump(k) {
    const app = await fresh();
    await app.press(k, 'Go to:');
    for (const ch of 'unit') app.stdin.write(ch);
    const f = await app.waitText('Go to: unit');
    expect(f).toMatch(/open\s+Units · Case/);
    await app.press(ENTER, 'Which units were the measurements taken in?');
  },
  async undo(k) {
    const app = await fresh();
    await app.answer('UNDO-ME', 'When did the crash happen?');
    const f = await app.press(k, 'Case or report reference');
    expect(f).toMatch(/0 of \d+ answered/);
  },
  async review(k) {
    const app = await fresh();
    const f = await app.press(k, /Review · /);
    expect(f).toContain('Cautions');
  },
  async explain(k) {
    const app = await fresh();
    expect(app.frame()).toContain('Why:');
    let f = await app.press(k, 'shows why this is asked');
    expect(f).not.toContain('Why:');
    f = await app.press(k, 'Why:');
  },
  async mode(k) {
    const app = await fresh();
    await app.press(k, 'brisk mode');
    // the preference is written through conf, which is loaded on this first write
    await vi.waitFor(() => {
      const cfg = JSON.parse(fs.readFileSync(path.join(app.cfg, 'config.json'), 'utf8'));
      expect(cfg.mode).toBe('brisk');
    });
    await app.press(k, 'guided mode');
  },
  async up(k) {
    const app = await fresh();
    for (let i = 0; i < 5; i++) await app.press(ENTER);
    await app.waitText('> [f]');
    await app.press(DOWN, '> [m]');
    await app.press(k, '> [f]');
  },
  async down(k) {
    const app = await home({
      files: { 'finished-slide.json': finishedSlide, 'half-done.json': halfDone },
    });
    await app.waitText('> finished-slide');
    await app.press(k, '> half-done');
    await app.press(UP, '> finished-slide');
  },
  async 'page-up'(k) {
    const app = await review(24);
    await app.press(PAGE_DOWN, /lines (?!1-)\d+-/);
    await app.press(k, /lines 1-/);
  },
  async 'page-down'(k) {
    const app = await review(24);
    const f = await app.press(k, /lines (?!1-)\d+-/);
    expect(f).toContain('↑/PgUp back');
  },
  async close(k) {
    const app = await review();
    await app.press('g', 'Go to:');
    await app.press(k, 'Analysis 1 · slide · skid-1');
    app.stdin.write(k);
    const f = await app.waitFor((x) => !x.includes('Analysis 1 · slide · skid-1'), 'the questions');
    // The last question of the case: the distribution, asked once at its end.
    expect(f).toContain('Also show a distribution of the speed');
  },
  async 'new-case'(k) {
    const app = await home();
    await app.press(k, 'Case or report reference');
  },
  async 'open-path'(k) {
    const elsewhere = trackedTempDir(
      'skidcase-other-',
      fs.realpathSync(process.env.TMPDIR ?? '/tmp'),
    );
    const file = path.join(elsewhere, 'finished-slide.json');
    fs.writeFileSync(file, JSON.stringify(finishedSlide));
    const app = await home();
    await app.press(k, 'File to open:');
    app.stdin.write(file);
    await app.waitText('finished-slide.json');
    await app.press(ENTER, 'UI-TEST-FINISHED');
  },
  async demo(k) {
    const app = await home();
    // The yaw demo is complete (no brakes to ask for a yaw): it opens on its review.
    const f = await app.press(k, 'critical speed (yaw)');
    expect(f).toContain('demo-copy');
  },
  async restore(k) {
    const app = await home({
      files: { 'cut-off.json': truncated, 'cut-off.json.bak': { ...finishedSlide, id: 'cut-off' } },
    });
    await app.waitText('restore its backup');
    await app.press(k, 'Restored cut-off');
  },
  async report(k) {
    const app = await review();
    const f = await app.press(k, 'Write the report as');
    expect(f).toContain('Its keys are below; Enter takes Markdown.');
    expect(f).toMatch(/m Markdown +t text +h HTML +p PDF +j JSON +Esc no report/);
    // Enter takes Markdown, as the line says
    const name = await written(app, ENTER, '.md');
    expect(fs.readFileSync(name, 'utf8')).toContain('at least 42 mph');
  },
  async 'report-md'(k) {
    const app = await review();
    await app.press('w', 'Write the report as');
    const text = fs.readFileSync(await written(app, k, '.md'), 'utf8');
    expect(text).toMatch(/^# /);
    expect(text).toContain('at least 42 mph');
  },
  async 'report-txt'(k) {
    const app = await review();
    await app.press('w', 'Write the report as');
    const text = fs.readFileSync(await written(app, k, '.txt'), 'utf8');
    expect(text).not.toMatch(/^# /m);
    expect(text).toContain('at least 42 mph');
  },
  async 'report-html'(k) {
    const app = await review();
    await app.press('w', 'Write the report as');
    const text = fs.readFileSync(await written(app, k, '.html'), 'utf8');
    expect(text).toMatch(/^<!doctype html>/i);
    expect(text).toContain('at least 42 mph');
  },
  async 'report-pdf'(k) {
    const app = await review();
    await app.press('w', 'Write the report as');
    const pdf = await readPdf(fs.readFileSync(await written(app, k, '.pdf')));
    // a case in feet is laid out on US Letter
    expect(pdf.sizes[0]).toEqual([612, 792]);
    expect(pdf.pages.join(' ')).toContain('at least 42 mph');
  },
  async 'report-json'(k) {
    const app = await review();
    await app.press('w', 'Write the report as');
    const doc = JSON.parse(fs.readFileSync(await written(app, k, '.json'), 'utf8'));
    expect(doc.format).toBe('skidcase-report');
    expect(JSON.stringify(doc)).toContain('at least 42 mph');
  },
  async 'report-cancel'(k) {
    const app = await review();
    await app.press('w', 'Write the report as');
    const f = await app.press(k);
    expect(f).not.toContain('Write the report as');
    expect(f).toContain('w write report');
    expect(fs.readdirSync(app.dir).filter((n) => n.includes('-report-'))).toEqual([]);
  },
  async 'to-list'(k) {
    const app = await fresh();
    await app.answer('LIST-1', /saved \d/);
    const f = await app.press(k, 'LIST-1');
    expect(f).toContain('Cases in');
    expect(fs.readdirSync(app.dir).some((n) => n.endsWith('.lock'))).toBe(false);
  },
  async 'to-question'(k) {
    const app = await review();
    await app.press(k, 'Go to:');
  },
  async 'line-start'(k) {
    const app = await fresh();
    for (const ch of 'abc') app.stdin.write(ch);
    await app.waitText('abc');
    app.stdin.write(k);
    await app.press('X', 'X|abc');
  },
  async 'line-end'(k) {
    const app = await fresh();
    for (const ch of 'abc') app.stdin.write(ch);
    await app.waitText('abc');
    app.stdin.write(ctrl('a'));
    await app.press('X', 'X|abc');
    app.stdin.write(k);
    await app.press('Y', '> XabcY_');
  },
  async 'line-clear'(k) {
    const app = await fresh();
    for (const ch of 'abc') app.stdin.write(ch);
    await app.waitText('abc');
    app.stdin.write(k);
    const f = await app.press('Z', /> Z/);
    expect(f).not.toContain('abc');
  },
};

const HOME = '\u001B[H';
const END = '\u001B[F';

describe('key bindings', () => {
  it.each(KEY_TABLE.map((b) => [b.command, b] as const))(
    '%s does what the help says',
    async (_c, b) => {
      const k = b.keys[0]!;
      const bytes =
        k.name === 'return'
          ? ENTER
          : k.name === 'escape'
            ? ESC
            : k.name === 'up'
              ? UP
              : k.name === 'down'
                ? DOWN
                : k.name === 'pagedown'
                  ? PAGE_DOWN
                  : k.name === 'pageup'
                    ? '\u001B[5~'
                    : k.name === 'home'
                      ? HOME
                      : k.name === 'end'
                        ? END
                        : k.ctrl
                          ? ctrl(k.name)
                          : k.name;
      await CHECKS[b.command](bytes);
    },
  );

  it('Ctrl+P goes back like Ctrl+B (Ctrl+B is the tmux prefix)', async () => {
    await CHECKS.back(ctrl('p'));
  });

  it('Home moves to the start like Ctrl+A', async () => {
    await CHECKS['line-start'](HOME);
  });

  it('Ctrl+C saves and leaves like Ctrl+Q', async () => {
    await CHECKS['save-leave'](ctrl('c'));
  });

  it('the help overlay lists every binding of the table, and the quick-entry syntax', async () => {
    const app = await fresh({ rows: 200 });
    const f = flat(await app.press(ctrl('k'), 'Quick entry'));
    for (const b of KEY_TABLE) {
      expect(f, b.command).toContain(bindingKeys(b));
      expect(f, b.command).toContain(b.description.replace(/\s+/g, ' '));
    }
    for (const line of QUICK_ENTRY_HELP) expect(f).toContain(line.trim().replace(/\s+/g, ' '));
  });

  it('the footer hints come from the table', async () => {
    const app = await home();
    const last = app.frame().trimEnd().split('\n').at(-1)!;
    // Wide enough for every home hint: each one is a binding's first key and its label there.
    for (const b of KEY_TABLE.filter((x) => x.footer?.includes('home')))
      expect(last).toContain(`${keyLabel(b.keys[0]!)} ${b.labelIn?.home ?? b.label}`);
  });
});
