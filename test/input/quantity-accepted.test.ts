/**
 * Catalogue of accepted answers. Conversions are checked against mathjs units as the outside
 * reference (mathjs defines ft = 0.3048 m, inch = 0.0254 m, yd = 0.9144 m, mi = 1609.344 m,
 * lbm = 0.45359237 kg and kgf = 9.80665 N, the international 1959 definitions and the CGPM 1901
 * standard gravity).
 */
import { add, tan, unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import type { Quantity } from '../../src/case/quantity.js';
import { parseQuantity } from '../../src/input/index.js';
import { expectQuantity, SPECS } from './specs.js';

const conv = (n: number, from: string, to: string) => unit(n, from).toNumber(to);
const rng = (value: number, low: number, high: number) => ({ value, low, high });

type Row = [
  text: string,
  spec: keyof typeof SPECS,
  units: 'imperial' | 'metric',
  expected: Quantity,
  note?: string,
];

const ROWS: Row[] = [
  // plain numbers, in the case's unit
  ['80', 'length', 'imperial', 80],
  ['80.5', 'length', 'imperial', 80.5],
  ['.5', 'length', 'imperial', 0.5],
  ['80.', 'length', 'imperial', 80],
  ['  80.5  ', 'length', 'imperial', 80.5],
  ['1e3', 'length', 'imperial', 1000],
  ['80 ft', 'length', 'imperial', 80],
  ["80'", 'length', 'imperial', 80],
  ['24.4 m', 'length', 'metric', 24.4],
  // conversions (mathjs as reference)
  ['24.4 m', 'length', 'imperial', conv(24.4, 'm', 'ft'), '24.4 m = 80.05 ft'],
  [
    '12 ft 6 in',
    'length',
    'metric',
    add(unit(12, 'ft'), unit(6, 'inch')).toNumber('m'),
    '12 ft 6 in = 3.81 m',
  ],
  ['12 ft 6 in', 'length', 'imperial', 12.5, '12 ft 6 in = 12.5 ft'],
  [`12' 6"`, 'length', 'imperial', 12.5],
  [`12'6"`, 'length', 'metric', add(unit(12, 'ft'), unit(6, 'inch')).toNumber('m')],
  ['12ft6in', 'length', 'imperial', 12.5],
  ['6 in', 'length', 'imperial', conv(6, 'inch', 'ft'), '6 in = 0.5 ft'],
  ['150 cm', 'length', 'imperial', conv(150, 'cm', 'ft')],
  ['150 cm', 'length', 'metric', 1.5, '150 cm = 1.5 m'],
  ['3 m 20 cm', 'length', 'metric', 3.2],
  ['0.3 km', 'length', 'imperial', conv(0.3, 'km', 'ft'), '0.3 km = 984.3 ft'],
  ['3 yd', 'length', 'imperial', conv(3, 'yd', 'ft')],
  ['2 yd 1 ft', 'length', 'imperial', 7],
  ['15 M', 'length', 'metric', 15],
  ['80 feet 6 inches', 'length', 'imperial', 80.5],
  ['80’ 6”', 'length', 'imperial', 80.5],
  ["80' 6''", 'length', 'imperial', 80.5],
  ['5′', 'length', 'metric', conv(5, 'ft', 'm')],
  // fractions, as a tape in eighths of an inch reads
  ['3 1/8 in', 'length', 'imperial', conv(3.125, 'inch', 'ft'), '3 1/8 in = 0.26 ft'],
  ['12 ft 3 1/8 in', 'length', 'metric', add(unit(12, 'ft'), unit(3.125, 'inch')).toNumber('m')],
  ['1/2 ft', 'length', 'imperial', 0.5],
  ['12 1/2', 'length', 'imperial', 12.5],
  ['12 1/2 ± 1/8', 'length', 'imperial', rng(12.5, 12.375, 12.625)],
  ['50 km/h', 'speed', 'imperial', conv(50, 'km/h', 'mi/h'), '50 km/h = 31.07 mph'],
  ['50 kph', 'speed', 'imperial', conv(50, 'km/h', 'mi/h')],
  ['50 kmh', 'speed', 'imperial', conv(50, 'km/h', 'mi/h')],
  ['30 mph', 'speed', 'metric', conv(30, 'mi/h', 'km/h')],
  ['10 m/s', 'speed', 'metric', conv(10, 'm/s', 'km/h')],
  ['44 ft/s', 'speed', 'imperial', conv(44, 'ft/s', 'mi/h')],
  ['30', 'speed', 'imperial', 30],
  ['6%', 'signedGrade', 'imperial', 6],
  ['6', 'signedGrade', 'imperial', 6],
  ['-6 %', 'signedGrade', 'imperial', -6],
  ['−6%', 'signedGrade', 'imperial', -6],
  ['-0%', 'signedGrade', 'imperial', 0],
  ['+2', 'grade', 'imperial', 2],
  // percent grade = 100 × rise / run = 100 tan(angle) (definition of percent slope)
  ['3°', 'signedGrade', 'imperial', 100 * tan(unit(3, 'deg')), '3° = 5.24%'],
  ['-2 deg', 'signedGrade', 'metric', -100 * tan(unit(2, 'deg'))],
  ['0.72', 'drag', 'imperial', 0.72],
  ['0.72 g', 'drag', 'metric', 0.72],
  ['1.5 s', 'time', 'imperial', 1.5],
  ['1.5', 'time', 'metric', 1.5],
  ['1500 ms', 'time', 'metric', conv(1500, 'ms', 's')],
  ['150', 'weight', 'imperial', 150],
  ['68 kg', 'weight', 'imperial', conv(68, 'kg', 'lbm')],
  ['150 lb', 'weight', 'metric', conv(150, 'lbm', 'kg')],
  ['500 N', 'pull', 'metric', conv(500, 'N', 'kgf'), '500 N = 50.99 kg'],
  ['110 lbf', 'pull', 'imperial', 110],
  ['0.5 kN', 'pull', 'imperial', conv(0.5, 'kN', 'lbf')],
  // ranges and tolerances
  ['0.65-0.80', 'drag', 'imperial', rng(0.725, 0.65, 0.8)],
  ['0.65 - 0.80', 'drag', 'imperial', rng(0.725, 0.65, 0.8)],
  ['0.65 to 0.80', 'drag', 'imperial', rng(0.725, 0.65, 0.8)],
  ['0.65..0.80', 'drag', 'imperial', rng(0.725, 0.65, 0.8)],
  ['0.65–0.80', 'drag', 'imperial', rng(0.725, 0.65, 0.8)],
  ['0.72 (0.65-0.80)', 'drag', 'imperial', rng(0.72, 0.65, 0.8)],
  ['0.72 (0.65 to 0.80)', 'drag', 'imperial', rng(0.72, 0.65, 0.8)],
  ['80 +/- 1', 'length', 'imperial', rng(80, 79, 81)],
  ['80 ± 1', 'length', 'imperial', rng(80, 79, 81)],
  ['80+-1', 'length', 'imperial', rng(80, 79, 81)],
  ['80 ± 0', 'length', 'imperial', 80],
  ['0.70-0.70', 'drag', 'imperial', 0.7],
  [
    '24.4 m +/- 0.1',
    'length',
    'imperial',
    rng(conv(24.4, 'm', 'ft'), conv(24.3, 'm', 'ft'), conv(24.5, 'm', 'ft')),
    '24.4 m +/- 0.1 = 80.05 ft (79.72 to 80.38)',
  ],
  [
    '24.4 m ± 10 cm',
    'length',
    'imperial',
    rng(conv(24.4, 'm', 'ft'), conv(24.3, 'm', 'ft'), conv(24.5, 'm', 'ft')),
  ],
  ['80 ft ± 6 in', 'length', 'imperial', rng(80, 79.5, 80.5)],
  ['80-82 ft', 'length', 'imperial', rng(81, 80, 82)],
  [
    '80-82 ft',
    'length',
    'metric',
    rng(conv(81, 'ft', 'm'), conv(80, 'ft', 'm'), conv(82, 'ft', 'm')),
    '80-82 ft = 24.38 to 24.99 m',
  ],
  ['80 ft - 82 ft', 'length', 'imperial', rng(81, 80, 82)],
  ['-4 to -2', 'signedGrade', 'imperial', rng(-3, -4, -2)],
  ['-4--2%', 'signedGrade', 'imperial', rng(-3, -4, -2)],
  [
    '3 ± 0.5°',
    'signedGrade',
    'imperial',
    rng(100 * tan(unit(3, 'deg')), 100 * tan(unit(2.5, 'deg')), 100 * tan(unit(3.5, 'deg'))),
  ],
];

describe('parseQuantity: accepted answers', () => {
  it.each(ROWS)('%s (%s, %s)', (text, name, units, expected, note) => {
    const r = parseQuantity(text, SPECS[name](units));
    expect(r.ok, JSON.stringify(r)).toBe(true);
    if (!r.ok) return;
    expectQuantity(r.value, expected);
    if (note) expect(r.converted).toBe(note);
  });

  it('says nothing about a conversion when the unit typed is the case unit', () => {
    for (const t of ['80 ft', "80'", '80']) {
      const r = parseQuantity(t, SPECS.length('imperial'));
      expect(r).toEqual({ ok: true, value: 80 });
    }
  });

  it('keeps a typed number exactly as typed when no unit is converted', () => {
    const r = parseQuantity('0.1', SPECS.drag('imperial'));
    expect(r).toEqual({ ok: true, value: 0.1 });
  });

  it('stores converted figures without binary noise (12 ft 6 in is 3.81 m, not 3.8100000000000005)', () => {
    const r = parseQuantity('12 ft 6 in', SPECS.length('metric'));
    expect(r).toEqual({ ok: true, value: 3.81, converted: '12 ft 6 in = 3.81 m' });
  });

  it('takes the low and high of a range in the order typed, the value at the midpoint', () => {
    const r = parseQuantity('0.65-0.80', SPECS.drag('imperial'));
    expect(r).toEqual({ ok: true, value: { value: 0.725, low: 0.65, high: 0.8 } });
  });
});
