import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER, renderApp } from './render-app.js';
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

describe('the chain panel shows the radius from surveyed points before the drag factor', () => {
  // Invented survey: five points on a circle of radius 100 ft centred at (0, 100), each
  // y = 100 − sqrt(100² − x²) to 4 decimals (circle geometry), so the fitted radius is 100.0 ft.
  const ON_CIRCLE = '0 0; 10 0.5013; 20 2.0204; 30 4.6061; 40 8.3485';
  /** The text inside the chain panel's box, its lines joined. */
  const panel = (f: string) =>
    f
      .split('\n')
      .map((l) => /│(.*)│\s*$/.exec(l)?.[1]?.trim())
      .filter(Boolean)
      .join(' ');
  it('as soon as the points are in, and again after one is left out', async () => {
    const app = await toLook({ rows: 40, columns: 110 }, '');
    await app.press('y', 'A short label');
    await app.press(ENTER, 'How was the radius');
    let f = await app.press('p', 'Points surveyed along the mark');
    expect(f).not.toMatch(/Radius from surveyed points/);
    f = await app.answer(ON_CIRCLE, 'Points to leave out');
    expect(panel(f)).toMatch(
      /^Chain so far Radius from surveyed points \(least-squares circle\): 100\.0 ft The speed follows/,
    );
    // the panel's figure and the notice under the question are the engine's one fit
    expect(f.replace(/\s+/g, ' ')).toContain('R = 100.0 ft from 5 points');
    f = await app.answer('5', 'Where does the drag factor');
    // four points still on the same circle: the same radius, without the point left out
    expect(panel(f)).toMatch(/Radius from surveyed points \(least-squares circle\): 100\.0 ft/);
  });
});

describe('the chain panel wraps its note between words', () => {
  it('no line of the panel starts with a space carried over from the wrap (90 columns)', async () => {
    // At 90 columns the note "... Units; Marks; Another analysis?, and 1 more." breaks after
    // "Another": Ink's own wrap moved the space to the start of the next line.
    const app = renderApp({ rows: 30, columns: 90 });
    await app.waitText('No cases here yet');
    await app.press('n', 'Case or report reference');
    const f = await app.answer('WALK-19', 'When did the crash happen?');
    const inside = f
      .split('\n')
      .map((l) => /│ (.*?)\s*│$/.exec(l)?.[1])
      .filter((l): l is string => l !== undefined);
    expect(inside.join(' ')).toContain('Units; Marks; Another');
    for (const l of inside) expect(l).not.toMatch(/^ /);
  });
});
