/**
 * Reference rows of typical drag factors by surface, exactly the rows in the project's domain
 * notes. A guide for choosing a value and a range, never a measurement: the user picks the value.
 */

/** How well a row is known: seen in a reprint, recalled from memory, or one value seen second-hand. */
export type RowKnown = 'seen-in-reprint' | 'from-memory' | 'single-value-second-hand';

/** A low-high range of drag factors. */
export interface DragBand {
  low: number;
  high: number;
}

export interface DragTableRow {
  key: string;
  surface: string;
  /** Speed bands (30 mph is about 48 km/h). `any` when the source gives one range for all speeds. */
  under30mph?: DragBand;
  over30mph?: DragBand;
  any?: DragBand;
  source: string;
  known: RowKnown;
}

const BAKER =
  'Northwestern University Traffic Institute table (J. S. Baker, Traffic Accident Investigation Manual, 1975; reprinted in L. B. Fricke, Traffic Accident Reconstruction, 1990)';
const NOON =
  'R. K. Noon, Engineering Analysis of Vehicular Accidents (CRC, 1994), single values seen second-hand';

const b = (low: number, high: number): DragBand => ({ low, high });

/** The table. Rows marked `from-memory` must be verified before use. */
export const DRAG_TABLE: readonly DragTableRow[] = [
  {
    key: 'asphalt-dry-new',
    surface: 'asphalt, dry, new or sharp',
    under30mph: b(0.8, 1.2),
    over30mph: b(0.65, 1.0),
    source: BAKER,
    known: 'seen-in-reprint',
  },
  {
    key: 'asphalt-dry-travelled',
    surface: 'asphalt, dry, travelled',
    under30mph: b(0.6, 0.8),
    over30mph: b(0.55, 0.7),
    source: BAKER,
    known: 'seen-in-reprint',
  },
  {
    key: 'asphalt-dry-polished',
    surface: 'asphalt, dry, traffic-polished',
    under30mph: b(0.55, 0.75),
    over30mph: b(0.45, 0.65),
    source: BAKER,
    known: 'seen-in-reprint',
  },
  {
    key: 'concrete-dry-new',
    surface: 'concrete, dry, new',
    under30mph: b(0.8, 1.2),
    over30mph: b(0.7, 1.0),
    source: BAKER,
    known: 'from-memory',
  },
  {
    key: 'concrete-wet-new',
    surface: 'concrete, wet, new',
    under30mph: b(0.5, 0.8),
    over30mph: b(0.4, 0.75),
    source: BAKER,
    known: 'from-memory',
  },
  {
    key: 'gravel-loose',
    surface: 'gravel, loose',
    any: b(0.4, 0.7),
    source: BAKER,
    known: 'from-memory',
  },
  {
    key: 'snow-packed',
    surface: 'snow, packed',
    under30mph: b(0.3, 0.55),
    over30mph: b(0.35, 0.55),
    source: BAKER,
    known: 'from-memory',
  },
  {
    key: 'ice-smooth',
    surface: 'ice, smooth',
    under30mph: b(0.1, 0.25),
    over30mph: b(0.07, 0.2),
    source: BAKER,
    known: 'from-memory',
  },
  {
    key: 'noon-asphalt-dry',
    surface: 'asphalt, dry',
    any: b(0.65, 0.65),
    source: NOON,
    known: 'single-value-second-hand',
  },
  {
    key: 'noon-asphalt-wet',
    surface: 'asphalt, wet',
    any: b(0.5, 0.5),
    source: NOON,
    known: 'single-value-second-hand',
  },
  {
    key: 'noon-concrete-dry',
    surface: 'concrete, dry',
    any: b(0.75, 0.75),
    source: NOON,
    known: 'single-value-second-hand',
  },
  {
    key: 'noon-concrete-wet',
    surface: 'concrete, wet',
    any: b(0.6, 0.6),
    source: NOON,
    known: 'single-value-second-hand',
  },
  {
    key: 'noon-gravel-dirt',
    surface: 'gravel or dirt',
    any: b(0.35, 0.35),
    source: NOON,
    known: 'single-value-second-hand',
  },
  {
    key: 'noon-grass-wet',
    surface: 'grass, wet',
    any: b(0.2, 0.2),
    source: NOON,
    known: 'single-value-second-hand',
  },
  {
    key: 'noon-snow',
    surface: 'snow',
    any: b(0.2, 0.25),
    source: NOON,
    known: 'single-value-second-hand',
  },
  {
    key: 'noon-ice',
    surface: 'ice',
    any: b(0.1, 0.15),
    source: NOON,
    known: 'single-value-second-hand',
  },
];

/** What the table is and is not, to show beside it. */
export const DRAG_TABLE_NOTE =
  'A guide, not a measurement. The table’s provenance is thin (its compiler could not say who tested) and newer tests put dry asphalt near 0.72-0.78. Measure on scene where possible; pick the value and the range yourself. Concrete in good condition gives the highest drag factor; the more slick the surface, the lower (common practice).';

/**
 * The row with this key, or undefined (a free-text surface label is allowed in a case).
 * @example dragTableRow('gravel-loose')?.any // { low: 0.4, high: 0.7 }
 */
export function dragTableRow(key: string): DragTableRow | undefined {
  return DRAG_TABLE.find((r) => r.key === key);
}

/**
 * The band of a row for a speed band, falling back to the row's single range.
 * @example dragTableBand(dragTableRow('asphalt-dry-travelled')!, 'over-30mph') // { low: 0.55, high: 0.7 }
 */
export function dragTableBand(
  row: DragTableRow,
  band: 'under-30mph' | 'over-30mph',
): DragBand | undefined {
  return (band === 'under-30mph' ? row.under30mph : row.over30mph) ?? row.any;
}
