/**
 * Analyses the interview cannot ask about: kept from the file exactly as they are, in a hidden
 * answer, and put back at their place when the case is built again. The interview never drops
 * what it cannot show: a slide that runs into an analysis it keeps, or more marks, surfaces or analyses than its questions take.
 */
import type { AnalysisV1 } from '../case/v1/schema.js';
import type { Answers } from './types.js';
import { MAX_ANALYSES, MAX_SEGMENTS } from './answers-read.js';
import { MAX_MARKS } from '../input/marks-line.js';

/** Hidden answer id of the kept analyses. */
export const ANALYSES_KEEP = 'case.keptAnalyses';

/** One kept analysis: its place in the file's list, why it is kept, and the analysis itself. */
export interface KeptAnalysis {
  at: number;
  why: string;
  analysis: AnalysisV1;
}

/** Why the interview cannot ask about this analysis, or undefined when it can. */
export function beyondInterview(a: AnalysisV1): string | undefined {
  if (a.kind === 'skid') {
    if ((a.marks?.length ?? 0) > MAX_MARKS)
      return `it has ${a.marks!.length} marks; the interview takes up to ${MAX_MARKS}`;
    if (a.segments.length > MAX_SEGMENTS)
      return `it has ${a.segments.length} surfaces; the interview takes up to ${MAX_SEGMENTS}`;
  }
  return undefined;
}

/**
 * Splits a file's analyses into those the interview asks about (at most MAX_ANALYSES, in order)
 * and those it keeps as they are.
 */
export function splitAnalyses(list: readonly AnalysisV1[]): {
  asked: AnalysisV1[];
  kept: KeptAnalysis[];
} {
  const asked: AnalysisV1[] = [];
  const kept: KeptAnalysis[] = [];
  const keep = new Map<number, string>();
  // A slide that runs into an analysis kept as it is, or into none asked, is kept too (and so
  // on along the chain), since its end could not be said by the interview's answers.
  for (let changed = true; changed;) {
    changed = false;
    let count = 0;
    const askedIds = new Set<string>();
    list.forEach((analysis, at) => {
      if (keep.has(at)) return;
      const why =
        beyondInterview(analysis) ??
        (count >= MAX_ANALYSES ? `the interview takes up to ${MAX_ANALYSES} analyses` : undefined);
      if (why) keep.set(at, why);
      else {
        count++;
        askedIds.add(analysis.id);
      }
    });
    list.forEach((a, at) => {
      if (keep.has(at) || a.kind !== 'skid' || a.end?.mode !== 'analysis') return;
      const target = a.end.analysis;
      if (!askedIds.has(target) || target === a.id) {
        keep.set(at, `it runs into analysis "${target}", which the interview does not ask about`);
        changed = true;
      }
    });
  }
  list.forEach((analysis, at) => {
    const why = keep.get(at);
    if (why) kept.push({ at, why, analysis });
    else asked.push(analysis);
  });
  return { asked, kept };
}

const isKept = (x: unknown): x is KeptAnalysis =>
  !!x &&
  typeof x === 'object' &&
  typeof (x as KeptAnalysis).at === 'number' &&
  typeof (x as KeptAnalysis).why === 'string' &&
  !!(x as KeptAnalysis).analysis &&
  typeof (x as KeptAnalysis).analysis === 'object';

/** The kept analyses of a state's answers. */
export function keptAnalyses(answers: Answers): KeptAnalysis[] {
  const v = answers[ANALYSES_KEEP]?.value;
  return Array.isArray(v) ? v.filter(isKept) : [];
}

/**
 * The analyses built from the answers with the kept ones put back at their places (a place past
 * the end goes last). An analysis built from the answers that now has a kept one's id yields it
 * a fresh id, so a chain that points at the kept analysis still finds it.
 */
export function withKept<A extends { id: string }>(
  built: A[],
  answers: Answers,
): (A | AnalysisV1)[] {
  const kept = keptAnalyses(answers);
  if (kept.length === 0) return built;
  const out: (A | AnalysisV1)[] = [...built];
  for (const k of [...kept].sort((x, y) => x.at - y.at))
    out.splice(Math.min(k.at, out.length), 0, k.analysis);
  return out;
}

/** Lines for the resume summary and the review: which analyses are kept and why. */
export function keptLines(answers: Answers): string[] {
  return keptAnalyses(answers).map(
    (k) =>
      `Analysis ${k.at + 1} (${k.analysis.kind}${k.analysis.label ? `, ${k.analysis.label}` : ''}, id ${k.analysis.id}) is kept exactly as in the file: ${k.why}. Its figures are in the review and the report; change it in the file.`,
  );
}
