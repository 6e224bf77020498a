import { spread } from './spread.js';
import type { DragInput } from './input.js';
import { formatNumber } from './number-text.js';
import { tradeConstants, unitsOf } from './constants.js';
import { levelTestDrag, testSkidDrag } from './formulas.js';
import { reduceRepeated } from './reduce.js';
import { fail, ok, type Outcome, type Range, type Step, type UnitSystem } from './types.js';
import { input, joinList, makeStep } from './step.js';

const f2 = (n: number) => formatNumber(n, 'drag');
type TestSkids = Extract<DragInput, { source: 'test-skids' }>;

/** What the tests gave before their grade is considered: one ratio each, with its working. */
function testRatios(
  drag: TestSkids,
  system: UnitSystem,
): { ratios: number[]; parts?: string[]; inputs: Step['inputs'] } {
  const C = tradeConstants(system).slide;
  const u = unitsOf(system);
  if (drag.factors) {
    const ratios = drag.factors.map((x) => spread(x).value);
    return {
      ratios,
      inputs: Object.fromEntries(ratios.map((r, i) => [`f_${i + 1}`, { value: r, unit: '' }])),
    };
  }
  const tests = (drag.tests ?? []).map((t) => ({
    S: spread(t.speed).value,
    d: spread(t.distance).value,
  }));
  return {
    ratios: tests.map((t) => testSkidDrag(t.S, t.d, system)),
    parts: tests.map(
      (t) => `${formatNumber(t.S, 'speed')}²/(${C} × ${formatNumber(t.d, 'length')})`,
    ),
    inputs: Object.fromEntries(
      tests.flatMap((t, i) => [
        [`S_${i + 1}`, { value: t.S, unit: u.speed }],
        [`d_${i + 1}`, { value: t.d, unit: u.length }],
      ]),
    ),
  };
}

/**
 * Drag factor from test skids, given as each test's speed and distance (f_i = S_i² / (C d_i)) or
 * as the factors already worked out from them (`factors`), with the grade the tests were run on
 * taken off once, here (`levelTestDrag`): value = mean(f_i) − G_t.value/100,
 * low = min(f_i) − G_t.high/100, high = max(f_i) − G_t.low/100 (each test by its `value`).
 * Factors marked `gradeTakenOut` are level-ground already: no grade is taken off them. A low end
 * that is not positive is a failure (path `testGrade`): the tests' grade would leave no friction.
 */
export function testSkidsDrag(
  drag: TestSkids,
  system: UnitSystem,
): Outcome<{ f: Range; step: Step; source: string }> {
  const C = tradeConstants(system).slide;
  const typed = drag.factors !== undefined;
  const { ratios, parts, inputs } = testRatios(drag, system);
  const G = spread(drag.gradeTakenOut ? 0 : (drag.testGrade ?? 0));
  const raw = reduceRepeated(ratios);
  const f: Range = {
    value: ratios.reduce((a, r) => a + levelTestDrag(r, G.value), 0) / ratios.length,
    low: ratios.reduce((a, r) => Math.min(a, levelTestDrag(r, G.high)), Infinity),
    high: ratios.reduce((a, r) => Math.max(a, levelTestDrag(r, G.low)), -Infinity),
  };
  const sloped = G.value !== 0 || G.low !== 0 || G.high !== 0;
  if (!(f.low > 0))
    return fail(
      `the test skids give ${f2(raw.low)} at their lowest, and the ${formatNumber(G.high, 'percent')}% grade they were run on takes all of it: check the test grade`,
      'testGrade',
    );
  const n = ratios.length;
  const count = typed
    ? `${n} drag factor${n === 1 ? '' : 's'} from test skids`
    : `${n} test skid${n === 1 ? '' : 's'}`;
  const partsText = `mean(${joinList(parts ?? ratios.map(f2), ', ')})`;
  const valuesText = `mean(${joinList(ratios.map(f2), ', ')})`;
  const gText = `${G.value < 0 ? '+' : '−'} ${formatNumber(Math.abs(G.value), 'percent')}/100`;
  const ratioFormula = typed ? 'f_i = as worked out from test i' : `f_i = S_i² / (${C} × d_i)`;
  const measured = typed
    ? 'drag factors worked out from test skids at known speed and entered'
    : 'measured on scene by test skids at known speed';
  const levelWhy = drag.gradeTakenOut
    ? `taken as level-ground factors (the tests' ${drag.testGrade === undefined ? '' : `${formatNumber(spread(drag.testGrade).value, 'percent')}% `}grade already taken out), so no grade was taken off them`
    : drag.testGrade === undefined
      ? typed
        ? 'taken as worked out on level ground (no test grade recorded)'
        : 'taken as run level (no test grade recorded)'
      : 'run level';
  return ok({
    f,
    source: sloped ? `${count} on a ${formatNumber(G.value, 'percent')}% grade` : count,
    step: makeStep({
      name: typed ? 'Drag factor from test skids (factors entered)' : 'Drag factor from test skids',
      formula: sloped
        ? `${ratioFormula}; f = mean(f_i) − G_t/100, range = smallest to largest`
        : `${ratioFormula}; f = mean, range = smallest to largest`,
      substituted: sloped
        ? `f = ${partsText} ${gText} = ${f2(raw.value)} ${gText} = ${f2(f.value)}`
        : `f = ${typed ? valuesText : `${partsText} = ${valuesText}`} = ${f2(f.value)}`,
      inputs: {
        ...inputs,
        ...(drag.testGrade !== undefined
          ? {
              G_t: drag.gradeTakenOut
                ? input(spread(drag.testGrade), '%', 'grade of the tests, already taken out')
                : input(G, '%', 'grade of the tests'),
            }
          : {}),
      },
      result: f,
      unit: '',
      why: sloped
        ? `${measured}; a test on a slope gives f + G_t/100, so the tests' ${formatNumber(G.value, 'percent')}% grade was taken off to give the level drag factor (the slide's own grade is applied after); the spread of the tests is the range`
        : `${measured}, ${levelWhy}; the spread of the tests is the range`,
    }),
  });
}
