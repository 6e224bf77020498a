/** Questions of a yaw (critical speed) analysis: chord, middle ordinate, drag, bank, path. */
import { RULES } from '../case/quantity.js';
import type { Answers, AnswerContext, Question } from './types.js';
import { choiceQuestion, quantityQuestion } from './question-kinds.js';
import { choiceOf, unitsOf } from './answers-read.js';
import { measuredByOffsets } from './kept-fields.js';
import { spread } from '../case/quantity.js';
import { radiusFromChord, unitsOf as engineUnits } from '../engine/index.js';
import { readQuantity } from './read-quantity.js';
import { dragQuestions } from './questions-drag.js';
import { bankQuestions } from './questions-grade.js';

const LENGTH = { kind: 'length' as const, rule: RULES.length, range: true };

/** Lowest end of the chord as answered, in the case's units, if it reads. */
function chordLow(id: string, ctx: AnswerContext): number | undefined {
  const a = ctx.answers[id];
  if (!a) return undefined;
  const r = readQuantity(a.text, LENGTH, ctx.units);
  if (!r.ok) return undefined;
  return typeof r.value === 'number' ? r.value : (r.value.low ?? r.value.value);
}

/** The middle ordinate must stay under half the chord at every end of both ranges (an arc under a half circle). */
function ordinateCheck(chordId: string) {
  return (value: unknown, ctx: AnswerContext): string | undefined => {
    const c = chordLow(chordId, ctx);
    if (c === undefined) return undefined;
    const q = value as number | { value: number; high?: number };
    const top = typeof q === 'number' ? q : (q.high ?? q.value);
    const unit = ctx.units === 'metric' ? 'm' : 'ft';
    return top >= c / 2
      ? `the middle ordinate must be less than half the chord (under ${c / 2} ${unit}); check both measurements`
      : undefined;
  };
}

/** The engine's radius step for the chord and ordinate answered, with its warnings (nearly straight). */
function radiusLine(a: Answers, p: string): string | undefined {
  const units = unitsOf(a);
  const read = (id: string) => {
    const t = a[id]?.text;
    const r = t === undefined ? undefined : readQuantity(t, LENGTH, units);
    return r?.ok ? spread(r.value) : undefined;
  };
  const C = read(`${p}.chord`);
  const M = read(`${p}.ordinate`);
  if (!C || !M) return undefined;
  const r = radiusFromChord(C, M, engineUnits(units));
  return r.ok ? [r.value.step.substituted, ...r.value.warnings].join(' ') : undefined;
}

/**
 * Yaw questions of analysis `i`. `askTrack` says whether this analysis is where the track width
 * is asked (the first yaw analysis using the centre-of-mass path).
 */
export function yawQuestions(...args: Parameters<typeof yawQuestionsOf>): Question[] {
  const [i, , applies] = args;
  // A yaw measured by offsets (kept from a file) is not asked for a chord and ordinate.
  const byOrdinate = (a: Answers) => applies(a) && !measuredByOffsets(a, i);
  return yawQuestionsOf(...args).map((q) =>
    q.id === `a${i}.chord` || q.id === `a${i}.ordinate` ? { ...q, appliesWhen: byOrdinate } : q,
  );
}

function yawQuestionsOf(
  i: number,
  section: string,
  applies: (a: Answers) => boolean,
  askTrack: (a: Answers) => boolean,
): Question[] {
  const p = `a${i}`;
  return [
    quantityQuestion(
      {
        id: `${p}.chord`,
        section,
        title: 'Chord',
        prompt: 'Chord length across the first part of the yaw mark',
        help: {
          why: 'The chord and its middle ordinate give the radius of the mark: R = C²/(8M) + M/2.',
          how: "Use the outside front tire's mark where the vehicle first yaws: stretch a tape between two points on the mark (chords of about 30-50 ft, or 10-15 m, are usual) and measure the tape's length.",
        },
        appliesWhen: applies,
        example: '45',
      },
      LENGTH,
    ),
    quantityQuestion(
      {
        id: `${p}.ordinate`,
        section,
        title: 'Middle ordinate',
        prompt:
          "Middle ordinate: from the chord's midpoint to the mark, at right angles (e.g. 3.5, or 3 ft 6 in)",
        help: {
          why: 'The radius is very sensitive to it: an error of one part in ten in the ordinate moves the radius by about the same share and the speed by about half that. Read it as finely as you can.',
          how: "At the chord's midpoint, measure square to the tape to the mark's outer edge; read to the nearest 1/8 inch (or few mm). It must be less than half the chord.",
        },
        appliesWhen: applies,
        example: '3.5',
        explainChoice: (a) => radiusLine(a, p),
      },
      { ...LENGTH, rule: { ...RULES.length, what: 'middle ordinate' } },
      ordinateCheck(`${p}.chord`),
    ),
    ...dragQuestions(p, section, 'the yaw marks', applies),
    ...bankQuestions(p, section, applies),
    choiceQuestion(
      {
        id: `${p}.path`,
        section,
        title: 'Path',
        prompt: 'Which path should the radius describe?',
        help: {
          why: "The mark is the outside front tire's path; the centre of mass runs about half a track width inside it (common practice), a slightly smaller radius and a lower speed.",
          how: "The centre-of-mass path needs the vehicle's track width (centre to centre of the tires on one axle).",
        },
        appliesWhen: applies,
        defaultText: () => 'none',
      },
      [
        { value: 'none', key: 'm', label: 'the tire mark as measured' },
        { value: 'half-track', key: 'c', label: 'the centre of mass (half a track width inside)' },
      ],
    ),
    quantityQuestion(
      {
        id: 'vehicle.trackWidth',
        section,
        title: 'Track width',
        prompt: 'Track width of the vehicle (centre to centre of the tires on one axle)',
        help: {
          why: 'Half of it is taken off the radius for the centre-of-mass path.',
          how: 'Measure the vehicle, or take it from its specification.',
        },
        appliesWhen: (a) => askTrack(a) && applies(a) && choiceOf(a, `${p}.path`) === 'half-track',
        example: '5.2',
      },
      { kind: 'length', rule: RULES.trackWidth, range: true },
    ),
  ];
}
