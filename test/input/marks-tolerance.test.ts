/** The marks line: one tolerance after the list, and lists that mix unit systems. */
import { describe, expect, it } from 'vitest';
import { parseMarksLine } from '../../src/input/index.js';

const read = (text: string, units: 'imperial' | 'metric' = 'imperial') =>
  parseMarksLine(text, { units });

describe('a tolerance after the list of marks', () => {
  it.each([['61 63 58 60 +/- 1'], ['61, 63, 58, 60 ± 1'], ['61 63 58 60±1']])(
    '%j: on every mark',
    (t) => {
      const r = read(t);
      expect(r.ok && r.marks).toEqual([
        { value: 61, low: 60, high: 62 },
        { value: 63, low: 62, high: 64 },
        { value: 58, low: 57, high: 59 },
        { value: 60, low: 59, high: 61 },
      ]);
      expect(r.ok && r.shared).toBe('± 1 taken for every mark');
    },
  );

  it('keeps each mark its own tolerance when every mark has one', () => {
    const r = read('61 ± 1 63 ± 2');
    expect(r.ok && r.marks).toEqual([
      { value: 61, low: 60, high: 62 },
      { value: 63, low: 61, high: 65 },
    ]);
    expect(r.ok && r.shared).toBeUndefined();
  });

  it('takes the unit of each mark for the tolerance (1 m = 3.2808 ft, international foot 0.3048 m)', () => {
    const r = read('20 m 21 m ± 1', 'imperial');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const first = r.marks[0];
    expect(typeof first === 'object' && first.low).toBeCloseTo(19 / 0.3048, 1);
    expect(r.converted).toMatch(/^mark 1: 20 m ± 1 = .*; mark 2: 21 m ± 1 = /);
  });
});

describe('marks that mix unit systems', () => {
  it('names the odd one out', () => {
    const r = read('61ft 63m 60 ft');
    expect(r.ok && r.mixed).toBe(
      'mark 2 (63m) is in m while the others are in ft: a list that mixes the two systems is almost always a slip',
    );
  });

  it('says nothing of a list in one system, even when it is not the case’s', () => {
    expect(read('18.6 m 19.2 m 1920 cm').ok && read('18.6 m 19.2 m 1920 cm')).not.toHaveProperty(
      'mixed',
    );
    expect(read('61 ft 2 in, 63 ft')).not.toHaveProperty('mixed');
  });
});
