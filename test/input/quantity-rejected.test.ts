/** Catalogue of malformed answers and the part of the message the investigator must see. */
import { describe, expect, it } from 'vitest';
import { parseCount, parseQuantity } from '../../src/input/index.js';
import { SPECS } from './specs.js';

type Row = [text: string, spec: keyof typeof SPECS, fragment: string];

const ROWS: Row[] = [
  ['', 'length', 'mark length is empty; type a number such as 80.5 or 24.4 m'],
  ['   ', 'length', 'mark length is empty'],
  ['\t', 'drag', 'drag factor is empty; type a number such as 0.72'],
  ['abc', 'length', "mark length: 'abc' is not a number"],
  ['ft', 'length', "'ft' is not a number"],
  ['-5', 'length', 'mark length must be greater than 0'],
  ['0', 'length', 'mark length must be greater than 0'],
  ['0', 'drag', 'drag factor must be greater than 0'],
  ['1e309', 'length', "'1e309' is too large to be a number"],
  ['NaN', 'length', "mark length must be a finite number, not 'NaN'"],
  ['Infinity', 'drag', "drag factor must be a finite number, not 'Infinity'"],
  ['-Infinity', 'signedGrade', 'must be a finite number'],
  [
    '80 ftt',
    'length',
    "mark length: unknown unit 'ftt'; a length takes ft (or '), in (or \"), yd, m, cm, mm or km",
  ],
  ['30 mhp', 'speed', "unknown unit 'mhp'; a speed takes mph, km/h, m/s or ft/s"],
  ['0.9-0.6', 'drag', 'drag factor: the low end comes first; write 0.6-0.9'],
  ['-2 to -4', 'signedGrade', 'the low end comes first; write -4 to -2'],
  ['0,72', 'drag', "the drag factor '0,72' uses a comma; write 0.72"],
  ['80,5', 'length', 'write 80.5'],
  ['1,234.5', 'length', "'1,234.5' uses a comma to group thousands; write 1234.5"],
  ['1,234', 'length', 'write 1234 for thousands or 1.234 for a decimal'],
  [
    '0.72 m',
    'drag',
    "drag factor: 'm' is a unit of length; a drag factor is a plain decimal such as 0.72",
  ],
  ['0.7 ft', 'drag', "'ft' is a unit of length"],
  ['80 mph', 'length', "mark length: 'mph' is a unit of speed; a length takes ft"],
  ['30 ft', 'speed', "'ft' is a unit of length; a speed takes mph"],
  ['3 s', 'length', "'s' is a unit of time"],
  ['72%', 'drag', 'drag factor: write a decimal, not a percentage (0.72 for 72%)'],
  ['60 %', 'efficiency', '(0.6 for 60%)'],
  ['72', 'drag', 'drag factor must be at most 2; write it as a decimal, e.g. 0.72 for 72%'],
  ['1.2', 'efficiency', 'braking efficiency must be at most 1'],
  ['-3', 'grade', 'grade: no minus sign here; choose downhill instead of typing a minus sign'],
  ['-3%', 'grade', 'choose downhill instead of typing a minus sign'],
  ['-2', 'bank', 'choose "away from the centre" instead of typing a minus sign'],
  ['100', 'signedGrade', 'grade must be less than 100'],
  ['0.65-0.80', 'lengthOne', 'track width: give one value here, not a range or a tolerance'],
  ['5.4 ± 0.1', 'lengthOne', 'give one value here'],
  ['0.1 ± 0.2', 'length', 'mark length (low) must be greater than 0'],
  ['1.9 ± 0.2', 'drag', 'drag factor (high) must be at most 2'],
  ['0.9 (0.65-0.80)', 'drag', 'drag factor: 0.9 is outside its range 0.65-0.80'],
  ['0.7 (0.8-0.6)', 'drag', 'the low end comes first in the brackets; write (0.6-0.8)'],
  ['0.7 (0.6', 'drag', 'has no closing )'],
  ['80 ± -1', 'length', 'the tolerance after ± is a size without a sign'],
  ['80 ft 6', 'length', "say the unit of '6' after '80 ft', e.g. 80 ft 6 in"],
  ['12 ft 6 in ± 1', 'length', "give a unit for '1' too"],
  ['80, 81', 'length', "give one value here; '80, 81' is more than one"],
  ['80 81', 'length', "cannot read '81' after '80'"],
  ['80 #', 'length', "'#' is not understood here"],
  ['50 km/h', 'time', "'km/h' is a unit of speed; a time takes s or ms"],
  ['40 km', 'length', 'mark length must be at most 100000 (40 km = 131233.6 ft)'],
  ['80-', 'length', "mark length: a number is missing after '80-'"],
  ['- ', 'length', "a number is missing after '-'"],
  ['80 to', 'length', "a number is missing after '80 to'"],
  ['to 80', 'length', "'to' is not a number"],
  ['100001', 'length', 'mark length must be at most 100000'],
  ['1e-400', 'length', 'mark length must be greater than 0'],
  ['80 x', 'length', "cannot read 'x' after '80'"],
  ['80 ft.', 'length', "'.' is not understood here"],
  ['3 1/0 in', 'length', "'3 1/0' divides by zero"],
  ['1/2/3', 'length', "'/' is not understood here"],
  ['-3 ± 0.5', 'grade', 'no minus sign here'],
  ['1 ± 2', 'grade', 'no minus sign here'],
];

describe('parseQuantity: rejected answers', () => {
  it.each(ROWS)('%j (%s)', (text, name, fragment) => {
    const r = parseQuantity(text, SPECS[name]('imperial'));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.message).toContain(fragment);
  });

  it('uses the file validator’s words for bounds (as src/case/quantity.ts ruleViolation)', () => {
    // The file validator reports `analyses[0].marks[2]: length must be greater than 0`.
    const r = parseQuantity('0', { ...SPECS.length(), field: 'length' });
    expect(r).toEqual({ ok: false, message: 'length must be greater than 0' });
  });
});

describe('parseCount', () => {
  const spec = { field: 'number of marks', min: 1, max: 16 };
  it.each([
    ['4', 4],
    [' 12 ', 12],
    ['4.0', 4],
  ])('accepts %j', (text, n) => {
    expect(parseCount(text, spec)).toEqual({ ok: true, value: n });
  });
  it.each([
    ['', 'number of marks is empty; type a whole number from 1 to 16'],
    ['four', "number of marks: 'four' is not a whole number"],
    ['4.5', 'number of marks must be a whole number, not 4.5'],
    ['0', 'number of marks must be a whole number from 1 to 16'],
    ['17', 'from 1 to 16'],
    ['-2', 'from 1 to 16'],
    ['4 marks', 'is not a whole number'],
    ['1e3', 'is not a whole number'],
  ])('rejects %j', (text, fragment) => {
    const r = parseCount(text, spec);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(fragment);
  });
});
