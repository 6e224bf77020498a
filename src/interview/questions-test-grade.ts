/**
 * Where the test skids were run. A test skid with every wheel locked on a grade G_t gives
 * S²/(C d) = f + G_t/100 (the work of friction and of gravity along the slope), so the grade of
 * the tests is recorded (`testGrade`) and taken off to give the level drag factor; the slide's own
 * grade is applied after it. Tests on the slide's own stretch, in its direction, have the
 * segment's grade: with every wheel braking the two cancel, and the effective drag is the test
 * ratio itself.
 */
import type { Answers, Question } from './types.js';
import { choiceQuestion, quantityQuestion } from './question-kinds.js';
import { choiceOf, factorsLevel, isSegment, testsAsFactors, testWhere } from './answers-read.js';
import { SLOPE_CHOICES, sloped } from './questions-grade.js';
import { measuredDragLine } from './drag-line.js';

/** The segment's grade as answered, in words: "level", "3% downhill". */
function gradeWords(a: Answers, prefix: string): string {
  const dir = choiceOf(a, `${prefix}.grade.dir`);
  const pct = a[`${prefix}.grade.pct`]?.text;
  return dir === 'uphill' || dir === 'downhill' ? `${pct ?? '?'}% ${dir}` : 'level';
}

/** What "same stretch" does with the grade, for the notice after the answer. */
function sameNote(a: Answers, prefix: string): string {
  const g = gradeWords(a, prefix);
  if (g === 'level')
    return 'The tests ran on this level stretch: the test ratio is the level drag factor.';
  const note = `The test ratio S²/(C d) already holds this stretch's ${g} grade: it is recorded as the tests' grade and taken off to give the level drag factor, and the segment's grade is applied once after it (with every wheel braking the two cancel).`;
  return testsAsFactors(a, prefix)
    ? `${note} Whether the factors you typed still hold it is asked next.`
    : note;
}

/**
 * The questions under test skids for drag prefix `prefix`, applying when `tests` does (the source
 * is test skids). `what` names the surface ("segment 2", "the yaw marks").
 */
export function testGradeQuestions(
  prefix: string,
  section: string,
  what: string,
  tests: (a: Answers) => boolean,
): Question[] {
  const p = `${prefix}.drag`;
  const segment = isSegment(prefix);
  const elsewhere = (a: Answers) => tests(a) && (!segment || testWhere(a, prefix) === 'elsewhere');
  const dir = `${p}.testGrade.dir`;
  // The tests ran on a slope: their own stretch's grade, or the grade answered for them.
  const testsSloped = (a: Answers) =>
    segment && testWhere(a, prefix) === 'same' ? sloped(a, `${prefix}.grade.dir`) : sloped(a, dir);
  return [
    choiceQuestion(
      {
        id: `${p}.testWhere`,
        section,
        title: `Where the tests ran, ${what}`,
        prompt: `Were the test skids run on the same stretch as ${what}, in the direction the vehicle slid?`,
        help: {
          why: "A test skid on a slope gives f + G/100, not f: on the slide's own stretch and direction the grade is already in the test, and taking it off again would count it twice.",
          how: 'Elsewhere (another stretch, or the other direction) the grade of the test stretch is asked next; level when none.',
        },
        appliesWhen: (a) => segment && tests(a),
        // Before an answer the highlighted choice (same stretch) is the one explained.
        explainChoice: (a) =>
          testWhere(a, prefix) === 'elsewhere'
            ? "The tests' own grade is asked next and taken off the test ratio to give the level drag factor."
            : sameNote(a, prefix),
      },
      [
        { value: 'same', key: 's', label: 'yes: same stretch, same direction' },
        { value: 'elsewhere', key: 'e', label: 'no: elsewhere, or the other direction' },
      ],
    ),
    choiceQuestion(
      {
        id: dir,
        section,
        title: `Grade of the tests, ${what}`,
        prompt: 'Where the test skids were run, in the direction they were run, the road goes:',
        help: {
          why: "The test ratio S²/(C d) is f + G/100 on a grade G: the tests' grade is taken off to give the level drag factor.",
          how: 'Measure the slope of the test stretch along the test skids, in percent (rise over run × 100).',
        },
        appliesWhen: elsewhere,
        defaultText: () => 'level',
      },
      SLOPE_CHOICES,
    ),
    quantityQuestion(
      {
        id: `${p}.testGrade.pct`,
        section,
        title: `Grade percent of the tests, ${what}`,
        prompt: 'How steep was the test stretch, in percent? (a positive number)',
        help: {
          why: 'Stored signed in the case as testGrade: + uphill, - downhill in the direction of the tests.',
          how: 'e.g. 3, or 2.5-3.5 when the slope varies.',
        },
        appliesWhen: (a) => elsewhere(a) && sloped(a, dir),
        example: '3',
      },
      {
        kind: 'percent',
        rule: { what: 'test grade', gt: 0, lt: 100 },
        range: true,
        noMinus: 'choose uphill or downhill above instead of typing a sign',
      },
    ),
    choiceQuestion(
      {
        id: `${p}.factorsGrade`,
        section,
        title: `Test factors and the grade, ${what}`,
        prompt:
          'The drag factors you typed: are they as worked out on the sloped test stretch (its grade still in them), or level-ground factors (the grade already taken out)?',
        help: {
          why: 'On a slope a test gives f + G/100. Worked out on the test stretch, the grade is still in the factors and is taken off once here; level-ground factors have it out already, and taking it off again would count it twice.',
          how: 'If you worked each out as S² / (C d) from the test, they hold the grade; if you took the grade off yourself, they are level-ground.',
        },
        appliesWhen: (a) => tests(a) && testsAsFactors(a, prefix) && testsSloped(a),
        explainChoice: (a, r) =>
          [
            factorsLevel(a, prefix)
              ? "Taken as level-ground factors: no grade is taken off them; the slide's own grade is applied after."
              : 'Taken as worked out on the test stretch: its grade is taken off once to give the level drag factor.',
            measuredDragLine(r, prefix),
          ]
            .filter(Boolean)
            .join(' '),
      },
      [
        {
          value: 'on-grade',
          key: 'g',
          label: 'worked out on the test stretch: its grade is still in them',
        },
        { value: 'level', key: 'l', label: 'level-ground: the grade was already taken out' },
      ],
    ),
  ];
}
