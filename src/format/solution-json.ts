import type { Case } from '../case/load.js';
import type { AnalysisSolution, CaseSolution } from '../engine/types.js';
import { extrasToJson, solveExtras } from './solve-extras.js';

/**
 * One analysis as `solve --json` prints it: the contract's fields first, then extras. With the
 * case and the analysis's index, also `sensitivity`, `timeDistance` and `distribution`
 * (solveExtras). The yaw middle-ordinate reading check is `ordinateSensitivity`; a yaw from
 * surveyed points has `pointsFit`; a slide that runs into another analysis has `phases`.
 */
export function analysisToJson(
  s: AnalysisSolution,
  from?: { c: Case; index: number },
): Record<string, unknown> {
  const out: Record<string, unknown> = {
    id: s.id,
    kind: s.kind,
    speed: { value: s.speed.value, low: s.speed.low, high: s.speed.high },
    minimum: s.minimum,
    steps: s.steps,
    assumptions: s.assumptions,
    warnings: s.warnings,
  };
  if (s.label !== undefined) out.label = s.label;
  if (s.distance) out.distance = s.distance;
  if (s.radius) out.radius = s.radius;
  if (s.boundaries) out.boundaries = s.boundaries;
  if (s.sensitivity) out.ordinateSensitivity = s.sensitivity;
  if (s.pointsFit) out.pointsFit = s.pointsFit;
  if (s.phases) out.phases = s.phases;
  if (from) Object.assign(out, extrasToJson(solveExtras(from.c, from.index, s)));
  return out;
}

/**
 * The file's warnings (unknown fields, by path) that concern analysis i: those inside it and
 * those outside every analysis (the vehicle and the case apply to all). A reader who knows only
 * the contract's shape looks for warnings in `analyses[].warnings`, so they are repeated there;
 * the top-level `warnings` keeps the whole list.
 */
function fileWarningsFor(warnings: readonly string[], i: number): string[] {
  const own = `analyses[${i}]`;
  return warnings.filter((w) => {
    if (!w.startsWith('analyses[')) return true;
    return w.startsWith(`${own}.`) || w.startsWith(`${own}:`);
  });
}

/**
 * The shape `skidcase solve FILE --json` prints (docs/case-file.md): id, units, analyses, and the
 * posted limit when the case has one, plus the file's warnings; given the case, each analysis
 * also carries its extras (see analysisToJson). Numbers are unrounded except
 * `minimum`. Only for a solution whose analyses all solved; the caller reports failures instead.
 */
export function solutionToJson(solution: CaseSolution, c?: Case): Record<string, unknown> {
  const out: Record<string, unknown> = {
    id: solution.id,
    units: solution.units,
    analyses: solution.analyses.flatMap((r, index) => {
      if (!r.ok) return [];
      const a = analysisToJson(r.solution, c ? { c, index } : undefined);
      a.warnings = [...r.solution.warnings, ...fileWarningsFor(solution.warnings, index)];
      return [a];
    }),
  };
  if (solution.postedLimit) out.postedLimit = solution.postedLimit;
  out.warnings = solution.warnings;
  return out;
}
