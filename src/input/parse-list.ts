/**
 * Several quantities on one line (`94 92 95 93`, `94, 92, 95`, `94 ft 2 in, 92`), and whole
 * counts. Items are separated by commas, semicolons or spaces; a space never splits a value from
 * its unit or a `12 ft 6 in` measure.
 */
import { Cursor, ReadError, type Read } from './cursor.js';
import { checkItem } from './check.js';
import { readItem, type RawItem } from './item.js';
import { isOp, lex, type Token } from './lexer.js';
import type { ReadContext } from './measure.js';
import { badTokenMessage, emptyMessage } from './parse-quantity.js';
import type { Quantity } from '../case/quantity.js';
import { withTypedDecimals } from './typed-decimals.js';
import type { CountResult, CountSpec, ListResult, ListSpec, QuantitySpec } from './types.js';

/** Items read from tokens, before the count limits. Used by the marks line as well. */
export interface ListRead {
  values: Quantity[];
  notes: string[];
  /** Each item as read, in the order typed (for a tolerance written once after the list). */
  raws: RawItem[];
  /** Per item: typed in the case's own units (not converted), so its typed decimals are kept. */
  asTyped: boolean[];
}

/** The values with the decimals each was typed with (`52.0` stays `52.0` in the record). */
export function typedValues(r: ListRead): Quantity[] {
  return r.values.map((v, i) =>
    r.asTyped[i] && r.raws[i] ? withTypedDecimals(v, r.raws[i].text) : v,
  );
}

const isSep = (t: Token | undefined) => isOp(t, 'comma', 'semi');

/** Reads items from `cur` until its end; messages name the item ("mark 3: ..."). */
export function readList(cur: Cursor, spec: QuantitySpec & { item: string }): Read<ListRead> {
  const values: Quantity[] = [];
  const notes: string[] = [];
  const raws: RawItem[] = [];
  const asTyped: boolean[] = [];
  while (!cur.done()) {
    const label = `${spec.item} ${values.length + 1}`;
    if (isSep(cur.peek()))
      return new ReadError(`${label} is empty: there are two separators in a row`);
    const ctx: ReadContext = {
      field: spec.field,
      kind: spec.kind,
      units: spec.units,
      inList: true,
    };
    const raw = readItem(cur, ctx, { allowRange: spec.allowRange });
    if (raw instanceof ReadError) return new ReadError(`${label}: ${raw.message}`);
    const checked = checkItem(raw, spec, ctx);
    if (checked instanceof ReadError) return new ReadError(`${label}: ${checked.message}`);
    values.push(checked.value);
    raws.push(raw);
    asTyped.push(!checked.converted);
    if (checked.converted) notes.push(`${label}: ${checked.converted}`);
    const t = cur.peek();
    if (isSep(t)) {
      cur.take();
      continue;
    }
    if (t === undefined || t.t === 'num' || t.t === 'commaNum' || isOp(t, 'minus', 'plus'))
      continue;
    const why = t.t === 'bad' ? t.why : `cannot read '${cur.rest()}' after '${raw.text}'`;
    return new ReadError(`${label}: ${spec.field}: ${why}`);
  }
  return { values, notes, raws, asTyped };
}

/**
 * Reads several values of one kind, each checked like `parseQuantity`.
 * @example parseList('94, 92 ft 6 in', { field: 'length', item: 'mark', kind: 'length', units: 'imperial', rule: RULES.length, allowRange: true })
 * // { ok: true, values: [94, 92.5], converted: 'mark 2: 92 ft 6 in = 92.5 ft' }
 */
export function parseList(text: string, spec: ListSpec): ListResult {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, message: emptyMessage(spec.field, spec.kind) };
  const tokens = lex(trimmed);
  const bad = badTokenMessage(tokens, spec.field);
  if (bad) return { ok: false, message: bad };
  const r = readList(new Cursor(tokens, trimmed), spec);
  if (r instanceof ReadError) return { ok: false, message: r.message };
  const limits = countLimits(r.values.length, spec);
  if (limits) return { ok: false, message: limits };
  const values = typedValues(r);
  return r.notes.length
    ? { ok: true, values, converted: r.notes.join('; ') }
    : { ok: true, values };
}

function countLimits(n: number, spec: ListSpec): string | undefined {
  const min = spec.minItems ?? 1;
  const max = spec.maxItems ?? 64;
  const plural = (k: number) => `${k} ${spec.item}${k === 1 ? '' : 's'}`;
  if (n < min) return `give at least ${plural(min)} (${n} typed)`;
  if (n > max) return `give at most ${plural(max)} (${n} typed)`;
  return undefined;
}

/**
 * Reads a whole number of things: `4`. Not a decimal, no unit, no range.
 * @example parseCount('4', { field: 'number of marks', max: 16 }) // { ok: true, value: 4 }
 */
export function parseCount(text: string, spec: CountSpec): CountResult {
  const t = text.trim();
  const min = spec.min ?? 1;
  const between = spec.max === undefined ? `${min} or more` : `from ${min} to ${spec.max}`;
  if (t === '')
    return { ok: false, message: `${spec.field} is empty; type a whole number ${between}` };
  if (!/^[+-]?\d+(\.\d+)?$/.test(t))
    return {
      ok: false,
      message: `${spec.field}: '${t}' is not a whole number; type a whole number ${between}`,
    };
  const n = Number(t);
  if (!Number.isInteger(n))
    return { ok: false, message: `${spec.field} must be a whole number, not ${t}` };
  if (n < min || (spec.max !== undefined && n > spec.max))
    return { ok: false, message: `${spec.field} must be a whole number ${between}` };
  return { ok: true, value: n };
}
