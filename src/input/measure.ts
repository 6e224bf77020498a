/**
 * One measure in a typed answer: an optional sign, a number, and optionally a unit, or several
 * number-unit parts of falling size (`12 ft 6 in`, `3 m 20 cm`).
 */
import type { UnitSystem } from '../engine/types.js';
import { Cursor, ReadError, type Read } from './cursor.js';
import { isOp, isToWord, type Token } from './lexer.js';
import {
  findAnyUnit,
  findUnit,
  KIND_EXAMPLE,
  KIND_NAME,
  suffixList,
  toCaseUnit,
  type QuantityKind,
  type UnitDef,
} from './units.js';
import { showNumber } from './show.js';

/** What is being read, for the words of messages and for the units understood. */
export interface ReadContext {
  /** The field as the message names it: "mark length", "drag factor". */
  field: string;
  kind: QuantityKind;
  units: UnitSystem;
  /** Several values on one line: a comma directly between digits then gets a list hint. */
  inList?: boolean;
}

export interface Part {
  n: number;
  unit?: UnitDef;
}

export interface Measure {
  negative: boolean;
  explicitSign: boolean;
  parts: Part[];
  /** Exactly as typed. */
  text: string;
}

/** Reads a measure at the cursor, or says what is wrong with it. */
export function readMeasure(cur: Cursor, ctx: ReadContext): Read<Measure> {
  const start = cur.pos;
  let negative = false;
  let explicitSign = false;
  const s = cur.peek();
  if (isOp(s, 'minus', 'plus')) {
    cur.take();
    negative = isOp(s, 'minus');
    explicitSign = true;
  }
  const first = readNumber(cur, ctx, start);
  if (first instanceof ReadError) return first;
  const parts: Part[] = [{ n: first }];
  const w = cur.peek();
  if (w?.t === 'word' && !isKeyword(w)) {
    const unit = unitOrError(w, first, ctx);
    if (unit instanceof ReadError) return unit;
    cur.take();
    parts[0]!.unit = unit;
    // Smaller parts: `12 ft 6 in`. A number is part of this measure only when its unit is a
    // smaller one that may follow; otherwise it starts the next value of a list.
    for (;;) {
      const last = parts[parts.length - 1]!.unit!;
      const n = cur.peek();
      const nu = cur.peek(1);
      if (n?.t !== 'num' || nu?.t !== 'word') break;
      const next = findUnit(ctx.kind, nu.text);
      if (!next || !(last.then ?? []).includes(next.id)) break;
      cur.take();
      cur.take();
      parts.push({ n: n.value, unit: next });
    }
  }
  return { negative, explicitSign, parts, text: cur.text(start) };
}

/** `to` and `x` are keywords of ranges and of `4 x 80.5`, never units. */
const isKeyword = (t: Token): boolean => isToWord(t) || t.text.toLowerCase() === 'x';

function readNumber(cur: Cursor, ctx: ReadContext, start: number): Read<number> {
  const t = cur.peek();
  const { field } = ctx;
  const example = KIND_EXAMPLE[ctx.kind];
  if (t === undefined) {
    const before = cur.text(Math.min(cur.itemStart, start));
    return new ReadError(
      before
        ? `${field}: a number is missing after '${before}'`
        : `${field}: a number is missing; type ${KIND_NAME[ctx.kind]} such as ${example}`,
    );
  }
  if (t.t === 'commaNum') return new ReadError(commaMessage(t.text, ctx));
  if (t.t === 'word' && /^(nan|inf|infinity)$/i.test(t.text))
    return new ReadError(
      `${field} must be a finite number, not '${t.text}'; type a number such as ${example}`,
    );
  if (t.t !== 'num') {
    const what = t.t === 'bad' ? t.why : `'${t.text}' is not a number`;
    return new ReadError(`${field}: ${what}; type a number such as ${example}`);
  }
  if (!Number.isFinite(t.value))
    return new ReadError(
      `${field}: '${t.text}' is too large to be a number; type a number such as ${example}`,
    );
  cur.take();
  return t.value;
}

/** The hint for digits with a comma: decimal comma, thousands separator, or a missing space. */
function commaMessage(text: string, ctx: ReadContext): string {
  const dot = text.replace(/,/g, '.');
  const joined = text.replace(/,/g, '');
  const { field } = ctx;
  if (ctx.inList && !text.includes('.')) {
    const decimal = /^\d+,\d+$/.test(text) ? `, for a decimal write ${dot}` : '';
    return `${field}: '${text}' has a comma between digits; to list several values put a space after each comma (${text.replace(/,/g, ', ')})${decimal}`;
  }
  if (/^\d{1,3}(,\d{3})+\.\d+$/.test(text))
    return `${field}: '${text}' uses a comma to group thousands; write ${joined}`;
  if (/^\d{1,3}(,\d{3})+$/.test(text))
    return `${field}: '${text}' is unclear with a comma; write ${joined} for thousands or ${dot} for a decimal`;
  if (/^\d+,\d+$/.test(text)) return `the ${field} '${text}' uses a comma; write ${dot}`;
  return `${field}: '${text}' has commas between digits; write the number with a dot for decimals and no thousands separator`;
}

function unitOrError(w: Token, n: number, ctx: ReadContext): Read<UnitDef> {
  const unit = findUnit(ctx.kind, w.text);
  if (unit) return unit;
  const { field, kind } = ctx;
  if (kind === 'factor' && w.text === '%')
    return new ReadError(
      `${field}: write a decimal, not a percentage (${showNumber(n / 100)} for ${showNumber(n)}%)`,
    );
  if (kind === 'count') return new ReadError(`${field} is a whole number without a unit`);
  const takes =
    kind === 'factor'
      ? `a ${field} is a plain decimal such as 0.72`
      : `${KIND_NAME[kind]} takes ${suffixList(kind)}`;
  const other = findAnyUnit(w.text);
  if (other) {
    const otherKind =
      other.kind === 'weight'
        ? 'weight or force'
        : other.kind === 'factor'
          ? 'deceleration'
          : other.kind;
    return new ReadError(`${field}: '${w.text}' is a unit of ${otherKind}; ${takes}`);
  }
  return new ReadError(`${field}: unknown unit '${w.text}'; ${takes}`);
}

/** The measure's number in its own unit (first part's), sign applied. For tolerances in that unit. */
export function nativeValue(m: Measure): number {
  const first = m.parts[0]!;
  let n = first.n;
  for (const p of m.parts.slice(1)) n += (p.n * p.unit!.factor) / first.unit!.factor;
  return m.negative ? -n : n;
}

/** The measure in the case's unit, with `unit` standing in for a bare number's missing unit. */
export function caseValue(m: Measure, ctx: ReadContext, unit: UnitDef | undefined): number {
  let n = 0;
  for (const p of m.parts) {
    const u = p.unit ?? unit;
    n += u ? toCaseUnit(p.n, u, ctx.kind, ctx.units) : p.n;
  }
  return m.negative ? -n : n;
}
