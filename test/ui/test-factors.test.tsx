/**
 * Test skids at the test-skids question, typed through the app either as each test's speed and
 * distance or as the drag factors already worked out from them: what it says it read, what the
 * file keeps, the figures `solve --json` gives from it, and what the review and the text report
 * say. Every number here is invented.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER } from './render-app.js';
import { toDragSource, toLook, type App, said } from './walks.js';
import { runSolve } from '../solve/run-solve.js';
import { runReport } from '../report/helpers.js';

afterEach(() => cleanup());

function savedFile(app: App): string {
  const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
  return path.join(app.dir, file);
}
const savedCase = (app: App) => JSON.parse(fs.readFileSync(savedFile(app), 'utf8'));

/** From "How did the slide end?" to the review: at rest, no conflict point, defaults after. */
async function endToReview(app: App): Promise<string> {
  await app.press(ENTER, 'Where was the conflict point');
  await app.press(ENTER, 'Perception-reaction time');
  await app.press(ENTER, 'Add another analysis');
  await app.press(ENTER, 'Also show a distribution');
  return app.press(ENTER, 'At a glance');
}

/** The drag factor's step in `solve --json` of the saved file. */
async function dragStep(app: App) {
  const r = await runSolve(savedFile(app), true);
  expect(r.code, r.err).toBe(0);
  const steps = JSON.parse(r.out).analyses[0].steps as {
    name: string;
    result: number;
    low: number;
    high: number;
    why: string;
  }[];
  return steps.find((s) => s.name.startsWith('Drag factor'))!;
}

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;

describe('test skids typed as the drag factors worked out from them', () => {
  it('reads 0.68, 0.71, 0.70 as three drag factors: the file keeps them, solve gives their mean and range', async () => {
    const app = await toLook();
    await toDragSource(app);
    let f = said(await app.press('k', 'Test skids for the slide'));
    // The question says both forms, and how typed factors are taken.
    expect(f).toContain('or the drag factors already worked out from the tests (0.68, 0.71, 0.70)');
    expect(f).toContain('taken as worked out on the test stretch, its grade still in them');
    f = said(await app.answer('0.68, 0.71, 0.70', 'Grade, the slide'));
    expect(f).toContain('Read as 3 drag factors: 0.68, 0.71, 0.70.');
    expect(f).toContain('f = 0.70 (0.68 to 0.71): the mean of 3 test factors');
    await app.press('l', 'same stretch');
    // On a level stretch the two readings of the factors agree: nothing more is asked.
    await app.press('s', 'How did the slide end');
    const review = said(await endToReview(app));
    expect(review).toContain('Drag factor from test skids (factors entered)');
    expect(review).toContain('f = mean(0.68, 0.71, 0.70)');
    const drag = savedCase(app).analyses[0].segments[0].drag;
    // 0.70 typed with its trailing zero is kept as typed.
    expect(drag).toEqual({
      source: 'test-skids',
      factors: [0.68, 0.71, { value: 0.7, decimals: 2 }],
      testGrade: 0,
    });
    const step = await dragStep(app);
    expect(step.result).toBeCloseTo(mean([0.68, 0.71, 0.7]), 12);
    expect(step.low).toBeCloseTo(0.68, 12);
    expect(step.high).toBeCloseTo(0.71, 12);
    const report = await runReport(savedFile(app), { format: 'txt' });
    expect(report.code, report.err).toBe(0);
    expect(report.out).toMatch(/Test skid 3 drag factor\s+0\.70\s/);
    expect(report.out).toContain('3 drag factors worked out from test skids');
  });

  it('on a sloped test stretch asks whether the grade is still in the factors, and takes it off once', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('k', 'Test skids for the slide');
    await app.answer('0.68, 0.71, 0.70', 'Grade, the slide');
    await app.press('l', 'same stretch');
    await app.press('e', 'Where the test skids were run');
    await app.press('d', 'How steep');
    let f = said(await app.answer('2', 'Test factors and the grade'));
    expect(f).toContain(
      'are they as worked out on the sloped test stretch (its grade still in them), or level-ground factors',
    );
    f = said(await app.press('g', 'How did the slide end'));
    // −2%: the tests' ratio holds f − 0.02, so 0.02 is added back once.
    expect(f).toContain(
      'its grade is taken off once to give the level drag factor. f = 0.72 (0.70 to 0.73)',
    );
    await endToReview(app);
    const drag = savedCase(app).analyses[0].segments[0].drag;
    expect(drag.factors).toEqual([0.68, 0.71, { value: 0.7, decimals: 2 }]);
    expect(drag.testGrade).toBe(-2);
    expect(drag.gradeTakenOut).toBeUndefined();
    const step = await dragStep(app);
    expect(step.result).toBeCloseTo(mean([0.68, 0.71, 0.7]) + 0.02, 12);
    expect(step.low).toBeCloseTo(0.7, 12);
    expect(step.high).toBeCloseTo(0.73, 12);
    expect(step.why).toContain("the tests' -2% grade was taken off");
  });

  it('on the slide’s own sloped stretch, factors that hold its grade give the test ratio back as the effective drag', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('k', 'Test skids for the slide');
    await app.answer('0.68, 0.71, 0.70', 'Grade, the slide');
    let f = said(await app.answer('-2', 'same stretch'));
    expect(f).toContain('Whether the factors you typed still hold it is asked next.');
    await app.press('s', 'Test factors and the grade');
    f = said(await app.press('g', 'How did the slide end'));
    expect(f).toContain('its grade is taken off once');
    await endToReview(app);
    const r = await runSolve(savedFile(app), true);
    const steps = JSON.parse(r.out).analyses[0].steps as { name: string; result: number }[];
    const m = mean([0.68, 0.71, 0.7]);
    // Level f = ratio + 0.02; with every wheel braking, f × 1 − 0.02 is the ratio again.
    expect(steps.find((s) => s.name.startsWith('Drag factor'))!.result).toBeCloseTo(m + 0.02, 12);
    expect(steps.find((s) => s.name.startsWith('Effective drag'))!.result).toBeCloseTo(m, 12);
  });

  it('level-ground factors keep their figures: no grade is taken off them', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('k', 'Test skids for the slide');
    await app.answer('0.68, 0.71, 0.70', 'Grade, the slide');
    await app.press('l', 'same stretch');
    await app.press('e', 'Where the test skids were run');
    await app.press('u', 'How steep');
    await app.answer('3', 'Test factors and the grade');
    const f = said(await app.press('l', 'How did the slide end'));
    expect(f).toContain('Taken as level-ground factors: no grade is taken off them');
    const review = said(await endToReview(app));
    expect(review).toContain(
      "taken as level-ground factors (the tests' 3% grade already taken out)",
    );
    const drag = savedCase(app).analyses[0].segments[0].drag;
    expect(drag.gradeTakenOut).toBe(true);
    expect(drag.testGrade).toBe(3);
    const step = await dragStep(app);
    expect(step.result).toBeCloseTo(mean([0.68, 0.71, 0.7]), 12);
    expect(step.low).toBeCloseTo(0.68, 12);
    expect(step.high).toBeCloseTo(0.71, 12);
    expect(step.why).toContain('so no grade was taken off them');
  });

  it('speed/distance pairs still work, say so, and keep their typed decimals', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('k', 'Test skids for the slide');
    const f = said(await app.answer('30/42.0, 35/57.50', 'Grade, the slide'));
    expect(f).toContain('Read as 2 test skids (speed, distance).');
    await app.press('l', 'same stretch');
    await app.press('s', 'How did the slide end');
    const review = said(await endToReview(app));
    expect(review).toContain('Drag factor from test skids');
    expect(review).not.toContain('factors entered');
    const drag = savedCase(app).analyses[0].segments[0].drag;
    expect(drag.tests).toEqual([
      { speed: 30, distance: { value: 42, decimals: 1 } },
      { speed: 35, distance: { value: 57.5, decimals: 2 } },
    ]);
    const step = await dragStep(app);
    const ratios = [30 ** 2 / (30 * 42), 35 ** 2 / (30 * 57.5)];
    expect(step.result).toBeCloseTo(mean(ratios), 12);
    const report = await runReport(savedFile(app), { format: 'txt' });
    expect(report.out).toMatch(/Test skid 1 distance\s+42\.0\s+none\s+ft/);
    expect(report.out).toMatch(/Test skid 2 distance\s+57\.50\s+none\s+ft/);
  });
});
