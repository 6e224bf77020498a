/**
 * An airborne analysis typed through the interview: take-off and landing marks, the distance,
 * the signed drop and the take-off angle, each with a tolerance. The figure on the review and in
 * the saved file is the engine's (solveCase on the saved file).
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { loadCaseText } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { formatRange } from '../../src/format/numbers.js';
import { ENTER } from './render-app.js';
import { toLook as toLookShared, type App } from './walks.js';

afterEach(() => cleanup());

const said = (f: string) => f.replace(/\s+/g, ' ');

/** A new imperial case without a posted limit, on to the look of the marks. */
const toLook = (): Promise<App> => toLookShared({ rows: 60, columns: 120 }, '');

function savedCase(app: App) {
  const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
  const r = loadCaseText(fs.readFileSync(path.join(app.dir, file), 'utf8'));
  if (!r.ok) throw new Error(`the saved file does not load: ${r.issues[0]?.message}`);
  return r.case;
}

describe('an airborne analysis through the interview', () => {
  it('asks distance, signed drop and take-off angle, and the review shows the engine figure of the saved file', async () => {
    const app = await toLook();
    let f = said(await app.press('j', 'A short label'));
    expect(f).toContain('the vehicle left the ground');
    await app.answer('off the bank', 'Horizontal distance');
    f = said(app.frame());
    // The help says why the distance matters and what the figure assumes.
    expect(f).toContain('Air drag is neglected');
    await app.answer('62 ± 2', 'Vertical drop');
    f = said(app.frame());
    expect(f).toContain('negative: higher');
    await app.answer('8.5 ± 0.5', 'Slope of the path at take-off');
    // The figure so far (level take-off while the angle is empty) is the engine's step.
    f = said(app.frame());
    expect(f).toMatch(/S = 2\.73\d* × 62\.0 \/ sqrt\(8\.5\d*\) = [\d.]+ mph/);
    await app.answer('-2 ± 1', 'Another analysis?');
    await app.press('n', 'Also show a distribution');
    f = said(await app.press('n', 'Review ·'));
    const c = savedCase(app);
    expect(c.analyses).toHaveLength(1);
    const a = c.analyses[0]!;
    expect(a).toMatchObject({
      kind: 'airborne',
      label: 'off the bank',
      distance: { value: 62, low: 60, high: 64 },
      drop: { value: 8.5, low: 8, high: 9 },
      takeoffGrade: { value: -2, low: -3, high: -1 },
    });
    const solved = solveCase(c).analyses[0]!;
    if (!solved.ok) throw new Error(solved.reason);
    expect(f).toContain(formatRange(solved.solution.speed, 'speed', 'mph'));
    expect(f).toContain('Air drag is neglected');
  });

  it('a drop and angle with no path between them are refused with the reason, and a degree angle is read', async () => {
    const app = await toLook();
    await app.press('j', 'A short label');
    await app.answer('', 'Horizontal distance');
    await app.answer('40', 'Vertical drop');
    await app.answer('-3', 'Slope of the path at take-off');
    let f = said(app.frame());
    // Landing 3 ft higher after a level take-off: no path; the screen says why, naming the sign.
    expect(f).toContain('No figure:');
    expect(f).toContain("check the drop's sign");
    await app.answer('10°', 'Another analysis?');
    await app.press('n', 'Also show a distribution');
    f = said(await app.press('n', 'Review ·'));
    const c = savedCase(app);
    const a = c.analyses[0] as { takeoffGrade?: unknown; drop?: unknown };
    expect(a.drop).toBe(-3);
    // 10 degrees of slope is 100 × tan 10° = 17.6%.
    expect(a.takeoffGrade).toBeCloseTo(17.63, 1);
    const solved = solveCase(c).analyses[0]!;
    if (!solved.ok) throw new Error(solved.reason);
    expect(f).toContain(formatRange(solved.solution.speed, 'speed', 'mph'));
    expect(f).toContain('landed 3');
  });
});

describe('the help gives an airborne example', () => {
  it("and its figure is the engine's for those inputs", async () => {
    const { helpLines } = await import('../../src/ui/help-overlay.js');
    const text = helpLines(76, [])
      .map((l) => l.text)
      .join(' ')
      .replace(/\s+/g, ' ');
    expect(text).toContain('A vehicle that left the ground');
    const c = loadCaseText(
      JSON.stringify({
        format: 'skidcase-case',
        version: 1,
        id: 'help-example',
        units: 'imperial',
        vehicle: {},
        analyses: [
          {
            id: 'fall',
            kind: 'airborne',
            distance: { value: 62, low: 60, high: 64 },
            drop: { value: 8.5, low: 8, high: 9 },
            takeoffGrade: { value: -2, low: -3, high: -1 },
          },
        ],
      }),
    );
    if (!c.ok) throw new Error('example does not load');
    const solved = solveCase(c.case).analyses[0]!;
    if (!solved.ok) throw new Error(solved.reason);
    expect(text).toContain(
      `62 ± 2 ft, 8.5 ± 0.5 ft, -2 ± 1 % gives ${formatRange(solved.solution.speed, 'speed', 'mph')}`,
    );
  });
});

describe('a slide that went on into a fall', () => {
  it('links the two; the review shows the phases and the figure of the saved file', async () => {
    const app = await toLook();
    await app.press('d', 'Were all four brakes working?');
    await app.press('a', 'A short label');
    await app.answer('before the edge', 'Did the vehicle slide over one surface');
    await app.press('o', 'How many tire marks');
    await app.answer('1', 'Length of each mark');
    await app.answer('38 ± 0.5', 'A name for the surface');
    await app.press(ENTER, 'Where does the drag factor');
    await app.press('e', 'Drag factor');
    await app.answer('0.74 (0.70-0.78)', 'Grade, the slide');
    await app.press('l', 'How did the slide end?');
    let f = said(await app.press('o', 'Which analysis holds the marks'));
    expect(f).toContain('analysis 2, the next one');
    // "Another analysis?" is not asked: the marks it ran into are part of the case already
    f = said(await app.press(ENTER, 'What do the marks of this analysis look like?'));
    expect(f).not.toContain('Add another analysis');
    await app.press('j', 'A short label');
    await app.answer('off the bank', 'Horizontal distance');
    await app.answer('48 (47-49)', 'Vertical drop');
    await app.answer('6.5 (6.3-6.7)', 'Slope of the path at take-off');
    await app.answer('-4', 'Another analysis?');
    await app.press('n', 'Also show a distribution');
    f = said(await app.press('n', 'Review ·'));
    const c = savedCase(app);
    expect(c.analyses.map((a) => a.kind)).toEqual(['skid', 'airborne']);
    expect((c.analyses[0] as { end?: unknown }).end).toEqual({
      mode: 'analysis',
      analysis: c.analyses[1]!.id,
    });
    const solved = solveCase(c).analyses;
    const slide = solved[0]!;
    const fall = solved[1]!;
    if (!slide.ok || !fall.ok) throw new Error('not solved');
    expect(f).toContain('Phases in order of travel:');
    expect(f).toContain(formatRange(slide.solution.speed, 'speed', 'mph'));
    expect(f).toContain(formatRange(fall.solution.speed, 'speed', 'mph'));
  });
});
