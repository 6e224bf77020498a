import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER, ctrl, renderApp } from './render-app.js';
import { finishedSlide, halfDone, truncated } from './fixtures.js';

afterEach(() => cleanup());

describe('home screen', () => {
  it('shows the sessions folder and where it came from', async () => {
    const app = renderApp();
    const f = await app.waitText('No cases here yet');
    expect(f).toContain(`Cases in ${app.dir}`);
    expect(f).toContain('set by --sessions');
  });

  it('lists cases newest first, with progress, where each stopped, and the result', async () => {
    const app = renderApp({
      files: { 'finished-slide.json': finishedSlide, 'half-done.json': halfDone },
    });
    const f = await app.waitText('half-done');
    expect(f.indexOf('finished-slide')).toBeLessThan(f.indexOf('half-done'));
    expect(f).toContain('UI-TEST-FINISHED');
    // S = sqrt(30 × 100 × 0.60) = 42.43 at the low end (slide to stop): "at least 42 mph".
    expect(f).toContain('at least 42 mph');
    expect(f).toMatch(
      /half-done · UI-TEST-HALF · saved 2026-11-\d\d \d\d:00\n\s+5 of \d+ answered · stopped at: Units/,
    );
  });

  it('names a broken file with its problem, never opens it, and offers its backup', async () => {
    const app = renderApp({
      files: {
        'cut-off.json': truncated,
        'cut-off.json.bak': { ...finishedSlide, id: 'cut-off', details: { reference: 'RESTORED' } },
      },
    });
    let f = await app.waitText('cannot be read');
    expect(f).toContain('not valid JSON');
    expect(f).toContain('Press b to restore its backup copy');
    f = await app.press(ENTER, 'cut-off cannot be opened');
    expect(fs.readFileSync(path.join(app.dir, 'cut-off.json'), 'utf8')).toBe(truncated);
    f = await app.press('b', 'Restored cut-off');
    await app.waitText('RESTORED');
  });

  it('quits with q', async () => {
    const app = renderApp();
    await app.waitText('No cases here yet');
    app.stdin.write('q');
    await app.waitFor(() => app.exits.length > 0, 'exit');
    expect(app.exits).toEqual([0]);
  });

  it('Ctrl+C leaves cleanly from the list too', async () => {
    const app = renderApp();
    await app.waitText('No cases here yet');
    app.stdin.write(ctrl('c'));
    await app.waitFor(() => app.exits.length > 0, 'exit');
    expect(app.exits).toEqual([0]);
  });
});
