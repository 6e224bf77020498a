/**
 * The segments' line in the app: typed straight at "one surface, or several?", with labels that
 * need no brackets; and a one-surface line without a length (`@0.74 -1%`), which takes its
 * distance from the marks and is no "several surfaces" slide. Every number here is invented.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER } from './render-app.js';
import { toLook, type App } from './walks.js';
import { runReport } from '../report/helpers.js';

afterEach(() => cleanup());

const savedCase = (app: App) => {
  const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
  return JSON.parse(fs.readFileSync(path.join(app.dir, file), 'utf8'));
};

/** From the look of the marks to "one surface, or several?" (dark marks, every brake working). */
async function toSurfaces(app: App): Promise<void> {
  await app.press('d', 'Were all four brakes working?');
  await app.press('a', 'A short label');
  await app.press(ENTER, 'Did the vehicle slide over one surface');
}

/** Letters of a line typed one by one, as a person types. */
async function typeLine(app: App, line: string): Promise<void> {
  for (const ch of line) app.stdin.write(ch);
  await app.waitText(line.slice(-12));
}

describe('the segments on one line', () => {
  it('typed at the surfaces question, with bare labels: no line question after, labels and grades kept', async () => {
    const app = await toLook();
    await toSurfaces(app);
    await typeLine(app, '52.5 @0.70-0.80 -3 asphalt lane, 21 @0.45-0.55 -3% gravel shoulder');
    let f = await app.press(ENTER, 'How many tire marks');
    expect(f).toContain('2 segments filled in');
    expect(f).toContain('Analysis 1 - slide, several surfaces');
    await app.answer('2', 'Length of each mark');
    await app.answer('73 74', 'Which slide distance');
    f = await app.press(ENTER, 'How did the slide end');
    expect(f).not.toContain('Each segment as length @drag');
    await app.press('r', 'Where was the conflict point');
    const segs = savedCase(app).analyses[0].segments;
    expect(segs).toEqual([
      {
        label: 'asphalt lane',
        length: 52.5,
        drag: { source: 'entered', value: 0.75, low: 0.7, high: 0.8 },
        grade: -3,
      },
      {
        label: 'gravel shoulder',
        length: 21,
        drag: { source: 'entered', value: 0.5, low: 0.45, high: 0.55 },
        grade: -3,
      },
    ]);
  });

  it('one surface without a length (@0.74 -1%) typed at the surfaces question asks the marks, no segment length, and is no several-surface slide', async () => {
    const app = await toLook();
    await toSurfaces(app);
    await typeLine(app, '@0.74 -1%');
    let f = await app.press(ENTER, 'How many tire marks');
    expect(f).not.toContain('several surfaces');
    // The marks give the distance: their count is not optional here.
    expect(f).not.toContain('optional: the segments give the distance');
    await app.answer('2', 'Length of each mark');
    await app.answer('61 63', 'Which slide distance');
    f = await app.press(ENTER, 'How did the slide end');
    expect(f).not.toContain('Length of segment 1');
    expect(f).not.toContain('several surfaces');
    expect(f).toContain('Analysis 1 - slide');
    await app.press('r', 'Where was the conflict point');
    const a = savedCase(app).analyses[0];
    expect(a.marks).toEqual([61, 63]);
    expect(a.segments).toEqual([{ drag: { source: 'entered', value: 0.74 }, grade: -1 }]);
  });

  it('keeps the decimals each figure was typed with (52.0, 0.70) in the file and the report', async () => {
    const app = await toLook();
    await toSurfaces(app);
    await typeLine(app, '52.0 @0.70 -2% lane, 21.50 @0.45-0.55 -2% shoulder');
    await app.press(ENTER, 'How many tire marks');
    await app.answer('2', 'Length of each mark');
    await app.answer('73.5 74.5', 'Which slide distance');
    await app.press(ENTER, 'How did the slide end');
    await app.press('r', 'Where was the conflict point');
    const segs = savedCase(app).analyses[0].segments;
    expect(segs[0].length).toEqual({ value: 52, decimals: 1 });
    expect(segs[0].drag).toEqual({ source: 'entered', value: 0.7, decimals: 2 });
    expect(segs[1].length).toEqual({ value: 21.5, decimals: 2 });
    const file = path.join(
      app.dir,
      fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!,
    );
    const report = await runReport(file, { format: 'txt' });
    expect(report.out).toMatch(/Segment 1 length\s+52\.0\s/);
    expect(report.out).toMatch(/Segment 1 drag factor \(entered\)\s+0\.70\s/);
    expect(report.out).toMatch(/Segment 2 length\s+21\.50\s/);
  });

  it('one surface without a length by the quick choice: after the line, no segment length and no "several surfaces"', async () => {
    const app = await toLook();
    await toSurfaces(app);
    let f = await app.press('q', 'How many tire marks');
    // Before the line nobody knows how many surfaces it holds: the header does not say several.
    expect(f).not.toContain('several surfaces');
    await app.answer('2', 'Length of each mark');
    await app.answer('61 63', 'Which slide distance');
    await app.press(ENTER, 'Each segment as length @drag');
    f = await app.answer('@0.74 -1%', 'How did the slide end');
    expect(f).not.toContain('Length of segment 1');
    expect(f).not.toContain('several surfaces');
    await app.press('r', 'Where was the conflict point');
    expect(savedCase(app).analyses[0].segments).toEqual([
      { drag: { source: 'entered', value: 0.74 }, grade: -1 },
    ]);
  });
});
