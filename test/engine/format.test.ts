import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CAUTIONS } from '../../src/format/cautions.js';
import { formatRange } from '../../src/format/numbers.js';
import { formatNumber, type NumberKind } from '../../src/engine/number-text.js';

describe('number formatting', () => {
  it('fixed decimals per kind', () => {
    expect(formatNumber(41.63, 'speed')).toBe('41.6');
    expect(formatNumber(0.7, 'drag')).toBe('0.70');
    expect(formatNumber(3.9, 'length')).toBe('3.90');
    expect(formatNumber(80.25, 'length')).toBe('80.3');
    expect(formatNumber(-0.12, 'grade')).toBe('-0.12');
    expect(formatNumber(0.0325, 'grade')).toBe('0.033');
    expect(formatNumber(12, 'percent')).toBe('12');
    expect(formatNumber(-0.04, 'speed')).toBe('0.0'); // a rounded zero has no sign
  });
  it('never shows NaN or Infinity, for any number of any kind', () => {
    const kinds: NumberKind[] = [
      'speed',
      'length',
      'drag',
      'efficiency',
      'grade',
      'percent',
      'seconds',
      'ratio',
      'integer',
    ];
    fc.assert(
      fc.property(fc.double(), fc.constantFrom(...kinds), (n, k) => {
        expect(formatNumber(n, k)).not.toMatch(/NaN|Infinity|undefined/);
      }),
    );
    expect(formatNumber(NaN, 'speed')).toBe('—');
  });
  it('a range with its unit, and without brackets when there is no spread', () => {
    expect(formatRange({ value: 41.63, low: 38.92, high: 44.04 }, 'speed', 'mph')).toBe(
      '41.6 mph (38.9 to 44.0)',
    );
    expect(formatRange({ value: 0.7, low: 0.7, high: 0.7 }, 'drag')).toBe('0.70');
  });
});

describe('cautions every result is shown with', () => {
  it('say minimum, verify the drag factor, agency procedures and law, qualified person, no fault', () => {
    const all = CAUTIONS.join(' ');
    expect(all).toMatch(/minimum, not the speed/);
    expect(all).toMatch(/verify the drag factor on scene/);
    expect(all).toMatch(/agency’s procedures, local law and rules of evidence/);
    expect(all).toMatch(/qualified reconstructionist or licensed engineer/);
    expect(all).toMatch(/does not state fault/);
  });
});
