/**
 * The whole list of questions as a pure function of the answers so far: the case, the vehicle,
 * then each analysis with its branch (slide or yaw) and its segments expanded.
 */
import type { Answers, Question } from './types.js';
import { choiceQuestion, confirmQuestion, textQuestion, unitHintOf } from './question-kinds.js';
import {
  slideInParts,
  surfaceMode,
  analysisCount,
  choiceOf,
  fedByChain,
  isSlideLook,
  markLook,
  MAX_ANALYSES,
  maxIndexIn,
  segmentCount,
  unitsOf,
  type MarkLook,
} from './answers-read.js';
import { caseQuestions } from './questions-case.js';
import { brakeQuestions, vehicleQuestions } from './questions-vehicle.js';
import { slideQuestions } from './questions-slide.js';
import { yawQuestions } from './questions-yaw.js';
import { airborneQuestions } from './questions-airborne.js';
import { samplingQuestions } from './questions-extras.js';

/** Heading of analysis `i`'s section, naming the chain picked. */
export function analysisSection(a: Answers, i: number): string {
  const look = markLook(a, i);
  const chain =
    look === undefined
      ? ''
      : look === 'yaw'
        ? ' - critical speed'
        : look === 'airborne'
          ? ' - airborne'
          : look === 'gap'
            ? ' - slide in parts'
            : // A quick line not typed yet may still be one surface (`@0.74 -1%`): not said yet.
              slideInParts(a, i) && !(surfaceMode(a, i) === 'quick' && !a[`a${i}.quick`])
              ? ' - slide, several surfaces'
              : ' - slide';
  return `Analysis ${i + 1}${chain}`;
}

/** Why the chain was picked, for each look of the marks, in the case's units. */
export function chainReason(look: MarkLook, metric: boolean): string {
  const slide = metric ? 'S = sqrt(254 d f n)' : 'S = sqrt(30 d f n)';
  return {
    dark: `Straight dark marks are left by locked wheels sliding: the slide chain applies, ${slide}.`,
    abs: `Faint, evenly dashed marks are typical of anti-lock brakes working hard: the slide chain applies with care, ${slide}, and the result is an estimate to be reported as such.`,
    skip: `Marks with short regular gaps come from a locked tire bouncing: the slide chain applies, and the whole length, gaps included, counts as sliding (common practice).`,
    gap: `Marks broken by long gaps mean the brakes were released and applied again: slide in parts. Only the marked parts count, each as its own segment; the gaps were not braking and are left out (common practice).`,
    airborne: `Take-off and landing marks mean the vehicle left the ground: its speed at take-off follows from how far and how far down it flew, ${metric ? 'S = 7.97 d / (cos θ sqrt(d tan θ + h))' : 'S = 2.73 d / (cos θ sqrt(d tan θ + h))'} (projectile motion, air drag neglected).`,
    yaw: `Curved sideways marks with diagonal striations are left by a vehicle sliding sideways with its tires still rotating: the critical speed chain applies, ${metric ? 'S = sqrt(127 f R)' : 'S = sqrt(15 f R)'}.`,
  }[look];
}

/** Index of the first analysis in play whose marks are a slide, or undefined (none, or yaw only). */
export function firstSlideOf(a: Answers): number | undefined {
  for (let k = 0; k < analysisCount(a); k++) if (isSlideLook(markLook(a, k))) return k;
  return undefined;
}

function analysisQuestions(i: number, now: Answers, segments: number): Question[] {
  const p = `a${i}`;
  const inPlay = (a: Answers) => i < analysisCount(a);
  const slide = (a: Answers) => inPlay(a) && isSlideLook(markLook(a, i));
  const yaw = (a: Answers) => inPlay(a) && markLook(a, i) === 'yaw';
  const air = (a: Answers) => inPlay(a) && markLook(a, i) === 'airborne';
  const section = analysisSection(now, i);
  // The brakes are asked once, in the first analysis that is a slide, right after its marks' look.
  const firstSlide = (a: Answers) => inPlay(a) && firstSlideOf(a) === i;
  // The track width is asked once, in the first yaw analysis that uses the centre-of-mass path.
  const askTrack = (a: Answers) => {
    for (let k = 0; k < analysisCount(a); k++)
      if (markLook(a, k) === 'yaw' && choiceOf(a, `a${k}.path`) === 'half-track') return k === i;
    return false;
  };
  return [
    choiceQuestion(
      {
        id: `${p}.look`,
        section,
        title: 'Marks',
        prompt:
          i === 0
            ? 'What do the marks look like?'
            : 'What do the marks of this analysis look like?',
        help: {
          why: 'The look of the marks tells how they were made, and so which formula chain applies.',
          how: 'Look along the whole length: locked-wheel marks are straight and darken toward the end; yaw marks curve and show striations across the mark; a vehicle that left the ground leaves marks that end at an edge, kerb or ramp and gouges or tire marks where it first came down.',
        },
        appliesWhen: inPlay,
        explainChoice: (a) => {
          const look = markLook(a, i);
          return look ? chainReason(look, unitsOf(a) === 'metric') : undefined;
        },
      },
      [
        { value: 'dark', key: 'd', label: 'straight, dark marks (locked wheels)' },
        { value: 'abs', key: 'a', label: 'faint, evenly dashed (anti-lock brakes)' },
        { value: 'skip', key: 's', label: 'short, regular gaps (skip skid)' },
        { value: 'gap', key: 'g', label: 'broken by long gaps (gap skid)' },
        { value: 'yaw', key: 'y', label: 'curved, sideways, striated (yaw)' },
        {
          value: 'airborne',
          key: 'j',
          label: 'left the ground (take-off, landing)',
        },
      ],
    ),
    ...brakeQuestions(section, firstSlide),
    textQuestion({
      id: `${p}.label`,
      section,
      title: 'Label',
      prompt: 'A short label for these marks (e.g. northbound, before the junction)',
      help: { why: 'Tells the analyses apart in the chain and the report.' },
      appliesWhen: inPlay,
      optional: true,
    }),
    ...slideQuestions(i, section, slide, segments, now),
    ...yawQuestions(i, section, yaw, askTrack),
    ...airborneQuestions(i, section, air),
    confirmQuestion({
      id: `${p}.more`,
      section,
      title: 'Another analysis?',
      prompt: 'Add another analysis (another set of marks, or the same marks another way)?',
      help: {
        why: 'A case may hold several analyses, e.g. a slide before an impact and yaw marks after it.',
      },
      // Not asked when an analysis up to this one runs on into the next: those marks are part of
      // the case already, and a "no" would leave the slide that leads into them without an end.
      appliesWhen: (a) => inPlay(a) && i < MAX_ANALYSES - 1 && !fedByChain(a, i),
      defaultText: () => 'no',
    }),
  ];
}

/**
 * Every question that could be asked given these answers, including branches that do not apply
 * (so that answers kept from them can be named); `appliesWhen` tells which apply.
 */
export function allQuestions(answers: Answers): Question[] {
  // Answers are never mutated (every change makes a new object), so the list can be kept per object.
  const hit = ALL.get(answers);
  if (hit) return hit;
  const list = expand(answers);
  ALL.set(answers, list);
  return list;
}

const ALL = new WeakMap<Answers, Question[]>();
const APPLICABLE = new WeakMap<Answers, Question[]>();

function expand(answers: Answers): Question[] {
  const analyses = Math.max(analysisCount(answers), maxIndexIn(answers, /^a(\d+)\./));
  const out: Question[] = [...caseQuestions(), ...vehicleQuestions()];
  for (let i = 0; i < analyses; i++) {
    const segs = Math.max(
      segmentCount(answers, i),
      maxIndexIn(answers, new RegExp(`^a${i}\\.seg(\\d+)\\.`)),
    );
    out.push(...analysisQuestions(i, answers, segs));
  }
  out.push(...samplingQuestions('End of the case', () => true));
  const units = unitsOf(answers);
  return oneOfEach(out, answers).map((q) => {
    const hint = q.unitKind && unitHintOf(q.unitKind, units);
    const example = units === 'metric' && q.metricExample ? { example: q.metricExample } : {};
    return hint ? { ...q, unitHint: hint, ...example } : { ...q, ...example };
  });
}

/**
 * A question asked in whichever analysis needs it (the brakes, the track width) appears once per
 * analysis; keep one of each id: the one that applies, else the first. So the jump list shows it
 * where it is asked.
 */
function oneOfEach(list: Question[], answers: Answers): Question[] {
  const pick = new Map<string, Question>();
  for (const q of list) {
    const had = pick.get(q.id);
    if (!had || (!had.appliesWhen(answers) && q.appliesWhen(answers))) pick.set(q.id, q);
  }
  return list.filter((q) => pick.get(q.id) === q);
}

/** The questions that apply now, in the order asked. */
export function questionsFor(answers: Answers): Question[] {
  const hit = APPLICABLE.get(answers);
  if (hit) return hit;
  const seen = new Set<string>();
  const list = allQuestions(answers).filter((q) => {
    if (seen.has(q.id) || !q.appliesWhen(answers)) return false;
    seen.add(q.id);
    return true;
  });
  APPLICABLE.set(answers, list);
  return list;
}
