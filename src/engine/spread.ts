import type { QuantityInput } from './input.js';

/** A quantity read into its three ends (low = value = high when no spread was given). */
export interface Spread {
  value: number;
  low: number;
  high: number;
  note?: string;
}

/** Reads a validated quantity into value, low and high. */
export function spread(q: QuantityInput): Spread {
  if (typeof q === 'number') return { value: q, low: q, high: q };
  const s: Spread = { value: q.value, low: q.low ?? q.value, high: q.high ?? q.value };
  if (q.note !== undefined) s.note = q.note;
  return s;
}
