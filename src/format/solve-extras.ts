import type { Case } from '../case/load.js';
import { DEFAULT_REACTION_TIME } from '../engine/constants.js';
import type { AnalysisSolution, Outcome } from '../engine/types.js';
import { limitComparison, type LimitComparison } from '../extras/limit-comparison.js';
import { sampleSpeeds, type SampleSummary } from '../extras/sampling.js';
import { sensitivity, type SensitivityRow } from '../extras/sensitivity.js';

/** Where the default reaction time comes from, as `solve` says it: solve reads no preferences. */
export const SOLVE_REACTION_ORIGIN = `default ${DEFAULT_REACTION_TIME} s (solve does not read the preferences; set timeDistance.reactionTime in the case to change it)`;

/** What `solve` adds to one solved analysis beyond the contract's fields. */
export interface SolveExtras {
  sensitivity: SensitivityRow[];
  /** Skid analyses, when the case has a posted limit or the analysis a conflict point. */
  timeDistance?: Outcome<LimitComparison>;
  /** When the case has `sampling`. */
  distribution?: Outcome<SampleSummary>;
}

/**
 * Runs the extras `solve` shows for one solved analysis: one-at-a-time sensitivity always; time
 * and distance at the posted limit for a skid (reaction time: the analysis's own
 * `timeDistance.reactionTime`, else the default); the seeded sampling when the case asks for it.
 * Pure, and free of any UI import (solve's path must not load Ink).
 * @example solveExtras(c, solution).sensitivity[0]?.key // the input that moves the speed most
 */
export function solveExtras(c: Case, i: number, solution: AnalysisSolution): SolveExtras {
  const out: SolveExtras = { sensitivity: sensitivity(solution) };
  const a = c.analyses[i];
  if (a?.kind === 'skid') {
    const td = a.timeDistance;
    if (c.postedLimit !== undefined || td?.conflictAt !== undefined) {
      const own = td?.reactionTime;
      out.timeDistance = limitComparison(c, solution, {
        reactionTime: own ?? DEFAULT_REACTION_TIME,
        reactionOrigin: own !== undefined ? 'set in the case file' : SOLVE_REACTION_ORIGIN,
        ...(td?.conflictAt !== undefined ? { conflictAt: td.conflictAt } : {}),
      });
    }
  }
  if (c.sampling) {
    const s = c.sampling;
    out.distribution = sampleSpeeds(solution.model, {
      ...(s.shape !== undefined ? { shape: s.shape } : {}),
      ...(s.samples !== undefined ? { n: s.samples } : {}),
      ...(s.seed !== undefined ? { seed: s.seed } : {}),
    });
  }
  return out;
}

/** A part that could not be computed, as JSON: its reason and the field it concerns. */
const failedJson = (r: { reason: string; path?: string }) => ({
  error: r.reason,
  ...(r.path !== undefined ? { path: r.path } : {}),
});

/**
 * The extras as `solve --json` prints them (docs/case-file.md): `sensitivity` rows largest swing
 * first (speeds at the input's low and high end, null where not computable), `timeDistance` (the
 * limit comparison's figures and steps), `distribution` (p5, p50, p95, mean, samples, seed,
 * shape). A part that cannot be computed is `{ error, path? }` and does not fail the solve.
 */
export function extrasToJson(x: SolveExtras): Record<string, unknown> {
  const out: Record<string, unknown> = {
    sensitivity: x.sensitivity.map((r) => ({
      key: r.key,
      label: r.label,
      unit: r.unit,
      inputLow: r.inputLow,
      inputHigh: r.inputHigh,
      speedAtLow: r.atLow ?? null,
      speedAtHigh: r.atHigh ?? null,
      swing: r.swing,
    })),
  };
  if (x.timeDistance)
    out.timeDistance = x.timeDistance.ok ? x.timeDistance.value : failedJson(x.timeDistance);
  if (x.distribution) {
    const d = x.distribution;
    out.distribution = d.ok
      ? {
          p5: d.value.p5,
          p50: d.value.p50,
          p95: d.value.p95,
          mean: d.value.mean,
          samples: d.value.samples,
          seed: d.value.seed,
          shape: d.value.shape,
          skipped: d.value.skipped,
          method: d.value.method,
        }
      : failedJson(d);
  }
  return out;
}
