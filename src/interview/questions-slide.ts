/** Questions of a slide (skid) analysis: marks, surfaces, segments, and how the slide ended. */
import { MAX_MARKS } from '../input/marks-line.js';
import { RULES } from '../case/quantity.js';
import type { Answers, Choice, Question } from './types.js';
import {
  choiceQuestion,
  countQuestion,
  customQuestion,
  marksQuestion,
  quantityQuestion,
  textQuestion,
} from './question-kinds.js';
import {
  slideInParts,
  choiceOf,
  countOf,
  markLook,
  MAX_SEGMENTS,
  segmentCount,
  surfaceMode,
} from './answers-read.js';
import { dragQuestions } from './questions-drag.js';
import { gradeQuestions } from './questions-grade.js';
import { testGradeQuestions } from './questions-test-grade.js';
import { quickFills, quickLineAtChoice } from './quick-fills.js';
import { endQuestions } from './questions-end.js';
import { timeDistanceQuestions } from './questions-extras.js';
// A cycle (build-case reads the questions), safe because it is only called at run time.
import { segmentsLine } from './build-parts.js';

const LENGTH = { kind: 'length' as const, rule: RULES.length, range: true };

/** The distance rules offered where there are several marks, each with a one-line why. */
export const DISTANCE_RULE_CHOICES: Choice[] = [
  {
    value: 'average',
    key: 'a',
    label: 'the average',
    hint: 'common practice: the mean of the marks, its range from their tolerances',
  },
  {
    value: 'longest',
    key: 'l',
    label: 'the longest mark',
    hint: 'some investigators prefer it; gives the highest distance',
  },
  {
    value: 'shortest',
    key: 's',
    label: 'the shortest mark',
    hint: 'the cautious choice for a minimum speed',
  },
  {
    value: 'spread',
    key: 'p',
    label: 'the spread of the marks',
    hint: "the average, its range from the shortest mark's low end to the longest mark's high end",
  },
];

/** What each rule will do, said after it is chosen. */
const DISTANCE_RULE_NOTES: Record<string, string> = {
  average: 'The average of the marks will be used (common practice).',
  longest:
    'The longest mark will be used; the report records that the average is the common practice.',
  shortest: 'The shortest mark will be used: the cautious choice for a minimum speed.',
  spread:
    "The average of the marks will be the distance, and its range will run from the shortest mark's low end to the longest mark's high end, so the marks' disagreement shows in the result.",
};

/** Slide questions of analysis `i`, with segments expanded up to `segments` (the superset). */
export function slideQuestions(
  i: number,
  section: string,
  applies: (a: Answers) => boolean,
  segments: number,
  now: Answers,
): Question[] {
  const p = `a${i}`;
  const gap = (a: Answers) => markLook(a, i) === 'gap';
  const inParts = (a: Answers) => slideInParts(a, i);
  const marksAsked = (a: Answers) => applies(a) && !gap(a) && surfaceMode(a, i) !== undefined;
  const count = (a: Answers) => countOf(a, `${p}.count`);
  const out: Question[] = [
    choiceQuestion(
      {
        id: `${p}.surfaces`,
        section,
        title: 'Surfaces',
        prompt:
          'Did the vehicle slide over one surface, or over several (or over marked parts with gaps)?',
        help: {
          why: 'Each surface (asphalt, then gravel, then grass) has its own drag factor and grade, so each is a separate segment. Skid parts broken by long gaps are also entered one segment per marked part.',
          how: 'One line enters every segment at once: length @drag grade%, e.g. 48 @0.74 +2%, 31 @0.55, 22 @0.40 -3%.',
        },
        appliesWhen: applies,
        defaultText: (a) => (gap(a) ? 'several' : 'one'),
      },
      [
        ...(gap(now) ? [] : [{ value: 'one', key: 'o', label: 'one surface' }]),
        {
          value: 'several',
          key: 's',
          label: gap(now) ? 'the marked parts, one at a time' : 'several segments, one at a time',
        },
        {
          value: 'quick',
          key: 'q',
          label: gap(now) ? 'the marked parts on one line' : 'several segments on one line',
        },
      ],
      'choice',
      // The segments' line typed straight here is the quick choice with its line answered.
      (text, ctx) => quickLineAtChoice(text, ctx, p),
    ),
    countQuestion(
      {
        id: `${p}.count`,
        section,
        title: 'Number of marks',
        prompt: inParts(now)
          ? 'How many tire marks did you measure? (optional: the segments give the distance)'
          : 'How many tire marks did you measure?',
        help: {
          why: 'Each tire leaves its own mark; the slide distance comes from all of them. With several segments the marks only cross-check the segment lengths, so they may be skipped.',
          how: 'Count the separate marks; a car braking on all four wheels can leave up to four.',
        },
        appliesWhen: marksAsked,
        optional: inParts(now),
        example: '4',
      },
      'marks',
      1,
      MAX_MARKS,
    ),
    marksQuestion(
      {
        id: `${p}.marks`,
        section,
        title: 'Mark lengths',
        prompt: 'Length of each mark, on one line (or 4 x 80.5 when all are equal)',
        help: {
          why: 'The slide distance is taken from these lengths.',
          how: 'Measure each mark from where it starts to where that tire came to rest (or left the surface, or the point of impact). For marks with short regular gaps (a bouncing tire), measure the whole length, gaps included (common practice). Add a tolerance to all with +/- (e.g. 94 92 95 93 +/- 1).',
        },
        appliesWhen: (a) => marksAsked(a) && count(a) !== undefined,
        example: '94 92 95 93',
        metricExample: '28.6 28.1 29.0 28.4',
      },
      count,
    ),
    choiceQuestion(
      {
        id: `${p}.rule`,
        section,
        title: 'Distance rule',
        prompt: 'Which slide distance should the marks give?',
        help: {
          why: 'Common practice takes the average of the measured lengths. The shortest mark is the cautious choice for a minimum; the spread lets the marks disagreeing show in the range. The choice is recorded in the report.',
        },
        appliesWhen: (a) => marksAsked(a) && (count(a) ?? 0) > 1,
        defaultText: () => 'average',
        explainChoice: (a) => DISTANCE_RULE_NOTES[choiceOf(a, `${p}.rule`) ?? 'average'],
      },
      DISTANCE_RULE_CHOICES,
    ),
    countQuestion(
      {
        id: `${p}.segcount`,
        section,
        title: 'Number of segments',
        prompt: 'How many segments, in order of travel?',
        help: {
          why: 'Each segment is entered with its own length, drag factor and grade.',
          how: 'For skid marks broken by long gaps, count only the marked parts: the gaps were not braking and are left out (common practice).',
        },
        appliesWhen: (a) => applies(a) && surfaceMode(a, i) === 'several',
        example: '2',
      },
      'segments',
      1,
      MAX_SEGMENTS,
    ),
    customQuestion(
      {
        id: `${p}.quick`,
        section,
        title: 'Segments on one line',
        prompt:
          'Each segment as length @drag grade%, separated by commas (grade: + uphill, - downhill, none if level)',
        help: {
          why: 'Enters every segment at once; each one can be checked or changed afterwards, question by question.',
          how: 'e.g. 48 @0.74 +2%, 31 @0.55, 22 @0.40-0.50 -3%. A drag factor range is written low-high.',
        },
        appliesWhen: (a) => applies(a) && surfaceMode(a, i) === 'quick',
        defaultText: (_a, r) => segmentsLine(r, i),
        example: '48 @0.74 +2%, 31 @0.55, 22 @0.40 -3%',
        metricExample: '15 @0.74 +2%, 9.5 @0.55, 6.7 @0.40 -3%',
      },
      'segments',
      (text, ctx) => quickFills(text, ctx, p),
    ),
  ];
  for (let j = 0; j < segments; j++) {
    const sp = `${p}.seg${j}`;
    const here = (a: Answers) => applies(a) && j < segmentCount(a, i);
    const several = (a: Answers) => here(a) && inParts(a);
    const what = inParts(now) ? `segment ${j + 1}` : 'the slide';
    out.push(
      quantityQuestion(
        {
          id: `${sp}.length`,
          section,
          title: `Length, segment ${j + 1}`,
          prompt: `Length of segment ${j + 1}`,
          help: {
            why: 'The slide distance is the sum of the segments.',
            how: 'Measure along the marks, from where this surface starts to where it ends.',
          },
          appliesWhen: several,
          example: '48',
          metricExample: '15',
        },
        LENGTH,
      ),
      textQuestion({
        id: `${sp}.label`,
        section,
        title: inParts(now) ? `Label, segment ${j + 1}` : 'Surface label',
        prompt: inParts(now)
          ? `A name for segment ${j + 1} (e.g. asphalt lane, gravel shoulder)`
          : 'A name for the surface slid over (e.g. asphalt lane)',
        help: { why: 'Names the surface in the chain and the report.' },
        appliesWhen: here,
        optional: true,
      }),
      ...dragQuestions(sp, section, what, here),
      ...gradeQuestions(sp, section, what, here),
      // After the segment's grade, so "the same stretch" can name the grade it shares.
      ...testGradeQuestions(
        sp,
        section,
        what,
        (a) => here(a) && choiceOf(a, `${sp}.drag.source`) === 'test-skids',
      ),
    );
  }
  out.push(
    ...endQuestions(p, section, applies, now),
    ...timeDistanceQuestions(p, section, applies),
  );
  return out;
}
