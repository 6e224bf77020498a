/**
 * Lists typed on one line, read through src/input/: mark lengths (`94 92 95 93`, `4 x 80.5`),
 * sled pulls and decelerometer readings, and test skids as `speed/distance` pairs.
 */
import type { UnitSystem } from '../engine/types.js';
import type { Quantity, QuantityRule } from '../case/quantity.js';
import { parseList, parseMarksLine } from '../input/index.js';
import { readQuantity, type QuantitySpec } from './read-quantity.js';

export type ListRead =
  | { ok: true; value: Quantity[]; notice?: string; confirm?: string }
  | { ok: false; message: string };

const withNote = (value: Quantity[], converted?: string, extra?: string): ListRead => {
  const notes = [extra, converted && `converted: ${converted}`].filter((s): s is string => !!s);
  return notes.length ? { ok: true, value, notice: notes.join('; ') } : { ok: true, value };
};

/**
 * Reads mark lengths. With `count`, one length stands for `count` equal marks, and any other
 * number of lengths is refused with a message that says how many are expected.
 * @example readMarks('4 x 80.5', 'imperial', 4) // { ok: true, value: [80.5, 80.5, 80.5, 80.5] }
 */
export function readMarks(text: string, units: UnitSystem, count?: number): ListRead {
  const r = parseMarksLine(text, { units });
  if (!r.ok) return r;
  let marks = r.marks;
  let extra: string | undefined;
  if (count !== undefined && count > 1 && marks.length === 1) {
    marks = Array.from({ length: count }, () => r.marks[0]!);
    extra = `one length given: taken as ${count} equal marks`;
  }
  if (count !== undefined && marks.length !== count)
    return {
      ok: false,
      message: `${count} mark${count === 1 ? ' was' : 's were'} counted, ${marks.length} length${marks.length === 1 ? '' : 's'} typed; give one length per mark, or change the number of marks`,
    };
  const read = withNote(marks, r.converted, [r.shared, extra].filter(Boolean).join('; '));
  return r.mixed && read.ok ? { ...read, confirm: `Check the marks: ${r.mixed}.` } : read;
}

/** Reads several values of one kind (sled pulls, decelerometer readings). */
export function readValues(
  text: string,
  spec: QuantitySpec,
  units: UnitSystem,
  item: string,
): ListRead {
  const r = parseList(text, {
    field: spec.rule.what,
    item,
    kind: spec.kind,
    units,
    rule: spec.rule,
    allowRange: spec.range,
  });
  if (!r.ok) return r;
  return withNote(r.values, r.converted);
}

export interface TestSkid {
  speed: Quantity;
  distance: Quantity;
}

/**
 * Reads test skids as `speed/distance` pairs separated by commas: `30/42, 35/57.5`; units may be
 * typed (`50 km/h / 13 m`).
 */
export function readTestSkids(
  text: string,
  units: UnitSystem,
  rules: { speed: QuantityRule; distance: QuantityRule },
): { ok: true; value: TestSkid[]; notice?: string } | { ok: false; message: string } {
  const items = text.split(/\s*[,;]\s*/).filter((s) => s.trim() !== '');
  if (items.length === 0)
    return { ok: false, message: 'give at least one test as speed/distance, e.g. 30/42' };
  // Drag factors already worked out from the tests (`0.68, 0.71, 0.70`) are no speed/distance
  // pairs: say where such figures go instead of asking for a slash.
  if (items.every((t) => /^\s*(?:0?\.\d+|[01](?:\.\d*)?)\s*$/.test(t)))
    return {
      ok: false,
      message: `${items.join(', ')} read as drag factors, not tests: this question takes each test as speed/distance (e.g. 30/42). For drag factors already worked out from the tests, go back to the drag factor source and choose "a value I enter, with its range", e.g. 0.70 (0.68-0.71)`,
    };
  const out: TestSkid[] = [];
  const notes: string[] = [];
  for (const [i, item] of items.entries()) {
    // A slash splits the pair, except the one inside "km/h" (and "mi/h", "ft/s").
    const parts = item.split(/\s+\/\s+|(?<![a-z])\/|\/(?![a-z])/i);
    const where = items.length > 1 ? `test ${i + 1} ("${item.trim()}"): ` : '';
    if (parts.length !== 2)
      return { ok: false, message: `${where}write each test as speed/distance, e.g. 30/42` };
    const s = readQuantity(parts[0]!, { kind: 'speed', rule: rules.speed, range: true }, units);
    if (!s.ok) return { ok: false, message: where + s.message };
    const d = readQuantity(parts[1]!, { kind: 'length', rule: rules.distance, range: true }, units);
    if (!d.ok) return { ok: false, message: where + d.message };
    for (const n of [s.notice, d.notice]) if (n) notes.push(n);
    out.push({ speed: s.value, distance: d.value });
  }
  return notes.length
    ? { ok: true, value: out, notice: notes.join('; ') }
    : { ok: true, value: out };
}
