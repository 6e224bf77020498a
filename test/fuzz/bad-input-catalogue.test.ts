// The catalogue of bad inputs, through every numeric question of the interview: what
// the investigator types, and what the message must tell them. The fragments say what a person
// needs to read (what is wrong, what is expected), not the exact wording.
import { describe, expect, it } from 'vitest';
import { contextOf, reduce, solveDraft } from '../../src/interview/index.js';
import { dryRun } from '../e2e/interview-driver.js';
import { TWO_SURFACES_AND_YAW } from '../e2e/scripts.js';
import {
  allNumericFamilies,
  family,
  numericQuestions,
  stateAt,
  type AtQuestion,
} from './question-states.js';

/** How a question family takes numbers, from the domain (docs/case-file.md, docs/physics.md). */
interface Traits {
  /** An empty answer is fine (optional, or Enter takes an offered default). */
  emptyOk?: boolean;
  /** 0 is a meaningful answer (no braking on a wheel, an end speed of 0, ...). */
  zeroOk?: boolean;
  /** Asked as a direction plus a positive percent: a typed sign is refused with a hint. */
  unsigned?: boolean;
  /** A whole number (a count). */
  count?: boolean;
  /** One value only: no range. */
  single?: boolean;
  /** Pairs `speed/distance`. */
  pairs?: boolean;
  /** Pairs `along offset` (stations along a chord). */
  stations?: boolean;
  /** Surveyed points, `x y` a line or `;` between them. */
  points?: boolean;
  /** Point numbers to leave out (`1, 12-14`). */
  pointNumbers?: boolean;
  /** Signed: a minus sign is part of the answer (a drop onto higher ground, a downward take-off). */
  signed?: boolean;
}

const TRAITS: Record<string, Traits> = {
  limit: { emptyOk: true, single: true },
  'vehicle.share': { emptyOk: true, zeroOk: true },
  'vehicle.wheel.*.fraction': { zeroOk: true },
  'vehicle.brakes.efficiency': { zeroOk: true },
  'vehicle.trackWidth': {},
  'a#.count': { emptyOk: true, count: true },
  'a#.marks': {},
  'a#.segcount': { count: true },
  'a#.quick': {},
  'a#.seg#.length': {},
  'drag.value': {},
  'drag.tests': { pairs: true },
  'drag.readings': { single: true },
  'drag.weight': { single: true },
  'drag.pulls': { single: true },
  'a#.seg#.grade.pct': { unsigned: true },
  'drag.testGrade.pct': { unsigned: true },
  'a#.end.speed': { zeroOk: true },
  'a#.chord': {},
  'a#.ordinate': {},
  'a#.bank.pct': { unsigned: true },
  'a#.offsets.chord': {},
  'a#.offsets.stations': { stations: true },
  'a#.points': { points: true },
  'a#.points.drop': { emptyOk: true, pointNumbers: true },
  'a#.air.distance': {},
  'a#.air.drop': { signed: true, zeroOk: true },
  'a#.air.grade': { signed: true, zeroOk: true, emptyOk: true },
  'a#.conflict': { emptyOk: true, zeroOk: true, single: true },
  // Perception-reaction time: published values (Green 2000, AASHTO) run from about 0.7 s to 2.5 s;
  // 0 s is not one.
  'a#.reaction': { emptyOk: true, single: true },
  'sampling.samples': { emptyOk: true, count: true },
  'sampling.seed': { emptyOk: true, count: true, zeroOk: true },
};

type Expect = 'accepted' | RegExp;

/** The catalogue: each input, and what the message must say for a question with these traits. */
const CATALOGUE: [string, (t: Traits) => Expect][] = [
  ['', (t) => (t.emptyOk ? 'accepted' : /empty|give at least one|type each/i)],
  ['   ', (t) => (t.emptyOk ? 'accepted' : /empty|give at least one|type each/i)],
  [
    'abc',
    (t) =>
      t.pairs
        ? /speed\/distance/
        : /'abc' is not a (whole )?number|not a row of the reference table/,
  ],
  [
    '-5',
    (t) =>
      t.pairs
        ? /speed\/distance/
        : t.signed
          ? 'accepted'
          : t.unsigned
            ? /minus sign.*(uphill or downhill|toward or away)/
            : t.count
              ? /whole number from \d+/
              : /greater than 0|at least 0/,
  ],
  [
    '0',
    (t) =>
      t.pairs
        ? /speed\/distance/
        : t.zeroOk
          ? 'accepted'
          : t.count
            ? /whole number from \d+/
            : /greater than 0|at least 0\.\d|at least [1-9]/,
  ],
  ['1e309', (t) => (t.pairs ? /speed\/distance/ : t.count ? /not a whole number/ : /too large/)],
  ['NaN', (t) => (t.pairs ? /speed\/distance/ : t.count ? /not a whole number/ : /finite number/)],
  [
    '80 ftt',
    (t) => (t.pairs ? /speed\/distance/ : t.count ? /not a whole number/ : /unknown unit 'ftt'/),
  ],
  [
    '0.9-0.6',
    (t) =>
      t.pairs
        ? /speed\/distance/
        : t.count
          ? /not a whole number/
          : t.single
            ? /one value/
            : /low end comes first/,
  ],
];

/** Stations are typed as pairs: any malformed entry is answered with how to write a pair. */
const STATION_HELP = /along offset|not a number/;
/** Points: a malformed entry is answered with how to write a point, or that 3 are needed. */
const POINTS_HELP = /as x y|not a number|at least 3 are needed/;
/** Point numbers: anything but blank or numbers of points is refused, saying which word. */
const NUMBERS_HELP = /is not a point number: give numbers from 1 to \d+/;
const rule = (f: (t: Traits) => Expect) => (t: Traits) =>
  t.stations
    ? f({}) === 'accepted'
      ? 'accepted'
      : STATION_HELP
    : t.points
      ? f({}) === 'accepted'
        ? 'accepted'
        : POINTS_HELP
      : t.pointNumbers
        ? f({ emptyOk: true }) === 'accepted'
          ? 'accepted'
          : NUMBERS_HELP
        : f(t);

const questions = numericQuestions();

/** The message the screen shows for `text` typed at the question (undefined when accepted). */
function messageFor(at: AtQuestion, text: string) {
  return reduce(at.state, { type: 'answer', text }).error?.message;
}

describe('the bad-input catalogue', () => {
  it('covers every numeric question the interview has (a new question needs a row here)', () => {
    const walked = new Set(questions.map((x) => family(x.q.id)));
    expect([...allNumericFamilies()].filter((f) => !walked.has(f))).toEqual([]);
    expect([...walked].filter((f) => !(f in TRAITS))).toEqual([]);
  });

  const rows = questions.flatMap((at) =>
    CATALOGUE.map(
      ([input, expected]) =>
        [at.q.id, input, rule(expected)(TRAITS[family(at.q.id)] ?? {}), at] as const,
    ),
  );
  it.each(
    rows.map(
      ([id, input, want, at]) =>
        [id, JSON.stringify(input), String(want), input, want, at] as const,
    ),
  )('%s, typed %s: %s', (_id, _shown, _want, input, want, at) => {
    const message = messageFor(at, input);
    if (want === 'accepted') expect(message).toBeUndefined();
    else {
      expect(message, 'the answer must be refused with a message').toBeDefined();
      expect(message).toMatch(want);
      // Echoes what was typed at most; never a broken number of the program's own.
      for (const w of message!.match(/NaN|Infinity|undefined/g) ?? []) expect(input).toContain(w);
      // The question's own check says the same as the screen (validate is what the screens call).
      if (input.trim() !== '')
        expect(at.q.validate(input, contextOf(at.state.answers))).toBe(message);
    }
  });

  it.each(['22', '30', '3 (2-25)'])(
    'a middle ordinate of %s ft, at least half the 44 ft chord, is refused naming the chord',
    (text) => {
      expect(messageFor(stateAt('a1.ordinate'), text)).toMatch(/less than half the chord/);
    },
  );

  it('a downhill grade steeper than the drag factor can hold is refused, or flagged, at the question', () => {
    // Segment 2: drag factor 0.45-0.55, n at most about 0.9, so a 60% downhill cannot be slowed by sliding.
    const at = stateAt('a0.seg1.grade.pct');
    const after = reduce(at.state, { type: 'answer', text: '60' });
    const said = [after.error?.message ?? '', after.notice ?? ''].join(' ');
    expect(said).toMatch(/steeper|cannot slow|could not slow|cannot be computed/i);
  });

  it('the same steep downhill, once the slide is complete, is named in the running chain rather than given a speed', () => {
    const answers = { ...TWO_SURFACES_AND_YAW, 'a0.seg1.grade.pct': '60' };
    const done = dryRun(answers, { stopAt: 'a0.more' });
    const first = solveDraft(done).analyses[0];
    expect(first?.ok).toBe(false);
    if (first && !first.ok) expect(first.reason).toMatch(/segment 2/);
  });
});
