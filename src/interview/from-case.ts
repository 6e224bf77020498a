/**
 * Resume: the interview state of a case. From its saved `interview` when present; for a
 * hand-written case, the answers are derived from its fields so it can be reviewed and edited.
 */
import { z } from 'zod';
import type { Quantity } from '../case/quantity.js';
import type { Case } from '../case/load.js';
import type { DragV1 } from '../case/v1/schema.js';
import type { Answers, InterviewState } from './types.js';
import { allQuestions } from './questions.js';
import { contextOf } from './answer-values.js';
import { quantityText } from './read-quantity.js';
import { firstOpenIn, REVIEW } from './navigate.js';
import { signed } from './signed.js';
import { buildCase } from './build-case.js';
import { surfaceRow, OTHER_SURFACE } from './drag-table.js';
import { WHEELS } from './questions-vehicle.js';

const savedSchema = z.object({
  version: z.literal(1),
  answers: z.record(z.string(), z.object({ text: z.string(), value: z.unknown() })),
  cursor: z.string(),
  mode: z.enum(['guided', 'brisk']),
});

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
      if (surfaceRow(d.surface)) put(`${p}.drag.surface`, d.surface);
      else {
        put(`${p}.drag.surface`, OTHER_SURFACE);
        put(`${p}.drag.surfaceName`, d.surface);
      }
    }
  } else if (d.source === 'test-skids') {
    put(
      `${p}.drag.tests`,
      d.tests.map((t) => `${quantityText(t.speed)}/${quantityText(t.distance)}`).join(', '),
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
  if (v.brakes) put('vehicle.brakes', v.brakes.mode);
  if (v.brakes?.mode === 'estimate') {
    put('vehicle.brakes.efficiency', quantityText(v.brakes.efficiency));
    put('vehicle.brakes.basis', v.brakes.basis ?? '');
  }
  if (v.frontAxleShare !== undefined) put('vehicle.share', quantityText(v.frontAxleShare));
  if (v.brakes?.mode === 'wheels') {
    const b = v.brakes;
    for (const w of WHEELS) {
      const q = b[w.key];
      const choice = q === 1 ? 'working' : q === 0 ? 'none' : 'partly';
      put(`vehicle.wheel.${w.id}`, choice);
      if (choice === 'partly') put(`vehicle.wheel.${w.id}.fraction`, quantityText(q));
    }
  }
  if (v.trackWidth !== undefined) put('vehicle.trackWidth', quantityText(v.trackWidth));
  c.analyses.forEach((a, i) => {
    const p = `a${i}`;
    put(`${p}.id`, a.id);
    put(`${p}.label`, a.label ?? '');
    put(`${p}.more`, i < c.analyses.length - 1 ? 'yes' : 'no');
    if (a.kind === 'yaw') {
      put(`${p}.look`, 'yaw');
      put(`${p}.chord`, quantityText(a.chord));
      put(`${p}.ordinate`, quantityText(a.middleOrdinate));
      dragAnswers(put, p, a.drag);
      slopeAnswers(put, `${p}.bank`, a.superelevation, ['none', 'toward', 'away']);
      put(`${p}.path`, a.pathAdjustment ?? 'none');
      return;
    }
    put(`${p}.look`, 'dark');
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
    });
    if (a.end?.mode === 'speed') {
      put(`${p}.end`, 'speed');
      put(`${p}.end.speed`, quantityText(a.end.speed));
      put(`${p}.end.basis`, a.end.basis ?? '');
    } else put(`${p}.end`, 'rest');
  });
  return normalize(A);
}

/** JSON with object keys sorted, so two cases compare by content and not by key order. */
function canonical(x: unknown): string {
  return JSON.stringify(x, (_k, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(
          Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : 1)),
        )
      : v,
  );
}

/** What the case says, apart from the interview and the timestamps. */
const figuresOf = (c: Case) =>
  canonical({ ...c, interview: undefined, created: undefined, updated: undefined });

export const EDITED_NOTICE =
  'The file was changed outside the interview since it was saved: the answers are read again from its fields.';

/**
 * The state to resume a case with. The saved interview is used when it still makes exactly the
 * case in the file; if the file was edited by hand since, its fields win (the file is what
 * `solve` reads) and the answers are derived from them, with a notice.
 */
export function stateFromCase(c: Case): InterviewState {
  const saved = savedSchema.safeParse(c.interview);
  if (saved.success) {
    const { answers, cursor, mode } = saved.data as {
      answers: Answers;
      cursor: string;
      mode: 'guided' | 'brisk';
    };
    const st: InterviewState = { answers, cursor, undo: [], mode, explain: mode === 'guided' };
    const meta = { id: c.id, units: c.units, ...(c.created ? { created: c.created } : {}) };
    if (figuresOf(buildCase(st, meta)) === figuresOf(c)) return st;
    return { ...fromFields(c), mode, explain: mode === 'guided', notice: EDITED_NOTICE };
  }
  return fromFields(c);
}

function fromFields(c: Case): InterviewState {
  const answers = answersFromCase(c);
  const cursor = firstOpenIn(answers);
  return {
    answers,
    cursor: cursor === REVIEW ? REVIEW : cursor,
    undo: [],
    mode: 'guided',
    explain: true,
  };
}
