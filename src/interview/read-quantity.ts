/**
 * How the interview reads typed numbers: a thin layer over src/input/ (the project's one reader
 * of numbers, units, ranges and quick-entry lines), so every answer takes the same syntax.
 */
import type { UnitSystem } from '../engine/types.js';
import { MAX_DECIMALS, type Quantity, type QuantityRule } from '../case/quantity.js';
import { parseQuantity, type QuantityKind } from '../input/index.js';
import { jsonDecimals, typedText } from '../engine/number-text.js';

export interface QuantitySpec {
  kind: QuantityKind;
  rule: QuantityRule;
  /** Whether a spread (range or tolerance) may be given. */
  range: boolean;
  /** Set where the sign is asked separately: a minus sign then gets this hint. */
  noMinus?: string;
  /**
   * For a factor with a 0..1 rule: replaces the reader's percent hint ("0.012 for 1.2%"), which
   * misleads when a value just over 1 was meant as a decimal.
   */
  decimalNote?: string;
}

export type QuantityRead =
  { ok: true; value: Quantity; notice?: string } | { ok: false; message: string };

/**
 * Reads `text` into a Quantity in the case's units; a converted unit comes back as a notice.
 * @example readQuantity('24.4 m', { kind: 'length', rule: RULES.length, range: true }, 'imperial')
 * // { ok: true, value: 80.0525, notice: '24.4 m = 80.05 ft' } (as src/input/ rounds it)
 */
export function readQuantity(text: string, spec: QuantitySpec, units: UnitSystem): QuantityRead {
  const r = parseQuantity(text, {
    field: spec.rule.what,
    kind: spec.kind,
    units,
    rule: spec.rule,
    allowRange: spec.range,
    ...(spec.noMinus ? { signed: false, negativeHint: spec.noMinus } : {}),
  });
  if (!r.ok) {
    const cut = r.message.indexOf('; write it as a decimal');
    return spec.decimalNote && cut >= 0
      ? { ok: false, message: `${r.message.slice(0, cut)}; ${spec.decimalNote}` }
      : r;
  }
  return r.converted
    ? { ok: true, value: r.value, notice: `converted: ${r.converted}` }
    : { ok: true, value: r.value };
}

/** Decimals of each number as typed, in order: `0.70 (0.65-0.80)` gives [2, 2, 2]. */
function typedDecimals(text: string): number[] {
  return [...text.matchAll(/\d*\.(\d+)|\d+/g)].map((m) => m[1]?.length ?? 0);
}

/**
 * The quantity with the decimals it was typed with, when the file's number would lose them
 * (`0.70` is saved as 0.7: `decimals: 2` keeps the record as typed). Only when every number typed
 * has the same decimals (`0.70 (0.65-0.80)`), and only in the case's own units: a converted
 * figure was not typed as it is kept.
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

/** Writes a Quantity back as text the reader accepts: `80.5` or `80.5 (79.5-81.5)`. */
export function quantityText(q: Quantity): string {
  if (typeof q === 'number') return String(q);
  const t = (n: number) => typedText(n, q.decimals);
  const low = q.low ?? q.value;
  const high = q.high ?? q.value;
  return low === q.value && high === q.value ? t(q.value) : `${t(q.value)} (${t(low)}-${t(high)})`;
}
