import { describe, expect, it } from 'vitest';
import {
  buildCase,
  contextOf,
  questionsFor,
  type InterviewState,
} from '../../src/interview/index.js';
import { act, fillUntil, start, type } from './drive.js';

/** The message shown for `text` typed at question `id`, after the answers in `before`. */
function rejection(before: Record<string, string>, id: string, text: string): string | undefined {
  const s = fillUntil(start(), before, id);
  return act(s, { type: 'answer', text }).error?.message;
}

const SLIDE = {
  units: 'f',
  'vehicle.brakes': 'a',
  'a0.look': 'd',
  'a0.surfaces': 'o',
  'a0.count': '4',
};
const YAW = { units: 'f', 'vehicle.brakes': 'a', 'a0.look': 'y', 'a0.chord': '40' };

describe('messages for bad input', () => {
  it.each([
    [
      'a0.count',
      'four',
      "number of marks: 'four' is not a whole number; type a whole number from 1 to 64",
    ],
    ['a0.count', '0', 'number of marks must be a whole number from 1 to 64'],
    [
      'a0.marks',
      '64 66 65 65 63',
      '4 marks were counted, 5 lengths typed; give one length per mark, or change the number of marks',
    ],
    [
      'a0.surfaces',
      'x',
      '"x" is not one of the choices: press o (one surface), s (several segments, one at a time), q (several segments on one line)',
    ],
  ])('%s: %j', (id, text, message) => {
    expect(rejection(SLIDE, id, text)).toBe(message);
  });

  it('a drag factor typed as a percentage is refused by the file rule, naming the bound', () => {
    const m = rejection(
      { ...SLIDE, 'a0.marks': '4 x 60', 'a0.seg0.drag.source': 'e' },
      'a0.seg0.drag.value',
      '72',
    );
    expect(m).toMatch(/^drag factor must be at most 2/);
  });

  it('a grade with a minus sign is refused: the direction is asked separately', () => {
    const m = rejection(
      {
        ...SLIDE,
        'a0.marks': '4 x 60',
        'a0.seg0.drag.source': 'e',
        'a0.seg0.drag.value': '0.7',
        'a0.seg0.grade.dir': 'd',
      },
      'a0.seg0.grade.pct',
      '-3',
    );
    expect(m).toBe(
      'grade: no minus sign here; choose uphill or downhill above instead of typing a sign',
    );
  });

  it('a middle ordinate of half the chord or more is refused, naming the limit', () => {
    expect(rejection(YAW, 'a0.ordinate', '20')).toBe(
      'the middle ordinate must be less than half the chord (under 20 ft); check both measurements',
    );
    // Against the chord's low end and the ordinate's high end, as the file rule checks.
    expect(rejection({ ...YAW, 'a0.chord': '40 +/- 2' }, 'a0.ordinate', '18 (17-19.5)')).toBe(
      'the middle ordinate must be less than half the chord (under 19 ft); check both measurements',
    );
  });

  it('a braking efficiency above 1 names the bound and says it is a decimal from 0 to 1', () => {
    const before = { units: 'f', 'a0.look': 'd', 'vehicle.brakes': 'e' };
    const m = rejection(before, 'vehicle.brakes.efficiency', '1.2');
    expect(m).toBe(
      'braking efficiency must be at most 1; braking efficiency is a decimal from 0 to 1, e.g. 0.85',
    );
    // No reading of 1.2 as a percentage: the rule is 0..1.
    expect(m).not.toContain('0.012');
    expect(rejection(before, 'vehicle.brakes.efficiency', '85')).toContain('e.g. 0.85');
  });

  it('test skids without a slash say how to write them', () => {
    const before = { ...SLIDE, 'a0.marks': '4 x 60', 'a0.seg0.drag.source': 'k' };
    // With no slash the figures are read as drag factors; 30 is none, so both forms are named.
    expect(rejection(before, 'a0.seg0.drag.tests', '30 42')).toBe(
      'drag factor 1: test drag factor must be at most 2 (with no slash, the figures are read as drag factors): give each test as speed/distance (e.g. 30/42, 35/57.5), or the drag factors worked out from the tests (e.g. 0.68, 0.71, 0.70)',
    );
    expect(rejection(before, 'a0.seg0.drag.tests', '30/42, 35')).toBe(
      'test 2 ("35"): write each test as speed/distance, e.g. 30/42 (or give only drag factors, with no slash: 0.68, 0.71)',
    );
  });

  it('a rejected required text says an answer is needed', () => {
    // The surface name of "another surface" has no default and must be given.
    const before = {
      ...SLIDE,
      'a0.marks': '4 x 60',
      'a0.seg0.drag.source': 't',
      'a0.seg0.drag.surface': 'o',
    };
    expect(rejection(before, 'a0.seg0.drag.surfaceName', '  ')).toBe('an answer is needed here');
  });
});

describe('units typed on an answer', () => {
  it('converts into the case units and says so', () => {
    let s = fillUntil(start(), SLIDE, 'a0.marks');
    s = type(s, '24.4 m');
    // International foot = 0.3048 m exactly (1959 agreement): 24.4 / 0.3048 = 80.0525 ft.
    expect(s.notice).toContain('24.4 m = 80.05 ft');
    expect(s.notice).toContain('taken as 4 equal marks');
    const marks = (s.answers['a0.marks']!.value as number[]).map((m) => Math.round(m * 1e4) / 1e4);
    expect(marks).toEqual([80.0525, 80.0525, 80.0525, 80.0525]);
  });

  it('a plain number is read in the units of the case, even after the units change', () => {
    let s = fillUntil(start(), { units: 'f' }, 'limit');
    s = type(s, '50');
    s = type(act(s, { type: 'jump', id: 'units' }), 'm');
    expect(s.notice).toContain('Units changed');
    expect(buildCase(s, { id: 'x' }).postedLimit).toBe(50);
    expect(buildCase(s, { id: 'x' }).units).toBe('metric');
  });

  it('every question validates with the same words it parses with', () => {
    const s: InterviewState = fillUntil(start(), SLIDE, 'a0.marks');
    const q = questionsFor(s.answers).find((x) => x.id === 'a0.marks')!;
    const ctx = contextOf(s.answers);
    expect(q.validate('1 2 3', ctx)).toBe((q.parse('1 2 3', ctx) as { message: string }).message);
    expect(q.validate('1 2 3 4', ctx)).toBeUndefined();
  });

  it('test skids take units on each figure', () => {
    const before = {
      units: 'm',
      'vehicle.brakes': 'a',
      'a0.look': 'd',
      'a0.surfaces': 'o',
      'a0.count': '2',
      'a0.marks': '20 21',
      'a0.seg0.drag.source': 'k',
    };
    const s = type(fillUntil(start(), before, 'a0.seg0.drag.tests'), '50 km/h / 14 m, 45/11');
    expect(s.answers['a0.seg0.drag.tests']!.value).toEqual([
      { speed: 50, distance: 14 },
      { speed: 45, distance: 11 },
    ]);
  });
});
