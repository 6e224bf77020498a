/**
 * Quick entry of a whole slide on one line (our own syntax).
 *
 * ```
 * line     = segment { ("," | ";") segment }
 * segment  = [LENGTH] ["@" DRAG] [GRADE] ["[" label "]" | label]
 * LENGTH   = a length in the case's unit or with a suffix: 48, 15 m, 48 ft 6 in, 47-49, 48 ± 0.5
 * DRAG     = a decimal, optionally with its range: 0.74, 0.70-0.78, 0.74 (0.70-0.80), 0.74 ± 0.04
 *          | a reference table key, optionally its band and your own pick:
 *            gravel-loose, asphalt-dry-travelled/over30, gravel-loose=0.5, gravel-loose=0.45-0.6
 * GRADE    = signed percent, + uphill in the direction of travel: +2%, -3%, -3% ± 0.5,
 *            -3% (-4 to -2); no grade means level (0). After a drag factor that is complete in
 *            itself (a range, a tolerance, a table key) the % may be left out: @0.70-0.80 -3
 * label    = free text in brackets, or without them at the end of the segment, starting with a
 *            letter: 21 @0.45-0.55 -3% gravel shoulder
 * ```
 *
 * Example (invented): `48 @0.74 +2%, 31 @0.55 [gravel], 22 @0.40-0.50 -3 grass verge`. Only a slide of one
 * segment may leave out the length (it then comes from the marks). A comma directly between two
 * digits is never a separator: `0,55` is a comma decimal and gets a message.
 */
import type { SegmentV1 } from '../case/v1/schema.js';
import { Cursor, ReadError } from './cursor.js';
import { isOp, lex } from './lexer.js';
import { SegmentReader, type SegmentContext } from './segment-reader.js';

export type { SegmentContext } from './segment-reader.js';

export type SegmentsResult =
  { ok: true; segments: SegmentV1[]; converted?: string } | { ok: false; message: string };

/**
 * Reads a slide typed on one line into case-file segments.
 * @example parseSegmentLine('48 @0.74 +2%, 31 @0.55', { units: 'imperial' })
 * // { ok: true, segments: [ { length: 48, drag: { source: 'entered', value: 0.74 }, grade: 2 },
 * //                         { length: 31, drag: { source: 'entered', value: 0.55 }, grade: 0 } ] }
 */
export function parseSegmentLine(text: string, ctx: SegmentContext): SegmentsResult {
  const source = text.trim();
  if (source === '')
    return {
      ok: false,
      message: 'segments: type each surface as LENGTH @DRAG GRADE, e.g. 48 @0.74 +2%, 31 @0.55',
    };
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
    if (a === b)
      return { ok: false, message: `segment ${i + 1} is empty: there are two separators in a row` };
    const cur = new Cursor(tokens, source, b);
    cur.pos = a;
    const where = `segment ${i + 1}, '${cur.text(a, b)}'`;
    const seg = new SegmentReader(cur, ctx, `segment ${i + 1}`, notes).read();
    if (seg instanceof ReadError) return { ok: false, message: `${where}: ${seg.message}` };
    if (seg.length === undefined && slices.length > 1)
      return {
        ok: false,
        message: `${where}: give the length first; only a slide of one segment may leave it out`,
      };
    segments.push(seg);
  }
  return notes.length
    ? { ok: true, segments, converted: notes.join('; ') }
    : { ok: true, segments };
}
