import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadCaseText } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { hangOf } from '../../src/ui/review-step.js';
import { reviewLines } from '../../src/ui/review-lines.js';

// A wrapped line goes on under the text of the line it continues: a sentence under the
// sentence, a list item under the item's text (past "- "), a step's numbers under the numbers
// (past "numbers  "). Before, every continuation went in two further, so a wrapped sentence
// read as if it began with a stray space ("    review.").

const loaded = loadCaseText(readFileSync('sessions/demo-orchard-hill.json', 'utf8'));
if (!loaded.ok) throw new Error('demo invalid');
const c = loaded.case;
const lead = (l: string) => l.length - l.trimStart().length;

describe.each([80, 60])('the review at %i columns', (width) => {
  const lines = reviewLines(solveCase(c), width, { case: c }).map((l) => l.text);

  it('a wrapped sentence goes on in its own column', () => {
    const i = lines.findIndex((l) => l.trimStart().startsWith('A result is a minimum estimate.'));
    expect(i).toBeGreaterThan(-1);
    expect(lead(lines[i + 1]!)).toBe(lead(lines[i]!));
  });

  it('a wrapped list item goes on under its text, past the marker', () => {
    const items = lines
      .map((l, i) => ({ l, i }))
      .filter(({ l, i }) => /^\s*- /.test(l) && lines[i + 1] && !/^\s*(- |$)/.test(lines[i + 1]!));
    const wrapped = items.filter(({ l, i }) => lead(lines[i + 1]!) > lead(l));
    expect(wrapped.length).toBeGreaterThan(0);
    for (const { l, i } of wrapped) expect(lead(lines[i + 1]!)).toBe(lead(l) + 2);
  });

  it('no line is wider than the screen', () => {
    for (const l of lines) expect(l.length, l).toBeLessThanOrEqual(width);
  });
});

describe('hangOf', () => {
  it('reads markers and label columns, and nothing else', () => {
    expect(hangOf('- an assumption')).toBe(2);
    expect(hangOf('! a warning')).toBe(2);
    expect(hangOf('12. Slide distance')).toBe(4);
    expect(hangOf('numbers  S = sqrt(30 × 80.0 ft × 0.68)')).toBe(9);
    expect(hangOf('A plain sentence.')).toBe(0);
    expect(hangOf('-3% downhill')).toBe(0);
  });
});
