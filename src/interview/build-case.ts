/**
 * The case file (v1) made from the interview's answers: details, vehicle and only the analyses
 * whose questions are all answered and valid, with the interview's progress so it resumes.
 */
import type { Case } from '../case/load.js';
import { APPEARANCE_NOTES } from '../engine/index.js';
import { airborneV1, chainIssues } from '../case/v1/phase-fields.js';
import { skidV1, yawV1, type AnalysisV1, type VehicleV1 } from '../case/v1/schema.js';
import type { AnswerReader, CaseMeta, InterviewState, SavedInterview } from './types.js';
import { analysisCount, choiceOf, endsInto, markLook, unitsOf } from './answers-read.js';
import { readAnswers } from './answer-values.js';
import {
  analysisKeep,
  CASE_KEEP,
  kept,
  measuredByOffsets,
  measuredByPoints,
  VEHICLE_KEEP,
} from './kept-fields.js';
import { brakesOf, dragOf, quantityOf, segmentsOf, slopeOf, text } from './build-parts.js';
import { RULES } from '../case/quantity.js';
import { samplingFieldV1 } from '../case/v1/extras-fields.js';
import { restoreNotes } from './kept-notes.js';
import { testGradeNotes } from './test-grade-notes.js';
import { withKept } from './kept-analyses.js';
import { keptPoints, leftOutOf } from './questions-yaw.js';
import type { PointValue } from './read-points.js';

/** Distance rules a slide's marks may take (the file's `distanceRule`). */
const DISTANCE_RULES = ['average', 'longest', 'shortest', 'spread'];

/** Slide `i` read with the file's schema; undefined when its answers do not make one. */
function skidOf(
  r: AnswerReader,
  i: number,
  id: string,
  idOf: Map<number, string>,
): AnalysisV1 | undefined {
  const p = `a${i}`;
  const label = text(r, `${p}.label`);
  // The look of the marks goes into the file, so solve and the report carry its caveat too.
  const look = markLook(r.answers, i);
  const marks = r.value(`${p}.marks`);
  const rule = r.value(`${p}.rule`);
  const end = r.value(`${p}.end`);
  const basis = text(r, `${p}.end.basis`);
  const reaction = r.value(`${p}.reaction`);
  const conflict = r.value(`${p}.conflict`);
  // Running on into another analysis: that one must enter the case too, under its stored id.
  const into = end === 'next' ? endsInto(r.answers, i) : undefined;
  if (end === 'next' && (into === undefined || !idOf.has(into))) return undefined;
  const parsed = skidV1.safeParse({
    ...kept(r.answers, analysisKeep(i)),
    id,
    kind: 'skid',
    segments: segmentsOf(r, i),
    ...(label ? { label } : {}),
    // Locked-wheel marks are the default and add nothing, so only the other looks are written.
    ...(look === 'abs' || look === 'skip' || look === 'gap' ? { appearance: look } : {}),
    ...(Array.isArray(marks) ? { marks } : {}),
    ...(typeof rule === 'string' && DISTANCE_RULES.includes(rule) ? { distanceRule: rule } : {}),
    end:
      end === 'speed'
        ? { mode: 'speed', speed: r.value(`${p}.end.speed`), ...(basis ? { basis } : {}) }
        : into !== undefined
          ? { mode: 'analysis', analysis: idOf.get(into) }
          : { mode: 'stop' },
    ...(typeof reaction === 'number' || typeof conflict === 'number'
      ? {
          timeDistance: {
            ...(typeof reaction === 'number' ? { reactionTime: reaction } : {}),
            ...(typeof conflict === 'number' ? { conflictAt: conflict } : {}),
          },
        }
      : {}),
  });
  return parsed.success ? parsed.data : undefined;
}

/** The radius's measurement of yaw `i` as the file holds it: one way only (the file refuses two). */
export function yawMeasure(r: AnswerReader, i: number): Record<string, unknown> {
  const p = `a${i}`;
  if (measuredByOffsets(r.answers, i))
    return {
      offsets: { chord: r.value(`${p}.offsets.chord`), stations: r.value(`${p}.offsets.stations`) },
    };
  if (measuredByPoints(r.answers, i)) {
    if (r.value(`${p}.points`) === undefined) return {};
    const all = r.value(`${p}.points`) as PointValue[];
    const out = new Set(leftOutOf(r.answers, p));
    const left = all.filter((_, k) => out.has(k + 1));
    return { points: keptPoints(r.answers, p), ...(left.length ? { pointsLeftOut: left } : {}) };
  }
  return { chord: r.value(`${p}.chord`), middleOrdinate: r.value(`${p}.ordinate`) };
}

/** Yaw `i` read with the file's schema; undefined when its answers do not make one. */
function yawOf(r: AnswerReader, i: number, id: string): AnalysisV1 | undefined {
  const p = `a${i}`;
  const { offsets: _o, points: _p, pointsLeftOut: _l, ...keep } = kept(r.answers, analysisKeep(i));
  const label = text(r, `${p}.label`);
  const e = slopeOf(r, `${p}.bank`, 'away', 'none');
  const parsed = yawV1.safeParse({
    ...keep,
    id,
    kind: 'yaw',
    drag: dragOf(r, p),
    pathAdjustment: r.value(`${p}.path`) === 'half-track' ? 'half-track' : 'none',
    ...yawMeasure(r, i),
    ...(label ? { label } : {}),
    ...(e !== undefined ? { superelevation: e } : {}),
  });
  return parsed.success ? parsed.data : undefined;
}

/** Airborne `i` read with the file's schema; undefined when its answers do not make one. */
function airborneOf(r: AnswerReader, i: number, id: string): AnalysisV1 | undefined {
  const p = `a${i}`;
  const label = text(r, `${p}.label`);
  const grade = r.value(`${p}.air.grade`);
  const parsed = airborneV1.safeParse({
    ...kept(r.answers, analysisKeep(i)),
    id,
    kind: 'airborne',
    ...(label ? { label } : {}),
    distance: r.value(`${p}.air.distance`),
    drop: r.value(`${p}.air.drop`),
    ...(grade !== undefined ? { takeoffGrade: grade } : {}),
  });
  return parsed.success ? parsed.data : undefined;
}

/**
 * The analyses without those whose chain the file would refuse (a loop, or a link to an analysis
 * that did not enter): the question refuses a loop as it is answered, but a later change of
 * another slide's end could close one; the case then still loads, without those slides.
 */
function unlooped(list: AnalysisV1[]): AnalysisV1[] {
  let out = list;
  for (;;) {
    const bad = new Set(chainIssues(out).map((x) => x.path[1] as number));
    if (bad.size === 0) return out;
    out = out.filter((_, k) => !bad.has(k));
  }
}

/** The distribution asked at the end of the case, when one was chosen and its questions are answered. */
function samplingOf(r: AnswerReader): Case['sampling'] {
  const shape = r.value('sampling.shape');
  if (shape !== 'uniform' && shape !== 'normal') return undefined;
  if (!r.complete((id) => id.startsWith('sampling.'))) return undefined;
  const parsed = samplingFieldV1.safeParse({
    shape,
    samples: r.value('sampling.samples'),
    seed: r.value('sampling.seed'),
  });
  return parsed.success ? parsed.data : undefined;
}

/** Stored id of analysis i (kept from a hand-written case), or `skid-1`, `yaw-2`, ... */
export function analysisId(state: InterviewState, i: number, kind: Included['kind']): string {
  const kept = state.answers[`a${i}.id`]?.text;
  return kept && /^[A-Za-z0-9._-]{1,64}$/.test(kept) ? kept : `${kind}-${i + 1}`;
}

/** An analysis that enters the case: its index in the interview, its stored id and kind. */
interface Included {
  i: number;
  id: string;
  kind: 'skid' | 'yaw' | 'airborne';
}

/** The analyses complete enough to enter the case, with the ids they are stored under. */
function included(
  state: InterviewState,
  answers: InterviewState['answers'],
  r: AnswerReader,
  brakes: boolean,
  track: boolean,
): Included[] {
  const used = new Set<string>();
  const out: Included[] = [];
  for (let i = 0; i < analysisCount(answers); i++) {
    const look = markLook(answers, i);
    if (look === undefined) continue;
    // The time-distance questions only add to the comparison at the limit: the slide's own
    // figure does not wait for them (a valid answer is written when there is one).
    const extra = new Set([`a${i}.more`, `a${i}.conflict`, `a${i}.reaction`]);
    const own = r.complete((id) => id.startsWith(`a${i}.`) && !extra.has(id));
    if (!own) continue;
    const kind = look === 'yaw' ? 'yaw' : look === 'airborne' ? 'airborne' : 'skid';
    if (kind === 'skid' && !brakes) continue;
    if (kind === 'yaw' && choiceOf(answers, `a${i}.path`) === 'half-track' && !track) continue;
    let id = analysisId(state, i, kind);
    if (used.has(id)) id = `${kind}-${i + 1}-${used.size}`;
    used.add(id);
    out.push({ i, id, kind });
  }
  return out;
}

/**
 * What the look of the marks adds to each analysis that enters the case, by stored id: anti-lock
 * marks make the slide figure an estimate (common practice, docs/physics.md). The case file has no
 * field for the look, so this is read from the answers.
 */
export function lookNotes(state: InterviewState): Record<string, string[]> {
  const r = readAnswers(state.answers);
  const out: Record<string, string[]> = {};
  const brakes = brakesOf(r) !== undefined;
  const track = r.value('vehicle.trackWidth') !== undefined;
  for (const a of included(state, state.answers, r, brakes, track)) {
    const notes = [
      ...(markLook(state.answers, a.i) === 'abs' ? [ABS_NOTE] : []),
      ...testGradeNotes(r, a.i),
    ];
    if (notes.length) out[a.id] = notes;
  }
  return out;
}

/** The caution for a slide read from faint, evenly dashed marks. */
export const ABS_NOTE = APPEARANCE_NOTES.abs!;

/**
 * The case as far as it is complete. Passes `loadCase`: an analysis enters only when every
 * question it needs (its own and the vehicle's it depends on) is answered and valid.
 */
export function buildCase(state: InterviewState, meta: CaseMeta): Case {
  // Units given by the caller stand in for an unanswered units question, so every figure is read in them.
  const answers =
    state.answers.units || !meta.units
      ? state.answers
      : { ...state.answers, units: { text: meta.units, value: meta.units } };
  const r = readAnswers(answers);
  const units = unitsOf(answers);
  const details: Record<string, string> = {};
  for (const k of ['reference', 'occurred', 'location', 'investigator', 'notes']) {
    const v = text(r, `details.${k}`);
    if (v) details[k] = v;
  }
  const vehicle: VehicleV1 = { ...kept(answers, VEHICLE_KEEP) };
  const label = text(r, 'vehicle.label');
  if (label) vehicle.label = label;
  const brakes = brakesOf(r);
  if (brakes) vehicle.brakes = brakes;
  const share = quantityOf(r, 'vehicle.share', RULES.share);
  if (brakes?.mode === 'wheels' && share !== undefined) vehicle.frontAxleShare = share;
  const track = quantityOf(r, 'vehicle.trackWidth', RULES.trackWidth);
  if (track !== undefined) vehicle.trackWidth = track;
  const entering = included(state, answers, r, !!brakes, track !== undefined);
  const idOf = new Map(entering.map((x) => [x.i, x.id] as const));
  const analyses = withKept(
    unlooped(
      entering.flatMap(
        ({ i, id, kind }) =>
          (kind === 'skid'
            ? skidOf(r, i, id, idOf)
            : kind === 'airborne'
              ? airborneOf(r, i, id)
              : yawOf(r, i, id)) ?? [],
      ),
    ),
    answers,
  ) as Case['analyses'];
  const interview: SavedInterview = {
    version: 1,
    answers: state.answers,
    cursor: state.cursor,
    mode: state.mode,
  };
  const c: Case = {
    ...kept(answers, CASE_KEEP),
    format: 'skidcase-case',
    version: 1,
    id: meta.id,
    units,
    vehicle,
    analyses,
    interview,
  };
  if (meta.created) c.created = meta.created;
  if (meta.updated) c.updated = meta.updated;
  if (Object.keys(details).length) c.details = details;
  const limit = quantityOf(r, 'limit', RULES.postedLimit);
  if (limit !== undefined) c.postedLimit = limit;
  const sampling = samplingOf(r);
  if (sampling) c.sampling = sampling;
  restoreNotes(c, answers);
  return c;
}
