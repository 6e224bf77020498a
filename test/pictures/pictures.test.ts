import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { segmentLabels } from '../../src/extras/limit-inputs.js';
import { sensitivity } from '../../src/extras/sensitivity.js';
import { speedAlongSlideChart } from '../../src/pictures/slide-chart.js';
import { speedAlongSlideSvg, sensitivitySvg, yawArcSvg } from '../../src/pictures/pictures-svg.js';
import { textWidth } from '../../src/pictures/text-fit.js';
import { arcOffset, yawArcSketch } from '../../src/pictures/yaw-sketch.js';
import { caseOf, clean, solved } from '../extras/helpers.js';

// Invented slide: 60 ft of asphalt at f 0.70 then 20 ft of gravel at f 0.50, level, n 1.
// By hand: gravel alone S² = 30 × 20 × 0.5 = 300 (17.3 mph at the boundary); start
// S² = 300 + 30 × 60 × 0.7 = 1560 (39.5 mph).
const c = caseOf({
  analyses: [
    {
      id: 'skid-2',
      kind: 'skid',
      segments: [
        {
          label: 'asphalt',
          length: 60,
          drag: { source: 'entered', value: 0.7, low: 0.65, high: 0.75 },
        },
        {
          label: 'gravel',
          length: 20,
          drag: { source: 'entered', value: 0.5, low: 0.45, high: 0.55 },
        },
      ],
    },
  ],
});
const s = solved(c);
const labels = segmentLabels(c, 'skid-2');

describe('speedAlongSlideChart', () => {
  it('fits every width and height asked, with no broken numbers (property, 200 sizes)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 160 }), fc.integer({ min: 1, max: 40 }), (w, h) => {
        const lines = speedAlongSlideChart(s, w, h, {
          segmentLabels: labels,
          speedUnit: 'mph',
          lengthUnit: 'ft',
        });
        for (const l of lines) {
          expect(textWidth(l)).toBeLessThanOrEqual(w);
          expect(clean(l)).toBe(true);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('shows the speed at each boundary, the distances and the surfaces', () => {
    const text = speedAlongSlideChart(s, 70, 14, {
      segmentLabels: labels,
      speedUnit: 'mph',
      lengthUnit: 'ft',
    }).join('\n');
    expect(text).toContain(Math.sqrt(1560).toFixed(1)); // 39.5
    expect(text).toContain(Math.sqrt(300).toFixed(1)); // 17.3
    expect(text).toContain('0.0');
    expect(text).toContain('60.0');
    expect(text).toContain('80.0 ft');
    expect(text).toContain('asphalt');
    expect(text).toContain('gravel');
    expect(text).toContain('mph');
  });

  it('the curve falls from the start to rest: the dots go down the chart left to right', () => {
    const lines = speedAlongSlideChart(s, 70, 14, { ascii: true });
    const rowOfCol = (col: number) => lines.findIndex((l) => l[col] === '*');
    const cols = [...lines[0]!].map((_, i) => i).filter((i) => rowOfCol(i) >= 0);
    const rows = cols.map(rowOfCol);
    for (let i = 1; i < rows.length; i++) expect(rows[i]!).toBeGreaterThanOrEqual(rows[i - 1]!);
  });

  it('a yaw solution has no profile and says so', () => {
    const y = caseOf({
      analyses: [
        {
          id: 'y',
          kind: 'yaw',
          chord: 40,
          middleOrdinate: 2.5,
          drag: { source: 'entered', value: 0.7 },
        },
      ],
    });
    expect(speedAlongSlideChart(solved(y), 60, 10)[0]).toMatch(/no speed profile/i);
  });
});

describe('yawArcSketch', () => {
  it('arcOffset is the circle through the chord ends with the given middle ordinate (circle geometry)', () => {
    expect(arcOffset(40, 2, 0)).toBeCloseTo(0, 9);
    expect(arcOffset(40, 2, 40)).toBeCloseTo(0, 9);
    expect(arcOffset(40, 2, 20)).toBeCloseTo(2, 9);
    // R = 40²/16 + 1 = 101; at 10 ft from the middle: sqrt(101² − 10²) − 99.
    expect(arcOffset(40, 2, 10)).toBeCloseTo(Math.sqrt(101 ** 2 - 100) - 99, 9);
  });

  it('fits every size and never shows a broken number (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 200, noNaN: true }),
        fc.double({ min: 0.001, max: 0.49, noNaN: true }),
        fc.integer({ min: 1, max: 140 }),
        fc.integer({ min: 1, max: 30 }),
        (C, q, w, h) => {
          for (const l of yawArcSketch(C, C * q, w, h, { unit: 'ft' })) {
            expect(textWidth(l)).toBeLessThanOrEqual(w);
            expect(clean(l)).toBe(true);
          }
        },
      ),
      { numRuns: 200 },
    );
  });

  it('marks the chord, the middle ordinate and says the height is stretched', () => {
    const text = yawArcSketch(45, 3.2, 60, 10, { unit: 'ft' }).join('\n');
    expect(text).toContain('chord C 45.00 ft');
    expect(text).toContain('M 3.20 ft');
    expect(text).toMatch(/height drawn about \d+× the length scale/);
    expect(text).toContain('┴');
  });

  it('refuses what is not an arc', () => {
    expect(yawArcSketch(40, 25, 60, 10)[0]).toMatch(/no arc/i);
    expect(yawArcSketch(40, Number.NaN, 60, 10)[0]).toMatch(/no arc/i);
  });
});

describe('SVG pictures: self-contained, no broken numbers', () => {
  const svgs = {
    speed: speedAlongSlideSvg(s, { segmentLabels: labels, speedUnit: 'mph', lengthUnit: 'ft' }),
    yaw: yawArcSvg(45, 3.2, { lengthUnit: 'ft' }),
    sensitivity: sensitivitySvg(sensitivity(s), { speedUnit: 'mph' }),
    empty: speedAlongSlideSvg(
      solved(
        caseOf({
          analyses: [
            {
              id: 'y',
              kind: 'yaw',
              chord: 40,
              middleOrdinate: 2.5,
              drag: { source: 'entered', value: 0.7 },
            },
          ],
        }),
      ),
    ),
  };
  it.each(Object.entries(svgs))('%s', (_, svg) => {
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
    expect((svg.match(/<svg/g) ?? []).length).toBe(1);
    expect(clean(svg)).toBe(true);
    // Nothing fetched from outside: no links, imports, external fonts or images.
    expect(svg).not.toMatch(/href|@import|@font-face|url\(|<image/);
    expect(svg).toContain('font-family="sans-serif"');
    // Every element opened is closed (self-closing or paired).
    const opened = (svg.match(/<(text|title|svg)\b/g) ?? []).length;
    const closed = (svg.match(/<\/(text|title|svg)>/g) ?? []).length;
    expect(closed).toBe(opened);
  });
  it('carry the figures the text shows', () => {
    expect(svgs.speed).toContain('39.5 mph');
    expect(svgs.speed).toContain('17.3 mph');
    expect(svgs.speed).toContain('asphalt');
    expect(svgs.yaw).toContain('M 3.20 ft');
    expect(svgs.sensitivity).toContain('drag factor (segment 1)');
    expect(svgs.sensitivity).not.toContain('f[0]');
  });
  it('escapes text', () => {
    expect(speedAlongSlideSvg(s, { segmentLabels: ['<wet> & "cold"', 'b'] })).toContain(
      '&lt;wet&gt; &amp; &quot;cold&quot;',
    );
  });
});
