/**
 * Questions about the vehicle: its label (always), and its brakes (all working, an estimate, or
 * wheel by wheel), which only a slide needs: they are asked inside the first slide analysis.
 */
import { RULES } from '../case/quantity.js';
import type { Answers, Question } from './types.js';
import { choiceQuestion, quantityQuestion, textQuestion } from './question-kinds.js';
import { choiceOf } from './answers-read.js';
import { wheelsLine } from './brakes-line.js';
import { WHEELS } from './wheels.js';

const S = 'Vehicle';
const always = () => true;
type Applies = (a: Answers) => boolean;
const brakesAre = (mode: string, applies: Applies) => (a: Answers) =>
  applies(a) && choiceOf(a, 'vehicle.brakes') === mode;

function wheelQuestions(w: (typeof WHEELS)[number], section: string, applies: Applies): Question[] {
  const id = `vehicle.wheel.${w.id}`;
  return [
    choiceQuestion(
      {
        id,
        section,
        title: `Brake, ${w.label}`,
        prompt: `The ${w.label} wheel's brake, as found on inspection:`,
        help: {
          why: 'A wheel whose brake does not work makes no braking friction, so the vehicle slows less for the same marks.',
          how: 'From the vehicle inspection: a disconnected, leaking or seized brake does not work; a worn or contaminated one may work partly.',
        },
        appliesWhen: brakesAre('wheels', applies),
        defaultText: () => 'working',
        explainChoice: (_a, r) => wheelsLine(r),
      },
      [
        { value: 'working', key: 'w', label: 'working' },
        { value: 'none', key: 'n', label: 'not working' },
        { value: 'partly', key: 'p', label: 'partly working' },
      ],
    ),
    quantityQuestion(
      {
        id: `${id}.fraction`,
        section,
        title: `Braking share, ${w.label}`,
        prompt: `How much of a full brake does the ${w.label} wheel give? (0 to 1, a range is allowed)`,
        help: {
          why: 'A partly working brake is counted as that fraction of a full one.',
          how: "From brake testing or the inspector's estimate, e.g. 0.5 or 0.4-0.6.",
        },
        appliesWhen: (a) => brakesAre('wheels', applies)(a) && choiceOf(a, id) === 'partly',
        example: '0.5',
        explainChoice: (_a, r) => wheelsLine(r),
      },
      {
        kind: 'factor',
        rule: RULES.wheel,
        range: true,
        decimalNote: "a wheel's braking share is a decimal from 0 to 1, e.g. 0.5",
      },
    ),
  ];
}

/** The vehicle's own questions (its label), in the Vehicle section. */
export function vehicleQuestions(): Question[] {
  return [
    textQuestion({
      id: 'vehicle.label',
      section: S,
      title: 'Vehicle',
      prompt: 'Which vehicle left the marks? (e.g. Unit 1, grey hatchback)',
      help: { why: 'Names the vehicle in the report, so each figure is tied to one vehicle.' },
      appliesWhen: always,
      optional: true,
    }),
  ];
}

/**
 * The brake questions, asked where `applies` says: inside the first slide analysis, right after
 * the look of its marks, since only a slide's friction is scaled by the braking efficiency.
 */
export function brakeQuestions(section: string, applies: Applies): Question[] {
  return [
    choiceQuestion(
      {
        id: 'vehicle.brakes',
        section,
        title: 'Brakes',
        prompt: 'Were all four brakes working?',
        help: {
          why: 'Asked now because these marks are a slide: the braking efficiency n scales the friction in the slide formula (f × n), 1.0 when every wheel brakes fully. A failed brake lowers n and so the speed the marks imply. Yaw marks do not need it: they use the full sideways friction.',
          how: 'Asked once for the vehicle, for every slide of the case. Use the vehicle inspection. Without one, "all working" is the usual assumption, and it is recorded as such.',
        },
        appliesWhen: applies,
        defaultText: () => 'all',
        explainChoice: (a) =>
          ({
            all: 'Braking efficiency n = 1.00: every wheel braking fully.',
            estimate: 'You will give n directly, with the basis for it.',
            wheels:
              'n will be worked out from each wheel and the share of weight on the front axle.',
          })[choiceOf(a, 'vehicle.brakes') ?? ''],
      },
      [
        { value: 'all', key: 'a', label: 'all working' },
        { value: 'estimate', key: 'e', label: 'an estimate of the braking efficiency' },
        { value: 'wheels', key: 'w', label: 'wheel by wheel' },
      ],
    ),
    quantityQuestion(
      {
        id: 'vehicle.brakes.efficiency',
        section,
        title: 'Braking efficiency',
        prompt: 'Braking efficiency n, as a decimal (1.00 = all wheels fully; a range is allowed)',
        help: {
          why: 'n multiplies the drag factor in the slide formula.',
          how: 'e.g. 0.8, or 0.7-0.9 when unsure.',
        },
        appliesWhen: brakesAre('estimate', applies),
        example: '0.8',
      },
      {
        kind: 'factor',
        rule: RULES.efficiency,
        range: true,
        decimalNote: 'braking efficiency is a decimal from 0 to 1, e.g. 0.85',
      },
    ),
    textQuestion({
      id: 'vehicle.brakes.basis',
      section,
      title: 'Basis of estimate',
      prompt: 'What is the estimate based on?',
      help: {
        why: 'An estimate without its basis cannot be defended; the report prints it beside n.',
      },
      appliesWhen: brakesAre('estimate', applies),
      optional: true,
    }),
    quantityQuestion(
      {
        id: 'vehicle.share',
        section,
        title: 'Front axle share',
        prompt: "Share of the vehicle's weight on the front axle, 0 to 1",
        help: {
          why: 'Each wheel brakes in proportion to the weight it carries, so a failed front brake costs more than a failed rear one. Weight shifts forward under braking, so the static share overstates n when only the rear brakes work.',
          how: 'Best from weighing the vehicle or its specification. Front-engine cars typically carry about 0.55-0.65 on the front axle (common practice; from memory).',
        },
        appliesWhen: brakesAre('wheels', applies),
        defaultText: () => '0.55-0.65',
        example: '0.58',
      },
      {
        kind: 'factor',
        rule: RULES.share,
        range: true,
        decimalNote: 'the front axle share is a decimal from 0 to 1, e.g. 0.58',
      },
    ),
    ...WHEELS.flatMap((w) => wheelQuestions(w, section, applies)),
  ];
}
