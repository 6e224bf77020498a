/**
 * Reading one typed quantity: a number with an optional unit suffix and, where allowed, a range or
 * a tolerance, converted into the case's units.
 */
import { Cursor, ReadError } from './cursor.js';
import { checkItem } from './check.js';
import { readItem, type RawItem } from './item.js';
import { lex, type Token } from './lexer.js';
import type { ReadContext } from './measure.js';
import type { QuantityResult, QuantitySpec } from './types.js';
import { KIND_EXAMPLE } from './units.js';

/** The message for an empty answer. */
export const emptyMessage = (field: string, kind: QuantitySpec['kind']): string =>
  `${field} is empty; type a number such as ${KIND_EXAMPLE[kind]}`;

/** The message for tokens left over after a value was read. */
export function leftoverMessage(cur: Cursor, field: string, raw: RawItem): string {
  const t = cur.peek()!;
  const rest = cur.rest();
  if (t.t === 'bad') return `${field}: ${t.why}`;
  const last =
    raw.form === 'single'
      ? raw.v
      : raw.form === 'tol'
        ? raw.tol
        : raw.form === 'range'
          ? raw.hi
          : undefined;
  const smaller = last?.parts[last.parts.length - 1]!.unit?.then?.[0];
  if (t.t === 'num' && smaller)
    return `${field}: say the unit of '${t.text}' after '${raw.text}', e.g. ${raw.text} ${t.text} ${smaller}`;
  if (t.t === 'op' && (t.op === 'comma' || t.op === 'semi'))
    return `${field}: give one value here; '${cur.source}' is more than one`;
  return `${field}: cannot read '${rest}' after '${raw.text}'`;
}

/** The first token that cannot be part of any answer, as a message. */
export function badTokenMessage(tokens: readonly Token[], field: string): string | undefined {
  const bad = tokens.find((t) => t.t === 'bad');
  return bad && bad.t === 'bad' ? `${field}: ${bad.why}` : undefined;
}

/**
 * Reads a typed quantity into the case's units.
 *
 * Accepted (invented examples): `80`, `80.5`, `.5`, `1e3`; with a unit `24.4 m`, `80 ft`, `80'`,
 * `12 ft 6 in`, `12' 6"`, `150 cm`, `0.3 km`, `3 yd`, `50 km/h`, `30 mph`, `6%`, `2°` (slope in
 * degrees, converted to percent), `1.5 s`, `68 kg`; where `allowRange`: `0.65-0.80`,
 * `0.65 to 0.80`, `0.65..0.80` (value = midpoint), `0.72 (0.65-0.80)`, `80 +/- 1`, `80 ± 1`,
 * `80+-1`, `24.4 m +/- 0.1`, `80-82 ft`.
 *
 * Decisions: a comma inside a number is never guessed (`0,72` gets "write 0.72", `1,234.5`
 * "write 1234.5"); a factor in percent (`72%`) is refused with the decimal to write instead;
 * `0.3 km` and `yd` are accepted; a slope in degrees is converted with percent = 100 tan(angle).
 * Bounds are checked after conversion with `ruleViolation`, so the words match the file validator.
 *
 * @example parseQuantity('12 ft 6 in', { field: 'mark length', kind: 'length', units: 'metric', rule: RULES.length, allowRange: true })
 * // { ok: true, value: 3.81, converted: '12 ft 6 in = 3.81 m' }
 */
export function parseQuantity(text: string, spec: QuantitySpec): QuantityResult {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, message: emptyMessage(spec.field, spec.kind) };
  const tokens = lex(trimmed);
  const cur = new Cursor(tokens, trimmed);
  const ctx: ReadContext = { field: spec.field, kind: spec.kind, units: spec.units };
  const raw = readItem(cur, ctx, { allowRange: spec.allowRange });
  if (raw instanceof ReadError) return { ok: false, message: raw.message };
  if (!cur.done()) return { ok: false, message: leftoverMessage(cur, spec.field, raw) };
  const checked = checkItem(raw, spec, ctx);
  if (checked instanceof ReadError) return { ok: false, message: checked.message };
  return { ok: true, ...checked };
}
