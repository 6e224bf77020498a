/**
 * The decimals a figure was typed with, kept for the record (docs/case-file.md, "Quantities"):
 * `0.70` is saved as `{ "value": 0.7, "decimals": 2 }`, which a plain JSON number cannot keep.
 */
import { MAX_DECIMALS, type Quantity } from '../case/quantity.js';
import { jsonDecimals } from '../engine/number-text.js';

/** Decimals of each number as typed, in order: `0.70 (0.65-0.80)` gives [2, 2, 2]. */
function typedDecimals(text: string): number[] {
  return [...text.matchAll(/\d*\.(\d+)|\d+/g)].map((m) => m[1]?.length ?? 0);
}

/**
 * The quantity with the decimals it was typed with, when the file's number would lose them
 * (`0.70` is saved as 0.7: `decimals: 2` keeps the record as typed). Only when every number typed
 * has the same decimals (`0.70 (0.65-0.80)`), and only in the case's own units: the caller passes
 * a converted figure through unchanged, since it was not typed as it is kept.
 * @example withTypedDecimals(0.7, '0.70') // { value: 0.7, decimals: 2 }
 */
export function withTypedDecimals(q: Quantity, text: string): Quantity {
  const value = typeof q === 'number' ? q : q.value;
  // Only a figure typed with one precision throughout: `0.6 (0.55-0.65)` says nothing of one.
  const typed = new Set(typedDecimals(text));
  if (typed.size !== 1) return q;
  const d = [...typed][0]!;
  // The value itself typed (not the middle of a range `0.55-0.65`).
  const first = /\d*\.?\d+/.exec(text);
  if (!first || Number(first[0]) !== value) return q;
  if (d === 0 || d <= jsonDecimals(value) || d > MAX_DECIMALS) return q;
  return typeof q === 'number' ? { value: q, decimals: d } : { ...q, decimals: d };
}
