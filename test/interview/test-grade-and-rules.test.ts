/**
 * Test skids on a slope and the distance rules, typed into the interview and read back from the
 * review's lines and the saved case.
 */
import { defaultTextOf } from '../../src/interview/answer-values.js';
import { describe, expect, it } from 'vitest';
import type { SkidV1 } from '../../src/case/v1/schema.js';
import { currentQuestion } from '../../src/interview/index.js';
import { fill, fillUntil, start } from './drive.js';
import { reviewText, savedCase } from './review-of.js';

const skid = (s: ReturnType<typeof start>) => savedCase(s).analyses[0] as SkidV1;

// Invented: a 4% downhill slide of 90 ft, all wheels braking; two tests at 30 mph over 40 and 42 ft.
const DOWNHILL = {
  units: 'f',
  'vehicle.brakes': 'a',
  'a0.look': 'd',
  'a0.surfaces': 'o',
  'a0.count': '1',
  'a0.marks': '90',
  'a0.seg0.drag.source': 'k',
  'a0.seg0.drag.tests': '30/40, 30/42',
  'a0.seg0.grade.dir': 'd',
  'a0.seg0.grade.pct': '4',
};

describe('test skids on a slope', () => {
  it('asks where the tests ran after the grade, and on the same stretch the grade is not taken off twice', () => {
    const at = fillUntil(start(), DOWNHILL, 'a0.seg0.drag.testWhere');
    expect(currentQuestion(at)!.prompt).toContain('same stretch');
    const s = fill(start(), { ...DOWNHILL, 'a0.seg0.drag.testWhere': 's' });
    expect(skid(s).segments[0]!.drag).toMatchObject({ source: 'test-skids', testGrade: -4 });
    // Test ratios S²/(30 d): 900/1200 = 0.75 and 900/1260 = 0.714, mean 0.7321. Run on this -4%
    // stretch, the level drag factor is 0.7321 + 0.04 = 0.7721; with n = 1 the effective drag is
    // 0.7721 - 0.04 = 0.7321, the test ratio itself: S = sqrt(30 × 90 × 0.7321) = 44.46 mph; the
    // low end sqrt(30 × 90 × 0.7143) = 43.92, "at least 43".
    const review = reviewText(s);
    expect(review).toContain('44.5');
    expect(review).toContain('Result: at least 43 mph');
    expect(review).toContain('the test skids ran on this stretch, in the slide');
  });

  it('elsewhere asks the tests’ own grade, level by default, and says so', () => {
    const level = fill(start(), { ...DOWNHILL, 'a0.seg0.drag.testWhere': 'e' });
    expect(skid(level).segments[0]!.drag).toMatchObject({ testGrade: 0 });
    // Level tests: f = 0.7321, effective 0.7321 - 0.04 = 0.6921: sqrt(30 × 90 × 0.6921) = 43.23.
    expect(reviewText(level)).toContain('43.2');
    expect(reviewText(level)).toContain('ran elsewhere, on level ground');
    const up = fill(start(), {
      ...DOWNHILL,
      'a0.seg0.drag.testWhere': 'e',
      'a0.seg0.drag.testGrade.dir': 'u',
      'a0.seg0.drag.testGrade.pct': '2',
    });
    expect(skid(up).segments[0]!.drag).toMatchObject({ testGrade: 2 });
    // Uphill tests: f = 0.7321 - 0.02 = 0.7121, effective 0.6721: sqrt(30 × 90 × 0.6721) = 42.60.
    expect(reviewText(up)).toContain('42.6');
    expect(reviewText(up)).toContain('on a +2% grade');
  });
});

describe('distance rules', () => {
  const typed = (rule: string) =>
    fill(start(), {
      units: 'f',
      'vehicle.brakes': 'a',
      'a0.look': 'd',
      'a0.surfaces': 'o',
      'a0.count': '3',
      'a0.marks': '60 64 68 ± 1',
      'a0.rule': rule,
      'a0.seg0.drag.source': 'e',
      'a0.seg0.drag.value': '0.7',
    });

  it('offers average, longest, shortest and spread, each with a why', () => {
    const s = fillUntil(
      start(),
      {
        units: 'f',
        'vehicle.brakes': 'a',
        'a0.look': 'd',
        'a0.surfaces': 'o',
        'a0.count': '3',
        'a0.marks': '60 64 68',
      },
      'a0.rule',
    );
    const q = currentQuestion(s)!;
    expect(q.choices!.map((c) => c.value)).toEqual(['average', 'longest', 'shortest', 'spread']);
    expect(q.choices!.every((c) => (c.hint ?? '').length > 10)).toBe(true);
    expect(defaultTextOf(q, s.answers)).toBe('average');
  });

  it('spread: the average, from the shortest low end to the longest high end', () => {
    const s = typed('p');
    expect(skid(s).distanceRule).toBe('spread');
    // Marks 60, 64, 68 ± 1 each: d = 64 ft, range 59 to 69 ft. S = sqrt(30 × d × 0.7):
    // sqrt(1344) = 36.66, sqrt(1239) = 35.20, sqrt(1449) = 38.07 mph.
    const review = reviewText(s);
    expect(review).toMatch(/59(\.0)? to 69(\.0)? ft/);
    expect(review).toContain('35.2 to 38.1');
    expect(review).toContain('Result: at least 35 mph');
  });

  it('shortest: the cautious choice, recorded and used', () => {
    const s = typed('s');
    expect(skid(s).distanceRule).toBe('shortest');
    // d = 60 (59 to 61): low sqrt(30 × 59 × 0.7) = 35.20, value sqrt(1260) = 35.50.
    expect(reviewText(s)).toContain('35.5');
    expect(reviewText(s)).toContain('shortest');
  });
});
