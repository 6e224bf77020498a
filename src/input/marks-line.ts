/**
 * Quick entry of the marks of one slide: every length on one line, or `4 x 80.5` for four marks
 * of one length.
 */
import { RULES, type Quantity } from '../case/quantity.js';
import type { UnitSystem } from '../engine/types.js';
import { checkItem } from './check.js';
import { Cursor, ReadError } from './cursor.js';
import { readItem } from './item.js';
import { isOp, lex, type Token } from './lexer.js';
import { badTokenMessage } from './parse-quantity.js';
import { readList, typedValues } from './parse-list.js';
import { withTypedDecimals } from './typed-decimals.js';
import { tolerancesForAll } from './list-tolerance.js';
import { mixedUnitsMessage } from './mixed-units.js';
import type { QuantitySpec } from './types.js';

/** Most marks one analysis takes through the interview (a truck's axles leave many). */
export const MAX_MARKS = 64;

export interface MarksContext {
  units: UnitSystem;
  /** Ranges and tolerances on a mark (`80 ± 0.5`); default true. */
  allowRange?: boolean;
  /** Most marks accepted; default MAX_MARKS. */
  maxMarks?: number;
}

export type MarksResult =
  | {
      ok: true;
      marks: Quantity[];
      converted?: string;
      /** Set when one tolerance typed after the list was taken for every mark. */
      shared?: string;
      /** Set when the marks' typed units mix feet and metres: names the entries out of place. */
      mixed?: string;
    }
  | { ok: false; message: string };

const isTimes = (t: Token | undefined) =>
  isOp(t, 'times') || (t?.t === 'word' && t.text.toLowerCase() === 'x');
const isWhole = (t: Token | undefined) =>
  t?.t === 'num' && Number.isInteger(t.value) && !t.text.includes('.');

/**
 * Reads the marks' lengths, in the case's length unit.
 *
 * - `94 92 95 93`, `94, 92, 95`, `94 ft 2 in, 92`, `24.4 m; 24.1 m`: one length per mark.
 * - `4 x 80.5` (also `4x80.5`, `4 × 80.5`, `4 * 80.5`): four marks of 80.5 each. The count comes
 *   first; `80.5 x 4` gets a message that says so.
 *
 * @example parseMarksLine('4 x 80.5', { units: 'imperial' }) // { ok: true, marks: [80.5, 80.5, 80.5, 80.5] }
 */
export function parseMarksLine(text: string, ctx: MarksContext): MarksResult {
  const trimmed = text.trim();
  const max = ctx.maxMarks ?? MAX_MARKS;
  if (trimmed === '')
    return {
      ok: false,
      message: 'marks: type each mark’s length, e.g. 94 92 95 93, or 4 x 80.5 for four equal marks',
    };
  const tokens = lex(trimmed);
  const bad = badTokenMessage(tokens, 'marks');
  if (bad) return { ok: false, message: bad };
  const spec: QuantitySpec & { item: string } = {
    field: 'length',
    item: 'mark',
    kind: 'length',
    units: ctx.units,
    rule: RULES.length,
    allowRange: ctx.allowRange ?? true,
  };
  const x = tokens.findIndex(isTimes);
  if (x >= 0) return equalMarks(tokens, trimmed, x, spec, max);
  const read = readList(new Cursor(tokens, trimmed), spec);
  if (read instanceof ReadError) return { ok: false, message: read.message };
  const r = tolerancesForAll(read, spec);
  if (r instanceof ReadError) return { ok: false, message: r.message };
  if (r.values.length > max)
    return { ok: false, message: `give at most ${max} marks (${r.values.length} typed)` };
  const mixed = mixedUnitsMessage(r.raws, ctx.units, 'mark');
  return {
    ok: true,
    marks: typedValues(r),
    ...(r.notes.length ? { converted: r.notes.join('; ') } : {}),
    ...(r.shared ? { shared: r.shared } : {}),
    ...(mixed ? { mixed } : {}),
  };
}

function equalMarks(
  tokens: Token[],
  source: string,
  x: number,
  spec: QuantitySpec & { item: string },
  max: number,
): MarksResult {
  const count = tokens[0];
  const after = tokens[x + 1];
  // `80.5 x 4`: a whole number last, after the x, reads as the count typed second.
  const swapHint = () =>
    x === tokens.length - 2 && isWhole(after) && (after as { value: number }).value <= max
      ? `marks: the count comes first; write ${after!.text} x ${source.slice(0, tokens[x]!.at).trim()}`
      : undefined;
  if (x !== 1 || !isWhole(count))
    return {
      ok: false,
      message: swapHint() ?? 'marks: write the number of marks, x, then the length, e.g. 4 x 80.5',
    };
  const n = (count as { value: number }).value;
  if (n < 1 || n > max)
    return {
      ok: false,
      message: swapHint() ?? `marks: the number of marks before x must be from 1 to ${max}`,
    };
  const cur = new Cursor(tokens, source);
  cur.pos = 2;
  const ctx = { field: 'length', kind: spec.kind, units: spec.units };
  if (cur.done())
    return { ok: false, message: `marks: give the length after ${n} x, e.g. ${n} x 80.5` };
  const raw = readItem(cur, ctx, { allowRange: spec.allowRange });
  if (raw instanceof ReadError) return { ok: false, message: `marks: ${raw.message}` };
  if (!cur.done())
    return {
      ok: false,
      message: `marks: after ${n} x give one length; cannot read '${cur.rest()}'`,
    };
  const checked = checkItem(raw, spec, ctx);
  if (checked instanceof ReadError) return { ok: false, message: `marks: ${checked.message}` };
  const v = checked.converted ? checked.value : withTypedDecimals(checked.value, raw.text);
  const marks = Array.from({ length: n }, () => (typeof v === 'number' ? v : { ...v }));
  return checked.converted
    ? { ok: true, marks, converted: checked.converted }
    : { ok: true, marks };
}
