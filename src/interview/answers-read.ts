/**
 * Reading branch answers (choices and counts) that decide which questions apply. Branching looks
 * only at these, whose values never depend on the case's units.
 */
import type { UnitSystem } from '../engine/types.js';
import type { Answers } from './types.js';

export function choiceOf(answers: Answers, id: string): string | undefined {
  const v = answers[id]?.value;
  return typeof v === 'string' ? v : undefined;
}

export function countOf(answers: Answers, id: string): number | undefined {
  const v = answers[id]?.value;
  return typeof v === 'number' && Number.isInteger(v) ? v : undefined;
}

export function unitsOf(answers: Answers): UnitSystem {
  return choiceOf(answers, 'units') === 'metric' ? 'metric' : 'imperial';
}

/** Most analyses a case may hold through the interview. */
export const MAX_ANALYSES = 9;
/** Most segments in one slide through the interview; a file may hold more (kept-analyses.ts). */
export const MAX_SEGMENTS = 64;

/** Analyses in play: the first, and one more for each "add another" answered yes in a row. */
export function analysisCount(answers: Answers): number {
  let i = 0;
  while (
    i < MAX_ANALYSES - 1 &&
    (choiceOf(answers, `a${i}.more`) === 'yes' || fedByChain(answers, i))
  )
    i++;
  return i + 1;
}

/** The analysis (0-based) slide `i` runs on into, when its end says so. */
export function endsInto(a: Answers, i: number): number | undefined {
  if (choiceOf(a, `a${i}.end`) !== 'next') return undefined;
  const n = Number(choiceOf(a, `a${i}.end.into`));
  return Number.isInteger(n) && n >= 1 && n <= MAX_ANALYSES && n - 1 !== i ? n - 1 : undefined;
}

/**
 * Whether an analysis up to `i` runs on into analysis `i + 1`: the marks it went on into are then
 * part of the case whatever "Another analysis?" says, so they are asked for and never silently
 * dropped with the slide that leads into them.
 */
export function fedByChain(a: Answers, i: number): boolean {
  for (let k = 0; k <= i; k++) if (endsInto(a, k) === i + 1) return true;
  return false;
}

/** What the marks look like. */
export type MarkLook = 'dark' | 'abs' | 'skip' | 'gap' | 'yaw' | 'airborne';

export function markLook(answers: Answers, i: number): MarkLook | undefined {
  const v = choiceOf(answers, `a${i}.look`);
  return v === 'dark' ||
    v === 'abs' ||
    v === 'skip' ||
    v === 'gap' ||
    v === 'yaw' ||
    v === 'airborne'
    ? v
    : undefined;
}

export const isSlideLook = (l: MarkLook | undefined): boolean =>
  l !== undefined && l !== 'yaw' && l !== 'airborne';

/** How the slide's surfaces are entered: `one` surface, `several` one at a time, or `quick` line. */
export function surfaceMode(answers: Answers, i: number): 'one' | 'several' | 'quick' | undefined {
  const v = choiceOf(answers, `a${i}.surfaces`);
  return v === 'one' || v === 'several' || v === 'quick' ? v : undefined;
}

/**
 * True when slide `i` is entered in parts, each with its length: several surfaces, or a quick line
 * of more than one segment (or one with a length). A quick line of one segment without a length
 * (`@0.74 -1%`) is one surface: its distance comes from the marks, as with `one`.
 */
export function slideInParts(answers: Answers, i: number): boolean {
  const mode = surfaceMode(answers, i);
  if (mode === 'several') return true;
  if (mode !== 'quick') return false;
  const v = answers[`a${i}.quick`]?.value;
  return !(
    Array.isArray(v) &&
    v.length === 1 &&
    (v[0] as { length?: unknown } | undefined)?.length === undefined
  );
}

/** Segments in play for slide `i` (0 while the count is not yet known). */
export function segmentCount(answers: Answers, i: number): number {
  const mode = surfaceMode(answers, i);
  if (mode === undefined) return 0;
  if (mode === 'one' && markLook(answers, i) !== 'gap') return 1;
  if (mode === 'quick') {
    const v = answers[`a${i}.quick`]?.value;
    return Array.isArray(v) ? Math.min(v.length, MAX_SEGMENTS) : 0;
  }
  return Math.min(countOf(answers, `a${i}.segcount`) ?? 0, MAX_SEGMENTS);
}

/** Highest index + 1 seen in answer ids matching `re` (its first group is the index). */
export function maxIndexIn(answers: Answers, re: RegExp): number {
  let max = 0;
  for (const id of Object.keys(answers)) {
    const m = re.exec(id);
    if (m) max = Math.max(max, Number(m[1]) + 1);
  }
  return max;
}

/** True for a slide segment's prefix (`a0.seg1`); a yaw's drag (`a2`) has no grade of its own. */
export const isSegment = (prefix: string): boolean => /^a\d+\.seg\d+$/.test(prefix);

/** Where the tests were run, for segment `prefix`: `same` stretch and direction, or `elsewhere`. */
export const testWhere = (a: Answers, prefix: string): string | undefined =>
  choiceOf(a, `${prefix}.drag.testWhere`);

/** True when the tests under `prefix` were typed as drag factors worked out from them. */
export const testsAsFactors = (a: Answers, prefix: string): boolean => {
  const v = a[`${prefix}.drag.tests`]?.value;
  return typeof v === 'object' && v !== null && 'factors' in v;
};

/** True when typed test factors were said to be level-ground (their test grade taken out). */
export const factorsLevel = (a: Answers, prefix: string): boolean =>
  choiceOf(a, `${prefix}.drag.factorsGrade`) === 'level';
