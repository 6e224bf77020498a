/**
 * A slide's segments written back in the quick-entry syntax, so that an entered slide can be shown
 * and edited on one line. `parseSegmentLine(formatSegmentLine(s)!)` gives `s` back for segments in
 * the parser's own form (see `parseSegmentLine`).
 */
import type { Quantity } from '../case/quantity.js';
import type { DragV1, SegmentV1 } from '../case/v1/schema.js';
import { DRAG_TABLE, type DragTableRow } from '../engine/drag-table.js';
import { tidy } from './show.js';
import { BAND_SUFFIX, lookupTableKey } from './table-drag.js';

/**
 * `0.74`, `0.70-0.78` (value at the midpoint) or `0.74 (0.70-0.80)`. Numbers are written exactly,
 * or with `decimals` when the figure was typed with them (`0.70` stays `0.70`).
 */
export function formatRangeText(
  value: number,
  low = value,
  high = value,
  sep = '-',
  decimals?: number,
): string {
  const n = (x: number) => (decimals === undefined ? String(x) : x.toFixed(decimals));
  if (low === value && high === value) return n(value);
  if (value === tidy((low + high) / 2) && sep === '-') return `${n(low)}-${n(high)}`;
  return `${n(value)} (${n(low)}${sep}${n(high)})`;
}

const quantityText = (q: Quantity): string =>
  typeof q === 'number' ? String(q) : formatRangeText(q.value, q.low, q.high, '-', q.decimals);

/** `+2%`, `-3%`, `-3% (-4 to -2)`; an empty text for a level segment. */
function gradeText(q: Quantity | undefined): string {
  if (q === undefined || q === 0) return '';
  const v = typeof q === 'number' ? q : q.value;
  const head = `${v > 0 || Object.is(v, 0) ? '+' : ''}${v}%`;
  if (typeof q === 'number' || ((q.low ?? v) === v && (q.high ?? v) === v)) return head;
  return `${head} (${q.low ?? v} to ${q.high ?? v})`;
}

function dragText(d: DragV1, table: readonly DragTableRow[]): string | undefined {
  if (d.source === 'entered') return `@${formatRangeText(d.value, d.low, d.high, '-', d.decimals)}`;
  if (d.source !== 'table' || d.surface === undefined) return undefined;
  const key = d.band ? `${d.surface}/${BAND_SUFFIX[d.band]}` : d.surface;
  const choice = lookupTableKey(key, table);
  // A free-text surface (not a row of the table) cannot be written as @key.
  if (typeof choice === 'string') return undefined;
  const { low, high } = choice.range;
  const dl = d.low ?? d.value;
  const dh = d.high ?? d.value;
  if (dl === low && dh === high)
    return d.value === tidy((low + high) / 2) ? `@${key}` : `@${key}=${d.value}`;
  return `@${key}=${formatRangeText(d.value, dl, dh)}`;
}

/**
 * Writes segments as one quick-entry line, or undefined when a segment cannot be written in it
 * (a drag factor from test skids, a sled or a decelerometer; a free-text table surface; a label
 * with brackets; a missing length in a slide of several segments). Notes are not written.
 * @example formatSegmentLine([{ length: 48, drag: { source: 'entered', value: 0.74 }, grade: 2 }]) // "48 @0.74 +2%"
 */
export function formatSegmentLine(
  segments: readonly SegmentV1[],
  table: readonly DragTableRow[] = DRAG_TABLE,
): string | undefined {
  const parts: string[] = [];
  for (const s of segments) {
    if (s.length === undefined && segments.length > 1) return undefined;
    const drag = dragText(s.drag, table);
    if (drag === undefined) return undefined;
    const label = s.label?.trim();
    if (label !== undefined && /[[\]\n]/.test(label)) return undefined;
    const words = [
      s.length === undefined ? '' : quantityText(s.length),
      drag,
      gradeText(s.grade),
      label ? `[${label}]` : '',
    ];
    parts.push(words.filter((w) => w !== '').join(' '));
  }
  return parts.join(', ');
}
