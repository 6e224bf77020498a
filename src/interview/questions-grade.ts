/**
 * Slopes asked as a direction and a positive percent, so that the sign can never be wrong; the
 * case stores them signed (grade + uphill in the direction of travel; bank + toward the centre).
 */
import { RULES } from '../case/quantity.js';
import type { AnswerContext, Answers, ParseResult, Question } from './types.js';
import { choiceQuestion, quantityQuestion } from './question-kinds.js';
import { choiceOf } from './answers-read.js';
import { steepDownhillNote } from './grade-check.js';

const PERCENT = { what: 'percent', gt: 0, lt: 100 };

/** The direction of a grade, along the direction of travel (or of the tests). */
export const SLOPE_CHOICES = [
  { value: 'level', key: 'l', label: 'level' },
  { value: 'uphill', key: 'u', label: 'uphill' },
  { value: 'downhill', key: 'd', label: 'downhill' },
];

/** True when the direction question `dir` was answered uphill or downhill: its percent is asked. */
export const sloped = (a: Answers, dir: string): boolean =>
  choiceOf(a, dir) === 'uphill' || choiceOf(a, dir) === 'downhill';

export function gradeQuestions(
  prefix: string,
  section: string,
  what: string,
  applies: (a: Answers) => boolean,
): Question[] {
  const dir = `${prefix}.grade.dir`;
  const pct = quantityQuestion(
    {
      id: `${prefix}.grade.pct`,
      section,
      title: `Grade percent, ${what}`,
      prompt: `How steep, in percent? (a positive number; the direction was given above)`,
      help: {
        why: 'Stored signed in the case: + uphill, - downhill.',
        how: 'e.g. 3, or 2.5-3.5 when the slope varies.',
      },
      appliesWhen: (a) => applies(a) && sloped(a, dir),
      example: '3',
    },
    {
      kind: 'percent',
      rule: { ...PERCENT, what: 'grade' },
      range: true,
      noMinus: 'choose uphill or downhill above instead of typing a sign',
    },
    undefined,
    (value, ctx) => steepDownhillNote(prefix, value, ctx),
  );
  return [
    choiceQuestion(
      {
        id: dir,
        section,
        title: `Grade, ${what}`,
        prompt: `Along ${what}, in the direction the vehicle travelled, the road goes:`,
        help: {
          why: 'Sliding uphill, gravity helps slow the vehicle; downhill it works against the brakes. The grade is added to the braking friction: f·n + G.',
          how: 'Measure the slope along the marks with a level or an inclinometer, in percent (rise over run × 100). The percent may be typed here with its sign: -3 is downhill 3%, +2 uphill 2%.',
        },
        appliesWhen: applies,
        defaultText: () => 'level',
        example: '-3 for downhill 3%',
      },
      SLOPE_CHOICES,
      'choice',
      (text, ctx) => signedGrade(text, pct, ctx),
    ),
    pct,
  ];
}

/**
 * A grade typed with its sign at the direction question: `-3` is downhill 3%, `+2.5` uphill
 * 2.5%, `0` level. The percent is read by the percent question itself (a fill), so it is checked
 * and stored exactly as if it were typed there. Undefined when the text is no number.
 */
function signedGrade(text: string, pct: Question, ctx: AnswerContext): ParseResult | undefined {
  const m = /^\s*([+\-−]?)\s*(\d.*)$/.exec(text);
  if (!m) return undefined;
  const sign = m[1]!;
  const rest = m[2]!.trim();
  if (/^0+(?:[.,]0*)?\s*%?$/.test(rest)) return { ok: true, value: 'level' };
  if (!sign)
    return {
      ok: false,
      message: `grade: give the sign with the number (+${rest} uphill, -${rest} downhill), or pick a direction`,
    };
  const r = pct.parse(rest, ctx);
  if (!r.ok) return r;
  const value = sign === '+' ? 'uphill' : 'downhill';
  return {
    ok: true,
    value,
    fills: { [pct.id]: { text: rest, value: r.value } },
    notice: [`Read as ${value} ${rest.replace(/\s*%$/, '')}%.`, r.notice].filter(Boolean).join(' '),
  };
}

export function bankQuestions(
  prefix: string,
  section: string,
  applies: (a: Answers) => boolean,
): Question[] {
  const dir = `${prefix}.bank.dir`;
  return [
    choiceQuestion(
      {
        id: dir,
        section,
        title: 'Bank',
        prompt: 'Across the road where the marks curve, the surface tilts:',
        help: {
          why: 'A road banked toward the centre of the curve (superelevation) lets a vehicle take it faster; banked away, slower. S = sqrt(K R (f + e) / (1 - f e)), K = 15 (mph, ft) or 127 (km/h, m).',
          how: "Measure the cross slope at the chord's midpoint, at right angles to the road, in percent.",
        },
        appliesWhen: applies,
        defaultText: () => 'none',
      },
      [
        { value: 'none', key: 'n', label: 'flat (no bank)' },
        { value: 'toward', key: 't', label: 'toward the centre of the curve' },
        { value: 'away', key: 'a', label: 'away from the centre of the curve' },
      ],
    ),
    quantityQuestion(
      {
        id: `${prefix}.bank.pct`,
        section,
        title: 'Bank percent',
        prompt: 'How much, in percent? (a positive number; the direction was given above)',
        help: {
          why: 'Stored signed in the case as superelevation: + toward the centre, - away.',
          how: 'e.g. 2, or 1.5-2.5.',
        },
        appliesWhen: (a) =>
          applies(a) && (choiceOf(a, dir) === 'toward' || choiceOf(a, dir) === 'away'),
        example: '2',
      },
      {
        kind: 'percent',
        rule: { ...RULES.superelevation, ...PERCENT, what: 'superelevation' },
        range: true,
        noMinus: 'choose toward or away from the centre above instead of typing a sign',
      },
    ),
  ];
}
