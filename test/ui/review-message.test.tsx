import fs from 'node:fs';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER, renderApp } from './render-app.js';
import { finishedSlide } from './fixtures.js';

afterEach(() => cleanup());

// At 60 columns the "Report written to <path>" line is longer than the screen is wide: it wraps
// onto two rows, and the review above it is one row shorter, so the header stays on screen.
describe('the report message under the review', () => {
  it('wraps at 60 columns without pushing the header off a 24-row screen', async () => {
    const app = renderApp({
      files: { 'finished-slide.json': finishedSlide },
      columns: 60,
      rows: 24,
    });
    await app.waitText('finished-slide');
    await app.press(ENTER, 'Analysis 1 · slide · skid-1');
    await app.press('w', 'Write the report as');
    await app.press('m', /Writing the report|Report written to/);
    const f = await app.waitText('Report written to', 30_000);
    const lines = f.split('\n');
    const name = fs.readdirSync(app.dir).find((n) => n.includes('-report-') && n.endsWith('.md'))!;
    const path = `${app.dir}/${name}`;
    // the whole path is on screen, over the rows the message wraps onto
    expect(f.replace(/\s+/g, '')).toContain(`Reportwrittento${path}`.replace(/\s+/g, ''));
    // the message is longer than a row: it takes two or more
    expect(`Report written to ${path}`.length).toBeGreaterThan(59);
    // the whole frame fits the 24 rows (one more and the terminal scrolls the header away)
    expect(lines.length).toBeLessThanOrEqual(24);
    // the header is the first row, the position line and the footer still under the review
    expect(lines[0]).toContain('finished-slide');
    expect(f).toMatch(/lines \d+-\d+ of \d+/);
    expect(lines.at(-1)).toContain('w write report');
  });
});
