import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER } from './render-app.js';
import { toLook } from './walks.js';

afterEach(() => cleanup());

// The chain panel shows each figure as soon as its own inputs are in, before the analysis is
// complete. Invented yaw mark: chord 40 ft, middle ordinate 2.0 ft, so R = C²/(8M) + M/2 =
// 1600/16 + 1 = 101 ft (circle geometry).

describe('the chain panel fills in as answers come', () => {
  it('a yaw: the radius after chord and ordinate, before the drag factor is asked', async () => {
    const app = await toLook({ rows: 40, columns: 110 }, '');
    await app.press('y', 'A short label');
    await app.press(ENTER, 'How was the radius');
    let f = await app.press('c', 'Chord length');
    expect(f).not.toContain('101.0 ft');
    await app.answer('40', 'Middle ordinate');
    f = await app.answer('2', '101.0 ft');
    const flat = f.replace(/\s+/g, ' ');
    expect(flat).toMatch(/Radius[^│]*│?[^│]*101\.0 ft/);
    // Not a speed yet: the panel says the speed follows and what it waits for.
    expect(flat).toContain('The speed follows');
    // One analysis: its figures need no "Analysis 1:" before them.
    await app.press('e', 'Drag factor');
    f = (await app.answer('0.72 (0.68-0.76)', 'the surface tilts')).replace(/\s+/g, ' ');
    expect(f).toMatch(/Drag factor:[\s│]*0\.72 \(0\.68 to 0\.76\)/);
    expect(f).not.toContain('Analysis 1:');
  });
});
