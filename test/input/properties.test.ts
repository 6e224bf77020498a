/** Property-based checks (fast-check) of the typed-answer parsers. */
import fc from 'fast-check';
import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { RULES, type Quantity } from '../../src/case/quantity.js';
import type { DragV1, SegmentV1 } from '../../src/case/v1/schema.js';
import { DRAG_TABLE, dragTableBand } from '../../src/engine/drag-table.js';
import {
  formatSegmentLine,
  parseCount,
  parseList,
  parseMarksLine,
  parseQuantity,
  parseSegmentLine,
} from '../../src/input/index.js';
import { tidy } from '../../src/input/show.js';
import { numbersIn, SPECS } from './specs.js';

/** A number as an investigator would type it (two decimals), or any double in the bounds. */
const num = (min: number, max: number) =>
  fc.oneof(
    fc.integer({ min: Math.ceil(min * 100), max: Math.floor(max * 100) }).map((n) => n / 100),
    fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((n) => (n === 0 ? 0 : n)),
  );

/** A quantity in the parser's own form: plain, a range with its midpoint, or a value with a range. */
const quantityIn = (min: number, max: number): fc.Arbitrary<Quantity> =>
  fc.oneof(
    num(min, max),
    fc
      .tuple(num(min, max), num(min, max), fc.boolean(), fc.double({ min: 0, max: 1, noNaN: true }))
      .filter(([a, b]) => a !== b)
      .map(([a, b, mid, t]) => {
        const low = Math.min(a, b);
        const high = Math.max(a, b);
        const value = mid ? tidy((low + high) / 2) : low + t * (high - low);
        return { value: Math.min(Math.max(value, low), high), low, high };
      }),
  );

const nonZero = (q: Quantity) => (typeof q === 'number' ? q !== 0 : true);

const enteredDrag: fc.Arbitrary<DragV1> = quantityIn(0.01, 2).map((q) =>
  typeof q === 'number' ? { source: 'entered', value: q } : { source: 'entered', ...q },
);

const tableDragArb: fc.Arbitrary<DragV1> = fc
  .tuple(
    fc.constantFrom(...DRAG_TABLE),
    fc.constantFrom('under-30mph' as const, 'over-30mph' as const),
    fc.nat(100),
    fc.nat(2),
  )
  .map(([row, band, t, how]) => {
    const banded = row.any === undefined;
    const r = dragTableBand(row, band)!;
    const base = { source: 'table' as const, surface: row.key, ...(banded ? { band } : {}) };
    if (how === 0) return { ...base, value: tidy((r.low + r.high) / 2), low: r.low, high: r.high };
    const value = r.low + ((r.high - r.low) * t) / 100;
    if (how === 1) return { ...base, value, low: r.low, high: r.high };
    // an own range around the pick, wider than the table's
    return { ...base, value, low: value / 2, high: Math.min(2, value * 1.5 + 0.01) };
  });

const label = fc
  .string({ minLength: 1, maxLength: 12 })
  .map((s) => s.replace(/[[\]\r\n\u2028\u2029]/g, '').trim())
  .filter((s) => s !== '');

const segment = (withLength: boolean): fc.Arbitrary<SegmentV1> =>
  fc
    .record({
      length: quantityIn(0.01, 5000),
      drag: fc.oneof(enteredDrag, tableDragArb),
      grade: fc.oneof(fc.constant(0), quantityIn(-40, 40).filter(nonZero)),
      label: fc.option(label, { nil: undefined }),
    })
    .map(({ length, label: l, ...rest }) => {
      const s: SegmentV1 = { ...rest };
      if (withLength) s.length = length;
      if (l !== undefined) s.label = l;
      return s;
    });

const segmentLists = fc.oneof(
  fc.array(segment(true), { minLength: 1, maxLength: 5 }),
  segment(false).map((s) => [s]),
);

describe('properties', () => {
  it('parseSegmentLine(formatSegmentLine(x)) == x for valid segment lists', () => {
    fc.assert(
      fc.property(
        segmentLists,
        fc.constantFrom('imperial' as const, 'metric' as const),
        (segments, units) => {
          const line = formatSegmentLine(segments);
          expect(line).toBeTypeOf('string');
          const back = parseSegmentLine(line!, { units });
          expect(back).toEqual({ ok: true, segments });
        },
      ),
      { numRuns: 500 },
    );
  });

  it('parseQuantity of a formatted number returns that number', () => {
    fc.assert(
      fc.property(num(0.001, 100_000), fc.nat(6), (n, dp) => {
        for (const text of [String(n), n.toFixed(dp)]) {
          const expected = Number(text);
          if (!(expected > 0)) continue;
          expect(parseQuantity(text, SPECS.length())).toEqual({ ok: true, value: expected });
          expect(parseQuantity(`${text} ft`, SPECS.length('imperial'))).toEqual({
            ok: true,
            value: expected,
          });
          expect(parseQuantity(`${text} m`, SPECS.length('metric'))).toEqual({
            ok: true,
            value: expected,
          });
        }
      }),
      { numRuns: 300 },
    );
  });

  it('parseQuantity of a formatted signed grade returns it', () => {
    fc.assert(
      fc.property(num(-99, 99), (n) => {
        expect(parseQuantity(`${n}%`, SPECS.signedGrade())).toEqual({
          ok: true,
          value: n === 0 ? 0 : n,
        });
      }),
    );
  });

  it('a list of typed numbers with any separators reads back in order', () => {
    // A comma directly between digits is refused by design (`1432,5` could be a decimal comma).
    const sep = fc.constantFrom(' ', ', ', ';', '; ', '  ', ' ,  ', ' ,');
    fc.assert(
      fc.property(
        fc.array(fc.tuple(num(0.01, 5000), sep), { minLength: 1, maxLength: 12 }),
        (items) => {
          const text = items.map(([n, s], i) => (i === 0 ? '' : s) + String(n)).join('');
          const spec = { ...SPECS.length(), field: 'length', item: 'mark' };
          expect(parseList(text, spec)).toEqual({ ok: true, values: items.map(([n]) => n) });
          expect(parseMarksLine(text, { units: 'imperial' })).toEqual(
            items.length <= 16
              ? { ok: true, marks: items.map(([n]) => n) }
              : expect.objectContaining({ ok: false }),
          );
        },
      ),
    );
  });

  it('n x LENGTH gives n equal marks', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 16 }), num(0.01, 5000), (k, n) => {
        expect(parseMarksLine(`${k} x ${n}`, { units: 'metric' })).toEqual({
          ok: true,
          marks: Array.from({ length: k }, () => n),
        });
      }),
    );
  });

  it('a length in the other unit system converts as mathjs converts it', () => {
    // mathjs units as the outside reference (international foot, 0.3048 m exactly)
    fc.assert(
      fc.property(num(0.01, 20_000), (n) => {
        const toFt = parseQuantity(`${n} m`, SPECS.length('imperial'));
        const toM = parseQuantity(`${n} ft`, SPECS.length('metric'));
        expect(toFt.ok && toM.ok).toBe(true);
        if (!toFt.ok || !toM.ok) return;
        const ft = unit(n, 'm').toNumber('ft');
        const m = unit(n, 'ft').toNumber('m');
        expect(Math.abs((toFt.value as number) - ft)).toBeLessThanOrEqual(ft * 1e-11);
        expect(Math.abs((toM.value as number) - m)).toBeLessThanOrEqual(m * 1e-11);
      }),
    );
  });

  const junk = fc.oneof(
    fc.string({ maxLength: 30 }),
    fc.string({ unit: 'grapheme', maxLength: 20 }),
    fc
      .array(
        fc.constantFrom(
          '0',
          '1',
          '5',
          '9',
          '.',
          '..',
          ',',
          ';',
          '-',
          '+',
          '±',
          '+/-',
          '(',
          ')',
          '@',
          '%',
          '[',
          ']',
          ' ',
          'm',
          'ft',
          'in',
          "'",
          '"',
          'x',
          'e',
          'e9',
          'to',
          'km/h',
          '°',
          '=',
          'gravel-loose',
          '/over30',
          'NaN',
          'Infinity',
          '1e309',
          '\t',
        ),
        { maxLength: 14 },
      )
      .map((a) => a.join('')),
  );

  /** Every result is ok with finite numbers, or not ok with a message; nothing throws. */
  function wellFormed(text: string, r: { ok: boolean; message?: string }): void {
    if (r.ok) {
      for (const n of numbersIn(r)) expect(Number.isFinite(n)).toBe(true);
    } else {
      expect(typeof r.message).toBe('string');
      expect(r.message!.trim().length).toBeGreaterThan(0);
      // A message may quote what was typed, but never invents NaN, undefined or [object ...].
      for (const word of ['NaN', 'undefined', '[object', 'Infinity'])
        if (!text.includes(word)) expect(r.message).not.toContain(word);
    }
  }

  it('random text never throws and always gives a value or a message, never NaN or Infinity', () => {
    const specs = Object.values(SPECS).flatMap((s) => [s('imperial'), s('metric')]);
    fc.assert(
      fc.property(junk, (text) => {
        for (const spec of specs) wellFormed(text, parseQuantity(text, spec));
        wellFormed(text, parseList(text, { ...SPECS.length(), item: 'mark', field: 'length' }));
        wellFormed(text, parseMarksLine(text, { units: 'metric' }));
        wellFormed(text, parseSegmentLine(text, { units: 'imperial' }));
        wellFormed(text, parseCount(text, { field: 'number of marks', max: 16 }));
      }),
      { numRuns: 400 },
    );
  });

  it('every accepted range has low <= value <= high, within the rule', () => {
    fc.assert(
      fc.property(junk, (text) => {
        const r = parseQuantity(text, SPECS.drag());
        if (!r.ok || typeof r.value === 'number') return;
        expect(r.value.low!).toBeLessThanOrEqual(r.value.value);
        expect(r.value.value).toBeLessThanOrEqual(r.value.high!);
        expect(r.value.low!).toBeGreaterThan(RULES.drag.gt);
        expect(r.value.high!).toBeLessThanOrEqual(RULES.drag.max);
      }),
      { numRuns: 400 },
    );
  });
});
