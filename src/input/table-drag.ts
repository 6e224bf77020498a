/**
 * A drag factor picked from the reference table in a quick-entry line: `@gravel-loose`,
 * `@asphalt-dry-travelled/over30`, `@gravel-loose=0.5`, `@gravel-loose=0.45-0.6`.
 */
import type { DragV1 } from '../case/v1/schema.js';
import {
  DRAG_TABLE,
  dragTableBand,
  type DragBand,
  type DragTableRow,
} from '../engine/drag-table.js';
import { tidy } from './show.js';

export type SpeedBand = 'under-30mph' | 'over-30mph';

/** Suffixes of a table key naming the speed band: `/under30`, `/over30`. */
export const BAND_SUFFIX: Record<SpeedBand, string> = {
  'under-30mph': 'under30',
  'over-30mph': 'over30',
};

const bandOfSuffix = (s: string): SpeedBand | undefined =>
  s === 'under30' ? 'under-30mph' : s === 'over30' ? 'over-30mph' : undefined;

export interface TableChoice {
  row: DragTableRow;
  range: DragBand;
  /** Set when the row has two speed bands. */
  band?: SpeedBand;
}

const banded = (row: DragTableRow) => row.under30mph !== undefined || row.over30mph !== undefined;

/** Looks up `key` or `key/band` in the table, or says what is wrong. */
export function lookupTableKey(
  keyText: string,
  table: readonly DragTableRow[] = DRAG_TABLE,
  defaultBand?: SpeedBand,
): TableChoice | string {
  const [key = '', suffix] = keyText.toLowerCase().split('/');
  const row = table.find((r) => r.key === key);
  if (!row) {
    const near = table.filter((r) => r.key.startsWith(key.split('-')[0] ?? '')).map((r) => r.key);
    const list = (near.length ? near : table.map((r) => r.key)).join(', ');
    return `'${key}' is not a row of the reference table; rows${near.length ? ' like it' : ''}: ${list}`;
  }
  let band: SpeedBand | undefined;
  if (suffix !== undefined) {
    band = bandOfSuffix(suffix);
    if (!band) return `'/${suffix}' is not a speed band; use /under30 or /over30 (mph)`;
  } else band = defaultBand;
  if (!banded(row)) return { row, range: row.any! };
  if (!band)
    return `'${key}' gives two ranges by speed; add /under30 or /over30 (30 mph is about 48 km/h), e.g. @${key}/over30`;
  const range = dragTableBand(row, band);
  if (!range) return `'${key}' has no range for ${band}`;
  return { row, range, band };
}

/** The drag of a table choice; `value` defaults to the middle of the range. */
export function tableDrag(
  choice: TableChoice,
  pick?: { value: number; low?: number; high?: number },
): DragV1 {
  const low = pick?.low ?? choice.range.low;
  const high = pick?.high ?? choice.range.high;
  const value = pick?.value ?? tidy((choice.range.low + choice.range.high) / 2);
  const d: DragV1 = { source: 'table', surface: choice.row.key, value, low, high };
  if (choice.band) d.band = choice.band;
  return d;
}
