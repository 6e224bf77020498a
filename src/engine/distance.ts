import type { Spread } from '../case/quantity.js';
import { formatNumber } from '../format/numbers.js';
import type { Range, Step, Units } from './types.js';
import { input, makeStep } from './step.js';

export type DistanceRule = 'average' | 'longest';

const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;

/**
 * Slide distance from the measured marks.
 * - `average` (the default, common practice): d = mean of the values; low = mean of the lows;
 *   high = mean of the highs.
 * - `longest`: d = largest value; low = largest low; high = largest high.
 * `marks` must not be empty (the case schema requires marks or a segment length).
 * @example slideDistanceFromMarks([{ value: 60, low: 60, high: 60 }, { value: 64, low: 64, high: 64 }], 'average', { length: 'ft', speed: 'mph' }).distance.value // 62
 */
export function slideDistanceFromMarks(
  marks: Spread[],
  rule: DistanceRule,
  units: Units,
): { distance: Range; step: Step } {
  if (marks.length === 0) throw new RangeError('slideDistanceFromMarks needs at least one mark');
  // A reduce, not Math.max(...xs): a file may hold more marks than a call can take as arguments.
  const pick = rule === 'average' ? mean : (xs: number[]) => xs.reduce((a, b) => Math.max(a, b));
  const distance: Range = {
    value: pick(marks.map((m) => m.value)),
    low: pick(marks.map((m) => m.low)),
    high: pick(marks.map((m) => m.high)),
  };
  const list = marks.map((m) => formatNumber(m.value, 'length')).join(', ');
  const inputs = Object.fromEntries(
    marks.map((m, i) => [`mark ${i + 1}`, input(m, units.length, m.note)]),
  );
  const single = marks.length === 1;
  const step = makeStep({
    name: 'Slide distance',
    formula: single
      ? 'd = the mark'
      : rule === 'average'
        ? 'd = mean of the marks'
        : 'd = longest mark',
    substituted: single
      ? `d = ${list} ${units.length}`
      : rule === 'average'
        ? `d = (${marks.map((m) => formatNumber(m.value, 'length')).join(' + ')}) / ${marks.length} = ${formatNumber(distance.value, 'length')} ${units.length}`
        : `d = max(${list}) = ${formatNumber(distance.value, 'length')} ${units.length}`,
    inputs,
    result: distance,
    unit: units.length,
    why: single
      ? 'one mark measured: its length is the slide distance'
      : rule === 'average'
        ? `average of ${marks.length} measured marks (common practice; the choice is recorded)`
        : `longest of ${marks.length} marks, as chosen for this analysis (the default is the average)`,
  });
  return { distance, step };
}
