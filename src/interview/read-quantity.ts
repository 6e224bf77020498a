/**
 * How the interview reads typed numbers: a thin layer over src/input/ (the project's one reader
 * of numbers, units, ranges and quick-entry lines), so every answer takes the same syntax.
 */
import type { UnitSystem } from '../engine/types.js';
import type { Quantity, QuantityRule } from '../case/quantity.js';
import { parseQuantity, type QuantityKind } from '../input/index.js';
import { typedText } from '../engine/number-text.js';

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

/** Writes a Quantity back as text the reader accepts: `80.5` or `80.5 (79.5-81.5)`. */
export function quantityText(q: Quantity): string {
  if (typeof q === 'number') return String(q);
  const t = (n: number) => typedText(n, q.decimals);
  const low = q.low ?? q.value;
  const high = q.high ?? q.value;
  return low === q.value && high === q.value ? t(q.value) : `${t(q.value)} (${t(low)}-${t(high)})`;
}
