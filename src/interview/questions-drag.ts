/** Questions for one drag factor: where it comes from, then the figures for that source. */
import { RULES } from '../case/quantity.js';
import type { Answers, Choice, Question } from './types.js';
import {
  choiceQuestion,
  customQuestion,
  listQuestion,
  quantityQuestion,
  textQuestion,
} from './question-kinds.js';
import { choiceOf } from './answers-read.js';
import { readTestSkids, testsReadAs } from './read-list.js';
import {
  defaultDragText,
  OTHER_SURFACE,
  rangesLine,
  SURFACE_CHOICES,
  surfaceRow,
} from './drag-table.js';
import { measuredDragLine } from './drag-line.js';

export const DRAG_SOURCES: Choice[] = [
  { value: 'test-skids', key: 'k', label: 'test skids at the scene' },
  { value: 'sled', key: 's', label: 'drag sled pulls' },
  { value: 'decelerometer', key: 'd', label: 'decelerometer readings' },
  { value: 'table', key: 't', label: 'reference table by surface (a guide, not a measurement)' },
  { value: 'entered', key: 'e', label: 'a value I enter, with its range' },
];

/** How to give the drag factor's value, for each source that asks it. */
const VALUE_HOW = {
  table:
    'From the table, choose the band for the speed in question and narrow the range only with a reason you can state.',
  entered:
    'Type the figure you have with the range it carries, e.g. 0.72 (0.65-0.80) or 0.70 ± 0.05: a figure your agency uses, or one from a source you can name. Say where it comes from in the case notes, since the report names the source as entered. Drag factors worked out from test skids go under test skids instead, where the grade of the tests is asked.',
} as const;

/**
 * The drag questions under `prefix` (`a0.seg1` or `a2`), applying when `applies` does.
 * `what` names the surface in prompts ("segment 2", "the yaw marks").
 */
export function dragQuestions(
  prefix: string,
  section: string,
  what: string,
  applies: (a: Answers) => boolean,
): Question[] {
  const p = `${prefix}.drag`;
  const source = (a: Answers) => choiceOf(a, `${p}.source`);
  const when =
    (...s: string[]) =>
    (a: Answers) =>
      applies(a) && s.includes(source(a) ?? '');
  const base = (id: string, title: string, prompt: string) => ({
    id: `${p}.${id}`,
    section,
    title: `${title}, ${what}`,
    prompt,
  });
  return [
    choiceQuestion(
      {
        ...base(
          'source',
          'Drag factor source',
          `Where does the drag factor for ${what} come from?`,
        ),
        help: {
          why: 'The drag factor f is the deceleration as a fraction of g. It moves the speed more than any other input, so its source is recorded and shown.',
          how: 'Best first: test skids with a similar vehicle, a drag sled, a decelerometer; the reference table last, when nothing was measured.',
        },
        appliesWhen: applies,
        explainChoice: (a) =>
          source(a) === 'table'
            ? 'A table range is a guide compiled from old tests, not a measurement: you will pick the value and its range.'
            : undefined,
      },
      DRAG_SOURCES,
    ),
    choiceQuestion(
      {
        ...base('surface', 'Surface', `Which surface best describes ${what}?`),
        help: {
          why: 'The table gives typical ranges by surface and by speed band (under or over 30 mph, about 48 km/h).',
          how: 'Concrete in good condition gives the highest drag factor; the more slick the surface, the lower (common practice).',
        },
        appliesWhen: when('table'),
      },
      SURFACE_CHOICES,
    ),
    textQuestion({
      ...base('surfaceName', 'Surface name', 'Name the surface (recorded for the report)'),
      help: { why: 'Without a table row, the report still needs to say what the vehicle slid on.' },
      appliesWhen: (a) => when('table')(a) && choiceOf(a, `${p}.surface`) === OTHER_SURFACE,
    }),
    // One value question per source, so each has its own "how" (the list keeps the one that
    // applies: a question id appears once).
    ...(['table', 'entered'] as const).map((src) =>
      quantityQuestion(
        {
          ...base(
            'value',
            'Drag factor',
            `Drag factor for ${what}: a range, or a value with its range such as 0.72 (0.65-0.80)`,
          ),
          help: {
            why: 'The low and high ends of the range give the low and high ends of the speed.',
            how: VALUE_HOW[src],
          },
          appliesWhen: when(src),
          defaultText: (a) => {
            const row = surfaceRow(choiceOf(a, `${p}.surface`));
            return src === 'table' && row ? defaultDragText(row) : undefined;
          },
          explainChoice: (a) => {
            const row = surfaceRow(choiceOf(a, `${p}.surface`));
            return src === 'table' && row
              ? `Table range for ${row.surface}: ${rangesLine(row)}; a guide, not a measurement (${row.source}).`
              : undefined;
          },
          example: '0.65-0.80',
        },
        { kind: 'factor', rule: RULES.drag, range: true },
      ),
    ),
    customQuestion(
      {
        ...base(
          'tests',
          'Test skids',
          `Test skids for ${what}: each test as speed/distance, separated by commas (a unit may follow a number: 50 km/h / 14 m); or the drag factors already worked out from the tests (0.68, 0.71, 0.70), which are taken as worked out on the test stretch, its grade still in them, unless you say they are level-ground (asked when the tests ran on a slope)`,
        ),
        help: {
          why: 'Each test gives f = S² / (30 d) (mph, ft) or S² / (254 d) (km/h, m); several tests show the spread.',
          how: 'Skid a similar vehicle at a known speed on the same surface and measure the skid. A test at low speed tends to give a slightly higher f than at crash speed (common practice). Factors you worked out already go in as they are, with no slash: their mean is the drag factor, the smallest to largest its range.',
        },
        appliesWhen: when('test-skids'),
        explainChoice: (a, r) => {
          const read = testsReadAs(a[`${p}.tests`]?.value);
          const line = measuredDragLine(r, prefix);
          return read
            ? `${read[0]!.toUpperCase()}${read.slice(1)}.${line ? ` ${line}` : ''}`
            : line;
        },
        example: '30/42, 35/57.5',
        metricExample: '50/13, 55/16',
      },
      'list',
      (text, ctx) =>
        readTestSkids(text, ctx.units, {
          speed: RULES.testSpeed,
          distance: RULES.length,
          factor: RULES.testFactor,
        }),
    ),
    quantityQuestion(
      {
        ...base(
          'weight',
          'Sled weight',
          'Weight of the drag sled (a plain number, or typed with lb, kg or N)',
        ),
        help: {
          why: 'f = pull / weight, so only the ratio matters.',
          how: 'Weigh the sled with its tire section.',
        },
        appliesWhen: when('sled'),
        example: '75',
      },
      { kind: 'weight', rule: RULES.sledWeight, range: false },
    ),
    listQuestion(
      {
        ...base('pulls', 'Sled pulls', 'Pull readings, in the same unit as the weight'),
        help: {
          why: 'Each pull gives one drag factor; their spread is the range.',
          how: 'Pull steadily, parallel to the surface, and read the scale while the sled slides.',
        },
        appliesWhen: when('sled'),
        example: '52 54 51',
        explainChoice: (_a, r) => measuredDragLine(r, prefix),
      },
      { kind: 'force', rule: RULES.sledPull, range: false },
      'pull',
    ),
    listQuestion(
      {
        ...base('readings', 'Decelerometer', 'Decelerometer readings, in g'),
        help: {
          why: 'A reading in g is the drag factor itself; several readings show the spread.',
          how: 'Take them from skid tests with the meter fixed level in the test vehicle.',
        },
        appliesWhen: when('decelerometer'),
        explainChoice: (_a, r) => measuredDragLine(r, prefix),
        example: '0.71 0.69 0.73',
      },
      { kind: 'factor', rule: RULES.decel, range: false },
      'reading',
    ),
  ];
}
