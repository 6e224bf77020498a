import React from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render } from 'ink-testing-library';
import { DraftPanel } from '../../src/ui/draft-panel.js';
import { strip } from './render-app.js';

afterEach(() => cleanup());

// Invented figures; only the layout is under test.
const view = {
  steps: [
    { name: 'Effective drag, segment 2 (loose gravel)', result: '0.46 (0.32 to 0.60)' },
    { name: 'Speed at the start of segment 2', result: '23.5 mph (19.6 to 26.9)' },
  ],
  result: '41.0 mph (38.6 to 43.2), at least 38 mph',
};

describe('chain panel beside a question (30 columns)', () => {
  it('wraps a long step name instead of cutting which segment it is', () => {
    const f = strip(render(<DraftPanel view={view} width={30} maxLines={12} />).lastFrame());
    const flat = f.replace(/[│┌┐└┘─]/g, ' ').replace(/\s+/g, ' ');
    expect(flat).toContain('Speed at the start of segment 2: 23.5 mph (19.6 to 26.9)');
    expect(flat).toContain('Effective drag, segment 2 (loose gravel): 0.46 (0.32 to 0.60)');
    expect(f).not.toContain('…');
    for (const l of f.split('\n')) expect([...l].length).toBeLessThanOrEqual(30);
  });

  it('keeps the latest steps when rows are short, and says how many are in the review', () => {
    const f = strip(render(<DraftPanel view={view} width={30} maxLines={7} />).lastFrame());
    expect(f).toContain('(1 earlier in the review)');
    // Within the rows given (the border's two rows aside).
    expect(f.trimEnd().split('\n').length - 2).toBeLessThanOrEqual(7);
    expect(f).toContain('segment 2:');
    expect(f).not.toContain('loose gravel');
  });
});
