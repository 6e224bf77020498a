import type { Case } from '../case/load.js';
import { DEFAULT_REACTION_TIME } from '../engine/constants.js';
import type { AnalysisSolution, CaseSolution, Outcome } from '../engine/types.js';
import { samplingFromCase, timeDistanceFromCase } from './case-fields.js';
import { limitComparison, type LimitComparison } from './limit-comparison.js';
import { segmentLabels } from './limit-inputs.js';
import { sampleSpeeds, type SampleOptions, type SampleSummary } from './sampling.js';
import { sensitivity, type SensitivityRow } from './sensitivity.js';

/** What the caller knows beside the case: the investigator's settings, where it has them. */
export interface ExtrasSettings {
  /** The investigator's preferred perception-reaction time, s (the case's own `timeDistance` wins). */
  reactionTime?: number;
  /**
   * How the default reaction time is described when neither the case nor a preference sets it
   * (`solve` reads no preferences and says so); default: "default".
   */
  defaultReactionNote?: string;
  /** Sample the inputs even when the case has no `sampling` field (the case's field wins). */
  sampling?: SampleOptions;
}

/**
 * What the extras add to one solved analysis: the figures beyond the chain itself. Every screen
 * and file that shows them (the review, `solve`'s text and JSON, each report format) reads this,
 * built once by `caseResult`; none of them runs an extra itself.
 */
export interface AnalysisExtras {
  /** One input at a time at the ends of its range, largest swing first. */
  sensitivity: SensitivityRow[];
  /** Present when the case asks for it (`sampling`) or the caller does. */
  sampling?: Outcome<SampleSummary>;
  /** Present for a skid analysis when the case has a posted limit or the analysis a conflict point. */
  limit?: Outcome<LimitComparison>;
  /** Surfaces of a skid analysis's segments, as the case names them (for the pictures). */
  segmentLabels: string[];
}

/** Where the reaction time comes from, in the words every output uses. */
export const REACTION_ORIGIN = {
  caseFile: 'set in the case file',
  preference: 'from the preferences',
  default: 'default',
} as const;

/**
 * Runs every extra that applies to one solved analysis of a case: sensitivity always; sampling if
 * the case (or the caller) asks for it; time and distance at the posted limit for a skid when the
 * case has a posted limit or the analysis a conflict point (reaction time from the analysis's
 * `timeDistance`, else the preference, else the default). Each part that can fail is an Outcome
 * of its own, so one failing part never hides the others.
 * @example analysisExtras(c, solution, { reactionTime: prefs.reactionTime }).limit
 */
export function analysisExtras(
  c: Case,
  solution: AnalysisSolution,
  settings: ExtrasSettings = {},
): AnalysisExtras {
  const out: AnalysisExtras = {
    sensitivity: sensitivity(solution),
    segmentLabels: segmentLabels(c, solution.id),
  };
  const sampling = samplingFromCase(c);
  if (!sampling.ok) out.sampling = sampling;
  else {
    const set = sampling.value ?? settings.sampling;
    if (set) out.sampling = sampleSpeeds(solution.model, set);
  }
  if (solution.kind !== 'skid') return out;
  const td = timeDistanceFromCase(c, solution.id);
  if (!td.ok) {
    out.limit = td;
    return out;
  }
  const conflictAt = td.value?.conflictAt;
  if (c.postedLimit === undefined && conflictAt === undefined) return out;
  const own = td.value?.reactionTime;
  const [t, origin] =
    own !== undefined
      ? [own, REACTION_ORIGIN.caseFile]
      : settings.reactionTime !== undefined
        ? [settings.reactionTime, REACTION_ORIGIN.preference]
        : [DEFAULT_REACTION_TIME, settings.defaultReactionNote ?? REACTION_ORIGIN.default];
  out.limit = limitComparison(c, solution, {
    reactionTime: t,
    reactionOrigin: origin,
    ...(conflictAt !== undefined ? { conflictAt } : {}),
  });
  return out;
}

/** One analysis of the result: the engine's outcome and, when it solved, its extras. */
export interface AnalysisResult {
  outcome: CaseSolution['analyses'][number];
  extras?: AnalysisExtras;
}

/**
 * The one result document of a case: the engine's solution and every extra, computed once. The
 * review, `solve` (text and JSON) and every report format render this; none recomputes a figure.
 */
export interface CaseResult {
  case: Case;
  solution: CaseSolution;
  /** In the case's order, one per analysis. */
  analyses: AnalysisResult[];
}

/**
 * Builds the result document from a case and its solution.
 * @example const r = caseResult(c, solveCase(c), { reactionTime: 1.5 }); r.analyses[0]?.extras?.limit
 */
export function caseResult(
  c: Case,
  solution: CaseSolution,
  settings: ExtrasSettings = {},
): CaseResult {
  return {
    case: c,
    solution,
    analyses: solution.analyses.map((outcome) =>
      outcome.ok ? { outcome, extras: analysisExtras(c, outcome.solution, settings) } : { outcome },
    ),
  };
}
