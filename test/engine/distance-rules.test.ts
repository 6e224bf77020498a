import { describe, expect, it } from 'vitest';
import { slideDistanceFromMarks, unitsOf } from '../../src/engine/index.js';

// Invented marks, worked by hand: values 60, 66, 63; lows 59, 65.5, 63; highs 61, 67, 63.
const marks = [
  { value: 60, low: 59, high: 61 },
  { value: 66, low: 65.5, high: 67 },
  { value: 63, low: 63, high: 63 },
];
const ft = unitsOf('imperial');

describe('slide distance rules', () => {
  it('average: the mean of each end (unchanged)', () => {
    const r = slideDistanceFromMarks(marks, 'average', ft);
    expect(r.distance.value).toBeCloseTo(63, 12);
    expect(r.distance.low).toBeCloseTo(62.5, 12);
    expect(r.distance.high).toBeCloseTo(63.666667, 5);
  });
  it('longest: the largest of each end (unchanged)', () => {
    expect(slideDistanceFromMarks(marks, 'longest', ft).distance).toEqual({
      value: 66,
      low: 65.5,
      high: 67,
    });
  });
  it('shortest: the smallest of each end, said to be the cautious choice', () => {
    const r = slideDistanceFromMarks(marks, 'shortest', ft);
    expect(r.distance).toEqual({ value: 60, low: 59, high: 61 });
    expect(r.step.substituted).toBe('d = min(60.0, 66.0, 63.0) = 60.0 ft');
    expect(r.step.why).toMatch(/shortest of 3 marks.*cautious choice for a minimum/);
  });
  it('spread: the mean as value, the smallest low to the largest high as range', () => {
    const r = slideDistanceFromMarks(marks, 'spread', ft);
    expect(r.distance).toEqual({ value: 63, low: 59, high: 67 });
    expect(r.step.substituted).toBe(
      'd = (60.0 + 66.0 + 63.0) / 3 = 63.0 ft; range 59.0 to 67.0 ft',
    );
    expect(r.step.why).toMatch(/disagreement shows in the range/);
  });
  it('one mark: every rule gives that mark', () => {
    for (const rule of ['average', 'longest', 'shortest', 'spread'] as const)
      expect(slideDistanceFromMarks([marks[0]!], rule, ft).distance).toEqual(marks[0]);
  });
});
