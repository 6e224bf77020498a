import { describe, expect, it } from 'vitest';
import { dragFactor, levelTestDrag, solveCase, testSkidDrag } from '../../src/engine/index.js';
import { caseOf } from './helpers.js';

// Physics of a test skid on a slope (work of friction and of gravity along the path, all wheels
// locked): S² = C d (f + G_t/100), so the test ratio S²/(C d) is f + G_t/100 and the level drag
// factor is f = S²/(C d) − G_t/100. Numbers below are invented and worked by hand.

const value = <T>(o: { ok: true; value: T } | { ok: false; reason: string }): T => {
  if (!o.ok) throw new Error(o.reason);
  return o.value;
};
// 30²/(30 × 40) = 0.75 and 32²/(30 × 48) = 1024/1440 = 0.711111 (by hand).
const tests = [
  { speed: 30, distance: 40 },
  { speed: 32, distance: 48 },
];

describe('test skids run on a grade', () => {
  it('the scalar function takes the test grade off the ratio', () => {
    expect(testSkidDrag(30, 40, 'imperial')).toBeCloseTo(0.75, 12);
    expect(testSkidDrag(30, 40, 'imperial', 5)).toBeCloseTo(0.7, 12);
    expect(testSkidDrag(30, 40, 'imperial', -4)).toBeCloseTo(0.79, 12);
    // Metric: 50²/(254 × 14) = 0.703037; less 2/100 = 0.683037 (by hand).
    expect(testSkidDrag(50, 14, 'metric', 2)).toBeCloseTo(0.683037, 5);
  });

  it('value takes off the grade value, low its high end, high its low end', () => {
    const d = value(
      dragFactor(
        { source: 'test-skids', tests, testGrade: { value: 2, low: 1, high: 3 } },
        'imperial',
      ),
    );
    // mean 0.730556 − 0.02 = 0.710556; low 0.711111 − 0.03 = 0.681111; high 0.75 − 0.01 = 0.74.
    expect(d.f.value).toBeCloseTo(0.710556, 5);
    expect(d.f.low).toBeCloseTo(0.681111, 5);
    expect(d.f.high).toBeCloseTo(0.74, 9);
    expect(d.step.why).toMatch(/grade was taken off/);
    expect(d.step.substituted).toMatch(/− 2\/100 = 0\.71$/);
    expect(d.step.inputs.G_t).toEqual({
      value: 2,
      low: 1,
      high: 3,
      unit: '%',
      source: 'grade of the tests',
    });
  });

  it('without a test grade the figures are those of level tests, and the step says so', () => {
    const plain = value(dragFactor({ source: 'test-skids', tests }, 'imperial'));
    const zero = value(dragFactor({ source: 'test-skids', tests, testGrade: 0 }, 'imperial'));
    expect(plain.f).toEqual(zero.f);
    expect(plain.f.value).toBeCloseTo((0.75 + 1024 / 1440) / 2, 12);
    expect(plain.step.why).toMatch(/taken as run level \(no test grade recorded\)/);
    expect(zero.step.why).toMatch(/run level;/);
  });

  it('tests on the slide’s own slope with all wheels braking give the test ratio back', () => {
    // Same −4% stretch: f = 0.730556 + 0.04; effective drag f × 1 − 0.04 = 0.730556, the ratio.
    // S = sqrt(30 × 100 × 0.730556) = 46.815; low sqrt(30 × 100 × 0.711111) = 46.188;
    // high sqrt(30 × 100 × 0.75) = 47.434 (by hand).
    const c = caseOf({
      analyses: [
        {
          id: 's',
          kind: 'skid',
          marks: [100],
          segments: [{ drag: { source: 'test-skids', tests, testGrade: -4 }, grade: -4 }],
        },
      ],
    });
    const a = solveCase(c).analyses[0]!;
    if (!a.ok) throw new Error(a.reason);
    const eff = a.solution.steps.find((s) => s.name.startsWith('Effective drag'))!;
    expect(eff.result).toBeCloseTo((0.75 + 1024 / 1440) / 2, 12);
    expect(eff.low).toBeCloseTo(1024 / 1440, 12);
    expect(eff.high).toBeCloseTo(0.75, 12);
    expect(a.solution.speed.value).toBeCloseTo(46.815, 3);
    expect(a.solution.speed.low).toBeCloseTo(46.188, 3);
    expect(a.solution.speed.high).toBeCloseTo(47.434, 3);
    expect(a.solution.minimum).toBe(46);
  });

  it('a test grade that takes all the friction is a failure naming testGrade', () => {
    const d = dragFactor({ source: 'test-skids', tests, testGrade: 75 }, 'imperial');
    expect(d.ok).toBe(false);
    if (!d.ok) {
      expect(d.path).toBe('testGrade');
      expect(d.reason).toMatch(/test grade/);
    }
  });
});

describe('drag factors already worked out from test skids', () => {
  // The same two tests as factors: 0.75 and 0.711111 (by hand, above).
  const factors = [0.75, 1024 / 1440];

  it('give the same drag factor as the tests they were worked out from, grade and all', () => {
    const testGrade = { value: 2, low: 1, high: 3 };
    const fromTests = value(dragFactor({ source: 'test-skids', tests, testGrade }, 'imperial'));
    const typed = value(dragFactor({ source: 'test-skids', factors, testGrade }, 'imperial'));
    expect(typed.f.value).toBeCloseTo(fromTests.f.value, 12);
    expect(typed.f.low).toBeCloseTo(fromTests.f.low, 12);
    expect(typed.f.high).toBeCloseTo(fromTests.f.high, 12);
    expect(typed.step.name).toBe('Drag factor from test skids (factors entered)');
    expect(typed.step.why).toMatch(/grade was taken off/);
    expect(typed.source).toBe('2 drag factors from test skids on a 2% grade');
  });

  it('level-ground factors have no grade taken off, even with the test grade on record', () => {
    const d = value(
      dragFactor({ source: 'test-skids', factors, testGrade: 3, gradeTakenOut: true }, 'imperial'),
    );
    expect(d.f.value).toBeCloseTo((0.75 + 1024 / 1440) / 2, 12);
    expect(d.f.low).toBeCloseTo(1024 / 1440, 12);
    expect(d.f.high).toBeCloseTo(0.75, 12);
    expect(d.step.why).toMatch(
      /taken as level-ground factors \(the tests' 3% grade already taken out\)/,
    );
    expect(d.step.inputs.G_t?.source).toBe('grade of the tests, already taken out');
  });

  it('the grade rule is the one scalar function: levelTestDrag(0.75, 5) is 0.70', () => {
    expect(levelTestDrag(0.75, 5)).toBeCloseTo(0.7, 12);
    expect(levelTestDrag(0.75, -4)).toBeCloseTo(0.79, 12);
  });
});
