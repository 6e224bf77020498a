/**
 * Every numeric question of the interview, each in a state where it is the question on screen
 * (so that checks which depend on earlier answers, such as the middle ordinate against the chord,
 * are in force). Found by walking whole cases through the pure reducer.
 */
import { allQuestions, currentQuestion } from '../../src/interview/index.js';
import type { InterviewState, Question } from '../../src/interview/types.js';
import { dryRun, walkStates, type Script } from '../e2e/interview-driver.js';
import { OTHER_SOURCES, SLIDE_ONLY_FAST, TWO_SURFACES_AND_YAW } from '../e2e/scripts.js';

export const NUMERIC_KINDS = new Set(['quantity', 'list', 'segments']);
export const isNumeric = (q: Question) => NUMERIC_KINDS.has(q.kind);

/**
 * The same question wherever it is asked: `a1.seg12.length` -> `a#.seg#.length`; the drag
 * factor questions of a segment and of a yaw are one family (`drag.value`), and so are the four
 * wheels' braking shares.
 */
export const family = (id: string) =>
  id
    .replace(/\d+/g, '#')
    .replace(/^a#\.(seg#\.)?drag\./, 'drag.')
    .replace(/^vehicle\.wheel\.\w+\.fraction$/, 'vehicle.wheel.*.fraction');

export interface AtQuestion {
  q: Question;
  state: InterviewState;
}

/** An invented fall off a bank: the airborne questions (distance, signed drop, take-off slope). */
const FALL_OFF_BANK: Script = {
  'details.reference': 'FUZZ-BANK-3',
  'details.occurred': '',
  'details.location': '',
  'details.investigator': '',
  'details.notes': '',
  units: '',
  limit: '',
  'vehicle.label': '',
  'a0.look': 'airborne',
  'a0.label': '',
  'a0.air.distance': '62 ± 2',
  'a0.air.drop': '8.5',
  'a0.air.grade': '-2',
  'a0.more': '',
  'sampling.shape': '',
};

/** An invented yaw mark surveyed as five points: the points and points-to-leave-out questions. */
const SURVEYED_YAW: Script = {
  ...FALL_OFF_BANK,
  'details.reference': 'FUZZ-ARC-5',
  'a0.look': 'yaw',
  'a0.measure': 'points',
  'a0.points': '0 0; 10 0.31; 20 1.25; 30 2.84; 40 5.08',
  'a0.points.drop': '',
  'a0.drag.source': 'entered',
  'a0.drag.value': '0.72',
  'a0.bank.dir': '',
  'a0.path': '',
};

const SCRIPTS: Script[] = [
  TWO_SURFACES_AND_YAW,
  OTHER_SOURCES,
  SLIDE_ONLY_FAST,
  FALL_OFF_BANK,
  SURVEYED_YAW,
];

/** The first state of each script in which `id` is the current question. */
/** Each script's walk, question by question (made once: states are never changed). */
let walks: AtQuestion[][] | undefined;
function walked(): AtQuestion[][] {
  walks ??= SCRIPTS.map((script) =>
    walkStates(script).flatMap((state) => {
      const q = currentQuestion(state);
      return q ? [{ q, state }] : [];
    }),
  );
  return walks;
}

export function stateAt(id: string): AtQuestion {
  for (const walk of walked()) {
    const at = walk.find((x) => x.q.id === id);
    if (at) return at;
  }
  throw new Error(`no script reaches question ${id}`);
}

/** One state per numeric question family met on the way through the scripts. */
export function numericQuestions(): AtQuestion[] {
  const out = new Map<string, AtQuestion>();
  for (const walk of walked())
    for (const at of walk)
      if (isNumeric(at.q) && !out.has(family(at.q.id))) out.set(family(at.q.id), at);
  return [...out.values()];
}

/** Families of every numeric question the interview knows after the scripts' answers. */
export function allNumericFamilies(): Set<string> {
  const fams = new Set<string>();
  for (const script of SCRIPTS)
    for (const q of allQuestions(dryRun(script).answers)) if (isNumeric(q)) fams.add(family(q.id));
  return fams;
}
