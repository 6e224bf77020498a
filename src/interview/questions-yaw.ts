/**
 * Questions of a yaw (critical speed) analysis: how the radius was measured (one chord and its
 * middle ordinate, or offsets at stations along one chord), drag, bank, path.
 */
import { RULES } from '../case/quantity.js';
import type { Answers, AnswerContext, Question } from './types.js';
import { choiceQuestion, customQuestion, quantityQuestion } from './question-kinds.js';
import { choiceOf, unitsOf } from './answers-read.js';
import { measuredByOffsets, measuredByPoints } from './kept-fields.js';
import { radiusFromPoints } from '../engine/radius-points.js';
import {
  dropPoints,
  pointNumbers,
  readPoints,
  POINTS_SYNTAX,
  type PointValue,
} from './read-points.js';
import { FILE_SYNTAX } from './read-points-file.js';
import { spread } from '../engine/spread.js';
import { radiusFromChord, unitsOf as engineUnits } from '../engine/index.js';
import { radiusFromOffsets } from '../engine/radius-offsets.js';
import { readStations, STATIONS_SYNTAX, type StationValue } from './read-stations.js';
import { readQuantity } from './read-quantity.js';
import { dragQuestions } from './questions-drag.js';
import { testGradeQuestions } from './questions-test-grade.js';
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

/** The chord lengths the help calls usual, in the case's units. */
const USUAL_CHORD = {
  imperial: { lo: 30, hi: 50, unit: 'ft' },
  metric: { lo: 10, hi: 15, unit: 'm' },
};

/**
 * A remark on a chord outside the usual 30-50 ft (10-15 m) the help gives: the answer is taken,
 * the investigator is asked to check it.
 */
export function chordRemark(value: unknown, ctx: AnswerContext): string | undefined {
  if (value === undefined) return undefined;
  const q = value as number | { value: number };
  const c = typeof q === 'number' ? q : q.value;
  const u = USUAL_CHORD[ctx.units];
  if (c >= u.lo && c <= u.hi) return undefined;
  const side =
    c > u.hi
      ? 'longer than the chords usually taken: check it spans only the first part of the yaw mark'
      : 'shorter than the chords usually taken: on a short chord the middle ordinate is small, and an error in it moves the radius more';
  return `A ${c} ${u.unit} chord is ${side} (about ${u.lo}-${u.hi} ${u.unit}).`;
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

/** The engine's radius from the offsets answered, with its warnings (scatter, few stations). */
function offsetsLine(a: Answers, p: string): string | undefined {
  const units = unitsOf(a);
  const t = a[`${p}.offsets.chord`]?.text;
  const c = t === undefined ? undefined : readQuantity(t, LENGTH, units);
  const st = a[`${p}.offsets.stations`]?.value as StationValue[] | undefined;
  if (!c?.ok || !Array.isArray(st)) return undefined;
  const r = radiusFromOffsets(spread(c.value), st, units, engineUnits(units));
  return r.ok ? [r.value.step.substituted, ...r.value.warnings].join('. ') : r.reason;
}

/** The engine's fit of `points`, as one line: radius, residuals, largest and where, warnings. */
function fitLine(points: readonly PointValue[], a: Answers): string {
  const units = unitsOf(a);
  const r = radiusFromPoints(points, units, engineUnits(units));
  const text = r.ok ? [`${r.value.step.substituted}.`, ...r.value.warnings].join(' ') : r.reason;
  return /[.!?]$/.test(text) ? text : `${text}.`;
}

/** The surveyed points answered for analysis `p`, if they read. */
const pointsOf = (a: Answers, p: string): PointValue[] | undefined => {
  const answer = a[`${p}.points`];
  if (!answer) return undefined;
  if (Array.isArray(answer.value)) return answer.value as PointValue[];
  // Not read yet (answers made from a file are read in turn): read its text.
  const r = readPoints(answer.text, unitsOf(a));
  return r.ok ? r.value : undefined;
};

/** The point numbers left out of the fit (1-based), none when the answer is blank. */
export const leftOutOf = (a: Answers, p: string): number[] => {
  const v = a[`${p}.points.drop`]?.value;
  return Array.isArray(v) ? (v as number[]) : [];
};

/** The points the fit uses: those answered, less the ones left out. */
export function keptPoints(a: Answers, p: string): PointValue[] | undefined {
  const all = pointsOf(a, p);
  if (!all) return undefined;
  const out = new Set(leftOutOf(a, p));
  return all.filter((_, k) => !out.has(k + 1));
}

/** The points question: pasted lines, `;`-separated points on one line, or `@file` (read by the screen). */
function pointsQuestion(
  p: string,
  section: string,
  appliesWhen: (a: Answers) => boolean,
): Question[] {
  return [
    customQuestion(
      {
        id: `${p}.points`,
        section,
        title: 'Surveyed points',
        prompt:
          'Points surveyed along the mark (x y): paste the lines, type them with ; between points, or @ and a CSV file',
        help: {
          why: 'A least-squares circle is fitted through every point; how far the points lie off it (the residuals) shows whether the mark really is one arc, and which point does not belong.',
          how: `Survey the outside front tire's mark from where the yaw starts, at even steps, on its outer edge. Give ${POINTS_SYNTAX}. A unit may be glued to a number (12.5m). Or read an export: ${FILE_SYNTAX}.`,
        },
        appliesWhen,
        lines: true,
        example: '0 0; 20 1.26; 40 5.06; 60 11.46',
        metricExample: '0 0; 6 0.38; 12 1.53; 18 3.47',
        explainChoice: (a) => {
          const pts = keptPoints(a, p);
          return pts ? fitLine(pts, a) : undefined;
        },
      },
      'list',
      (text, ctx) => {
        if (text.trim().startsWith('@'))
          return { ok: false, message: `the file could not be read here: ${FILE_SYNTAX}` };
        const r = readPoints(text, ctx.units);
        if (!r.ok) return r;
        const numbered =
          r.value.length > 3 ? ' Leave points out at the next question, by number.' : '';
        // A pasted block is kept as one line of its points (in the case's unit), as typed by hand.
        const oneLine = /[\r\n]/.test(text.trim())
          ? { text: r.value.map(([x, y]) => `${x} ${y}`).join('; ') }
          : {};
        return {
          ok: true,
          value: r.value,
          ...oneLine,
          notice: `${r.notice}. ${fitLine(r.value, ctx.answers)}${numbered}`,
        };
      },
    ),
    customQuestion(
      {
        id: `${p}.points.drop`,
        section,
        title: 'Points left out',
        prompt: 'Points to leave out of the fit, by number (e.g. 1, 12-14); blank for none',
        help: {
          why: 'A point past where the yaw mark turns into a scuff, or a misread one, pulls the circle off the rest; the largest residual shows which. The points left out are kept in the case file beside the ones fitted.',
          how: 'Give the numbers the fit shows (point 1 is the first line), separated by commas or spaces, a range as 12-14. Leave it blank to fit every point.',
        },
        appliesWhen: (a) => appliesWhen(a) && (pointsOf(a, p)?.length ?? 0) > 3,
        optional: true,
        example: '12-14',
        explainChoice: (a) => {
          const pts = keptPoints(a, p);
          const n = leftOutOf(a, p).length;
          return pts && n
            ? `Without point${n === 1 ? '' : 's'} ${leftOutOf(a, p).join(', ')}: ${fitLine(pts, a)}`
            : undefined;
        },
      },
      'list',
      (text, ctx) => {
        const all = pointsOf(ctx.answers, p);
        if (text.trim() === '') return { ok: true, value: [] };
        if (!all) return { ok: false, message: 'give the surveyed points first' };
        const nums = pointNumbers(text, all.length);
        if (!nums.ok) return nums;
        const kept = dropPoints(all, text);
        if (!kept.ok) return kept;
        return {
          ok: true,
          value: nums.value,
          notice: `Left out ${nums.value.join(', ')}; ${kept.value.length} points fitted. ${fitLine(kept.value, ctx.answers)}`,
        };
      },
    ),
  ];
}

/**
 * Yaw questions of analysis `i`. `askTrack` says whether this analysis is where the track width
 * is asked (the first yaw analysis using the centre-of-mass path).
 */
export function yawQuestions(...args: Parameters<typeof yawQuestionsOf>): Question[] {
  const [i, section, applies] = args;
  const p = `a${i}`;
  const byOrdinate = (a: Answers) =>
    applies(a) && !measuredByOffsets(a, i) && !measuredByPoints(a, i);
  const byPoints = (a: Answers) => applies(a) && measuredByPoints(a, i);
  const byOffsets = (a: Answers) => applies(a) && measuredByOffsets(a, i);
  const [chord, ordinate, ...rest] = yawQuestionsOf(...args);
  return [
    choiceQuestion(
      {
        id: `${p}.measure`,
        section,
        title: 'Radius measured by',
        prompt: 'How was the radius of the mark measured?',
        help: {
          why: 'The radius comes from one chord and its middle ordinate, from a circle fitted to offsets read at several stations along one chord, or from a circle fitted to points surveyed along the mark; several offsets or points show how well the mark follows a circle.',
          how: "Offsets: stretch one chord along the mark and read, at stations measured from its start, the distance square to the tape to the mark. Surveyed points: take x and y of points along the mark's outer edge with a total station, a laser scanner or from a drone survey, and paste them or name the exported CSV file.",
        },
        appliesWhen: applies,
        defaultText: () => 'ordinate',
        explainChoice: (a) =>
          a[`${p}.measure`] === undefined
            ? undefined
            : measuredByOffsets(a, i)
              ? 'The radius will be the circle fitted through the chord ends and the offsets (least squares), with its scatter.'
              : measuredByPoints(a, i)
                ? "The radius will be the least-squares circle through the surveyed points, with each point's residual; points that do not belong can be left out."
                : 'The radius will be R = C²/(8M) + M/2 from the chord and its middle ordinate.',
      },
      [
        { value: 'ordinate', key: 'c', label: 'one chord and its middle ordinate' },
        { value: 'offsets', key: 'o', label: 'offsets at stations along one chord' },
        {
          value: 'points',
          key: 'p',
          label: 'surveyed points (total station, scanner or drone export)',
        },
      ],
    ),
    { ...chord!, appliesWhen: byOrdinate },
    { ...ordinate!, appliesWhen: byOrdinate },
    quantityQuestion(
      {
        id: `${p}.offsets.chord`,
        section,
        title: 'Chord (offsets)',
        prompt: 'Length of the chord the offsets are read from',
        help: {
          why: "The chord's two ends lie on the mark; with the offsets between them they fix the circle.",
          how: "Use the outside front tire's mark where the vehicle first yaws, as for a single chord.",
        },
        appliesWhen: byOffsets,
        example: '45',
        metricExample: '14',
      },
      { ...LENGTH, rule: { ...RULES.length, what: 'chord' } },
      undefined,
      chordRemark,
    ),
    customQuestion(
      {
        id: `${p}.offsets.stations`,
        section,
        title: 'Offsets',
        prompt:
          'Offsets along the chord: distance from its start, then the offset, in pairs separated by commas',
        help: {
          why: 'A circle is fitted through the chord ends and these points; how far they scatter about it says how well the mark is a circle.',
          how: `Type the ${STATIONS_SYNTAX}. Each station must lie inside the chord. A unit may be glued to a number (3.1m:0.12m).`,
        },
        appliesWhen: byOffsets,
        example: '10 1.9, 20 2.5, 30 1.9',
        metricExample: '3 0.6, 7 0.8, 10 0.6',
        explainChoice: (a) => offsetsLine(a, p),
      },
      'list',
      (text, ctx) => readStations(text, ctx.units, chordLow(`${p}.offsets.chord`, ctx)),
    ),
    ...pointsQuestion(p, section, byPoints),
    ...rest,
  ];
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
        metricExample: '14',
      },
      LENGTH,
      undefined,
      chordRemark,
    ),
    quantityQuestion(
      {
        id: `${p}.ordinate`,
        section,
        title: 'Middle ordinate',
        prompt: "Middle ordinate: from the chord's midpoint to the mark, at right angles",
        help: {
          why: 'The radius is very sensitive to it: an error of one part in ten in the ordinate moves the radius by about the same share and the speed by about half that. Read it as finely as you can.',
          how: "At the chord's midpoint, measure square to the tape to the mark's outer edge; read to the nearest 1/8 inch (or few mm). It must be less than half the chord.",
        },
        appliesWhen: applies,
        example: '3 ft 6 in',
        metricExample: '1.1',
        explainChoice: (a) => radiusLine(a, p),
      },
      { ...LENGTH, rule: { ...RULES.length, what: 'middle ordinate' } },
      ordinateCheck(`${p}.chord`),
    ),
    ...dragQuestions(p, section, 'the yaw marks', applies),
    ...testGradeQuestions(
      p,
      section,
      'the yaw marks',
      (a) => applies(a) && choiceOf(a, `${p}.drag.source`) === 'test-skids',
    ),
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
        metricExample: '1.6',
      },
      { kind: 'length', rule: RULES.trackWidth, range: true },
    ),
  ];
}
