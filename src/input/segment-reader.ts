/**
 * Reads one segment of a quick-entry line: `[LENGTH] [@DRAG] [GRADE] [[label]]`. The grammar and
 * its decisions are documented on `parseSegmentLine`.
 */
import { RULES } from '../case/quantity.js';
import type { DragV1, SegmentV1 } from '../case/v1/schema.js';
import type { DragTableRow } from '../engine/drag-table.js';
import type { UnitSystem } from '../engine/types.js';
import { checkItem, type Checked } from './check.js';
import { Cursor, ReadError, type Read } from './cursor.js';
import { gradeAhead, measures, readItem, type RawItem } from './item.js';
import { isOp, type Token } from './lexer.js';
import { findUnit } from './units.js';
import { lookupTableKey, tableDrag, type SpeedBand } from './table-drag.js';
import { withTypedDecimals } from './typed-decimals.js';

export interface SegmentContext {
  units: UnitSystem;
  /** The reference table for `@key`; default the engine's DRAG_TABLE. */
  table?: readonly DragTableRow[];
  /** Speed band for table rows that give two, when the key does not say `/under30` or `/over30`. */
  band?: SpeedBand;
}

const FIELDS = {
  length: { kind: 'length', rule: RULES.length },
  'drag factor': { kind: 'factor', rule: RULES.drag },
  grade: { kind: 'percent', rule: RULES.grade },
} as const;
type Field = keyof typeof FIELDS;

/** A word that begins a label: starts with a letter and is no percent sign (`%`, `pct`). */
const isLabelWord = (t: Token | undefined): boolean =>
  t?.t === 'word' && /^\p{L}/u.test(t.text) && !findUnit('percent', t.text);

export class SegmentReader {
  private readonly seg: Partial<SegmentV1> = {};
  /** True once the drag factor read is complete in itself: a range, a tolerance or a table key. */
  private dragComplete = false;

  constructor(
    private readonly cur: Cursor,
    private readonly ctx: SegmentContext,
    /** "segment 2", for conversion notes. */
    private readonly name: string,
    private readonly notes: string[],
  ) {}

  read(): Read<SegmentV1> {
    const { cur, seg } = this;
    const problem =
      this.label() ??
      this.length() ??
      this.drag() ??
      this.grade() ??
      this.label() ??
      this.label() ??
      this.bareLabel();
    if (problem) return problem;
    if (!cur.done()) return new ReadError(this.unreadable());
    return seg as SegmentV1;
  }

  private item(field: Field, stopBeforeGrade: boolean): Read<RawItem> {
    const { kind } = FIELDS[field];
    const { cur } = this;
    // A drag factor takes no unit: a word after it begins the label (`@0.45 gravel shoulder`).
    let stop = cur.stop;
    if (field === 'drag factor')
      for (let i = cur.pos; i < cur.stop; i++)
        if (isLabelWord(cur.tokens[i]) && cur.tokens[i]!.text.toLowerCase() !== 'to') {
          stop = i;
          break;
        }
    const sub = new Cursor(cur.tokens, cur.source, stop);
    sub.pos = cur.pos;
    const raw = readItem(
      sub,
      { field, kind, units: this.ctx.units },
      { allowRange: true, stopBeforeGrade },
    );
    cur.pos = sub.pos;
    cur.itemStart = sub.itemStart;
    return raw;
  }

  private check(field: Field, raw: RawItem): Read<Checked> {
    const { kind, rule } = FIELDS[field];
    const spec = { field, kind, rule, units: this.ctx.units, allowRange: true };
    const c = checkItem(raw, spec, spec);
    if (!(c instanceof ReadError) && c.converted) this.notes.push(`${this.name}: ${c.converted}`);
    return c;
  }

  private label(): ReadError | undefined {
    const t = this.cur.peek();
    if (t?.t !== 'label') return undefined;
    this.cur.take();
    if (this.seg.label !== undefined) return new ReadError('give one [label] per segment');
    if (t.text.trim() === '')
      return new ReadError('the [label] is empty; write a surface name in it, e.g. [gravel]');
    this.seg.label = t.text.trim();
    return undefined;
  }

  /**
   * A label typed without brackets at the end of the segment (`21 @0.5 -3% gravel shoulder`):
   * the rest of the segment, when it begins with a word. Brackets are still needed for a label
   * that holds a comma or comes before the figures.
   */
  private bareLabel(): ReadError | undefined {
    const { cur } = this;
    const t = cur.peek();
    if (!isLabelWord(t)) return undefined;
    if (this.seg.label !== undefined) return new ReadError('give one label per segment');
    this.seg.label = cur.rest().trim();
    cur.pos = cur.stop;
    return undefined;
  }

  private length(): ReadError | undefined {
    const { cur } = this;
    let typed = '48';
    const first = cur.peek();
    if (first && !isOp(first, 'at') && first.t !== 'label') {
      const raw = this.item('length', true);
      if (raw instanceof ReadError) return raw;
      const len = this.check('length', raw);
      if (len instanceof ReadError) return len;
      // typed in the case's units: kept with its typed decimals (`52.0`), as a single answer is
      this.seg.length = len.converted ? len.value : withTypedDecimals(len.value, raw.text);
      typed = raw.text;
    }
    if (isOp(cur.peek(), 'at')) return undefined;
    if (cur.done() || gradeAhead(cur) || cur.peek()?.t === 'label') {
      const after = cur.done() ? '' : ` ${cur.rest()}`;
      return new ReadError(`no drag factor; add it after @, e.g. ${typed} @0.70${after}`);
    }
    return new ReadError(
      `${this.unreadable()}; a segment is LENGTH @DRAG GRADE, e.g. 48 @0.70 -3%`,
    );
  }

  private drag(): ReadError | undefined {
    const { cur } = this;
    cur.take(); // the @
    const t = cur.peek();
    if (t?.t === 'key') {
      cur.take();
      const d = this.tableDrag(t.text);
      if (d instanceof ReadError) return d;
      this.seg.drag = d;
      this.dragComplete = true;
      return undefined;
    }
    if (t === undefined || isOp(t, 'minus', 'plus') || t.t === 'label')
      return new ReadError('a drag factor is missing after @; write it as a decimal, e.g. @0.70');
    const raw = this.item('drag factor', true);
    if (raw instanceof ReadError) return raw;
    const d = this.check('drag factor', raw);
    if (d instanceof ReadError) {
      // `@0.7 -3` reads as the range 0.7 to 3: most likely a grade without its %.
      const bareHigh = raw.form === 'range' && !raw.hi.explicitSign && !raw.hi.parts[0]!.unit;
      if (!bareHigh) return d;
      return new ReadError(
        `${d.message}; '${raw.text}' reads as a drag factor range; a grade is written with its sign and %, e.g. -${raw.form === 'range' ? raw.hi.text : ''}%`,
      );
    }
    const q = withTypedDecimals(d.value, raw.text);
    this.dragComplete = raw.form !== 'single';
    this.seg.drag =
      typeof q === 'number'
        ? { source: 'entered', value: q }
        : {
            source: 'entered',
            value: q.value,
            ...(q.low !== undefined || q.high !== undefined
              ? { low: q.low ?? q.value, high: q.high ?? q.value }
              : {}),
            ...(q.decimals !== undefined ? { decimals: q.decimals } : {}),
          };
    return undefined;
  }

  /** `@key`, `@key/over30`, `@key=0.5`, `@key=0.45-0.6`. */
  private tableDrag(key: string): Read<DragV1> {
    const { cur } = this;
    const choice = lookupTableKey(key, this.ctx.table, this.ctx.band);
    if (typeof choice === 'string') return new ReadError(choice);
    if (!isOp(cur.peek(), 'eq')) return tableDrag(choice);
    cur.take();
    const raw = this.item('drag factor', true);
    if (raw instanceof ReadError) return raw;
    const pick = this.check('drag factor', raw);
    if (pick instanceof ReadError) return pick;
    if (typeof pick.value !== 'number') return tableDrag(choice, pick.value);
    const v = pick.value;
    const { low, high } = choice.range;
    if (v < low || v > high)
      return new ReadError(
        `the drag factor ${v} is outside the table range ${low}-${high} of ${choice.row.key}; give your own range, e.g. @${key}=${v} (${Math.min(low, v)}-${Math.max(high, v)})`,
      );
    return tableDrag(choice, { value: v });
  }

  private grade(): ReadError | undefined {
    const { cur } = this;
    this.seg.grade = 0;
    const g = cur.peek();
    if (isOp(g, 'minus', 'plus')) {
      const bare = this.bareGrade();
      if (bare !== undefined) return bare === true ? undefined : bare;
      const raw = this.item('grade', false);
      if (raw instanceof ReadError) return raw;
      // The % is required so that a grade never passes for part of a drag factor range, except
      // after a drag factor that is complete in itself (a range, a tolerance, a table key): a
      // signed number after `@0.70-0.80` can be nothing but the grade.
      if (!measures(raw).some((m) => m.parts[0]!.unit) && !this.dragComplete)
        return new ReadError(`write the grade with %, e.g. ${raw.text.replace(/\s+/g, '')}%`);
      const grade = this.check('grade', raw);
      if (grade instanceof ReadError) return grade;
      this.seg.grade = grade.value;
      return undefined;
    }
    if (g?.t !== 'num') return undefined;
    const unit = cur.peek(1);
    if (unit?.t !== 'word' || !findUnit('percent', unit.text))
      return new ReadError(
        `${this.unreadable()}; a grade is written with its sign and %, e.g. -3%`,
      );
    const typed = `${g.text}${unit.text}`;
    if (g.value !== 0)
      return new ReadError(
        `the grade '${typed}' needs a sign: +${typed} uphill or -${typed} downhill`,
      );
    cur.take();
    cur.take();
    return undefined;
  }

  /**
   * A signed grade without its % right after a complete drag factor (`@0.70-0.80 -3`), followed by
   * nothing, a label or the next segment: true when read, a ReadError when out of bounds,
   * undefined when this is not such a grade (the usual reading with % then applies).
   */
  private bareGrade(): true | ReadError | undefined {
    const { cur } = this;
    const sign = cur.peek();
    const n = cur.peek(1);
    const after = cur.peek(2);
    if (!this.dragComplete || n?.t !== 'num' || !sign || sign.end !== n.at) return undefined;
    if (after && !(after.t === 'label' || (after.t === 'word' && !findUnit('percent', after.text))))
      return undefined;
    const v = isOp(sign, 'minus') ? -n.value : n.value;
    const { gt, lt } = RULES.grade;
    if (!(v > gt && v < lt)) return new ReadError(`grade must be between ${gt} and ${lt} percent`);
    cur.take();
    cur.take();
    this.seg.grade = v;
    return true;
  }

  /** What cannot be read at the cursor: a stray character's reason, or the text itself. */
  private unreadable(): string {
    const t = this.cur.peek();
    return t?.t === 'bad' ? t.why : `cannot read '${this.cur.rest()}'`;
  }
}
