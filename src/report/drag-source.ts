import type { DragV1 } from '../case/v1/schema.js';
import {
  DRAG_TABLE_NOTE,
  dragTableRow,
  type DragBand,
  type DragTableRow,
  type RowKnown,
} from '../engine/drag-table.js';
import { formatNumber } from '../engine/number-text.js';

const KNOWN_TEXT: Record<RowKnown, string> = {
  'seen-in-reprint': 'seen in a reprint',
  'from-memory': 'from memory, to be verified against the publication before use',
  'single-value-second-hand': 'a single value seen second-hand',
};

function band(b: DragBand | undefined): string | undefined {
  if (!b) return undefined;
  const lo = formatNumber(b.low, 'drag');
  const hi = formatNumber(b.high, 'drag');
  return lo === hi ? lo : `${lo} to ${hi}`;
}

/** The reference row in words: its ranges by speed band, its publication and how well it is known. */
export function tableRowText(row: DragTableRow): string {
  const ranges = [
    band(row.under30mph) && `under 30 mph ${band(row.under30mph)}`,
    band(row.over30mph) && `over 30 mph ${band(row.over30mph)}`,
    band(row.any) && `${band(row.any)} at any speed`,
  ].filter(Boolean);
  return `Reference row "${row.surface}": ${ranges.join('; ')}. Source: ${row.source}. How well it is known: ${KNOWN_TEXT[row.known]}.`;
}

/**
 * Where a drag factor came from, in sentences for the report. The figures themselves (value,
 * range, per-test factors) are in the engine's step; this says what kind of evidence they rest on.
 */
export function dragSourceLines(d: DragV1, where: string): string[] {
  switch (d.source) {
    case 'entered':
      return [
        `${where}: entered by the investigator${d.note ? ` (${d.note})` : ''}; the basis is the investigator's, not the tool's.`,
      ];
    case 'table': {
      const row = d.surface ? dragTableRow(d.surface) : undefined;
      const lines = [
        `${where}: chosen from a reference table of typical ranges, ${d.surface ? `surface "${d.surface}"` : 'surface not named'}${d.band ? `, speed band ${d.band}` : ''}${d.note ? ` (${d.note})` : ''}.`,
      ];
      lines.push(
        row
          ? tableRowText(row)
          : `"${d.surface}" is not a row of the built-in table: the value and range are the investigator's own.`,
      );
      lines.push(DRAG_TABLE_NOTE);
      return lines;
    }
    case 'test-skids':
      return [
        d.factors
          ? `${where}: ${d.factors.length} drag factor${d.factors.length === 1 ? '' : 's'} worked out from test skids at known speed on the scene and entered as such, ${d.gradeTakenOut ? 'as level-ground factors (the test grade already taken out)' : 'as worked out on the test stretch (its grade, if any, taken off once)'} (each factor is in the measurements table)${d.note ? `; ${d.note}` : ''}.`
          : `${where}: ${d.tests?.length ?? 0} test skid${d.tests?.length === 1 ? '' : 's'} at known speed on the scene (each test's speed and distance are in the measurements table)${d.note ? `; ${d.note}` : ''}.`,
        'A test skid at a lower speed than the crash tends to give a slightly higher drag factor (common practice).',
      ];
    case 'sled':
      return [
        `${where}: drag sled, ${d.pulls.length} pull${d.pulls.length === 1 ? '' : 's'} (weight and pulls in the measurements table)${d.note ? `; ${d.note}` : ''}.`,
      ];
    case 'decelerometer':
      return [
        `${where}: decelerometer, ${d.readings.length} reading${d.readings.length === 1 ? '' : 's'} in g (in the measurements table)${d.note ? `; ${d.note}` : ''}.`,
      ];
  }
}
