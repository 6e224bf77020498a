/**
 * Quick entry of a whole slide on one line (our own syntax).
 *
 * ```
 * line     = segment { ("," | ";") segment }
 * segment  = [LENGTH] ["@" DRAG] [GRADE] ["[" label "]"]
 * LENGTH   = a length in the case's unit or with a suffix: 48, 15 m, 48 ft 6 in, 47-49, 48 ± 0.5
 * DRAG     = a decimal, optionally with its range: 0.74, 0.70-0.78, 0.74 (0.70-0.80), 0.74 ± 0.04
 *          | a reference table key, optionally its band and your own pick:
 *            gravel-loose, asphalt-dry-travelled/over30, gravel-loose=0.5, gravel-loose=0.45-0.6
 * GRADE    = signed percent, + uphill in the direction of travel: +2%, -3%, -3% ± 0.5,
 *            -3% (-4 to -2); no grade means level (0)
 * ```
 *
 * Example (invented): `48 @0.74 +2%, 31 @0.55 [gravel], 22 @0.40 -3%`. Only a slide of one
 * segment may leave out the length (it then comes from the marks). A comma directly between two
 * digits is never a separator: `0,55` is a comma decimal and gets a message.
 */
import { RULES } from '../case/quantity.js';
import type { DragV1, SegmentV1 } from '../case/v1/schema.js';
import type { DragTableRow } from '../engine/drag-table.js';
import type { UnitSystem } from '../engine/types.js';
import { checkItem, type Checked } from './check.js';
import { Cursor, ReadError, type Read } from './cursor.js';
import { gradeAhead, readItem } from './item.js';
import { isOp, lex, type Token } from './lexer.js';
import type { ReadContext } from './measure.js';
import type { QuantitySpec } from './types.js';
import { findUnit } from './units.js';
import { lookupTableKey, tableDrag, type SpeedBand } from './table-drag.js';

export interface SegmentContext {
  units: UnitSystem;
  /** The reference table for `@key`; default the engine's DRAG_TABLE. */
  table?: readonly DragTableRow[];
  /** Speed band for table rows that give two, when the key does not say `/under30` or `/over30`. */
  band?: SpeedBand;
}

export type SegmentsResult =
  | { ok: true; segments: SegmentV1[]; converted?: string }
  | { ok: false; message: string };

const spec = (field: string, kind: QuantitySpec['kind'], units: UnitSystem): QuantitySpec => ({
  field,
  kind,
  units,
  rule: field === 'length' ? RULES.length : field === 'grade' ? RULES.grade : RULES.drag,
  allowRange: true,
});

/**
 * Reads a slide typed on one line into case-file segments.
 * @example parseSegmentLine('48 @0.74 +2%, 31 @0.55', { units: 'imperial' })
 * // { ok: true, segments: [ { length: 48, drag: { source: 'entered', value: 0.74 }, grade: 2 },
 * //                         { length: 31, drag: { source: 'entered', value: 0.55 }, grade: 0 } ] }
 */
export function parseSegmentLine(text: string, ctx: SegmentContext): SegmentsResult {
  const source = text.trim();
  if (source === '')
    return { ok: false, message: 'segments: type each surface as LENGTH @DRAG GRADE, e.g. 48 @0.74 +2%, 31 @0.55' };
  const tokens = lex(source);
  const slices: [number, number][] = [];
  let from = 0;
  tokens.forEach((t, i) => {
    if (isOp(t, 'comma', 'semi')) {
      slices.push([from, i]);
      from = i + 1;
    }
  });
  if (from < tokens.length || slices.length === 0) slices.push([from, tokens.length]);
  const segments: SegmentV1[] = [];
  const notes: string[] = [];
  for (const [i, [a, b]] of slices.entries()) {
    if (a === b) return { ok: false, message: `segment ${i + 1} is empty: there are two separators in a row` };
    const cur = new Cursor(tokens, source, b);
    cur.pos = a;
    const where = `segment ${i + 1}, '${cur.text(a, b)}'`;
    const seg = readSegment(cur, ctx, notes, `segment ${i + 1}`);
    if (seg instanceof ReadError) return { ok: false, message: `${where}: ${seg.message}` };
    if (seg.length === undefined && slices.length > 1)
      return { ok: false, message: `${where}: give the length first; only a slide of one segment may leave it out` };
    segments.push(seg);
  }
  return notes.length ? { ok: true, segments, converted: notes.join('; ') } : { ok: true, segments };
}

function readSegment(cur: Cursor, ctx: SegmentContext, notes: string[], name: string): Read<SegmentV1> {
  const seg: Partial<SegmentV1> = {};
  const label = () => {
    const t = cur.peek();
    if (t?.t !== 'label') return undefined;
    cur.take();
    if (seg.label !== undefined) return new ReadError('give one [label] per segment');
    if (t.text.trim() === '') return new ReadError('the [label] is empty; write a surface name in it, e.g. [gravel]');
    seg.label = t.text.trim();
    return undefined;
  };
  const checked = (field: string, kind: QuantitySpec['kind'], raw: Read<Parameters<typeof checkItem>[0]>): Read<Checked> => {
    if (raw instanceof ReadError) return raw;
    const c = checkItem(raw, spec(field, kind, ctx.units), { field, kind, units: ctx.units });
    if (!(c instanceof ReadError) && c.converted) notes.push(`${name}: ${c.converted}`);
    return c;
  };
  const rc = (field: string, kind: QuantitySpec['kind']): ReadContext => ({ field, kind, units: ctx.units });

  const l0 = label();
  if (l0) return l0;
  const first = cur.peek();
  let lengthText = '48';
  if (first && !isOp(first, 'at') && first.t !== 'label') {
    const raw = readItem(cur, rc('length', 'length'), { allowRange: true, stopBeforeGrade: true });
    const len = checked('length', 'length', raw);
    if (len instanceof ReadError) return len;
    seg.length = len.value;
    lengthText = (raw as { text: string }).text;
  }
  if (!isOp(cur.peek(), 'at')) {
    if (cur.done() || gradeAhead(cur) || cur.peek()?.t === 'label') {
      const after = cur.done() ? '' : ` ${cur.rest()}`;
      return new ReadError(`no drag factor; add it after @, e.g. ${lengthText} @0.70${after}`);
    }
    return new ReadError(`${unreadable(cur)}; a segment is LENGTH @DRAG GRADE, e.g. 48 @0.70 -3%`);
  }
  cur.take();
  const drag = readDrag(cur, ctx, checked, rc);
  if (drag instanceof ReadError) return drag;
  seg.drag = drag;
  seg.grade = 0;
  const g = cur.peek();
  if (isOp(g, 'minus', 'plus')) {
    const grade = checked('grade', 'percent', readItem(cur, rc('grade', 'percent'), { allowRange: true }));
    if (grade instanceof ReadError) return grade;
    seg.grade = grade.value;
  } else if (g?.t === 'num') {
    const unit = cur.peek(1);
    const isPct = unit?.t === 'word' && findUnit('percent', unit.text) !== undefined;
    if (!isPct) return new ReadError(`${unreadable(cur)}; a grade is written with its sign and %, e.g. -3%`);
    if (g.value !== 0) return new ReadError(`the grade '${g.text}${unit.text}' needs a sign: +${g.text}${unit.text} uphill or -${g.text}${unit.text} downhill`);
    cur.take();
    cur.take();
  }
  const l1 = label();
  if (l1) return l1;
  if (!cur.done()) return new ReadError(unreadable(cur));
  return seg as SegmentV1;
}

/** What cannot be read at the cursor: a stray character's reason, or the text itself. */
function unreadable(cur: Cursor): string {
  const t = cur.peek();
  return t?.t === 'bad' ? t.why : `cannot read '${cur.rest()}'`;
}

type CheckFn = (field: string, kind: QuantitySpec['kind'], raw: Read<Parameters<typeof checkItem>[0]>) => Read<Checked>;

function readDrag(
  cur: Cursor,
  ctx: SegmentContext,
  checked: CheckFn,
  rc: (field: string, kind: QuantitySpec['kind']) => ReadContext,
): Read<DragV1> {
  const t: Token | undefined = cur.peek();
  if (t?.t === 'key') {
    cur.take();
    const choice = lookupTableKey(t.text, ctx.table, ctx.band);
    if (typeof choice === 'string') return new ReadError(choice);
    if (!isOp(cur.peek(), 'eq')) return tableDrag(choice);
    cur.take();
    const raw = readItem(cur, rc('drag factor', 'factor'), { allowRange: true, stopBeforeGrade: true });
    const pick = checked('drag factor', 'factor', raw);
    if (pick instanceof ReadError) return pick;
    if (typeof pick.value !== 'number') return tableDrag(choice, pick.value);
    const { low, high } = choice.range;
    if (pick.value < low || pick.value > high)
      return new ReadError(
        `the drag factor ${pick.value} is outside the table range ${low}-${high} of ${choice.row.key}; give your own range, e.g. @${t.text}=${pick.value} (${Math.min(low, pick.value)}-${Math.max(high, pick.value)})`,
      );
    return tableDrag(choice, { value: pick.value });
  }
  if (t === undefined || isOp(t, 'minus', 'plus') || t.t === 'label')
    return new ReadError('a drag factor is missing after @; write it as a decimal, e.g. @0.70');
  const raw = readItem(cur, rc('drag factor', 'factor'), { allowRange: true, stopBeforeGrade: true });
  const d = checked('drag factor', 'factor', raw);
  if (d instanceof ReadError) {
    // `@0.7 -3` reads as the range 0.7 to 3: most likely a grade without its %.
    if (!(raw instanceof ReadError) && raw.form === 'range' && !raw.hi.explicitSign && raw.hi.parts[0]!.unit === undefined)
      return new ReadError(
        `${d.message}; '${raw.text}' reads as a drag factor range; a grade is written with its sign and %, e.g. -${raw.hi.text}%`,
      );
    return d;
  }
  const q = d.value;
  return typeof q === 'number'
    ? { source: 'entered', value: q }
    : { source: 'entered', value: q.value, low: q.low ?? q.value, high: q.high ?? q.value };
}
