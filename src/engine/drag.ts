import { spread } from './spread.js';
import type { DragInput } from './input.js';
import { formatNumber } from './number-text.js';
import { dragTableRow } from './drag-table.js';
import { testSkidsDrag } from './drag-tests.js';
import { reduceRepeated } from './reduce.js';
import { ok, type Outcome, type Range, type Step, type UnitSystem } from './types.js';
import { input, joinList, makeStep } from './step.js';

export interface Drag {
  f: Range;
  step: Step;
  /** Where f came from, in words for the report ("3 test skids", "table: asphalt-dry"). */
  source: string;
  /** Cautions that go with this way of getting f. */
  notes: string[];
}

const f2 = (n: number) => formatNumber(n, 'drag');

function fixedRange(d: { value: number; low?: number; high?: number }): Range {
  return { value: d.value, low: d.low ?? d.value, high: d.high ?? d.value };
}

/**
 * The drag factor f of a surface as a decimal of g, with its range.
 * - `entered` / `table`: value, low, high (a missing end is the value). A table value is a guide.
 * - `test-skids`: f_i = S_i² / (C d_i) less the tests' own grade (see testSkidsDrag); value = mean,
 *   low/high = smallest/largest f_i.
 * - `sled`: f_i = pull_i / weight, same reduction. `decelerometer`: readings in g, same reduction.
 * Each test, pull and reading enters by its `value`.
 * @example dragFactor({ source: 'entered', value: 0.7, low: 0.65, high: 0.75 }, 'imperial') // f 0.70 (0.65 to 0.75)
 */
export function dragFactor(drag: DragInput, system: UnitSystem): Outcome<Drag> {
  const notes: string[] = [];
  if (drag.source === 'entered' || drag.source === 'table') {
    const f = fixedRange(drag);
    const isTable = drag.source === 'table';
    const surface = isTable ? (drag.surface ?? 'a surface not named') : '';
    const row = isTable && drag.surface ? dragTableRow(drag.surface) : undefined;
    const source = isTable ? `table: ${surface}${drag.band ? `, ${drag.band}` : ''}` : 'entered';
    if (isTable)
      notes.push(
        `The drag factor ${f2(f.value)} is a guide from a reference table, not a measurement of this surface${row ? `; source: ${row.source}` : ''}.`,
      );
    return ok({
      f,
      source,
      notes,
      step: makeStep({
        name: 'Drag factor',
        formula: isTable ? 'f = chosen from the reference table' : 'f = entered',
        substituted: `f = ${f2(f.value)}`,
        inputs: { f: input(f, '', drag.note ?? source) },
        result: f,
        unit: '',
        why: isTable
          ? `chosen from a table of typical ranges for ${surface}: a guide, not a measurement`
          : drag.note
            ? `entered: ${drag.note}`
            : 'entered by the investigator',
      }),
    });
  }
  if (drag.source === 'test-skids') {
    const t = testSkidsDrag(drag, system);
    if (!t.ok) return t;
    notes.push(
      'A test skid at a lower speed than the crash tends to give a slightly higher drag factor (common practice).',
    );
    return ok({ ...t.value, notes });
  }
  if (drag.source === 'sled') {
    const W = spread(drag.weight).value;
    const pulls = drag.pulls.map((p) => spread(p).value);
    const fs = pulls.map((p) => p / W);
    const f = reduceRepeated(fs);
    return ok({
      f,
      source: `drag sled, ${pulls.length} pull${pulls.length === 1 ? '' : 's'}`,
      notes,
      step: makeStep({
        name: 'Drag factor from a drag sled',
        formula: 'f_i = pull_i / weight; f = mean, range = smallest to largest',
        substituted: `f = mean(${joinList(
          pulls.map((p) => `${formatNumber(p, 'ratio')}/${formatNumber(W, 'ratio')}`),
          ', ',
        )}) = ${f2(f.value)}`,
        inputs: {
          weight: { value: W, unit: '' },
          ...Object.fromEntries(pulls.map((p, i) => [`pull_${i + 1}`, { value: p, unit: '' }])),
        },
        result: f,
        unit: '',
        why: 'measured on scene with a drag sled; the spread of the pulls is the range',
      }),
    });
  }
  const readings = drag.readings.map((r) => spread(r).value);
  const f = reduceRepeated(readings);
  return ok({
    f,
    source: `decelerometer, ${readings.length} reading${readings.length === 1 ? '' : 's'}`,
    notes,
    step: makeStep({
      name: 'Drag factor from a decelerometer',
      formula: 'f = mean of readings (in g), range = smallest to largest',
      substituted: `f = mean(${joinList(readings.map(f2), ', ')}) = ${f2(f.value)}`,
      inputs: Object.fromEntries(
        readings.map((r, i) => [`reading_${i + 1}`, { value: r, unit: 'g' }]),
      ),
      result: f,
      unit: '',
      why: 'measured on scene with a decelerometer; the spread of the readings is the range',
    }),
  });
}
