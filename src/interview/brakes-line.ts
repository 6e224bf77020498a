/**
 * The braking efficiency worked out from the wheel-by-wheel answers, in one line, shown as soon
 * as the last wheel is answered: the investigator sees what the inspection findings come to.
 */
import { RULES } from '../case/quantity.js';
import { brakingEfficiency } from '../engine/index.js';
import { formatNumber } from '../engine/number-text.js';
import type { AnswerReader } from './types.js';
import { brakesOf, quantityOf } from './build-parts.js';

/**
 * "Braking efficiency n = 0.90 (0.89 to 0.91), from the four wheels and the front axle share."
 * Undefined until every wheel (and the share) is answered.
 * n = share/2 × (front left + front right) + (1 − share)/2 × (rear left + rear right).
 * @example wheelsLine(readAnswers(answers))
 */
export function wheelsLine(r: AnswerReader): string | undefined {
  if (r.value('vehicle.brakes') !== 'wheels') return undefined;
  const brakes = brakesOf(r);
  const share = quantityOf(r, 'vehicle.share', RULES.share);
  // Both read with the file's schema: undefined until every wheel and the share are validly in.
  if (!brakes || share === undefined) return undefined;
  const n = brakingEfficiency({ brakes, frontAxleShare: share });
  if (!n.ok) return undefined;
  const { value, low, high } = n.value.n;
  const d = (x: number) => formatNumber(x, 'drag');
  const range = d(low) === d(high) ? '' : ` (${d(low)} to ${d(high)})`;
  return `Braking efficiency n = ${d(value)}${range}, from the four wheels and the front axle share.`;
}
