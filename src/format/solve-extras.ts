import { DEFAULT_REACTION_TIME } from '../engine/constants.js';
import type { AnalysisExtras } from '../extras/analysis-extras.js';

/** Where the default reaction time comes from, as `solve` says it: solve reads no preferences. */
export const SOLVE_REACTION_ORIGIN = `default ${DEFAULT_REACTION_TIME} s (solve does not read the preferences; set timeDistance.reactionTime in the case to change it)`;

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
export function extrasToJson(x: AnalysisExtras): Record<string, unknown> {
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
  if (x.limit) out.timeDistance = x.limit.ok ? x.limit.value : failedJson(x.limit);
  if (x.sampling) {
    const d = x.sampling;
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
