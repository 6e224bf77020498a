/**
 * Figures typed as a list keep the decimals they were typed with (docs/case-file.md,
 * "Quantities"): in the saved file and in the text report's measurements as entered. Every number
 * here is invented.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER } from './render-app.js';
import { toDragSource, toLook, type App } from './walks.js';
import { runReport } from '../report/helpers.js';

afterEach(() => cleanup());

function savedFile(app: App): string {
  const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
  return path.join(app.dir, file);
}
const savedCase = (app: App) => JSON.parse(fs.readFileSync(savedFile(app), 'utf8'));

async function toReview(app: App): Promise<void> {
  await app.press('r', 'Where was the conflict point');
  await app.press(ENTER, 'Perception-reaction time');
  await app.press(ENTER, 'Add another analysis');
  await app.press(ENTER, 'Also show a distribution');
  await app.press(ENTER, 'At a glance');
}

describe('decimals typed in a list', () => {
  it('mark lengths 52.0 55.50 ... and sled pulls stay as typed in the file and the text report', async () => {
    const app = await toLook();
    await toDragSource(app, { lengths: '52.0 55.50 54.25 53' });
    await app.press('s', 'Weight of the drag sled');
    await app.answer('75', 'Pull readings');
    await app.answer('52.0 54.5 51.50', 'Grade, the slide');
    await app.answer('0', 'How did the slide end');
    await toReview(app);
    const a = savedCase(app).analyses[0];
    expect(a.marks).toEqual([{ value: 52, decimals: 1 }, { value: 55.5, decimals: 2 }, 54.25, 53]);
    expect(a.segments[0].drag.pulls).toEqual([
      { value: 52, decimals: 1 },
      54.5,
      { value: 51.5, decimals: 2 },
    ]);
    const report = await runReport(savedFile(app), { format: 'txt' });
    expect(report.code, report.err).toBe(0);
    expect(report.out).toMatch(/Mark 1\s+52\.0\s+none\s+ft/);
    expect(report.out).toMatch(/Mark 2\s+55\.50\s+none\s+ft/);
    expect(report.out).toMatch(/Mark 3\s+54\.25\s+none\s+ft/);
    expect(report.out).toMatch(/Mark 4\s+53\s+none\s+ft/);
    expect(report.out).toMatch(/Sled pull 1\s+52\.0\s/);
    expect(report.out).toMatch(/Sled pull 3\s+51\.50\s/);
  });

  it('a converted mark is kept as converted, with no typed decimals', async () => {
    const app = await toLook();
    await toDragSource(app, { lengths: '52.0 55.50 16.00 m 53' });
    await app.press('e', 'Drag factor for the slide');
    await app.answer('0.70', 'Grade, the slide');
    await app.answer('0', 'How did the slide end');
    await toReview(app);
    const marks = savedCase(app).analyses[0].marks;
    expect(marks[0]).toEqual({ value: 52, decimals: 1 });
    // 16.00 m is 52.49 ft: a figure nobody typed, so no decimals are recorded for it.
    expect(typeof marks[2]).toBe('number');
    expect(marks[2]).toBeCloseTo(16 / 0.3048, 9);
  });
});
