/** Several values on one line: parseList and the marks quick entry. */
import { add, unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { RULES } from '../../src/case/quantity.js';
import { parseList, parseMarksLine, type ListSpec } from '../../src/input/index.js';
import { expectQuantity } from './specs.js';

const lengths = (units: 'imperial' | 'metric' = 'imperial'): ListSpec => ({
  field: 'length',
  item: 'mark',
  kind: 'length',
  units,
  rule: RULES.length,
  allowRange: true,
});

describe('parseList', () => {
  it.each([
    ['94 92 95 93', [94, 92, 95, 93]],
    ['94, 92, 95', [94, 92, 95]],
    ['94;92;95', [94, 92, 95]],
    ['94,  92 ,95', [94, 92, 95]],
    ['94, 92,', [94, 92]],
    ['80.2, 79.5,81', [80.2, 79.5, 81]],
    ["94' 92'", [94, 92]],
    ['94 1/2 92', [94.5, 92]],
  ])('%j', (text, expected) => {
    expect(parseList(text, lengths())).toEqual({ ok: true, values: expected });
  });

  it('keeps a two-part measure together and converts it (mathjs: 94 ft 2 in in ft)', () => {
    const r = parseList('94 ft 2 in, 92', lengths());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.values).toHaveLength(2);
    expectQuantity(r.values[0]!, add(unit(94, 'ft'), unit(2, 'inch')).toNumber('ft'));
    expect(r.values[1]).toBe(92);
    expect(r.converted).toBe('mark 1: 94 ft 2 in = 94.17 ft');
  });

  it('reads spaces between measures with units as separators (mathjs for m to ft)', () => {
    const r = parseList('24.4 m 24.1 m 80 ft', lengths());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expectQuantity(r.values[0]!, unit(24.4, 'm').toNumber('ft'));
    expectQuantity(r.values[1]!, unit(24.1, 'm').toNumber('ft'));
    expect(r.values[2]).toBe(80);
    expect(r.converted).toBe('mark 1: 24.4 m = 80.05 ft; mark 2: 24.1 m = 79.07 ft');
  });

  it('accepts ranges and tolerances on items', () => {
    expect(parseList('80 ± 1, 79-81', lengths())).toEqual({
      ok: true,
      values: [
        { value: 80, low: 79, high: 81 },
        { value: 80, low: 79, high: 81 },
      ],
    });
  });

  it.each([
    ['94 0 95', 'mark 2: length must be greater than 0'],
    ['94, 92, -3', 'mark 3: length must be greater than 0'],
    ['94 ftt 92', "mark 1: length: unknown unit 'ftt'"],
    ['94, abc', "mark 2: length: 'abc' is not a number"],
    ['94,, 92', 'mark 2 is empty: there are two separators in a row'],
    [
      '94,92',
      "'94,92' has a comma between digits; to list several values put a space after each comma (94, 92), for a decimal write 94.92",
    ],
    ['94 92 # 3', "'#' is not understood here"],
    ['94,92,95', 'put a space after each comma (94, 92, 95)'],
    ['1,234.5 92', "mark 1: length: '1,234.5' uses a comma to group thousands; write 1234.5"],
    ['', 'length is empty'],
    ['94 mph', "mark 1: length: 'mph' is a unit of speed"],
    ['90-80 85', 'mark 1: length: the low end comes first; write 80-90'],
  ])('rejects %j', (text, fragment) => {
    const r = parseList(text, lengths());
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(fragment);
  });

  it('enforces the number of items', () => {
    const r = parseList('1 2 3', { ...lengths(), maxItems: 2 });
    expect(r).toEqual({ ok: false, message: 'give at most 2 marks (3 typed)' });
    const r2 = parseList('1', { ...lengths(), minItems: 2 });
    expect(r2).toEqual({ ok: false, message: 'give at least 2 marks (1 typed)' });
  });
});

describe('parseMarksLine', () => {
  const ctx = { units: 'imperial' as const };
  it.each([
    ['94 92 95 93', [94, 92, 95, 93]],
    ['94, 92, 95', [94, 92, 95]],
    ['4 x 80.5', [80.5, 80.5, 80.5, 80.5]],
    ['4x80.5', [80.5, 80.5, 80.5, 80.5]],
    ['3 X 80', [80, 80, 80]],
    ['2 × 80', [80, 80]],
    ['2 * 80', [80, 80]],
    ['1 x 80', [80]],
    ['80', [80]],
  ])('%j', (text, expected) => {
    expect(parseMarksLine(text, ctx)).toEqual({ ok: true, marks: expected });
  });

  it('converts equal marks given with a unit (mathjs: 24.5 m in ft)', () => {
    const r = parseMarksLine('2 x 24.5 m', ctx);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.marks).toHaveLength(2);
    for (const m of r.marks) expectQuantity(m, unit(24.5, 'm').toNumber('ft'));
    expect(r.converted).toBe('24.5 m = 80.38 ft');
  });

  it('gives each equal mark its own copy of a range', () => {
    const r = parseMarksLine('2 x 80 ± 1', ctx);
    expect(r).toEqual({
      ok: true,
      marks: [
        { value: 80, low: 79, high: 81 },
        { value: 80, low: 79, high: 81 },
      ],
    });
    if (r.ok) expect(r.marks[0]).not.toBe(r.marks[1]);
  });

  it.each([
    ['', 'marks: type each mark’s length, e.g. 94 92 95 93, or 4 x 80.5 for four equal marks'],
    ['80.5 x 4', 'marks: the count comes first; write 4 x 80.5'],
    ['80 x 4', 'marks: the count comes first; write 4 x 80'],
    ['4 x', 'marks: give the length after 4 x, e.g. 4 x 80.5'],
    ['2.5 x 80', 'marks: write the number of marks, x, then the length, e.g. 4 x 80.5'],
    ['0 x 80', 'the number of marks before x must be from 1 to 64'],
    ['65 x 80', 'the number of marks before x must be from 1 to 64'],
    ['4 x 80 81', "after 4 x give one length; cannot read '81'"],
    ['4 x 0', 'marks: length must be greater than 0'],
    ['4 x 80,5', "the length '80,5' uses a comma; write 80.5"],
    ['94 92 0', 'mark 3: length must be greater than 0'],
    [Array.from({ length: 65 }, (_, i) => 60 + i).join(' '), 'give at most 64 marks (65 typed)'],
  ])('rejects %j', (text, fragment) => {
    const r = parseMarksLine(text, ctx);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(fragment);
  });

  it('refuses a range on a mark when the question does not allow one', () => {
    const r = parseMarksLine('80 ± 1', { units: 'metric', allowRange: false });
    expect(r).toEqual({
      ok: false,
      message: 'mark 1: length: give one value here, not a range or a tolerance',
    });
  });
});
