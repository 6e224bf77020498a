import { spread } from '../engine/spread.js';
import type { Case } from '../case/load.js';
import { DEFAULT_REACTION_TIME } from '../engine/constants.js';
import { unitsOf } from '../engine/index.js';
import type { AnalysisSolution, Outcome } from '../engine/types.js';
import { samplingFromCase, timeDistanceFromCase } from './case-fields.js';
import { limitComparison, type LimitComparison } from './limit-comparison.js';
import { segmentLabels } from './limit-inputs.js';
import { sensitivitySvg, speedAlongSlideSvg, yawArcSvg } from './pictures-svg.js';
import { sampleSpeeds, type SampleSummary } from './sampling.js';
import { sensitivity, type SensitivityRow } from './sensitivity.js';
import { yawFromOffsets, type YawFromOffsets } from './yaw-offsets.js';

export interface ExtrasOptions {
  /** The user's preferred perception-reaction time, s (the case's own `timeDistance` wins). */
  reactionTime?: number;
}

/** Everything the extras add to one solved analysis, for the review screen and the report. */
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
  /** Self-contained SVG pictures, ready to write beside a report. */
  svg: { speed?: string; yaw?: string; sensitivity: string };
}

/**
 * Runs every extra that applies to one solved analysis of a case: sensitivity always; sampling if
 * the case has a `sampling` field; time and distance at the posted limit for a skid analysis when
 * the case has a posted limit (reaction time from the analysis's `timeDistance`, else the
 * preference, else 1.5 s); the offsets fit for a yaw analysis with `offsets`; and the pictures.
 * Each part that can fail is an Outcome of its own, so one failing part never hides the others.
 * @example analysisExtras(c, solution, { reactionTime: prefs.reactionTime }).limit
 */
export function analysisExtras(
  c: Case,
  solution: AnalysisSolution,
  opts: ExtrasOptions = {},
): AnalysisExtras {
  const u = unitsOf(c.units);
  const rows = sensitivity(solution);
  const labels = segmentLabels(c, solution.id);
  const out: AnalysisExtras = {
    sensitivity: rows,
    segmentLabels: labels,
    svg: { sensitivity: sensitivitySvg(rows, { speedUnit: u.speed }) },
  };
  const sampling = samplingFromCase(c);
  if (!sampling.ok) out.sampling = sampling;
  else if (sampling.value) out.sampling = sampleSpeeds(solution.model, sampling.value);

  const a = c.analyses.find((x) => x.id === solution.id);
  if (solution.kind === 'skid') {
    out.svg.speed = speedAlongSlideSvg(solution, {
      segmentLabels: labels,
      speedUnit: u.speed,
      lengthUnit: u.length,
    });
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
    // Measured by offsets, the sketch shows the fitted arc's chord and middle ordinate.
    const chord = a.chord ?? a.offsets?.chord;
    const ordinate =
      a.middleOrdinate !== undefined
        ? spread(a.middleOrdinate).value
        : fit.ok
          ? fit.value?.fit.middleOrdinate
          : undefined;
    if (chord !== undefined && ordinate !== undefined)
      out.svg.yaw = yawArcSvg(spread(chord).value, ordinate, { lengthUnit: u.length });
  }
  return out;
}
