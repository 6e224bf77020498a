/**
 * Answers derived from a case's fields, for a hand-written case (or one edited by hand): so it
 * can be reviewed and edited in the interview, and built again with the same figures.
 */
import { airborneAnswers } from './airborne-answers.js';
import { type Quantity } from '../case/quantity.js';
import { spread } from '../engine/spread.js';
import type { Case } from '../case/load.js';
import type { DragV1 } from '../case/v1/schema.js';
import type { Answers } from './types.js';
import { allQuestions } from './questions.js';
import { contextOf } from './answer-values.js';
import { quantityText } from './read-quantity.js';
import { signed } from './signed.js';
import { surfaceRow, OTHER_SURFACE } from './drag-table.js';
import { WHEELS } from './wheels.js';
import { isSegment } from './answers-read.js';
import { DEFAULT_SAMPLES, DEFAULT_SEED } from '../extras/sampling.js';
import { notesOf, NOTES_KEEP } from './kept-notes.js';
import { ANALYSES_KEEP, splitAnalyses } from './kept-analyses.js';
import {
  analysisKeptFields,
  analysisKeep,
  caseExtras,
  CASE_KEEP,
  vehicleExtras,
  VEHICLE_KEEP,
} from './kept-fields.js';

const low = (q: Quantity) => (typeof q === 'number' ? q : (q.low ?? q.value));
const val = (q: Quantity) => (typeof q === 'number' ? q : q.value);
const list = (qs: readonly Quantity[]) => qs.map(quantityText).join(', ');

/** Sets every answer's value by reading its text through its question, as if it had been typed. */
function normalize(answers: Answers): Answers {
  const ctx = contextOf(answers);
  const out: Answers = { ...answers };
  for (const q of allQuestions(answers)) {
    const a = answers[q.id];
    if (!a) continue;
    const r = q.parse(a.text, ctx);
    if (r.ok) out[q.id] = { text: a.text, value: r.value };
  }
  return out;
}

function dragAnswers(
  put: (id: string, text: string, value?: unknown) => void,
  p: string,
  d: DragV1,
): void {
  put(`${p}.drag.source`, d.source);
  if (d.source === 'entered' || d.source === 'table') {
    put(
      `${p}.drag.value`,
      quantityText({
        value: d.value,
        ...(d.low !== undefined ? { low: d.low } : {}),
        ...(d.high !== undefined ? { high: d.high } : {}),
      }),
    );
    if (d.source === 'table') {
      if (d.surface && surfaceRow(d.surface)) put(`${p}.drag.surface`, d.surface);
      else {
        put(`${p}.drag.surface`, OTHER_SURFACE);
        put(`${p}.drag.surfaceName`, d.surface ?? '');
      }
    }
  } else if (d.source === 'test-skids') {
    if (d.factors) {
      put(`${p}.drag.tests`, d.factors.map(quantityText).join(', '));
      if (d.gradeTakenOut !== undefined)
        put(`${p}.drag.factorsGrade`, d.gradeTakenOut ? 'level' : 'on-grade');
    } else
      put(
        `${p}.drag.tests`,
        (d.tests ?? [])
          .map((t) => `${quantityText(t.speed)}/${quantityText(t.distance)}`)
          .join(', '),
      );
  } else if (d.source === 'sled') {
    put(`${p}.drag.weight`, quantityText(d.weight));
    put(`${p}.drag.pulls`, list(d.pulls));
  } else put(`${p}.drag.readings`, list(d.readings));
}

/** A signed slope as direction + positive percent. */
function slopeAnswers(
  put: (id: string, text: string) => void,
  id: string,
  q: Quantity | undefined,
  words: [string, string, string],
): void {
  const [none, up, down] = words;
  if (
    q === undefined ||
    (val(q) === 0 && low(q) === 0 && (typeof q === 'number' || (q.high ?? 0) === 0))
  )
    return put(`${id}.dir`, none);
  const negative = val(q) < 0;
  put(`${id}.dir`, negative ? down : up);
  put(`${id}.pct`, quantityText(signed(q, negative)));
}

const same = (a: Quantity | undefined, b: Quantity | undefined) =>
  JSON.stringify(spreadOf(a)) === JSON.stringify(spreadOf(b));
const spreadOf = (q: Quantity | undefined) => {
  const { note: _n, ...s } = spread(q ?? 0);
  return s;
};

/**
 * Where test skids ran, from their `testGrade`: the same stretch when it equals the segment's
 * grade (a segment, `grade` given), elsewhere on that grade otherwise (level when absent).
 */
function testGradeAnswers(
  put: (id: string, text: string) => void,
  p: string,
  d: DragV1,
  grade?: Quantity,
): void {
  if (d.source !== 'test-skids') return;
  const segment = isSegment(p);
  if (segment && d.testGrade !== undefined && same(d.testGrade, grade))
    return put(`${p}.drag.testWhere`, 'same');
  if (segment) put(`${p}.drag.testWhere`, 'elsewhere');
  slopeAnswers(put, `${p}.drag.testGrade`, d.testGrade, ['level', 'uphill', 'downhill']);
}

/**
 * Keeps what no question asks: the case's and vehicle's other fields, and a front-axle share or
 * track width that no answer uses (brakes not given per wheel; no centre-of-mass path).
 */
function keepFields(c: Case, put: (id: string, text: string, value?: unknown) => void): void {
  const top = caseExtras(c);
  if (top) put(CASE_KEEP, '', top);
  const v = c.vehicle;
  const halfTrack = splitAnalyses(c.analyses).asked.some(
    (a) => a.kind === 'yaw' && a.pathAdjustment === 'half-track',
  );
  // Without a slide the brakes are not asked: brakes given in the file are kept as they are.
  const asked = hasSlide(c);
  const vehicle = {
    ...vehicleExtras(v),
    ...(v.brakes !== undefined && !asked ? { brakes: v.brakes } : {}),
    ...(v.frontAxleShare !== undefined && (!asked || v.brakes?.mode !== 'wheels')
      ? { frontAxleShare: v.frontAxleShare }
      : {}),
    ...(v.trackWidth !== undefined && !halfTrack ? { trackWidth: v.trackWidth } : {}),
  };
  if (Object.keys(vehicle).length) put(VEHICLE_KEEP, '', vehicle);
}

/** A slide the interview asks about (a kept one does not bring the brakes questions). */
const hasSlide = (c: Case) => splitAnalyses(c.analyses).asked.some((a) => a.kind === 'skid');

/** Answers that say what a hand-written case says. */
export function answersFromCase(c: Case): Answers {
  const A: Answers = {};
  const put = (id: string, text: string, value: unknown = text) => {
    A[id] = { text, value };
  };
  for (const k of ['reference', 'occurred', 'location', 'investigator', 'notes'] as const)
    put(`details.${k}`, c.details?.[k] ?? '');
  put('units', c.units);
  put('limit', c.postedLimit === undefined ? '' : quantityText(c.postedLimit));
  const v = c.vehicle;
  put('vehicle.label', v.label ?? '');
  const brakes = hasSlide(c) ? v.brakes : undefined;
  if (brakes) put('vehicle.brakes', brakes.mode);
  if (brakes?.mode === 'estimate') {
    put('vehicle.brakes.efficiency', quantityText(brakes.efficiency));
    put('vehicle.brakes.basis', brakes.basis ?? '');
  }
  if (v.frontAxleShare !== undefined && brakes?.mode === 'wheels')
    put('vehicle.share', quantityText(v.frontAxleShare));
  if (brakes?.mode === 'wheels') {
    const b = brakes;
    for (const w of WHEELS) {
      const q = b[w.key];
      const choice = q === 1 ? 'working' : q === 0 ? 'none' : 'partly';
      put(`vehicle.wheel.${w.id}`, choice);
      if (choice === 'partly') put(`vehicle.wheel.${w.id}.fraction`, quantityText(q));
    }
  }
  if (v.trackWidth !== undefined) put('vehicle.trackWidth', quantityText(v.trackWidth));
  keepFields(c, put);
  const notes = notesOf(c);
  if (notes.length) put(NOTES_KEEP, '', notes);
  const { asked, kept: keptList } = splitAnalyses(c.analyses);
  if (keptList.length) put(ANALYSES_KEEP, '', keptList);
  asked.forEach((a, i) => {
    const p = `a${i}`;
    put(`${p}.id`, a.id);
    // Without a limit the time-distance questions are not asked: the field is kept as it is.
    const timeKept =
      a.kind === 'skid' && a.timeDistance && c.postedLimit === undefined
        ? { timeDistance: a.timeDistance }
        : {};
    const extra = { ...analysisKeptFields(a), ...timeKept };
    if (Object.keys(extra).length) put(analysisKeep(i), '', extra);
    put(`${p}.label`, a.label ?? '');
    put(`${p}.more`, i < asked.length - 1 ? 'yes' : 'no');
    if (a.kind === 'yaw') {
      put(`${p}.look`, 'yaw');
      put(`${p}.measure`, a.offsets ? 'offsets' : a.points ? 'points' : 'ordinate');
      if (a.points) {
        // The points left out follow those fitted, numbered on from them.
        const all = [...a.points, ...(a.pointsLeftOut ?? [])];
        put(`${p}.points`, all.map(([x, y]) => `${x} ${y}`).join('; '));
        const n = a.points.length;
        const k = a.pointsLeftOut?.length ?? 0;
        if (all.length > 3)
          put(`${p}.points.drop`, k === 0 ? '' : k === 1 ? `${n + 1}` : `${n + 1}-${n + k}`);
      }
      if (a.offsets) {
        put(`${p}.offsets.chord`, quantityText(a.offsets.chord));
        put(
          `${p}.offsets.stations`,
          a.offsets.stations.map((st) => `${st.at} ${st.offset}`).join(', '),
        );
      }
      if (a.chord !== undefined) put(`${p}.chord`, quantityText(a.chord));
      if (a.middleOrdinate !== undefined) put(`${p}.ordinate`, quantityText(a.middleOrdinate));
      dragAnswers(put, p, a.drag);
      testGradeAnswers(put, p, a.drag);
      slopeAnswers(put, `${p}.bank`, a.superelevation, ['none', 'toward', 'away']);
      put(`${p}.path`, a.pathAdjustment ?? 'none');
      return;
    }
    if (a.kind === 'airborne') {
      airborneAnswers(put, p, a);
      return;
    }
    put(`${p}.look`, a.appearance && a.appearance !== 'locked' ? a.appearance : 'dark');
    const one = a.segments.length === 1 && a.segments[0]!.length === undefined;
    put(`${p}.surfaces`, one ? 'one' : 'several');
    if (!one) put(`${p}.segcount`, String(a.segments.length), a.segments.length);
    if (a.marks && a.marks.length > 0) {
      put(`${p}.count`, String(a.marks.length), a.marks.length);
      put(`${p}.marks`, list(a.marks));
      if (a.marks.length > 1) put(`${p}.rule`, a.distanceRule ?? 'average');
    } else if (!one) put(`${p}.count`, '', undefined);
    a.segments.forEach((s, j) => {
      const sp = `${p}.seg${j}`;
      put(`${sp}.label`, s.label ?? '');
      if (!one && s.length !== undefined) put(`${sp}.length`, quantityText(s.length));
      dragAnswers(put, sp, s.drag);
      slopeAnswers(put, `${sp}.grade`, s.grade, ['level', 'uphill', 'downhill']);
      testGradeAnswers(put, sp, s.drag, s.grade);
    });
    if (a.end?.mode === 'analysis') {
      put(`${p}.end`, 'next');
      const to = asked.findIndex((x) => x.id === (a.end as { analysis: string }).analysis);
      put(`${p}.end.into`, String(to + 1));
    } else if (a.end?.mode === 'speed') {
      put(`${p}.end`, 'speed');
      put(`${p}.end.speed`, quantityText(a.end.speed));
      put(`${p}.end.basis`, a.end.basis ?? '');
    } else put(`${p}.end`, 'rest');
    if (c.postedLimit !== undefined) {
      const t = a.timeDistance;
      put(`${p}.conflict`, t?.conflictAt === undefined ? '' : String(t.conflictAt));
      put(`${p}.reaction`, t?.reactionTime === undefined ? '' : String(t.reactionTime));
    }
  });
  const sm = c.sampling;
  put('sampling.shape', sm ? (sm.shape ?? 'uniform') : 'none');
  if (sm) {
    put('sampling.samples', String(sm.samples ?? DEFAULT_SAMPLES));
    put('sampling.seed', String(sm.seed ?? DEFAULT_SEED));
  }
  return normalize(A);
}
