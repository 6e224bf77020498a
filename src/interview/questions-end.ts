/** How a slide ended: at rest, or at an impact with or without an estimate of the speed there. */
import { RULES } from '../case/quantity.js';
import type { Answers, Question } from './types.js';
import { choiceQuestion, quantityQuestion, textQuestion } from './question-kinds.js';
import { choiceOf } from './answers-read.js';

/** The end questions of the slide under prefix `p` (`a0`). */
export function endQuestions(
  p: string,
  section: string,
  applies: (a: Answers) => boolean,
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
      ],
    ),
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
