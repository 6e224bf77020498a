/**
 * One value with its optional spread: `80`, `80 ± 1`, `0.72 (0.65-0.80)`, `0.65-0.80`,
 * `0.65 to 0.80`, `0.65..0.80`, each part with or without a unit.
 */
import { Cursor, ReadError, type Read } from './cursor.js';
import { isOp, isToWord } from './lexer.js';
import { caseValue, nativeValue, readMeasure, type Measure, type ReadContext } from './measure.js';
import { findUnit, type UnitDef } from './units.js';
import { tidy } from './show.js';

export type RawItem =
  | { form: 'single'; v: Measure; text: string }
  | { form: 'tol'; v: Measure; tol: Measure; text: string }
  | { form: 'paren'; v: Measure; lo: Measure; hi: Measure; text: string }
  | { form: 'range'; lo: Measure; hi: Measure; text: string };

export interface ItemOptions {
  allowRange: boolean;
  /** In a segment, `0.74 -3%` is a drag factor then a grade, not a range. */
  stopBeforeGrade?: boolean;
}

const isRangeSep = (cur: Cursor, ahead = 0) =>
  isOp(cur.peek(ahead), 'minus', 'to') || isToWord(cur.peek(ahead));

/**
 * True when the cursor stands on a signed percentage: `-3%`, `+ 2 %`, `-1.5°`, `-3 ± 0.5%`,
 * `-4..-2%`, `-4 to -2%`. A `-` range (`-4--2%`) is not looked for: `0.70-0.78` must stay a range.
 */
export function gradeAhead(cur: Cursor): boolean {
  const pct = (i: number) => {
    const t = cur.peek(i);
    return t?.t === 'word' && findUnit('percent', t.text) !== undefined;
  };
  if (!isOp(cur.peek(), 'minus', 'plus') || cur.peek(1)?.t !== 'num') return false;
  if (pct(2)) return true;
  const sep = cur.peek(2);
  if (!isOp(sep, 'pm', 'to') && !isToWord(sep)) return false;
  let i = 3;
  if (!isOp(sep, 'pm') && isOp(cur.peek(i), 'minus', 'plus')) i++;
  return cur.peek(i)?.t === 'num' && pct(i + 1);
}

/**
 * `-63` when the cursor stands on a minus with a space before it and a number right after it
 * (`61 -63`): in a list that reads as a negative value more than as a range. Else undefined.
 */
function looseMinus(cur: Cursor): string | undefined {
  const before = cur.tokens[cur.pos - 1];
  const sep = cur.peek();
  const after = cur.peek(1);
  if (!before || !isOp(sep, 'minus') || after?.t !== 'num') return undefined;
  return before.end < sep!.at && after.at === sep!.end ? `${sep!.text}${after.text}` : undefined;
}

/** Reads one value with its spread at the cursor. */
export function readItem(cur: Cursor, ctx: ReadContext, opts: ItemOptions): Read<RawItem> {
  const start = cur.pos;
  cur.itemStart = start;
  const noRange = () =>
    new ReadError(`${ctx.field}: give one value here, not a range or a tolerance`);
  const v = readMeasure(cur, ctx);
  if (v instanceof ReadError) return v;
  const t = cur.peek();
  if (isOp(t, 'pm')) {
    if (!opts.allowRange) return noRange();
    cur.take();
    const tol = readMeasure(cur, ctx);
    if (tol instanceof ReadError) return tol;
    if (tol.explicitSign)
      return new ReadError(
        `${ctx.field}: the tolerance after ± is a size without a sign, e.g. ${v.text} ± 1`,
      );
    return { form: 'tol', v, tol, text: cur.text(start) };
  }
  if (isOp(t, 'lparen')) {
    if (!opts.allowRange) return noRange();
    cur.take();
    const lo = readMeasure(cur, ctx);
    if (lo instanceof ReadError) return lo;
    if (cur.done()) return new ReadError(`${ctx.field}: the ( after ${v.text} has no closing )`);
    if (!isRangeSep(cur))
      return new ReadError(
        `${ctx.field}: in brackets give the range as low-high, e.g. ${v.text} (${lo.text}-…)`,
      );
    cur.take();
    const hi = readMeasure(cur, ctx);
    if (hi instanceof ReadError) return hi;
    if (!isOp(cur.peek(), 'rparen'))
      return new ReadError(`${ctx.field}: the ( after ${v.text} has no closing )`);
    cur.take();
    return { form: 'paren', v, lo, hi, text: cur.text(start) };
  }
  if (isRangeSep(cur) && !(opts.stopBeforeGrade && gradeAhead(cur))) {
    const loose = looseMinus(cur);
    if (ctx.inList && loose)
      return new ReadError(
        `'${v.text} ${loose}': a ${ctx.field} cannot be negative; a range is written ${v.text}-${loose.slice(1)} or ${v.text} to ${loose.slice(1)}`,
      );
    if (!opts.allowRange) return noRange();
    cur.take();
    const hi = readMeasure(cur, ctx);
    if (hi instanceof ReadError) return hi;
    return { form: 'range', lo: v, hi, text: cur.text(start) };
  }
  return { form: 'single', v, text: cur.text(start) };
}

/** An item in the case's units. `converted` is true when a typed unit differs from the case's. */
export interface Resolved {
  value: number;
  low?: number;
  high?: number;
  converted: boolean;
}

/** The measures of an item, in the order typed. */
export const measures = (r: RawItem): Measure[] =>
  r.form === 'single'
    ? [r.v]
    : r.form === 'tol'
      ? [r.v, r.tol]
      : r.form === 'paren'
        ? [r.v, r.lo, r.hi]
        : [r.lo, r.hi];

/**
 * Brings every part into the case's unit. A bare number takes the unit typed elsewhere in the
 * item (`80-82 ft`, `24.4 m ± 0.1`) when that is a single plain unit; otherwise it must say its own.
 */
export function resolveItem(raw: RawItem, ctx: ReadContext, caseUnit: string): Read<Resolved> {
  const ms = measures(raw);
  const typed = ms.filter((m) => m.parts[0]!.unit).map((m) => m.parts[0]!.unit!);
  const simple = ms.every((m) => m.parts.length === 1) && new Set(typed.map((u) => u.id)).size <= 1;
  const bare = ms.find((m) => !m.parts[0]!.unit);
  if (bare && typed.length > 0 && !simple)
    return new ReadError(
      `${ctx.field}: give a unit for '${bare.text}' too, e.g. ${bare.text} ${typed[typed.length - 1]!.id}`,
    );
  const shared: UnitDef | undefined = typed[0];
  const converted =
    caseUnit !== '' &&
    ms.some((m) =>
      m.parts.some((p) => (p.unit ?? shared) !== undefined && (p.unit ?? shared)!.id !== caseUnit),
    );
  const val = (m: Measure) => caseValue(m, ctx, shared);
  // Typed numbers stay exactly as typed; converted and computed ones (a midpoint, the ends of a
  // tolerance) lose the noise of binary arithmetic.
  const fix = (n: number) => (converted ? tidy(n) : n);
  switch (raw.form) {
    case 'single':
      return { value: fix(val(raw.v)), converted };
    case 'paren':
      return { value: fix(val(raw.v)), low: fix(val(raw.lo)), high: fix(val(raw.hi)), converted };
    case 'range': {
      const low = val(raw.lo);
      const high = val(raw.hi);
      return {
        value: low === high ? fix(low) : tidy((low + high) / 2),
        low: fix(low),
        high: fix(high),
        converted,
      };
    }
    case 'tol': {
      const vu = raw.v.parts[0]!.unit ?? shared;
      const tu = raw.tol.parts[0]!.unit ?? shared;
      const value = val(raw.v);
      if (simple && (vu === undefined || vu.id === tu?.id)) {
        // Same unit: the ends are taken in that unit and then converted, which also suits
        // degrees of slope (not a plain multiple of percent).
        const n = nativeValue(raw.v);
        const t = nativeValue(raw.tol);
        const end = (x: number) =>
          caseValue({ ...raw.v, negative: x < 0, parts: [{ n: Math.abs(x), unit: vu }] }, ctx, vu);
        return { value: fix(value), low: tidy(end(n - t)), high: tidy(end(n + t)), converted };
      }
      if (tu?.toBase || vu?.toBase)
        return new ReadError(
          `${ctx.field}: give the tolerance in the same unit as the value, e.g. ${raw.v.text} ± 0.5`,
        );
      const delta = caseValue(raw.tol, ctx, shared);
      return { value: fix(value), low: tidy(value - delta), high: tidy(value + delta), converted };
    }
  }
}
