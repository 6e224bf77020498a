import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER, ctrl } from './render-app.js';
import { toDragSource, toLook } from './walks.js';

// Counts the review's heavy work (the limit comparison, the sampled speeds, the sensitivity)
// while the screen renders again: after a resize, a scroll or a mode switch the answers are the
// same, so none of it may run again; a changed answer runs it once more.
const calls = vi.hoisted(() => ({ limit: 0, sampling: 0, sensitivity: 0 }));
vi.mock(import('../../src/extras/limit-comparison.js'), async (original) => {
  const m = await original();
  return {
    ...m,
    limitComparison: (...a: Parameters<typeof m.limitComparison>) => (
      calls.limit++,
      m.limitComparison(...a)
    ),
  };
});
vi.mock(import('../../src/extras/sampling.js'), async (original) => {
  const m = await original();
  return {
    ...m,
    sampleSpeeds: (...a: Parameters<typeof m.sampleSpeeds>) => (
      calls.sampling++,
      m.sampleSpeeds(...a)
    ),
  };
});
vi.mock(import('../../src/extras/sensitivity.js'), async (original) => {
  const m = await original();
  return {
    ...m,
    sensitivity: (...a: Parameters<typeof m.sensitivity>) => (
      calls.sensitivity++,
      m.sensitivity(...a)
    ),
  };
});

afterEach(() => cleanup());

// Invented slide: 4 marks of 100 ft, f 0.70 entered, limit 40 mph, a distribution of 2000 draws.
async function toReview() {
  const app = await toLook({}, '40');
  await toDragSource(app, { lengths: '4 x 100' });
  await app.press('e', 'Drag factor');
  await app.answer('0.70', 'Grade, the slide');
  await app.press('l', 'How did the slide end?');
  await app.press('r', 'Where was the conflict point');
  await app.press(ENTER, 'Perception-reaction time for this case');
  await app.press(ENTER, 'Another analysis?');
  await app.press('n', 'Also show a distribution');
  await app.press('u', 'How many draws?');
  await app.answer('2000', 'Seed of the draws');
  return app;
}

describe('the review computes once per change of the answers', () => {
  it('a resize, a scroll and a mode switch lay the lines out again without recomputing', async () => {
    const app = await toReview();
    const before = { ...calls };
    let f = await app.press(ENTER, 'Analysis 1 · slide · skid-1');
    expect(f).toContain('45.8 mph');
    const once = { ...calls };
    // Opening the review ran each part (at least) once.
    expect(once.limit).toBeGreaterThan(before.limit);
    expect(once.sensitivity).toBeGreaterThan(before.sensitivity);
    expect(once.sampling).toBeGreaterThan(before.sampling);

    app.resize(70);
    f = await app.waitFor((x) => x.split('\n').every((l) => l.length <= 70), 'the narrower frame');
    expect(f).toContain('Analysis 1 · slide · skid-1');
    app.resize(120);
    await app.waitFor((x) => x.split('\n').some((l) => l.length > 100), 'the wider frame');
    await app.press(' ');
    await app.press(ctrl('t'));
    expect(calls).toEqual(once);

    // A changed answer (the seed undone, then given again as 2): the review computes once more.
    await app.press(ctrl('z'), 'Seed of the draws');
    await app.answer('2', 'Analysis 1 · slide · skid-1');
    expect(calls.limit - once.limit).toBe(1);
    expect(calls.sampling).toBeGreaterThan(once.sampling);
  });
});
