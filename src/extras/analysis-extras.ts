import type { Case } from '../case/load.js';
import { DEFAULT_REACTION_TIME } from '../engine/constants.js';
import type { AnalysisSolution, Outcome } from '../engine/types.js';
import { samplingFromCase, timeDistanceFromCase } from './case-fields.js';
import { limitComparison, type LimitComparison } from './limit-comparison.js';
import { segmentLabels } from './limit-inputs.js';
import { sampleSpeeds, type SampleSummary } from './sampling.js';
import { sensitivity, type SensitivityRow } from './sensitivity.js';
import { yawFromOffsets, type YawFromOffsets } from './yaw-offsets.js';

export interface ExtrasOptions {
  /** The user's preferred perception-reaction time, s (the case's own `timeDistance` wins). */
  reactionTime?: number;
}

/** What the extras add to one solved analysis, for the review screen (its pictures are drawn as text there). */
export interface AnalysisExtras {
  sensitivity: SensitivityRow[];
  /** Present when the case asks for it (top-level `sampling`). */
  sampling?: Outcome<SampleSummary>;
  /** Present for a skid analysis of a case with a posted limit. */
  limit?: Outcome<LimitComparison>;
  /** Present for a yaw analysis with `offsets`. */
  offsets?: Outcome<YawFromOffsets>;
  /** Surfaces of a skid analysis's segments, as the case names them (for the text chart). */
  segmentLabels: string[];
}

/**
 * Runs every extra that applies to one solved analysis of a case: sensitivity always; sampling if
 * the case has a `sampling` field; time and distance at the posted limit for a skid analysis when
 * the case has a posted limit (reaction time from the analysis's `timeDistance`, else the
 * preference, else the default); the offsets fit for a yaw analysis with `offsets`.
 * Each part that can fail is an Outcome of its own, so one failing part never hides the others.
 * @example analysisExtras(c, solution, { reactionTime: prefs.reactionTime }).limit
 */
export function analysisExtras(
  c: Case,
  solution: AnalysisSolution,
  opts: ExtrasOptions = {},
): AnalysisExtras {
  const rows = sensitivity(solution);
  const labels = segmentLabels(c, solution.id);
  const out: AnalysisExtras = {
    sensitivity: rows,
    segmentLabels: labels,
  };
  const sampling = samplingFromCase(c);
  if (!sampling.ok) out.sampling = sampling;
  else if (sampling.value) out.sampling = sampleSpeeds(solution.model, sampling.value);

  const a = c.analyses.find((x) => x.id === solution.id);
  if (solution.kind === 'skid') {
    if (c.postedLimit !== undefined) {
      const td = timeDistanceFromCase(c, solution.id);
      if (!td.ok) out.limit = td;
      else {
        const own = td.value?.reactionTime;
        const t = own ?? opts.reactionTime ?? DEFAULT_REACTION_TIME;
        const origin =
          own !== undefined
            ? 'set in the case file'
            : opts.reactionTime !== undefined
              ? 'from the preferences'
              : 'default';
        const conflictAt = td.value?.conflictAt;
        out.limit = limitComparison(c, solution, {
          reactionTime: t,
          reactionOrigin: origin,
          ...(conflictAt !== undefined ? { conflictAt } : {}),
        });
      }
    }
  } else if (a && a.kind === 'yaw') {
    const fit = yawFromOffsets(c, solution.id);
    if (!fit.ok) out.offsets = fit;
    else if (fit.value) out.offsets = { ok: true, value: fit.value };
  }
  return out;
}
