import { spread } from '../case/quantity.js';
import type { Case } from '../case/load.js';
import { unknownFields } from '../case/unknown-fields.js';
import { unitsOf } from './constants.js';
import { solveSkid } from './solve-skid.js';
import { isAboveLimit } from './solution.js';
import { solveYaw } from './solve-yaw.js';
import type { AnalysisOutcome, CaseSolution } from './types.js';

/**
 * Solves analysis i of a case: its start speed with range, the "at least" minimum (low end
 * rounded down), every step, assumptions, warnings and the model for sensitivity. A figure that
 * cannot be computed is `{ ok: false, reason, path }`, never a NaN.
 * @example
 * const r = solveAnalysis(c, 0);
 * if (r.ok) console.log(r.solution.minimum); else console.error(r.reason);
 */
export function solveAnalysis(c: Case, i: number): AnalysisOutcome {
  const a = c.analyses[i];
  if (!a)
    return {
      ok: false,
      id: '',
      kind: 'skid',
      reason: `there is no analysis ${i + 1}`,
      path: 'analyses',
    };
  return a.kind === 'skid' ? solveSkid(c, i, a) : solveYaw(c, i, a);
}

/**
 * Solves every analysis of a validated case and compares with the posted limit:
 * `exceededAtMinimum` is true when some analysis's low end is above the limit. The file's unknown
 * fields become warnings naming their paths.
 * @example
 * const loaded = loadCaseText(text);
 * if (loaded.ok) solveCase(loaded.case).analyses.forEach((r) => r.ok && r.solution.speed);
 */
export function solveCase(c: Case): CaseSolution {
  const analyses = c.analyses.map((_, i) => solveAnalysis(c, i));
  const warnings = unknownFields(c).map(
    (path) => `${path}: not a field of the case format; kept, but not used (misspelt?)`,
  );
  if (c.analyses.length === 0) warnings.push('The case has no analyses yet: nothing to solve.');
  const out: CaseSolution = { id: c.id, units: unitsOf(c.units), analyses, warnings };
  if (c.postedLimit !== undefined) {
    const limit = spread(c.postedLimit).value;
    out.postedLimit = {
      value: limit,
      exceededAtMinimum: analyses.some((r) => r.ok && isAboveLimit(r.solution.speed.low, limit)),
    };
  }
  return out;
}
