/**
 * Analyses the interview cannot ask about: kept from the file exactly as they are, in a hidden
 * answer, and put back at their place when the case is built again. The interview never drops
 * what it cannot show: a slide that runs into another analysis, a yaw
 * measured by surveyed points, or more marks, surfaces or analyses than its questions take.
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
  if (a.kind === 'yaw' && a.points !== undefined)
    return 'the interview does not ask for surveyed points';
  if (a.kind === 'skid') {
    if (a.end?.mode === 'analysis')
      return 'the interview does not ask for a slide that runs into another analysis';
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
  list.forEach((analysis, at) => {
    const why =
      beyondInterview(analysis) ??
      (asked.length >= MAX_ANALYSES
        ? `the interview takes up to ${MAX_ANALYSES} analyses`
        : undefined);
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
