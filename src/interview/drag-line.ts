/**
 * The drag factor a measured source gives, in one line for the investigator to check before
 * going on: the mean and the smallest to largest of the tests, pulls or readings.
 */
import { dragFactor } from '../engine/index.js';
import { formatNumber } from '../engine/number-text.js';
import type { AnswerReader } from './types.js';
import { unitsOf } from './answers-read.js';
import { dragOf } from './build-parts.js';

const WHAT: Record<string, string> = {
  'test-skids': 'test skid',
  sled: 'sled pull',
  decelerometer: 'reading',
};

/**
 * "f = 0.71 (0.69 to 0.74): the mean of 3 sled pulls, the range from the smallest to the
 * largest." Undefined until the source's figures are answered, or when they give no factor.
 * @example measuredDragLine(readAnswers(answers), 'a0.seg0')
 */
export function measuredDragLine(r: AnswerReader, prefix: string): string | undefined {
  const source = r.value(`${prefix}.drag.source`);
  if (typeof source !== 'string' || !(source in WHAT)) return undefined;
  // Read with the file's schema: undefined until the source's figures are all in.
  const drag = dragOf(r, prefix);
  if (!drag || drag.source === 'entered' || drag.source === 'table') return undefined;
  const count =
    drag.source === 'test-skids'
      ? (drag.factors ?? drag.tests ?? []).length
      : drag.source === 'sled'
        ? drag.pulls.length
        : drag.readings.length;
  const out = dragFactor(drag, unitsOf(r.answers));
  if (!out.ok) return undefined;
  const { value, low, high } = out.value.f;
  const d = (x: number) => formatNumber(x, 'drag');
  const what = drag.source === 'test-skids' && drag.factors ? 'test factor' : WHAT[source]!;
  if (count === 1) return `f = ${d(value)}: from 1 ${what}.`;
  if (d(low) === d(high))
    return `f = ${d(value)}: the mean of ${count} ${what}s, which agree to two decimals.`;
  return `f = ${d(value)} (${d(low)} to ${d(high)}): the mean of ${count} ${what}s, the range from the smallest to the largest.`;
}
