import type { AnalysisOutcome, AnalysisSolution, Range } from './types.js';

/** "at least" figure: the low end rounded down, safe against 40.999999 from rounding error. */
export const minimumOf = (low: number) => Math.floor(low + 1e-9);

/**
 * Whether a low end is above the posted limit, with the tolerance minimumOf uses: a low end that
 * is the limit exactly but computes as 24.000000000000004 is not above it (and its minimum is 24).
 * @example isAboveLimit(24.000000000000004, 24) // false
 */
export const isAboveLimit = (low: number, limit: number) => low > limit + 1e-9;

/** What each kind of analysis adds to the common part of a solution. */
type Specific = Omit<AnalysisSolution, 'id' | 'kind' | 'label' | 'speed' | 'minimum'>;

/**
 * A solved analysis: its id, kind and label from the case, the start speed with its "at least"
 * figure, and what the skid or yaw chain produced (steps, assumptions, model, ...).
 */
export function solvedAnalysis(
  a: { id: string; label?: string | undefined },
  kind: AnalysisSolution['kind'],
  speed: Range,
  rest: Specific,
): AnalysisOutcome {
  return {
    ok: true,
    solution: {
      id: a.id,
      kind,
      ...(a.label !== undefined ? { label: a.label } : {}),
      speed,
      minimum: minimumOf(speed.low),
      ...rest,
    },
  };
}
