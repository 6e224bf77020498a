/**
 * Quick entry of segments (syntax in src/input/segment-line.ts, e.g. `48 @0.74 +2%, 31 @0.55`):
 * the line becomes the answers of each segment's own questions, so that every figure can be
 * checked and changed afterwards, one question at a time.
 */
import { MAX_SEGMENTS } from './answers-read.js';
import { parseSegmentLine } from '../input/index.js';
import type { DragV1, SegmentV1 } from '../case/v1/schema.js';
import type { Answers, AnswerContext, ParseResult } from './types.js';
import { quantityText } from './read-quantity.js';
import { signed } from './signed.js';
import { OTHER_SURFACE, surfaceRow } from './drag-table.js';

const answer = (text: string, value: unknown = text) => ({ text, value });

function dragFills(fills: Answers, p: string, d: DragV1): void {
  if (d.source !== 'entered' && d.source !== 'table') return;
  fills[`${p}.drag.source`] = answer(d.source);
  fills[`${p}.drag.value`] = answer(
    quantityText({
      value: d.value,
      low: d.low ?? d.value,
      high: d.high ?? d.value,
      // the decimals it was typed with (`@0.70`), so the answer's text keeps them
      ...(d.decimals !== undefined ? { decimals: d.decimals } : {}),
    }),
  );
  if (d.source === 'table') {
    const surface = d.surface;
    const known = surface !== undefined && surfaceRow(surface) !== undefined;
    fills[`${p}.drag.surface`] = answer(known ? surface : OTHER_SURFACE);
    if (!known && surface !== undefined) fills[`${p}.drag.surfaceName`] = answer(surface);
  }
}

/** The answers of segment `sp` (`a0.seg1`) for one segment read from the line. */
function segmentFills(fills: Answers, sp: string, s: SegmentV1, answers: Answers): void {
  if (s.length !== undefined) fills[`${sp}.length`] = answer(quantityText(s.length));
  if (s.label !== undefined) fills[`${sp}.label`] = answer(s.label);
  else if (!answers[`${sp}.label`]) fills[`${sp}.label`] = answer('', undefined);
  dragFills(fills, sp, s.drag);
  const g = s.grade ?? 0;
  const v = typeof g === 'number' ? g : g.value;
  const flat =
    typeof g === 'number' ? g === 0 : g.value === 0 && (g.low ?? 0) === 0 && (g.high ?? 0) === 0;
  if (flat) fills[`${sp}.grade.dir`] = answer('level');
  else {
    fills[`${sp}.grade.dir`] = answer(v < 0 ? 'downhill' : 'uphill');
    fills[`${sp}.grade.pct`] = answer(quantityText(signed(g, v < 0)));
  }
}

/**
 * Parses a quick-entry line for analysis prefix `p` (`a0`). The value is the segments read;
 * `fills` sets length, label, drag and grade of each segment, keeping labels given before.
 */
export function quickFills(text: string, ctx: AnswerContext, p: string): ParseResult {
  const r = parseSegmentLine(text, { units: ctx.units });
  if (!r.ok) return r;
  if (r.segments.length > MAX_SEGMENTS)
    return { ok: false, message: `at most ${MAX_SEGMENTS} segments (${r.segments.length} typed)` };
  const fills: Answers = {};
  r.segments.forEach((s, j) => segmentFills(fills, `${p}.seg${j}`, s, ctx.answers));
  const n = r.segments.length;
  const filled = `${n} segment${n === 1 ? '' : 's'} filled in; each can be checked or changed question by question.`;
  return {
    ok: true,
    value: r.segments,
    fills,
    notice: r.converted ? `${filled} Converted: ${r.converted}` : filled,
  };
}

/**
 * A segments line typed at the "one surface, or several" question (`52 @0.7 -3% asphalt, ...`):
 * read as the quick choice with its line answered, so the line question is not asked again.
 * Undefined for text that is no such line (words for a choice), so the choice's own message
 * stands; a line that starts like one but does not read gets the line's message.
 */
export function quickLineAtChoice(
  text: string,
  ctx: AnswerContext,
  p: string,
): ParseResult | undefined {
  if (!/^\s*[@\d.]/.test(text)) return undefined;
  const r = quickFills(text, ctx, p);
  if (!r.ok) return r;
  return {
    ok: true,
    value: 'quick',
    fills: { ...r.fills, [`${p}.quick`]: answer(text.trim(), r.value) },
    ...(r.notice ? { notice: r.notice } : {}),
  };
}
