/**
 * Questions of an airborne analysis (the vehicle left the ground): the horizontal distance and
 * the drop of its centre of mass from take-off to first landing, and the take-off grade. The
 * figure shown while answering is the engine's own (`airborneSpeed`), never a copy of it.
 */
import { RULES } from '../case/quantity.js';
import type { Answers, Question } from './types.js';
import { quantityQuestion } from './question-kinds.js';
import { unitsOf } from './answers-read.js';
import { readQuantity, type QuantitySpec } from './read-quantity.js';
import { spread } from '../engine/spread.js';
import { airborneSpeed } from '../engine/airborne.js';
import { AIRBORNE_ASSUMPTIONS } from '../engine/solve-airborne.js';

const DISTANCE: QuantitySpec = {
  kind: 'length',
  rule: { ...RULES.length, what: 'distance' },
  range: true,
};
const DROP: QuantitySpec = { kind: 'length', rule: RULES.drop, range: true };
const GRADE: QuantitySpec = { kind: 'percent', rule: RULES.takeoffGrade, range: true };

/** What the airborne figure assumes, for the help of its first question. */
export const AIRBORNE_CAUTIONS = AIRBORNE_ASSUMPTIONS.join(' ');

/**
 * The engine's take-off speed step for what is answered so far (the grade taken as level while
 * it is empty), or its reason when no path fits; undefined until distance and drop read.
 */
export function airborneLine(a: Answers, p: string): string | undefined {
  const units = unitsOf(a);
  const read = (id: string, spec: QuantitySpec) => {
    const t = a[id]?.text;
    if (t === undefined || t.trim() === '') return undefined;
    const r = readQuantity(t, spec, units);
    return r.ok ? spread(r.value) : undefined;
  };
  const d = read(`${p}.air.distance`, DISTANCE);
  const h = read(`${p}.air.drop`, DROP);
  if (!d || !h) return undefined;
  const G = read(`${p}.air.grade`, GRADE) ?? spread(0);
  const r = airborneSpeed(d, h, G, units);
  if (!r.ok) return `No figure: ${r.reason}.`;
  const last = r.value.steps[r.value.steps.length - 1]!;
  return last.substituted;
}

/** Airborne questions of analysis `i`. */
export function airborneQuestions(
  i: number,
  section: string,
  applies: (a: Answers) => boolean,
): Question[] {
  const p = `a${i}`;
  const line = (a: Answers) => airborneLine(a, p);
  return [
    quantityQuestion(
      {
        id: `${p}.air.distance`,
        section,
        title: 'Distance in the air',
        prompt:
          "Horizontal distance the vehicle's centre of mass travelled from take-off to first landing",
        help: {
          why: `The farther it flew for the same drop, the faster it left the ground: S = K·d / (cos θ · sqrt(d·tan θ + h)). ${AIRBORNE_CAUTIONS}`,
          how: 'Find the take-off point (where the tire marks end at the edge, kerb or ramp) and the first landing (gouges, tire marks or scrapes where it first came down), and measure level between them, carried to the centre of mass. Give a tolerance: 62 ± 2.',
        },
        appliesWhen: applies,
        example: '62 ± 2',
        metricExample: '19 ± 0.5',
      },
      DISTANCE,
    ),
    quantityQuestion(
      {
        id: `${p}.air.drop`,
        section,
        title: 'Drop in the air',
        prompt:
          'Vertical drop of the centre of mass from take-off to landing (positive: it landed lower; negative: higher)',
        help: {
          why: 'A longer fall gives the vehicle more time in the air, so the same distance means a lower speed. The drop is signed: + when the landing is lower than the take-off, - when it landed higher (e.g. -1.5 onto a raised bank).',
          how: "Measure the height of the centre of mass at take-off above its height at landing (e.g. level survey of both points, then the vehicle's centre-of-mass height at each). Give a tolerance: 8.5 ± 0.5.",
        },
        appliesWhen: applies,
        example: '8.5 ± 0.5',
        metricExample: '2.6 ± 0.2',
        explainChoice: line,
      },
      DROP,
    ),
    quantityQuestion(
      {
        id: `${p}.air.grade`,
        section,
        title: 'Take-off angle',
        prompt:
          'Slope of the path at take-off: signed percent (+ upward, - downward) or degrees (3°); empty for level',
        help: {
          why: 'Leaving upward keeps the vehicle in the air longer, so the same distance needs less speed; leaving downward, more. θ = atan(G/100). Empty is taken as level (0%), and the report says so.',
          how: 'Measure the slope of the ground (ramp, kerb, bank edge) over the last few feet before take-off, in the direction of travel, not the pitch of the vehicle. -2 for a 2% downward slope, 4° for a 4 degree ramp; give a tolerance: -2 ± 1.',
        },
        appliesWhen: applies,
        example: '-2 ± 1',
        optional: true,
        explainChoice: line,
      },
      GRADE,
    ),
  ];
}
