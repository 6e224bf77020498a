/**
 * From a read item to a Quantity in the case's units: order of the ends, sign, the rule's bounds
 * (in the file validator's words), and the conversion note.
 */
import { ruleViolation, type Quantity } from '../case/quantity.js';
import { ReadError, type Read } from './cursor.js';
import { resolveItem, type RawItem } from './item.js';
import type { ReadContext } from './measure.js';
import { showNumber } from './show.js';
import type { QuantitySpec } from './types.js';
import { caseUnitOf } from './units.js';

export const DEFAULT_NEGATIVE_HINT = 'choose downhill instead of typing a minus sign';

export interface Checked {
  value: Quantity;
  converted?: string;
}

/** `80.05 ft`, `5.24%`, `0.72`: a case-unit figure for a note. */
function withUnit(n: string, unit: string): string {
  return unit === '' ? n : unit === '%' ? `${n}%` : `${n} ${unit}`;
}

/** The quantity as a note shows it: `80.05 ft`, `24.38 to 24.99 m`, `80.05 ft (79.72 to 80.38)`. */
export function showQuantity(q: Quantity, unit: string, asRange = false): string {
  if (typeof q === 'number') return withUnit(showNumber(q), unit);
  const lo = showNumber(q.low ?? q.value);
  const hi = showNumber(q.high ?? q.value);
  if (asRange) return withUnit(`${lo} to ${hi}`, unit);
  return `${withUnit(showNumber(q.value), unit)} (${lo} to ${hi})`;
}

/** Checks a read item against the spec and builds the Quantity. */
export function checkItem(raw: RawItem, spec: QuantitySpec, ctx: ReadContext): Read<Checked> {
  const unit = caseUnitOf(spec.kind, spec.units);
  const r = resolveItem(raw, ctx, unit);
  if (r instanceof ReadError) return r;
  const { field } = ctx;
  if (raw.form === 'range' && r.low! > r.high!) {
    const sep = raw.lo.negative || raw.hi.negative ? ' to ' : '-';
    return new ReadError(
      `${field}: the low end comes first; write ${raw.hi.text}${sep}${raw.lo.text}`,
    );
  }
  if (raw.form === 'paren' && r.low! > r.high!)
    return new ReadError(
      `${field}: the low end comes first in the brackets; write (${raw.hi.text}-${raw.lo.text})`,
    );
  if (raw.form === 'paren' && (r.value < r.low! || r.value > r.high!))
    return new ReadError(
      `${field}: ${raw.v.text} is outside its range ${raw.lo.text}-${raw.hi.text}`,
    );

  // A typed "-0" is level, not a signed zero.
  if (r.value === 0) r.value = 0;
  const value: Quantity =
    r.low === undefined || (r.low === r.value && r.high === r.value)
      ? r.value
      : { value: r.value, low: r.low, high: r.high! };
  const converted = r.converted
    ? `${raw.text} = ${showQuantity(value, unit, raw.form === 'range')}`
    : undefined;
  const after = converted ? ` (${converted})` : '';

  if (spec.signed === false && [r.value, r.low, r.high].some((n) => n !== undefined && n < 0))
    return new ReadError(
      `${field}: no minus sign here; ${spec.negativeHint ?? DEFAULT_NEGATIVE_HINT}`,
    );
  const ends: [number | undefined, string][] = [
    [r.value, field],
    [r.low, `${field} (low)`],
    [r.high, `${field} (high)`],
  ];
  for (const [n, what] of ends) {
    if (n === undefined) continue;
    const msg = ruleViolation({ ...spec.rule, what }, n);
    if (!msg) continue;
    const tooBig =
      spec.kind === 'factor' &&
      raw.form === 'single' &&
      spec.rule.max !== undefined &&
      n > spec.rule.max &&
      n <= 100;
    // A small whole number is no percent anyone meant (3 is not 0.03): say what the figure is.
    const decimalHint = !tooBig
      ? ''
      : n < 10 && /drag factor/.test(`${spec.rule.what} ${field}`)
        ? '; a drag factor is a decimal, usually near 0.7 (e.g. 0.70)'
        : `; write it as a decimal, e.g. ${showNumber(n / 100)} for ${showNumber(n)}%`;
    return new ReadError(`${msg}${after}${decimalHint}`);
  }
  return converted ? { value, converted } : { value };
}
