/**
 * Wrong-result paths closed at the point where the investigator types: a tolerance after the
 * marks, the one-line segment entry revisited after a later edit, and marks mixing feet and metres.
 * Each figure is read where the user reads it: the review's lines and the saved case.
 */
import { describe, expect, it } from 'vitest';
import type { SkidV1 } from '../../src/case/v1/schema.js';
import { act, fill, fillUntil, start, type } from './drive.js';
import { reviewText, savedCase, shownLine } from './review-of.js';

const BASE = { units: 'f', 'vehicle.brakes': 'a', 'a0.look': 'd' };
const skid = (s: ReturnType<typeof start>) => savedCase(s).analyses[0] as SkidV1;

describe('a tolerance typed after the list of marks', () => {
  const typed = (marks: string) =>
    fill(start(), {
      ...BASE,
      'a0.surfaces': 'o',
      'a0.count': '4',
      'a0.marks': marks,
      'a0.seg0.drag.source': 'e',
      'a0.seg0.drag.value': '0.72 (0.68-0.76)',
    });

  it('applies to every mark, so the low end and the "at least" figure are not too high', () => {
    const s = typed('61 63 58 60 +/- 1');
    expect(skid(s).marks).toEqual([
      { value: 61, low: 60, high: 62 },
      { value: 63, low: 62, high: 64 },
      { value: 58, low: 57, high: 59 },
      { value: 60, low: 59, high: 61 },
    ]);
    // Slide to stop, S = sqrt(30 d f) (mph, ft; v² = 2 f g d): low end with the mean of the low
    // ends, d = (60 + 62 + 57 + 59) / 4 = 59.5 ft, and f = 0.68: sqrt(30 × 59.5 × 0.68) = 34.84 mph.
    // With the tolerance on the last mark only, d = 60.25 ft and sqrt(1229.1) = 35.06: "35".
    const review = reviewText(s);
    expect(review).toContain('Result: at least 34 mph');
    expect(review).toMatch(/34\.8 to/);
  });

  it('says so when it is taken', () => {
    let s = fillUntil(start(), { ...BASE, 'a0.surfaces': 'o', 'a0.count': '4' }, 'a0.marks');
    s = type(s, '61, 63, 58, 60 ± 1');
    expect(s.notice).toContain('± 1 taken for every mark');
  });

  it('refuses the ambiguous mix of marks with and without their own range, naming the field', () => {
    let s = fillUntil(start(), { ...BASE, 'a0.surfaces': 'o', 'a0.count': '3' }, 'a0.marks');
    s = act(s, { type: 'answer', text: '61 63-64 60 ± 1' });
    expect(s.error?.message).toMatch(/^length: a tolerance after the last mark/);
    expect(s.answers['a0.marks']).toBeUndefined();
  });
});

describe('the one-line segment entry, revisited after a later edit', () => {
  const LINE = '79 @0.70 (0.68-0.71) -3% [dry asphalt]';
  const typed = () =>
    fill(start(), {
      ...BASE,
      'a0.surfaces': 'q',
      'a0.count': '2',
      'a0.marks': '80 78',
      'a0.quick': LINE,
    });
  const gradeTo5 = (s: ReturnType<typeof start>) =>
    type(act(s, { type: 'jump', id: 'a0.seg0.grade.pct' }), '5');

  it('shows the line rebuilt from the current answers, and Enter keeps the newer grade', () => {
    let s = gradeTo5(typed());
    expect(skid(s).segments[0]!.grade).toBe(-5);
    const after = reviewText(s);
    s = act(s, { type: 'jump', id: 'a0.quick' });
    expect(shownLine(s)).toBe('79 @0.70 (0.68-0.71) -5% [dry asphalt]');
    s = type(s, shownLine(s));
    expect(skid(s).segments[0]!.grade).toBe(-5);
    // Level drag f n + G/100 = 0.70 - 0.05 = 0.65 at the value: sqrt(30 × 79 × 0.65) = 39.25 mph.
    expect(reviewText(s)).toBe(after);
    expect(after).toContain('39.2');
  });

  it('says what a line it cannot rebuild would change, and changes nothing until Enter again', () => {
    let s = gradeTo5(typed());
    s = act(s, { type: 'jump', id: 'a0.seg0.drag.source' });
    s = type(s, 'k', '30/42');
    s = fill(s, { 'a0.seg0.drag.testWhere': 'e' });
    const before = s.answers;
    s = act(s, { type: 'jump', id: 'a0.quick' });
    // Test skids cannot be written on the line: it keeps the last segments it could say (the
    // grade edit is in it), and entering it would put the entered drag factor back.
    const last = '79 @0.70 (0.68-0.71) -5% [dry asphalt]';
    expect(shownLine(s)).toBe(last);
    s = act(s, { type: 'answer', text: shownLine(s) });
    expect(s.answers).toBe(before);
    expect(skid(s).segments[0]!.drag.source).toBe('test-skids');
    expect(s.error?.message).toContain('This line would change:');
    expect(s.error?.message).toContain('Drag factor source, segment 1: test-skids → entered');
    expect(s.error?.message).not.toContain('Grade');
    expect(s.error?.message).toContain('Press Enter again');
    s = act(s, { type: 'answer', text: last });
    expect(s.error).toBeUndefined();
    expect(skid(s).segments[0]!.drag).toEqual({
      source: 'entered',
      value: 0.7,
      low: 0.68,
      high: 0.71,
      // the line says 0.70: kept as typed
      decimals: 2,
    });
    expect(skid(s).segments[0]!.grade).toBe(-5);
    expect(s.notice).toContain('Changed: ');
  });
});

describe('marks that mix feet and metres', () => {
  it('names the entry that looks out of place and keeps the previous good answer', () => {
    let s = fill(start(), {
      ...BASE,
      'a0.surfaces': 'o',
      'a0.count': '2',
      'a0.marks': '61 63',
      'a0.seg0.drag.source': 'e',
      'a0.seg0.drag.value': '0.7',
    });
    s = act(s, { type: 'jump', id: 'a0.marks' });
    const held = act(s, { type: 'answer', text: '61ft 63m' });
    expect(held.error?.message).toContain('mark 2 (63m) is in m while the others are in ft');
    expect(held.answers).toBe(s.answers);
    expect(skid(held).marks).toEqual([61, 63]);
    // Entered again as typed, it is taken (a warning, never a refusal), converted: 63 m = 206.69 ft.
    const taken = act(held, { type: 'answer', text: '61ft 63m' });
    expect(taken.error).toBeUndefined();
    expect(skid(taken).marks![0]).toBe(61);
    expect(skid(taken).marks![1]).toBeCloseTo(63 / 0.3048, 6);
  });

  it('takes marks all in the other system without a word about mixing', () => {
    let s = fillUntil(start(), { ...BASE, 'a0.surfaces': 'o', 'a0.count': '2' }, 'a0.marks');
    s = type(s, '18.6 m 19.2 m');
    expect(s.notice).toContain('converted');
  });
});
