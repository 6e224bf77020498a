/**
 * How a slide ended: at rest, at an impact with or without an estimate of the speed there, or
 * running on into the marks of another analysis (a phase of the same case).
 */
import { RULES } from '../case/quantity.js';
import type { Answers, AnswerContext, Choice, ParseResult, Question } from './types.js';
import { choiceQuestion, quantityQuestion, textQuestion } from './question-kinds.js';
import { analysisCount, choiceOf, endsInto, MAX_ANALYSES } from './answers-read.js';

/** Analysis `k` named for a message: "analysis 2 (first arc)". */
function named(a: Answers, k: number): string {
  const label = a[`a${k}.label`]?.text;
  return `analysis ${k + 1}${label ? ` (${label})` : ''}`;
}

/**
 * The loop that slide `i` running into `target` would close, as "analysis 1 → analysis 2 →
 * analysis 1", or undefined when the chain from `target` never comes back to `i`.
 */
export function chainLoop(a: Answers, i: number, target: number): string | undefined {
  const path = [i, target];
  for (let k: number | undefined = target; k !== undefined; k = endsInto(a, k)) {
    if (k === i) return path.map((x) => named(a, x)).join(' → ');
    if (path.indexOf(k) !== path.lastIndexOf(k)) return undefined; // a loop elsewhere
    const next = endsInto(a, k);
    if (next !== undefined) path.push(next);
  }
  return undefined;
}

/** The analyses slide `i` may run on into: those in play but itself, and the next one to enter. */
function intoChoices(a: Answers, i: number): Choice[] {
  const n = analysisCount(a);
  const out: Choice[] = [];
  for (let k = 0; k < Math.min(n + 1, MAX_ANALYSES); k++) {
    if (k === i) continue;
    const label = a[`a${k}.label`]?.text;
    const look = choiceOf(a, `a${k}.look`);
    out.push({
      value: String(k + 1),
      key: String(k + 1),
      label:
        k >= n
          ? `analysis ${k + 1}, the next one (to be entered after this one)`
          : `analysis ${k + 1}${look ? `, ${look === 'airborne' ? 'airborne' : look === 'yaw' ? 'yaw' : 'slide'}` : ''}${label ? `, ${label}` : ''}`,
    });
  }
  return out;
}

/** The end questions of the slide under prefix `p` (`a0`). */
export function endQuestions(
  p: string,
  section: string,
  applies: (a: Answers) => boolean,
  now: Answers = {},
): Question[] {
  const end = (a: Answers) => choiceOf(a, `${p}.end`);
  return [
    choiceQuestion(
      {
        id: `${p}.end`,
        section,
        title: 'End of the slide',
        prompt: 'How did the slide end?',
        help: {
          why: 'If the vehicle was still moving at the end of the marks, its speed there adds to the start speed. Without an estimate, the slide-to-stop figure is a minimum: energy taken by the impact is not counted.',
        },
        appliesWhen: applies,
        defaultText: () => 'rest',
        explainChoice: (a) =>
          ({
            rest: 'The slide is worked back from rest: end speed 0.',
            speed:
              'The estimated end speed is added: S_start² = S_end² + the speed the slide took off.',
            struck:
              'Worked back from 0 as if to rest: the figure is a minimum, since the energy taken by the impact is not counted.',
            next: "The speed at the end of these marks is the speed where the next marks begin (that analysis's figure, with its range): S_start² = S_next² + the speed the slide took off.",
          })[end(a) ?? ''],
      },
      [
        { value: 'rest', key: 'r', label: 'came to rest at the end of the marks' },
        { value: 'speed', key: 's', label: 'struck something; the speed at impact is estimated' },
        {
          value: 'struck',
          key: 'n',
          label: 'struck something; no estimate (the figure is a minimum)',
        },
        {
          value: 'next',
          key: 'o',
          label: 'the vehicle went on into the next set of marks (yaw, another slide, or a flight)',
        },
      ],
    ),
    intoQuestion(Number(p.slice(1)), section, (a) => applies(a) && end(a) === 'next', now),
    quantityQuestion(
      {
        id: `${p}.end.speed`,
        section,
        title: 'Speed at the end',
        prompt: 'Estimated speed at the end of the marks (a range is allowed)',
        help: {
          why: 'S_start² = S_end² + 30 d (f n + G).',
          how: 'From a momentum or crush analysis done separately.',
        },
        appliesWhen: (a) => applies(a) && end(a) === 'speed',
        example: '20-25',
        metricExample: '30-40',
      },
      { kind: 'speed', rule: RULES.speed, range: true },
    ),
    textQuestion({
      id: `${p}.end.basis`,
      section,
      title: 'Basis of end speed',
      prompt: 'Where does that estimate come from?',
      help: {
        why: 'The report prints it beside the end speed; an estimate without its source is hard to defend.',
      },
      appliesWhen: (a) => applies(a) && end(a) === 'speed',
      optional: true,
    }),
  ];
}

/**
 * Which analysis the slide ran on into, among those of `now` (the answers the list is made
 * from); a choice that would close a loop is refused, naming the loop.
 */
function intoQuestion(
  i: number,
  section: string,
  applies: (a: Answers) => boolean,
  now: Answers,
): Question {
  const q = choiceQuestion(
    {
      id: `a${i}.end.into`,
      section,
      title: 'Marks it ran into',
      prompt: 'Which analysis holds the marks the vehicle went on into?',
      help: {
        why: 'The speed where those marks begin is the speed at the end of these: the two figures are chained, and the review shows the phases in order of travel.',
        how: 'Pick an analysis already entered, or the next one, and enter its marks after this one. A slide cannot run into itself, nor into marks that lead back to it.',
      },
      appliesWhen: applies,
      defaultText: (a) =>
        i + 1 < MAX_ANALYSES && i + 1 >= analysisCount(a) ? String(i + 2) : undefined,
    },
    intoChoices(now, i),
  );
  const parse = (text: string, ctx: AnswerContext): ParseResult => {
    const r = q.parse(text, ctx);
    if (!r.ok) return r;
    const loop = chainLoop(ctx.answers, i, Number(r.value) - 1);
    return loop
      ? {
          ok: false,
          message: `the phases would loop back on themselves (${loop}): a slide cannot run on into marks that lead back to it; pick another analysis, or change how that one ends`,
        }
      : r;
  };
  return {
    ...q,
    parse,
    validate: (text, ctx) => {
      const r = parse(text, ctx);
      return r.ok ? undefined : r.message;
    },
  };
}
