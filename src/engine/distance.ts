import type { Spread } from './spread.js';
import { formatNumber } from './number-text.js';
import type { Range, Step, Units } from './types.js';
import { input, joinList, makeStep } from './step.js';

export type DistanceRule = 'average' | 'longest' | 'shortest' | 'spread';

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
// Reduced, not Math.max(...xs): a file may hold more marks than a call can take as arguments.
const largest = (xs: number[]) => xs.reduce((a, b) => Math.max(a, b));
const smallest = (xs: number[]) => xs.reduce((a, b) => Math.min(a, b));

/** How each rule picks the value, the low end and the high end, and how its step reads. */
const RULES: Record<
  DistanceRule,
  {
    value: (xs: number[]) => number;
    low: (xs: number[]) => number;
    high: (xs: number[]) => number;
    formula: string;
    fn: string;
    why: (count: number) => string;
  }
> = {
  average: {
    value: mean,
    low: mean,
    high: mean,
    formula: 'd = mean of the marks',
    fn: 'mean',
    why: (k) => `average of ${k} measured marks (common practice; the choice is recorded)`,
  },
  longest: {
    value: largest,
    low: largest,
    high: largest,
    formula: 'd = longest mark',
    fn: 'max',
    why: (k) =>
      `longest of ${k} marks, as chosen for this analysis (some investigators prefer it; the default is the average)`,
  },
  shortest: {
    value: smallest,
    low: smallest,
    high: smallest,
    formula: 'd = shortest mark',
    fn: 'min',
    why: (k) =>
      `shortest of ${k} marks, as chosen for this analysis: the cautious choice for a minimum speed`,
  },
  spread: {
    value: mean,
    low: smallest,
    high: largest,
    formula: 'd = mean of the marks; range = shortest low end to longest high end',
    fn: 'mean',
    why: (k) =>
      `average of ${k} marks, with the range running from the shortest mark's low end to the longest mark's high end: the marks' disagreement shows in the range`,
  },
};

/**
 * Slide distance from the measured marks.
 * - `average` (the default, common practice): d = mean of the values; low = mean of the lows;
 *   high = mean of the highs.
 * - `longest`: d = largest value; low = largest low; high = largest high.
 * - `shortest`: d = smallest value; low = smallest low; high = smallest high.
 * - `spread`: d = mean of the values; low = smallest low; high = largest high.
 * `marks` must not be empty (the case schema requires marks or a segment length).
 * @example slideDistanceFromMarks([{ value: 60, low: 60, high: 60 }, { value: 64, low: 64, high: 64 }], 'average', { length: 'ft', speed: 'mph' }).distance.value // 62
 */
export function slideDistanceFromMarks(
  marks: Spread[],
  rule: DistanceRule,
  units: Units,
): { distance: Range; step: Step } {
  if (marks.length === 0) throw new RangeError('slideDistanceFromMarks needs at least one mark');
  const r = RULES[rule];
  const distance: Range = {
    value: r.value(marks.map((m) => m.value)),
    low: r.low(marks.map((m) => m.low)),
    high: r.high(marks.map((m) => m.high)),
  };
  const fmt = (n: number) => formatNumber(n, 'length');
  const list = marks.map((m) => fmt(m.value));
  const inputs = Object.fromEntries(
    marks.map((m, i) => [`mark ${i + 1}`, input(m, units.length, m.note)]),
  );
  const single = marks.length === 1;
  const result = `${fmt(distance.value)} ${units.length}`;
  const substituted = single
    ? `d = ${list[0]} ${units.length}`
    : r.fn === 'mean'
      ? `d = (${joinList(list, ' + ')}) / ${marks.length} = ${result}` +
        (rule === 'spread'
          ? `; range ${fmt(distance.low)} to ${fmt(distance.high)} ${units.length}`
          : '')
      : `d = ${r.fn}(${joinList(list, ', ')}) = ${result}`;
  const step = makeStep({
    name: 'Slide distance',
    formula: single ? 'd = the mark' : r.formula,
    substituted,
    inputs,
    result: distance,
    unit: units.length,
    why: single ? 'one mark measured: its length is the slide distance' : r.why(marks.length),
  });
  return { distance, step };
}
