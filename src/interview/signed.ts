import type { Quantity } from '../case/quantity.js';

/**
 * A positive percent made signed (or a negative one made positive): the ends swap when the sign
 * flips, so `low <= value <= high` still holds.
 * @example signed({ value: 3, low: 2, high: 4 }, true) // { value: -3, low: -4, high: -2 }
 */
export function signed(q: Quantity, negative: boolean): Quantity {
  if (!negative) return q;
  if (typeof q === 'number') return q === 0 ? 0 : -q;
  return { value: -q.value, low: -(q.high ?? q.value), high: -(q.low ?? q.value) };
}
