/**
 * The engine's reference table of drag factors, as choices: each row shown with its ranges and
 * its source, as a guide and never as a measurement (the investigator picks value and range).
 */
import { DRAG_TABLE, dragTableRow, type DragBand, type DragTableRow } from '../engine/index.js';
import type { Choice } from './types.js';

/** Free-text surface not in the table. */
export const OTHER_SURFACE = 'other';

/** Every word of the surfaces' names ("asphalt", "dry", "gravel", ...), lower case. */
const SURFACE_WORDS = [...DRAG_TABLE.map((r) => r.surface), 'another single value']
  .flatMap((t) => t.toLowerCase().split(/[^a-z]+/))
  .filter(Boolean);

// Single keys for the rows in table order: digits, then letters that begin no word of a surface's
// name, so a name typed at the question ("gravel") is read as words rather than picking by its
// first letter. 'o' stays free for "another surface".
const KEYS = [
  ...'123456789',
  ...[...'abcdefghijklmnpqrstuvwxyz'].filter((ch) => !SURFACE_WORDS.some((w) => w[0] === ch)),
];

const fmt = (r: DragBand) =>
  r.low === r.high ? r.low.toFixed(2) : `${r.low.toFixed(2)}-${r.high.toFixed(2)}`;

/** One line with the row's ranges: "under 30 mph 0.80-1.20, over 30 mph 0.65-1.00". */
export function rangesLine(row: DragTableRow): string {
  const parts: string[] = [];
  if (row.under30mph) parts.push(`under 30 mph ${fmt(row.under30mph)}`);
  if (row.over30mph) parts.push(`over 30 mph ${fmt(row.over30mph)}`);
  if (row.any) parts.push(fmt(row.any));
  return parts.join(', ');
}

const known = (row: DragTableRow) =>
  row.known === 'from-memory'
    ? ' (from memory: verify before use)'
    : row.known === 'single-value-second-hand'
      ? ' (seen second-hand)'
      : '';

/** The table rows as choices, then "another surface". */
export const SURFACE_CHOICES: Choice[] = [
  ...DRAG_TABLE.map((r, i) => ({
    value: r.key,
    key: KEYS[i]!,
    label: r.known === 'single-value-second-hand' ? `${r.surface} (single value)` : r.surface,
    hint: `${rangesLine(r)}; ${r.source}${known(r)}`,
  })),
  { value: OTHER_SURFACE, key: 'o', label: 'another surface (type its name next)' },
];

export function surfaceRow(key: unknown): DragTableRow | undefined {
  return typeof key === 'string' ? dragTableRow(key) : undefined;
}

/** Offered default for the drag factor from a row: the over-30 mph range (or its one range). */
export function defaultDragText(row: DragTableRow): string | undefined {
  const r = row.over30mph ?? row.any ?? row.under30mph;
  return r ? fmt(r) : undefined;
}
