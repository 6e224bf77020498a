/**
 * The case file (v1) made from the interview's answers: details, vehicle and only the analyses
 * whose questions are all answered and valid, with the interview's progress so it resumes.
 */
import type { Quantity } from '../case/quantity.js';
import type { Case } from '../case/load.js';
import type { AnalysisV1, BrakesV1, DragV1, SegmentV1, VehicleV1 } from '../case/v1/schema.js';
import type { Answers, CaseMeta, InterviewState, SavedInterview } from './types.js';
import { formatSegmentLine } from '../input/index.js';
import {
  analysisCount,
  choiceOf,
  markLook,
  segmentCount,
  surfaceMode,
  unitsOf,
} from './answers-read.js';
import { readAnswers, type AnswerReader } from './answer-values.js';
import { OTHER_SURFACE } from './drag-table.js';
import { WHEELS } from './questions-vehicle.js';
import { signed } from './signed.js';

type Q = Quantity;

/** `{ value, low, high }` of a Quantity, for the drag shapes that take the fields flat. */
function flat(q: Q): { value: number; low?: number; high?: number } {
  return typeof q === 'number'
    ? { value: q }
    : {
        value: q.value,
        ...(q.low !== undefined ? { low: q.low } : {}),
        ...(q.high !== undefined ? { high: q.high } : {}),
      };
}

function dragOf(r: AnswerReader, p: string): DragV1 {
  const source = r.value(`${p}.drag.source`);
  if (source === 'test-skids')
    return { source, tests: r.value(`${p}.drag.tests`) as { speed: Q; distance: Q }[] };
  if (source === 'sled')
    return {
      source,
      weight: r.value(`${p}.drag.weight`) as Q,
      pulls: r.value(`${p}.drag.pulls`) as Q[],
    };
  if (source === 'decelerometer') return { source, readings: r.value(`${p}.drag.readings`) as Q[] };
  const v = flat(r.value(`${p}.drag.value`) as Q);
  if (source === 'table') {
    const key = r.value(`${p}.drag.surface`) as string;
    const surface = key === OTHER_SURFACE ? (r.value(`${p}.drag.surfaceName`) as string) : key;
    return { source, surface, ...v };
  }
  return { source: 'entered', ...v };
}

function slopeOf(
  r: AnswerReader,
  id: string,
  negativeWord: string,
  noneWord: string,
): Q | undefined {
  const dir = r.value(`${id}.dir`);
  if (dir === noneWord || dir === undefined) return undefined;
  return signed(r.value(`${id}.pct`) as Q, dir === negativeWord);
}

const text = (r: AnswerReader, id: string) => {
  const v = r.value(id);
  return typeof v === 'string' && v !== '' ? v : undefined;
};

/** The segments of slide `i` as the case stores them; read only when their questions are complete. */
function segmentsOf(r: AnswerReader, i: number): SegmentV1[] {
  const several = surfaceMode(r.answers, i) !== 'one';
  const segments: SegmentV1[] = [];
  for (let j = 0; j < segmentCount(r.answers, i); j++) {
    const sp = `a${i}.seg${j}`;
    const s: SegmentV1 = { drag: dragOf(r, sp) };
    const label = text(r, `${sp}.label`);
    if (label) s.label = label;
    if (several) s.length = r.value(`${sp}.length`) as Q;
    const g = slopeOf(r, `${sp}.grade`, 'downhill', 'level');
    if (g !== undefined) s.grade = g;
    segments.push(s);
  }
  return segments;
}

/**
 * The segments of slide `i` written on one quick-entry line, when every segment question is
 * answered and the line can say them (undefined otherwise): Enter then keeps them as they are.
 */
export function segmentsLine(answers: Answers, i: number): string | undefined {
  const r = readAnswers(answers);
  const own = new RegExp(`^a${i}\\.seg\\d+\\.`);
  if (segmentCount(answers, i) === 0 || !r.complete((id) => own.test(id))) return undefined;
  return formatSegmentLine(segmentsOf(r, i));
}

function skidOf(r: AnswerReader, i: number, id: string): AnalysisV1 {
  const p = `a${i}`;
  const segments = segmentsOf(r, i);
  const out: AnalysisV1 = { id, kind: 'skid', segments };
  const label = text(r, `${p}.label`);
  if (label) out.label = label;
  const marks = r.value(`${p}.marks`);
  if (Array.isArray(marks)) out.marks = marks as Q[];
  const rule = r.value(`${p}.rule`);
  if (rule === 'average' || rule === 'longest') out.distanceRule = rule;
  const end = r.value(`${p}.end`);
  if (end === 'speed') {
    const basis = text(r, `${p}.end.basis`);
    out.end = { mode: 'speed', speed: r.value(`${p}.end.speed`) as Q, ...(basis ? { basis } : {}) };
  } else out.end = { mode: 'stop' };
  return out;
}

function yawOf(r: AnswerReader, i: number, id: string): AnalysisV1 {
  const p = `a${i}`;
  const out: AnalysisV1 = {
    id,
    kind: 'yaw',
    chord: r.value(`${p}.chord`) as Q,
    middleOrdinate: r.value(`${p}.ordinate`) as Q,
    drag: dragOf(r, p),
    pathAdjustment: r.value(`${p}.path`) === 'half-track' ? 'half-track' : 'none',
  };
  const label = text(r, `${p}.label`);
  if (label) out.label = label;
  const e = slopeOf(r, `${p}.bank`, 'away', 'none');
  if (e !== undefined) out.superelevation = e;
  return out;
}

function brakesOf(r: AnswerReader): BrakesV1 | undefined {
  if (
    !r.complete(
      (id) =>
        id.startsWith('vehicle.brakes') ||
        id === 'vehicle.share' ||
        id.startsWith('vehicle.wheel.'),
    )
  )
    return undefined;
  const mode = r.value('vehicle.brakes');
  if (mode === 'all') return { mode };
  if (mode === 'estimate') {
    const basis = text(r, 'vehicle.brakes.basis');
    return {
      mode,
      efficiency: r.value('vehicle.brakes.efficiency') as Q,
      ...(basis ? { basis } : {}),
    };
  }
  const wheel = (w: (typeof WHEELS)[number]): Q => {
    const v = r.value(`vehicle.wheel.${w.id}`);
    return v === 'working'
      ? 1
      : v === 'none'
        ? 0
        : (r.value(`vehicle.wheel.${w.id}.fraction`) as Q);
  };
  return {
    mode: 'wheels',
    frontLeft: wheel(WHEELS[0]),
    frontRight: wheel(WHEELS[1]),
    rearLeft: wheel(WHEELS[2]),
    rearRight: wheel(WHEELS[3]),
  };
}

/** Stored id of analysis i (kept from a hand-written case), or `skid-1`, `yaw-2`, ... */
export function analysisId(state: InterviewState, i: number, kind: 'skid' | 'yaw'): string {
  const kept = state.answers[`a${i}.id`]?.text;
  return kept && /^[A-Za-z0-9._-]{1,64}$/.test(kept) ? kept : `${kind}-${i + 1}`;
}

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
  const vehicle: VehicleV1 = {};
  const label = text(r, 'vehicle.label');
  if (label) vehicle.label = label;
  const brakes = brakesOf(r);
  if (brakes) vehicle.brakes = brakes;
  const share = r.value('vehicle.share');
  if (brakes?.mode === 'wheels' && share !== undefined) vehicle.frontAxleShare = share as Q;
  const track = r.value('vehicle.trackWidth');
  if (track !== undefined) vehicle.trackWidth = track as Q;
  const used = new Set<string>();
  const analyses: AnalysisV1[] = [];
  for (let i = 0; i < analysisCount(answers); i++) {
    const look = markLook(answers, i);
    if (look === undefined) continue;
    const own = r.complete((id) => id.startsWith(`a${i}.`) && id !== `a${i}.more`);
    if (!own) continue;
    const kind = look === 'yaw' ? 'yaw' : 'skid';
    if (kind === 'skid' && !brakes) continue;
    if (kind === 'yaw' && choiceOf(answers, `a${i}.path`) === 'half-track' && track === undefined)
      continue;
    let id = analysisId(state, i, kind);
    if (used.has(id)) id = `${kind}-${i + 1}-${used.size}`;
    used.add(id);
    analyses.push(kind === 'skid' ? skidOf(r, i, id) : yawOf(r, i, id));
  }
  const interview: SavedInterview = {
    version: 1,
    answers: state.answers,
    cursor: state.cursor,
    mode: state.mode,
  };
  const c: Case = {
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
  const limit = r.value('limit');
  if (limit !== undefined) c.postedLimit = limit as Q;
  return c;
}
