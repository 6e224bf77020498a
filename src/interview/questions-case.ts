/** Questions about the case itself: details, unit system, posted limit. */
import { RULES } from '../case/quantity.js';
import type { Question } from './types.js';
import { choiceQuestion, quantityQuestion, textQuestion } from './question-kinds.js';
import { unitsOf } from './answers-read.js';
import { showNumber } from '../input/index.js';

const always = () => true;
const S = 'Case';

const detail = (key: string, title: string, prompt: string, why: string): Question =>
  textQuestion({
    id: `details.${key}`,
    section: S,
    title,
    prompt,
    help: { why },
    appliesWhen: always,
    optional: true,
  });

/** The case questions, in the order asked. */
export function caseQuestions(): Question[] {
  return [
    detail(
      'reference',
      'Reference',
      'Case or report reference',
      'Ties this calculation to the agency file it belongs to.',
    ),
    detail(
      'occurred',
      'Date and time',
      'When did the crash happen?',
      'Recorded for the report; the surface and light conditions depend on it.',
    ),
    detail(
      'location',
      'Location',
      'Where did it happen? (road, direction, nearest landmark)',
      'Recorded for the report, so that others can find the marks.',
    ),
    detail(
      'investigator',
      'Investigator',
      'Who measured the marks?',
      'A figure offered later must name who took the measurements.',
    ),
    detail(
      'notes',
      'Notes',
      'Anything else worth recording (weather, surface, light)?',
      'Conditions on scene bear on the drag factor; note them while you remember.',
    ),
    choiceQuestion(
      {
        id: 'units',
        section: S,
        title: 'Units',
        prompt: 'Which units were the measurements taken in?',
        help: {
          why: 'Every length and speed in the case is in one system. You may still type another unit on any answer (24.4 m, 80 ft): it is converted and you are told.',
        },
        appliesWhen: always,
        defaultText: () => 'imperial',
      },
      [
        { value: 'imperial', key: 'f', label: 'feet and mph' },
        { value: 'metric', key: 'm', label: 'metres and km/h' },
      ],
    ),
    quantityQuestion(
      {
        id: 'limit',
        section: S,
        title: 'Posted limit',
        prompt: 'Posted speed limit where the marks are (skip if none or not known)',
        help: {
          why: 'The minimum speed is compared with the limit. That comparison is a fact for the report, not a finding of fault.',
        },
        appliesWhen: always,
        optional: true,
        example: '45',
        metricExample: '50',
        explainChoice: (a) => {
          const v = a.limit?.value;
          const unit = unitsOf(a) === 'metric' ? 'km/h' : 'mph';
          return typeof v === 'number'
            ? `Speeds will be compared with ${showNumber(v)} ${unit}.`
            : undefined;
        },
      },
      { kind: 'speed', rule: RULES.postedLimit, range: false },
    ),
  ];
}
