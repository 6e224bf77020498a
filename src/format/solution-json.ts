import type { AnalysisSolution } from '../engine/types.js';
import type { AnalysisExtras, CaseResult } from '../extras/analysis-extras.js';
import { extrasToJson } from './solve-extras.js';

/**
 * One analysis as `solve --json` prints it: the contract's fields first, then, given its extras
 * (from the result document), `sensitivity`, `timeDistance` and `distribution`. The yaw
 * middle-ordinate reading check is `ordinateSensitivity`; a yaw from surveyed points has
 * `pointsFit`, one from offsets `offsetsFit`; a slide that runs into another analysis has `phases`.
 */
export function analysisToJson(
  s: AnalysisSolution,
  extras?: AnalysisExtras,
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
  if (s.offsetsFit) out.offsetsFit = offsetsFitJson(s.offsetsFit);
  if (s.phases) out.phases = s.phases;
  if (extras) Object.assign(out, extrasToJson(extras));
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

/** The offsets fit as JSON: the radius it gives, the fit's figures and each residual. */
function offsetsFitJson(o: NonNullable<AnalysisSolution['offsetsFit']>) {
  const f = o.fit;
  return {
    radius: o.radius,
    fittedRadius: f.radius,
    stdError: f.radiusStdError ?? null,
    middleOrdinate: f.middleOrdinate,
    rms: f.rms,
    residuals: f.residuals.map((r) => ({
      at: r.at,
      offset: r.offset,
      fitted: r.fitted ?? null,
      residual: r.residual,
      chordEnd: r.chordEnd,
    })),
  };
}

/**
 * The shape `skidcase solve FILE --json` prints (docs/case-file.md): id, units, analyses, and the
 * posted limit when the case has one, plus the file's warnings; each analysis also carries its
 * extras from the result document (see analysisToJson). Numbers are unrounded except
 * `minimum`. Only for a solution whose analyses all solved; the caller reports failures instead.
 */
export function solutionToJson(result: CaseResult): Record<string, unknown> {
  const { solution } = result;
  const out: Record<string, unknown> = {
    id: solution.id,
    units: solution.units,
    analyses: result.analyses.flatMap(({ outcome: r, extras }, index) => {
      if (!r.ok) return [];
      const a = analysisToJson(r.solution, extras);
      a.warnings = [...r.solution.warnings, ...fileWarningsFor(solution.warnings, index)];
      return [a];
    }),
  };
  if (solution.postedLimit) out.postedLimit = solution.postedLimit;
  out.warnings = solution.warnings;
  return out;
}
