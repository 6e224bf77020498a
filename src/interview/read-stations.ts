/**
 * Offset stations typed on one line, for a yaw radius measured by offsets along one chord:
 * `5 0.21, 10 0.36, 15 0.41` or `5:0.21, 10:0.36, 15:0.41` (distance along the chord from its
 * start, then the offset from the chord to the mark). Each number goes through src/input/, so a
 * unit may be glued to it (`1.5m:0.06m`) and is converted to the case's length unit.
 */
import { RULES } from '../case/quantity.js';
import type { UnitSystem } from '../engine/types.js';
import { readQuantity } from './read-quantity.js';

/** One station as the case stores it (`offsets.stations[]`). */
export interface StationValue {
  at: number;
  offset: number;
}

export type StationsRead =
  { ok: true; value: StationValue[]; notice?: string } | { ok: false; message: string };

/** How the syntax is explained in the help and the error messages. */
export const STATIONS_SYNTAX =
  'stations as "along offset" pairs separated by commas, e.g. 5 0.21, 10 0.36, 15 0.41 (or 5:0.21, 10:0.36)';

const AT = { kind: 'length' as const, rule: { ...RULES.length, what: 'station' }, range: false };
const OFFSET = { kind: 'length' as const, rule: { ...RULES.length, what: 'offset' }, range: false };

/** The two parts of one pair: split at a colon, else at the whitespace between two numbers. */
function partsOf(item: string): [string, string] | undefined {
  if (item.includes(':')) {
    const bits = item.split(':');
    return bits.length === 2 ? [bits[0]!.trim(), bits[1]!.trim()] : undefined;
  }
  const bits = item.trim().split(/\s+/);
  return bits.length === 2 ? [bits[0]!, bits[1]!] : undefined;
}

/**
 * Reads the stations; `chord` (the chord's low end, when known) bounds where a station may lie.
 * @example readStations('5 0.21, 10 0.36', 'imperial', 20)
 * // { ok: true, value: [{ at: 5, offset: 0.21 }, { at: 10, offset: 0.36 }] }
 */
export function readStations(text: string, units: UnitSystem, chord?: number): StationsRead {
  const items = text
    .split(/[,;]/)
    .map((s) => s.trim())
    .filter((s) => s !== '');
  if (items.length === 0) return { ok: false, message: `give the ${STATIONS_SYNTAX}` };
  const value: StationValue[] = [];
  const notes: string[] = [];
  for (const [n, item] of items.entries()) {
    const parts = partsOf(item);
    const where = `station ${n + 1} ("${item}")`;
    if (!parts) return { ok: false, message: `${where}: write it as along offset, e.g. 10 0.36` };
    const at = readQuantity(parts[0], AT, units);
    if (!at.ok) return { ok: false, message: `${where}: ${at.message}` };
    const off = readQuantity(parts[1], OFFSET, units);
    if (!off.ok) return { ok: false, message: `${where}: ${off.message}` };
    const a = at.value as number;
    const o = off.value as number;
    if (chord !== undefined && a >= chord)
      return {
        ok: false,
        message: `${where}: a station must lie inside the chord (less than ${chord}); measure it from the chord's start`,
      };
    for (const note of [at.notice, off.notice]) if (note) notes.push(note);
    value.push({ at: a, offset: o });
  }
  return notes.length ? { ok: true, value, notice: notes.join('; ') } : { ok: true, value };
}
