/**
 * The footer: one line at any width, the help key always in it, every hint a binding of the key
 * table, and what is left out still in the help overlay. Frames come from the whole app.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { KEY_TABLE, footerLine, keyLabel, type KeyContext } from '../../src/ui/keys.js';
import { ENTER, ctrl, renderApp } from './render-app.js';
import { finishedSlide } from './fixtures.js';

afterEach(() => cleanup());

const lastLine = (f: string) => f.trimEnd().split('\n').at(-1)!;
const cols = (s: string) => [...s].length;

/** Every hint a context's footer could show, as written there. */
function allHints(ctx: KeyContext): string[] {
  return KEY_TABLE.filter((b) => b.footer?.includes(ctx)).map(
    (b) => `${keyLabel(b.keys[0]!)} ${b.labelIn?.[ctx] ?? b.label}`,
  );
}

describe('footer line', () => {
  it.each(['home', 'question', 'choice', 'review', 'jump', 'path', 'help'] as KeyContext[])(
    'in %s fits 80 and 60 columns on one line, the help key first',
    (ctx) => {
      for (const width of [79, 59, 30]) {
        const hints = footerLine(ctx, width);
        expect(hints[0]).toBe(ctx === 'help' ? 'Ctrl+K hide keys' : 'Ctrl+K all keys');
        expect(cols(hints.join('  '))).toBeLessThanOrEqual(Math.max(width, cols(hints[0]!)));
        for (const h of hints) expect(allHints(ctx)).toContain(h);
      }
    },
  );

  it('keeps the keys a new investigator needs on a question at 80 columns', () => {
    const hints = footerLine('question', 79);
    for (const h of ['Enter accept', 'Ctrl+P back', 'Ctrl+E why/how', 'Ctrl+Q save & leave'])
      expect(hints).toContain(h);
  });

  it('at 60 columns keeps the keys that keep or lose work: save & leave on a question, open file on the list', () => {
    for (const ctx of ['question', 'choice', 'review'] as const)
      expect(footerLine(ctx, 59), ctx).toContain('Ctrl+Q save & leave');
    expect(footerLine('home', 59)).toContain('o open file');
    expect(footerLine('home', 59)).toContain('n new case');
  });

  it('shows fewer hints at 60 columns, never the help key missing', () => {
    expect(footerLine('question', 59).length).toBeLessThan(footerLine('question', 79).length);
    expect(footerLine('question', 59)).toContain('Enter accept');
  });
});

describe('footer on screen', () => {
  async function onQuestion(columns: number) {
    const app = renderApp({ columns, rows: 24 });
    await app.waitFor((f) => f.includes('Cases in'), 'the case list');
    await app.press('n', 'Case or report reference');
    return app;
  }

  it.each([80, 60])('is one line at %i columns on a question and a choice', async (columns) => {
    const app = await onQuestion(columns);
    let f = app.frame();
    const line = lastLine(f);
    expect(line.startsWith('Ctrl+K all keys')).toBe(true);
    expect(cols(line)).toBeLessThan(columns);
    // The line above the footer is the screen's own, not a second row of hints.
    expect(f.trimEnd().split('\n').at(-2)).not.toMatch(/Ctrl\+[A-Z] /);
    for (let i = 0; i < 5; i++) f = await app.press(ENTER);
    f = await app.waitText('Which units');
    expect(lastLine(f).startsWith('Ctrl+K all keys')).toBe(true);
    expect(f.trimEnd().split('\n').at(-2)).not.toMatch(/Ctrl\+[A-Z] /);
  });

  it('says on the case list that Enter opens the case picked, and it does', async () => {
    const app = renderApp({ files: { 'finished-slide.json': finishedSlide }, columns: 80 });
    const f = await app.waitText('finished-slide');
    expect(lastLine(f)).toContain('Enter open');
    await app.press(ENTER, 'Analysis 1 · slide · skid-1');
    expect(lastLine(app.frame())).toContain('w write report');
    expect(lastLine(app.frame())).toContain('Esc back to questions');
  });

  it('offers no Enter on an empty case list, where there is nothing to open', async () => {
    const app = renderApp({ columns: 80 });
    const f = await app.waitText('No cases here yet');
    expect(lastLine(f)).not.toContain('Enter');
    expect(lastLine(f)).toContain('n new case');
  });

  it('a key left out of the footer is still in the help overlay', async () => {
    const app = await onQuestion(80);
    expect(lastLine(app.frame())).not.toContain('Ctrl+Z');
    const f = await app.press(ctrl('k'), 'Undo the last answer');
    expect(f).toContain('Ctrl+Z');
  });
});
