import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER, renderApp } from './render-app.js';
import { toDragSource, toLook } from './walks.js';

afterEach(() => cleanup());

// Invented scenario: faint dashed marks, 4 marks of 100 ft, f 0.70 entered, limit 40 mph.
async function toReaction(o: Parameters<typeof renderApp>[0] = {}) {
  const app = await toLook(o, '40');
  // Anti-lock marks are a slide: the brakes come next, saying why they matter.
  const brakes = await toDragSource(app, { look: 'a', lengths: '4 x 100' });
  expect(brakes).toContain('scales the friction');
  await app.press('e', 'Drag factor');
  await app.answer('0.70', 'Grade, the slide');
  await app.press('l', 'How did the slide end?');
  await app.press('r', 'Where was the conflict point');
  const f = await app.answer('50', 'Perception-reaction time for this case');
  return { app, f };
}

describe('a slide with a posted limit', () => {
  it('offers the preferred reaction time with its sources, and the review compares at the limit', async () => {
    const { app, f } = await toReaction();
    // Wrapped beside the chain panel: each part on its own line.
    expect(f).toContain('Enter accepts: your preference, 1.5 s (1.5 s: surprise event,');
    expect(f).toContain('M. Green 2000; 2.5 s: AASHTO design)');
    await app.press(ENTER, 'Another analysis?');
    await app.press('n', 'Also show a distribution');
    await app.press('n', 'Analysis 1 · slide · skid-1');
    // Page through the review, collecting what is shown.
    let seen = app.frame();
    for (let i = 0; i < 12 && !seen.includes('Cautions'); i++) {
      seen += await app.press(' ');
    }
    const all = seen.replace(/\s+/g, ' ');
    expect(all).toContain('the slide figure is an estimate from anti-lock marks');
    // 4 marks of 100 ft, f 0.70, n 1: S = sqrt(30 × 100 × 0.70) = 45.8 mph (slide to stop). At 40 mph
    // with 1.5 s the limit vehicle rests 63.4 ft in (see review-extras.test.ts): short of the
    // 100 ft end, beyond the conflict point at 50 ft.
    expect(all).toContain('45.8 mph');
    expect(all).toContain('reaction time 1.5 s: from the preferences');
    expect(all).toMatch(
      /Would have stopped before the end of the marks \(100\.0 ft from the start of the marks\): yes/,
    );
    expect(all).toMatch(
      /Would have stopped before the conflict point \(50\.0 ft from the start of the marks\): no/,
    );
    expect(all).toContain('Speed along the slide');
  });
});
