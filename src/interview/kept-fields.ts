/**
 * Fields of a case the interview does not ask about (fields the format does not know, brakes of a
 * case without a slide, a time-distance block of a case without a posted limit): kept from a
 * hand-written file in hidden answers and written back unchanged, so a round trip never drops them.
 */
import type { Answers } from './types.js';
import { KNOWN } from '../case/unknown-fields.js';

// The fields the interview writes itself are the format's own (one list, in src/case).
const CASE_OWN = KNOWN.top;
const VEHICLE_OWN = KNOWN.vehicle;
const SKID_OWN = KNOWN.skid;
const YAW_OWN = KNOWN.yaw;
const AIRBORNE_OWN = KNOWN.airborne;

/** Hidden answer ids: not questions, never listed in the jump list. */
export const CASE_KEEP = 'case.keep';
export const VEHICLE_KEEP = 'vehicle.keep';
export const analysisKeep = (i: number): string => `a${i}.keep`;

/** The fields of `obj` not in `own`, or undefined when there are none. */
export function extraFields(
  obj: object,
  own: readonly string[],
): Record<string, unknown> | undefined {
  const out = Object.fromEntries(
    Object.entries(obj).filter(([k, v]) => !own.includes(k) && v !== undefined),
  );
  return Object.keys(out).length ? out : undefined;
}

export const caseExtras = (c: object) => extraFields(c, CASE_OWN);
export const vehicleExtras = (v: object) => extraFields(v, VEHICLE_OWN);
export const analysisKeptFields = (a: { kind: string }) =>
  extraFields(a, a.kind === 'yaw' ? YAW_OWN : a.kind === 'airborne' ? AIRBORNE_OWN : SKID_OWN);

/** The kept fields under a hidden answer id (an object), or an empty object. */
export function kept(answers: Answers, id: string): Record<string, unknown> {
  const v = answers[id]?.value;
  return v && typeof v === 'object' && !Array.isArray(v) ? (v as Record<string, unknown>) : {};
}

/** True for a yaw whose radius was measured by offsets: its chord and ordinate are not asked. */
export const measuredByOffsets = (answers: Answers, i: number): boolean =>
  answers[`a${i}.measure`]?.value === 'offsets';

/** True for a yaw whose radius comes from surveyed points (`points` in the file). */
export const measuredByPoints = (answers: Answers, i: number): boolean =>
  answers[`a${i}.measure`]?.value === 'points';

/** Answers that are not questions (kept ids and fields). */
export const isMetaAnswer = (id: string): boolean =>
  /^a\d+\.(id|keep)$/.test(id) ||
  id === CASE_KEEP ||
  id === VEHICLE_KEEP ||
  id === 'case.notes' ||
  id === 'case.keptAnalyses';
