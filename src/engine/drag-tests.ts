import { spread } from './spread.js';
import type { DragInput } from './input.js';
import { formatNumber } from './number-text.js';
import { tradeConstants, unitsOf } from './constants.js';
import { testSkidDrag } from './formulas.js';
import { reduceRepeated } from './reduce.js';
import { fail, ok, type Outcome, type Range, type Step, type UnitSystem } from './types.js';
import { input, joinList, makeStep } from './step.js';

const f2 = (n: number) => formatNumber(n, 'drag');
type TestSkids = Extract<DragInput, { source: 'test-skids' }>;

/**
 * Drag factor from test skids, with the grade they were run on taken off:
 * value = mean(f_i) − G_t.value/100, low = min(f_i) − G_t.high/100, high = max(f_i) − G_t.low/100,
 * where f_i = S_i² / (C d_i) (each test by its `value`). A low end that is not positive is a
 * failure (path `testGrade`): the tests' grade would leave no friction.
 */
export function testSkidsDrag(
  drag: TestSkids,
  system: UnitSystem,
): Outcome<{ f: Range; step: Step; source: string }> {
  const C = tradeConstants(system).slide;
  const u = unitsOf(system);
  const tests = drag.tests.map((t) => ({ S: spread(t.speed).value, d: spread(t.distance).value }));
  const G = spread(drag.testGrade ?? 0);
  const ratios = reduceRepeated(tests.map((t) => testSkidDrag(t.S, t.d, system)));
  const f: Range = {
    value: tests.reduce((a, t) => a + testSkidDrag(t.S, t.d, system, G.value), 0) / tests.length,
    low: tests.reduce((a, t) => Math.min(a, testSkidDrag(t.S, t.d, system, G.high)), Infinity),
    high: tests.reduce((a, t) => Math.max(a, testSkidDrag(t.S, t.d, system, G.low)), -Infinity),
  };
  const sloped = G.value !== 0 || G.low !== 0 || G.high !== 0;
  if (!(f.low > 0))
    return fail(
      `the test skids give ${f2(ratios.low)} at their lowest, and the ${formatNumber(G.high, 'percent')}% grade they were run on takes all of it: check the test grade`,
      'testGrade',
    );
  const count = `${tests.length} test skid${tests.length === 1 ? '' : 's'}`;
  const parts = tests.map(
    (t) => `${formatNumber(t.S, 'speed')}²/(${C} × ${formatNumber(t.d, 'length')})`,
  );
  const partsText = `mean(${joinList(parts, ', ')})`;
  const valuesText = `mean(${joinList(
    tests.map((t) => f2(testSkidDrag(t.S, t.d, system))),
    ', ',
  )})`;
  const gText = `${G.value < 0 ? '+' : '−'} ${formatNumber(Math.abs(G.value), 'percent')}/100`;
  return ok({
    f,
    source: sloped ? `${count} on a ${formatNumber(G.value, 'percent')}% grade` : count,
    step: makeStep({
      name: 'Drag factor from test skids',
      formula: sloped
        ? `f_i = S_i² / (${C} × d_i) − G_t/100; f = mean, range = smallest to largest`
        : `f_i = S_i² / (${C} × d_i); f = mean, range = smallest to largest`,
      substituted: sloped
        ? `f = ${partsText} ${gText} = ${f2(ratios.value)} ${gText} = ${f2(f.value)}`
        : `f = ${partsText} = ${valuesText} = ${f2(f.value)}`,
      inputs: {
        ...Object.fromEntries(
          tests.flatMap((t, i) => [
            [`S_${i + 1}`, { value: t.S, unit: u.speed }],
            [`d_${i + 1}`, { value: t.d, unit: u.length }],
          ]),
        ),
        ...(drag.testGrade !== undefined ? { G_t: input(G, '%', 'grade of the tests') } : {}),
      },
      result: f,
      unit: '',
      why: sloped
        ? `measured on scene by test skids at known speed; a test on a slope gives f + G_t/100, so the tests' ${formatNumber(G.value, 'percent')}% grade was taken off to give the level drag factor (the slide's own grade is applied after); the spread of the tests is the range`
        : `measured on scene by test skids at known speed, ${drag.testGrade === undefined ? 'taken as run level (no test grade recorded)' : 'run level'}; the spread of the tests is the range`,
    }),
  });
}
