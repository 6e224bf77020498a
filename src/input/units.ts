/**
 * Unit suffixes understood in typed answers, per kind of quantity, and their conversions into the
 * case's units. Exact definitions: international foot 0.3048 m (1959 agreement), inch 0.0254 m,
 * yard 0.9144 m, mile 1609.344 m, pound 0.45359237 kg; standard gravity 9.80665 m/s² (CGPM 1901)
 * for newtons to kilograms-force.
 */
import type { UnitSystem } from '../engine/types.js';

/** What a typed number is; decides which suffixes are read and how they convert. */
export type QuantityKind =
  'length' | 'speed' | 'percent' | 'factor' | 'time' | 'count' | 'weight' | 'force';

/** One unit: the words that name it and how a number in it becomes a number in the kind's base. */
export interface UnitDef {
  /** Canonical label, as shown back: `ft`, `km/h`, `%`. */
  id: string;
  kind: QuantityKind;
  /** Lower-case spellings accepted, the canonical one first. */
  words: readonly string[];
  /** Base units per one of this unit (linear units). Base: m, m/s, %, 1, s, kg. */
  factor: number;
  /** For a unit that is not a plain multiple (degrees of slope to percent). */
  toBase?: (n: number) => number;
  /** Smaller units that may follow in one measure: `12 ft 6 in`. */
  then?: readonly string[];
}

const G = 9.80665;
const LB = 0.45359237;

const u = (
  id: string,
  kind: QuantityKind,
  words: string[],
  factor: number,
  extra: Partial<UnitDef> = {},
): UnitDef => ({ id, kind, words: [id, ...words], factor, ...extra });

/** Every unit, by kind. Order is the order shown in messages and help. */
export const UNITS: readonly UnitDef[] = [
  u('ft', 'length', ['foot', 'feet', "'", '’', '′'], 0.3048, { then: ['in'] }),
  u('in', 'length', ['inch', 'inches', '"', '”', '″', "''"], 0.0254),
  u('yd', 'length', ['yds', 'yard', 'yards'], 0.9144, { then: ['ft', 'in'] }),
  u('m', 'length', ['metre', 'metres', 'meter', 'meters'], 1, { then: ['cm', 'mm'] }),
  u('cm', 'length', ['centimetre', 'centimetres', 'centimeter', 'centimeters'], 0.01, {
    then: ['mm'],
  }),
  u('mm', 'length', ['millimetre', 'millimetres', 'millimeter', 'millimeters'], 0.001),
  u('km', 'length', ['kilometre', 'kilometres', 'kilometer', 'kilometers'], 1000),
  u('mph', 'speed', ['mi/h'], 1609.344 / 3600),
  u('km/h', 'speed', ['kph', 'kmh', 'km/hr'], 1 / 3.6),
  u('m/s', 'speed', [], 1),
  u('ft/s', 'speed', ['fps'], 0.3048),
  u('%', 'percent', ['percent', 'pct'], 1),
  u('°', 'percent', ['deg', 'degree', 'degrees'], 1, {
    // A slope of θ degrees rises tan θ per unit run: percent = 100 tan θ.
    toBase: (n) => 100 * Math.tan((n * Math.PI) / 180),
  }),
  u('g', 'factor', [], 1),
  u('s', 'time', ['sec', 'secs', 'second', 'seconds'], 1),
  u('ms', 'time', [], 0.001),
  // Weights and forces share units so that a sled's pull / weight needs no conversion.
  u('lb', 'weight', ['lbs', 'pound', 'pounds', 'lbf'], LB),
  u('kg', 'weight', ['kgf', 'kilogram', 'kilograms'], 1),
  u('N', 'weight', ['n', 'newton', 'newtons'], 1 / G),
  u('kN', 'weight', ['kn'], 1000 / G),
];

/** The kind whose units a kind uses (a force is read in the same units as a weight). */
const unitKind = (kind: QuantityKind): QuantityKind => (kind === 'force' ? 'weight' : kind);

/** Units accepted for a kind. */
export function unitsFor(kind: QuantityKind): UnitDef[] {
  return UNITS.filter((d) => d.kind === unitKind(kind));
}

/** Finds a typed unit word among a kind's units (case-insensitive). */
export function findUnit(kind: QuantityKind, word: string): UnitDef | undefined {
  const w = word.toLowerCase();
  return unitsFor(kind).find((d) => d.words.includes(w) || d.id === word);
}

/** Finds a unit word in any kind, to say "'mph' is a unit of speed" on a length. */
export function findAnyUnit(word: string): UnitDef | undefined {
  const w = word.toLowerCase();
  return UNITS.find((d) => d.words.includes(w) || d.id === word);
}

/** The unit a kind is stored in for a case: `ft`/`m`, `mph`/`km/h`, `%`, `s`, `lb`/`kg`, `` for factors and counts. */
export function caseUnitOf(kind: QuantityKind, units: UnitSystem): string {
  const imperial = units === 'imperial';
  switch (kind) {
    case 'length':
      return imperial ? 'ft' : 'm';
    case 'speed':
      return imperial ? 'mph' : 'km/h';
    case 'percent':
      return '%';
    case 'time':
      return 's';
    case 'weight':
    case 'force':
      return imperial ? 'lb' : 'kg';
    case 'factor':
    case 'count':
      return '';
  }
}

/** The case unit's definition (undefined for factors and counts, which have none). */
export function caseUnitDef(kind: QuantityKind, units: UnitSystem): UnitDef | undefined {
  const id = caseUnitOf(kind, units);
  return id === '' ? undefined : unitsFor(kind).find((d) => d.id === id);
}

/**
 * A number in `unit` expressed in the case unit of the kind. Exact when the unit is the case unit.
 * @example toCaseUnit(24.4, findUnit('length', 'm')!, 'length', 'imperial') // 80.0524934...
 */
export function toCaseUnit(
  n: number,
  unit: UnitDef,
  kind: QuantityKind,
  units: UnitSystem,
): number {
  const target = caseUnitDef(kind, units);
  if (target === undefined || target.id === unit.id) return n;
  const base = unit.toBase ? unit.toBase(n) : n * unit.factor;
  return base / target.factor;
}

/** Words naming a kind in messages: "a length", "a speed". */
export const KIND_NAME: Record<QuantityKind, string> = {
  length: 'a length',
  speed: 'a speed',
  percent: 'a percentage',
  factor: 'a decimal factor',
  time: 'a time',
  count: 'a whole number',
  weight: 'a weight',
  force: 'a force',
};

/** An example of a typed answer for each kind, for messages. Invented values. */
export const KIND_EXAMPLE: Record<QuantityKind, string> = {
  length: '80.5 or 24.4 m',
  speed: '45 or 70 km/h',
  percent: '3 or 3%',
  factor: '0.72',
  time: '1.5 or 1.5 s',
  count: '4',
  weight: '150 or 68 kg',
  force: '110 or 50 kg',
};

/** The suffixes of a kind as a phrase: `ft (or '), in (or "), yd, m, cm, mm or km`. */
export function suffixList(kind: QuantityKind): string {
  const shown = unitsFor(kind).map((d) => {
    const alt = d.words.find((w) => w.length === 1 && w !== d.id && !/[a-z]/.test(w));
    return alt ? `${d.id} (or ${alt})` : d.id;
  });
  if (shown.length === 0) return 'no unit';
  if (shown.length === 1) return shown[0]!;
  return `${shown.slice(0, -1).join(', ')} or ${shown[shown.length - 1]}`;
}
