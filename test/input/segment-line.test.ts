/** Quick entry of a slide's segments: accepted lines, malformed lines, and writing them back. */
import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { segmentV1 } from '../../src/case/v1/schema.js';
import { formatSegmentLine, parseSegmentLine } from '../../src/input/index.js';
import { expectQuantity } from './specs.js';

const imperial = { units: 'imperial' as const };
const entered = (value: number, low?: number, high?: number) =>
  low === undefined ? { source: 'entered', value } : { source: 'entered', value, low, high };

describe('parseSegmentLine: accepted lines', () => {
  it.each([
    [
      '48 @0.74 +2%, 31 @0.55, 22 @0.40 -3%',
      [
        { length: 48, drag: entered(0.74), grade: 2 },
        { length: 31, drag: entered(0.55), grade: 0 },
        // typed as 0.40: kept with its two decimals for the record
        { length: 22, drag: { ...entered(0.4), decimals: 2 }, grade: -3 },
      ],
    ],
    [
      '52.0 @0.70 -2%',
      [
        {
          length: { value: 52, decimals: 1 },
          drag: { ...entered(0.7), decimals: 2 },
          grade: -2,
        },
      ],
    ],
    ['52.50 @0.7', [{ length: { value: 52.5, decimals: 2 }, drag: entered(0.7), grade: 0 }]],
    [
      '48 @0.74 +2%; 31 @0.55',
      [
        { length: 48, drag: entered(0.74), grade: 2 },
        { length: 31, drag: entered(0.55), grade: 0 },
      ],
    ],
    [
      '48@0.74+2%,31@0.55',
      [
        { length: 48, drag: entered(0.74), grade: 2 },
        { length: 31, drag: entered(0.55), grade: 0 },
      ],
    ],
    ['48 @0.70-0.78 -3%', [{ length: 48, drag: entered(0.74, 0.7, 0.78), grade: -3 }]],
    ['48 @0.70..0.78', [{ length: 48, drag: entered(0.74, 0.7, 0.78), grade: 0 }]],
    ['48 @0.72 (0.65-0.80) + 2 %', [{ length: 48, drag: entered(0.72, 0.65, 0.8), grade: 2 }]],
    ['48 @0.74 ± 0.04', [{ length: 48, drag: entered(0.74, 0.7, 0.78), grade: 0 }]],
    [
      '48 @0.74 -3% ± 0.5',
      [{ length: 48, drag: entered(0.74), grade: { value: -3, low: -3.5, high: -2.5 } }],
    ],
    [
      '48 @0.74 -4..-2%',
      [{ length: 48, drag: entered(0.74), grade: { value: -3, low: -4, high: -2 } }],
    ],
    [
      '48 @0.74 -4 to -2%',
      [{ length: 48, drag: entered(0.74), grade: { value: -3, low: -4, high: -2 } }],
    ],
    [
      '48 @0.74 -3% (-4 to -2)',
      [{ length: 48, drag: entered(0.74), grade: { value: -3, low: -4, high: -2 } }],
    ],
    ['48 @0.7 0%', [{ length: 48, drag: entered(0.7), grade: 0 }]],
    ['47-49 @0.7', [{ length: { value: 48, low: 47, high: 49 }, drag: entered(0.7), grade: 0 }]],
    [
      '48 ± 0.5 @0.7',
      [{ length: { value: 48, low: 47.5, high: 48.5 }, drag: entered(0.7), grade: 0 }],
    ],
    [
      '48 @0.74 +2% [gravel, loose]',
      [{ length: 48, drag: entered(0.74), grade: 2, label: 'gravel, loose' }],
    ],
    ['[shoulder] 22 @0.4', [{ length: 22, drag: entered(0.4), grade: 0, label: 'shoulder' }]],
    ['@0.74 -1%', [{ drag: entered(0.74), grade: -1 }]],
  ])('%j', (text, expected) => {
    expect(parseSegmentLine(text, imperial)).toEqual({ ok: true, segments: expected });
  });

  it('converts lengths typed in another unit and says so (mathjs: 15 m in ft)', () => {
    const r = parseSegmentLine('15 m @0.7, 48 ft 6 in @0.5', imperial);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expectQuantity(r.segments[0]!.length!, unit(15, 'm').toNumber('ft'));
    expect(r.segments[1]!.length).toBe(48.5);
    expect(r.converted).toBe('segment 1: 15 m = 49.21 ft; segment 2: 48 ft 6 in = 48.5 ft');
  });

  it('reads a metric line in metres without conversion', () => {
    expect(parseSegmentLine('14.6 @0.74 -2%', { units: 'metric' })).toEqual({
      ok: true,
      segments: [{ length: 14.6, drag: entered(0.74), grade: -2 }],
    });
  });

  it('reads a unicode minus and an en dash as typed by phone keyboards', () => {
    expect(parseSegmentLine('48 @0.70–0.78 −3%', imperial)).toEqual({
      ok: true,
      segments: [{ length: 48, drag: entered(0.74, 0.7, 0.78), grade: -3 }],
    });
  });

  it('reads a metric line with the speed band from the context (30 mph is about 48 km/h)', () => {
    // Dry new asphalt over 30 mph 0.65-1.00: Baker table (1975), seen in a reprint (Fricke 1990).
    const r = parseSegmentLine('15 @asphalt-dry-new, 5.5 @0.5 +1%', {
      units: 'metric',
      band: 'over-30mph',
    });
    expect(r).toEqual({
      ok: true,
      segments: [
        {
          length: 15,
          drag: {
            source: 'table',
            surface: 'asphalt-dry-new',
            value: 0.825,
            low: 0.65,
            high: 1,
            band: 'over-30mph',
          },
          grade: 0,
        },
        { length: 5.5, drag: entered(0.5), grade: 1 },
      ],
    });
  });

  it('takes a reference table row by key, with the range of the table', () => {
    // Loose gravel 0.40-0.70: Baker table (1975) row, from memory (verify before use).
    const r = parseSegmentLine('22 @gravel-loose', imperial);
    expect(r).toEqual({
      ok: true,
      segments: [
        {
          length: 22,
          drag: { source: 'table', surface: 'gravel-loose', value: 0.55, low: 0.4, high: 0.7 },
          grade: 0,
        },
      ],
    });
  });

  it('takes the speed band of a two-band row from the key or from the context', () => {
    // Dry travelled asphalt, over 30 mph 0.55-0.70, under 30 mph 0.60-0.80: Baker table (1975),
    // seen in a reprint (Fricke 1990).
    const over = {
      source: 'table',
      surface: 'asphalt-dry-travelled',
      value: 0.625,
      low: 0.55,
      high: 0.7,
      band: 'over-30mph',
    };
    const under = {
      source: 'table',
      surface: 'asphalt-dry-travelled',
      value: 0.7,
      low: 0.6,
      high: 0.8,
      band: 'under-30mph',
    };
    expect(parseSegmentLine('48 @asphalt-dry-travelled/over30 -1%', imperial)).toEqual({
      ok: true,
      segments: [{ length: 48, drag: over, grade: -1 }],
    });
    expect(
      parseSegmentLine('48 @asphalt-dry-travelled', { ...imperial, band: 'under-30mph' }),
    ).toEqual({
      ok: true,
      segments: [{ length: 48, drag: under, grade: 0 }],
    });
  });

  it('lets the investigator pick the value or the range of a table row', () => {
    const r = parseSegmentLine('22 @gravel-loose=0.5, 10 @gravel-loose=0.45-0.6 +1%', imperial);
    expect(r).toEqual({
      ok: true,
      segments: [
        {
          length: 22,
          drag: { source: 'table', surface: 'gravel-loose', value: 0.5, low: 0.4, high: 0.7 },
          grade: 0,
        },
        {
          length: 10,
          drag: { source: 'table', surface: 'gravel-loose', value: 0.525, low: 0.45, high: 0.6 },
          grade: 1,
        },
      ],
    });
  });

  it('returns segments the case file schema accepts', () => {
    const r = parseSegmentLine(
      '48 @0.70-0.78 -3% [asphalt], 31 @gravel-loose=0.5 +1%, 22 ± 0.5 @0.4',
      imperial,
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    for (const s of r.segments) expect(segmentV1.safeParse(s).success).toBe(true);
  });
});

describe('parseSegmentLine: malformed lines name the segment and the part', () => {
  it.each([
    ['', 'segments: type each surface as LENGTH @DRAG GRADE, e.g. 48 @0.74 +2%, 31 @0.55'],
    [
      '48 @0.74, 31 @0,55',
      "segment 2, '31 @0,55': the drag factor '0,55' uses a comma; write 0.55",
    ],
    ['48,31 @0.7', "segment 1, '48,31 @0.7': the length '48,31' uses a comma; write 48.31"],
    ['48', "segment 1, '48': no drag factor; add it after @, e.g. 48 @0.70"],
    ['48 -3%', "segment 1, '48 -3%': no drag factor; add it after @, e.g. 48 @0.70 -3%"],
    [
      '48 @',
      "segment 1, '48 @': a drag factor is missing after @; write it as a decimal, e.g. @0.70",
    ],
    ['48 @-3%', 'a drag factor is missing after @'],
    ['48 @0.7 2%', "the grade '2%' needs a sign: +2% uphill or -2% downhill"],
    [
      '48 @0.7 -3',
      "'0.7 -3' reads as a drag factor range; a grade is written with its sign and %, e.g. -3%",
    ],
    ['48 @0.7 +3', 'write the grade with %, e.g. +3%'],
    ['48 @0.7 +2% [', 'the [ has no closing ]'],
    ['48 @0.7 []', 'the [label] is empty'],
    ['48 @0.7 [a] [b]', 'give one [label] per segment'],
    ['48 @0.7,, 31 @0.5', 'segment 2 is empty: there are two separators in a row'],
    [
      '@0.74, 31 @0.5',
      "segment 1, '@0.74': give the length first; only a slide of one segment may leave it out",
    ],
    ['0 @0.7', "segment 1, '0 @0.7': length must be greater than 0"],
    ['48 @0', 'drag factor must be greater than 0'],
    ['48 @72%', 'drag factor: write a decimal, not a percentage (0.72 for 72%)'],
    ['48 @0.9-0.6', 'the low end comes first; write 0.6-0.9'],
    ['48 mph @0.7', "'mph' is a unit of speed"],
    ['48 @0.7 +120%', 'grade must be less than 100'],
    // Words after the figures are a label (`48 @0.7 gravel`); a number there is not.
    ['48 @0.7 +2% 5', "cannot read '5'"],
    ['48 xyz @0.7', "unknown unit 'xyz'"],
    ['48 @gravl', "'gravl' is not a row of the reference table"],
    ['48 @gravel', 'rows like it: gravel-loose'],
    [
      '48 @asphalt-dry-travelled',
      "'asphalt-dry-travelled' gives two ranges by speed; add /under30 or /over30",
    ],
    ['48 @gravel-loose/fast', "'/fast' is not a speed band; use /under30 or /over30"],
    [
      '48 @gravel-loose=0.8',
      'the drag factor 0.8 is outside the table range 0.4-0.7 of gravel-loose',
    ],
    ['48 @0.7 # 2', "'#' is not understood here"],
  ])('%j', (text, fragment) => {
    const r = parseSegmentLine(text, imperial);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(fragment);
  });
});

describe('formatSegmentLine', () => {
  it.each([
    [[{ length: 48, drag: entered(0.74), grade: 2 }], '48 @0.74 +2%'],
    [
      [
        { length: 48, drag: entered(0.74), grade: 0 },
        { length: 31, drag: entered(0.55), grade: -3 },
      ],
      '48 @0.74, 31 @0.55 -3%',
    ],
    [[{ length: 48, drag: entered(0.74, 0.7, 0.78) }], '48 @0.7-0.78'],
    [[{ length: 48, drag: entered(0.72, 0.65, 0.8) }], '48 @0.72 (0.65-0.8)'],
    [
      [
        {
          length: { value: 48, low: 47, high: 49 },
          drag: entered(0.7),
          grade: { value: -3, low: -4, high: -2 },
        },
      ],
      '47-49 @0.7 -3% (-4 to -2)',
    ],
    [[{ drag: entered(0.7), grade: -1, label: 'asphalt' }], '@0.7 -1% [asphalt]'],
    [
      [
        {
          length: 22,
          drag: { source: 'table', surface: 'gravel-loose', value: 0.55, low: 0.4, high: 0.7 },
        },
      ],
      '22 @gravel-loose',
    ],
    [
      [
        {
          length: 22,
          drag: { source: 'table', surface: 'gravel-loose', value: 0.5, low: 0.4, high: 0.7 },
        },
      ],
      '22 @gravel-loose=0.5',
    ],
    [
      [
        {
          length: 22,
          drag: {
            source: 'table',
            surface: 'asphalt-dry-travelled',
            value: 0.6,
            low: 0.55,
            high: 0.7,
            band: 'over-30mph',
          },
        },
      ],
      '22 @asphalt-dry-travelled/over30=0.6',
    ],
  ] as const)('%j -> %s', (segments, text) => {
    const line = formatSegmentLine(segments as never);
    expect(line).toBe(text);
    // and it reads back to the same segments (grade 0 where none was given)
    const back = parseSegmentLine(line!, imperial);
    expect(back.ok).toBe(true);
    if (back.ok) expect(back.segments).toEqual(segments.map((s) => ({ grade: 0, ...s })));
  });

  it('gives undefined for what the line cannot carry', () => {
    expect(
      formatSegmentLine([
        { length: 48, drag: { source: 'decelerometer', readings: [0.7] }, grade: 0 },
      ]),
    ).toBeUndefined();
    expect(
      formatSegmentLine([
        { length: 48, drag: { source: 'table', surface: 'wet cobbles', value: 0.5 }, grade: 0 },
      ]),
    ).toBeUndefined();
    expect(
      formatSegmentLine([{ length: 48, drag: entered(0.5), label: 'a [b]' }] as never),
    ).toBeUndefined();
    expect(
      formatSegmentLine([{ drag: entered(0.5) }, { length: 3, drag: entered(0.5) }] as never),
    ).toBeUndefined();
  });
});

describe('parseSegmentLine: labels without brackets and a grade without % after a drag range', () => {
  it('takes the words that end a segment as its label', () => {
    const r = parseSegmentLine(
      '52.5 @0.70-0.80 -3% asphalt lane, 21 @0.45 gravel shoulder',
      imperial,
    );
    expect(r).toEqual({
      ok: true,
      segments: [
        { length: 52.5, drag: entered(0.75, 0.7, 0.8), grade: -3, label: 'asphalt lane' },
        { length: 21, drag: entered(0.45), grade: 0, label: 'gravel shoulder' },
      ],
    });
  });

  it('reads a signed number after a complete drag factor as the grade, % or not', () => {
    const r = parseSegmentLine('52.5 @0.70-0.80 -3 asphalt, 21 @gravel-loose +2', imperial);
    if (!r.ok) throw new Error(r.message);
    expect(r.segments.map((s) => s.grade)).toEqual([-3, 2]);
    expect(r.segments[0]!.label).toBe('asphalt');
    expect(parseSegmentLine('40 @0.70 (0.65-0.75) -2', imperial)).toMatchObject({
      ok: true,
      segments: [{ grade: -2 }],
    });
  });

  it('still wants the % after a single drag factor, where -3 would read as part of a range', () => {
    const r = parseSegmentLine('48 @0.7 -3', imperial);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('a grade is written with its sign and %');
    const big = parseSegmentLine('48 @0.70-0.80 -130', imperial);
    expect(big).toEqual({
      ok: false,
      message: "segment 1, '48 @0.70-0.80 -130': grade must be between -100 and 100 percent",
    });
  });

  it('keeps brackets for a label before the figures, and refuses two labels', () => {
    expect(parseSegmentLine('[lane] 48 @0.74', imperial)).toMatchObject({
      ok: true,
      segments: [{ label: 'lane', length: 48 }],
    });
    const two = parseSegmentLine('48 @0.74 [lane] gravel', imperial);
    expect(two).toEqual({
      ok: false,
      message: "segment 1, '48 @0.74 [lane] gravel': give one label per segment",
    });
  });
});
