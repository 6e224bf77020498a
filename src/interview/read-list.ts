/**
 * Lists typed on one line, read through src/input/: mark lengths (`94 92 95 93`, `4 x 80.5`),
 * sled pulls and decelerometer readings, and test skids as `speed/distance` pairs or as the drag
 * factors worked out from them.
 */
import type { UnitSystem } from '../engine/types.js';
import type { Quantity, QuantityRule } from '../case/quantity.js';
import { parseList, parseMarksLine, withTypedDecimals } from '../input/index.js';
import { quantityText, readQuantity, type QuantitySpec } from './read-quantity.js';

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

/** Test skids as typed: each test's speed and distance, or the factors worked out from them. */
export type TestSkidsRead = TestSkid[] | { factors: Quantity[] };

const plural = (n: number, what: string) => `${n} ${what}${n === 1 ? '' : 's'}`;

/**
 * Reads test skids either as `speed/distance` pairs separated by commas (`30/42, 35/57.5`; units
 * may be typed: `50 km/h / 13 m`), or as the drag factors already worked out from them
 * (`0.68, 0.71, 0.70`: no slash, every figure a drag factor). The notice says which was read.
 */
export function readTestSkids(
  text: string,
  units: UnitSystem,
  rules: { speed: QuantityRule; distance: QuantityRule; factor: QuantityRule },
): { ok: true; value: TestSkidsRead; notice?: string } | { ok: false; message: string } {
  const items = text.split(/\s*[,;]\s*/).filter((s) => s.trim() !== '');
  const how =
    'give each test as speed/distance (e.g. 30/42, 35/57.5), or the drag factors worked out from the tests (e.g. 0.68, 0.71, 0.70)';
  if (items.length === 0) return { ok: false, message: `test skids: the answer is empty; ${how}` };
  if (!text.includes('/')) return readFactors(text, units, rules.factor, how);
  const out: TestSkid[] = [];
  const notes: string[] = [];
  for (const [i, item] of items.entries()) {
    // A slash splits the pair, except the one inside "km/h" (and "mi/h", "ft/s").
    const parts = item.split(/\s+\/\s+|(?<![a-z])\/|\/(?![a-z])/i);
    const where = items.length > 1 ? `test ${i + 1} ("${item.trim()}"): ` : '';
    if (parts.length !== 2)
      return {
        ok: false,
        message: `${where}write each test as speed/distance, e.g. 30/42 (or give only drag factors, with no slash: 0.68, 0.71)`,
      };
    const s = readQuantity(parts[0]!, { kind: 'speed', rule: rules.speed, range: true }, units);
    if (!s.ok) return { ok: false, message: where + s.message };
    const d = readQuantity(parts[1]!, { kind: 'length', rule: rules.distance, range: true }, units);
    if (!d.ok) return { ok: false, message: where + d.message };
    for (const n of [s.notice, d.notice]) if (n) notes.push(n);
    // Kept as typed (`42.0`) for the record, unless converted from another unit.
    out.push({
      speed: s.notice ? s.value : withTypedDecimals(s.value, parts[0]!),
      distance: d.notice ? d.value : withTypedDecimals(d.value, parts[1]!),
    });
  }
  // Which form was read is said with the drag factor they give (`testsReadAs`); a conversion
  // notice takes that line's place, so it says it too.
  return notes.length
    ? { ok: true, value: out, notice: `${testsReadAs(out)}; ${notes.join('; ')}` }
    : { ok: true, value: out };
}

/** The factors-worked-out form: every item a drag factor (at most 2), no unit. */
function readFactors(
  text: string,
  units: UnitSystem,
  rule: QuantityRule,
  how: string,
): { ok: true; value: TestSkidsRead } | { ok: false; message: string } {
  const r = parseList(text, {
    field: rule.what,
    item: 'drag factor',
    kind: 'factor',
    units,
    rule,
    allowRange: false,
  });
  if (!r.ok) {
    // The reader's percent hint ("0.3 for 30%") misleads here: `30 42` is a test without its slash.
    const cut = r.message.indexOf('; write it as a decimal');
    const why = cut >= 0 ? r.message.slice(0, cut) : r.message;
    return {
      ok: false,
      message: `${why} (with no slash, the figures are read as drag factors): ${how}`,
    };
  }
  return { ok: true, value: { factors: r.values } };
}

/**
 * Which form the test skids were read in: "read as 3 drag factors: 0.68, 0.71, 0.70" or "read
 * as 3 test skids (speed, distance)". Undefined for a value that is neither.
 */
export function testsReadAs(value: unknown): string | undefined {
  if (Array.isArray(value)) return `read as ${plural(value.length, 'test skid')} (speed, distance)`;
  if (typeof value !== 'object' || value === null || !('factors' in value)) return undefined;
  const f = (value as { factors: unknown }).factors;
  if (!Array.isArray(f)) return undefined;
  return `read as ${plural(f.length, 'drag factor')}: ${(f as Quantity[]).map(quantityText).join(', ')}`;
}
