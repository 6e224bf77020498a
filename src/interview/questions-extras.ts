/**
 * Optional questions that feed the extras: for a slide, a conflict point and a reaction time for
 * this case (the comparison at the posted limit, `timeDistance`); at the end of the case, a
 * distribution of speeds drawn from the inputs' ranges (`sampling`).
 */
import type { Answers, Question } from './types.js';
import { choiceQuestion, countQuestion, quantityQuestion } from './question-kinds.js';
import { choiceOf } from './answers-read.js';
import { reactionTimeSource } from '../extras/limit-inputs.js';
import { DEFAULT_SAMPLES, DEFAULT_SEED } from '../extras/sampling.js';
import { REACTION_TIME } from '../prefs/schema.js';
import { REACTION_TIMES as T } from '../engine/constants.js';

/** A posted limit was given: the time-distance comparison has something to compare with. */
export const hasLimit = (a: Answers): boolean => typeof a.limit?.value === 'number';

/** Bounds as the case file takes them (src/case/v1/extras-fields.ts). */
const CONFLICT = { what: 'conflict point', min: 0, max: 100_000 };
// The same bounds as the preference: a perception-reaction time under half a second is not credible
// for a driver (M. Green 2000: about 0.7 s even when fully expected; docs/physics.md).
const REACTION = { what: 'reaction time', min: REACTION_TIME.min, max: REACTION_TIME.max };
export const SAMPLES = { min: 1000, max: 1_000_000 };
const SEED_MAX = 0xffffffff;

/** Conflict point and reaction time of the slide under prefix `p`, asked when there is a limit. */
export function timeDistanceQuestions(
  p: string,
  section: string,
  applies: (a: Answers) => boolean,
): Question[] {
  const asked = (a: Answers) => applies(a) && hasLimit(a);
  return [
    quantityQuestion(
      {
        id: `${p}.conflict`,
        section,
        title: 'Conflict point',
        prompt:
          'Where was the conflict point (the pedestrian, the other vehicle), measured from the start of the marks?',
        help: {
          why: 'The review then says whether a vehicle at the posted limit, perceiving at the same point, would have stopped before it.',
          how: 'Along the path of travel, from where the marks begin; 0 is the start of the marks.',
        },
        appliesWhen: asked,
        optional: true,
        example: '60',
        metricExample: '18',
      },
      { kind: 'length', rule: CONFLICT, range: false },
    ),
    quantityQuestion(
      {
        id: `${p}.reaction`,
        section,
        title: 'Reaction time',
        prompt: 'Perception-reaction time for this case, in seconds',
        help: {
          why: `Used for the comparison at the posted limit. ${T.surprise} s: ${reactionTimeSource(T.surprise)}. ${T.design} s: ${reactionTimeSource(T.design)}.`,
          how: 'Leave it empty to use your preference; give a time here only when this case calls for another one, and say why in the notes.',
        },
        appliesWhen: asked,
        optional: true,
        usesPreference: 'reactionTime',
        example: '1.5',
      },
      { kind: 'time', rule: REACTION, range: false },
    ),
  ];
}

const shape = (a: Answers) => choiceOf(a, 'sampling.shape');
const drawn = (a: Answers) => shape(a) === 'uniform' || shape(a) === 'normal';

/** The distribution questions, asked once at the end of the case. */
export function samplingQuestions(section: string, applies: (a: Answers) => boolean): Question[] {
  return [
    choiceQuestion(
      {
        id: 'sampling.shape',
        section,
        title: 'Distribution',
        prompt: 'Also show a distribution of the speed, drawing the inputs from their ranges?',
        help: {
          why: 'Beside the low and high ends, percentiles of many draws show where the speed most likely lies; the minimum reported stays the low end.',
          how: 'Uniform draws each input evenly over its range; normal treats the range as ±2 standard deviations about the value.',
        },
        appliesWhen: applies,
        defaultText: () => 'none',
      },
      [
        { value: 'none', key: 'n', label: 'no distribution' },
        { value: 'uniform', key: 'u', label: 'uniform over each range' },
        { value: 'normal', key: 'o', label: 'normal, the range as ±2 sigma' },
      ],
    ),
    countQuestion(
      {
        id: 'sampling.samples',
        section,
        title: 'Draws',
        prompt: `How many draws? (${SAMPLES.min} to ${SAMPLES.max})`,
        help: { why: 'More draws give steadier percentiles and take a little longer.' },
        appliesWhen: (a) => applies(a) && drawn(a),
        defaultText: () => String(DEFAULT_SAMPLES),
      },
      'draws',
      SAMPLES.min,
      SAMPLES.max,
    ),
    countQuestion(
      {
        id: 'sampling.seed',
        section,
        title: 'Seed',
        prompt: 'Seed of the draws (the same seed gives the same percentiles every time)',
        help: {
          why: 'Recorded so that anyone can run the same draws again and get the same figures.',
        },
        appliesWhen: (a) => applies(a) && drawn(a),
        defaultText: () => String(DEFAULT_SEED),
      },
      'seed',
      0,
      SEED_MAX,
    ),
  ];
}
