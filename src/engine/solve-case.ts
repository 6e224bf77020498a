import { spread } from './spread.js';
import type { CaseInput } from './input.js';
import { unitsOf } from './constants.js';
import { solveAirborne } from './solve-airborne.js';
import { solveSkid } from './solve-skid.js';
import { isAboveLimit } from './solution.js';
import { solveYaw } from './solve-yaw.js';
import type { AnalysisOutcome, CaseSolution } from './types.js';

/**
 * Solves analysis i, first solving the analysis its marks run into (a slide's
 * `end.analysis`), each once: `memo` keeps what is solved, `visiting` the chain so far (a loop,
 * which the schema already refuses, fails here rather than recursing).
 */
function solveInChain(
  c: CaseInput,
  i: number,
  memo: Map<number, AnalysisOutcome>,
  visiting: readonly number[],
): AnalysisOutcome {
  const known = memo.get(i);
  if (known) return known;
  const a = c.analyses[i];
  if (!a)
    return {
      ok: false,
      id: '',
      kind: 'skid',
      reason: `there is no analysis ${i + 1}`,
      path: 'analyses',
    };
  let r: AnalysisOutcome;
  if (a.kind === 'skid' && a.end?.mode === 'analysis') {
    const path = `analyses[${i}].end.analysis`;
    const target = a.end.analysis;
    const j = c.analyses.findIndex((x) => x.id === target);
    const fails = (reason: string): AnalysisOutcome => ({
      ok: false,
      id: a.id,
      kind: 'skid',
      reason,
      path,
    });
    if (j < 0) r = fails(`there is no analysis "${target}" in this case`);
    else if (j === i || visiting.includes(j)) r = fails('the phases loop back on themselves');
    else {
      const next = solveInChain(c, j, memo, [...visiting, i]);
      r = next.ok
        ? solveSkid(c, i, a, next.solution)
        : fails(
            `the marks run into analysis "${target}", which cannot be computed: ${next.reason}`,
          );
    }
  } else if (a.kind === 'skid') r = solveSkid(c, i, a);
  else if (a.kind === 'yaw') r = solveYaw(c, i, a);
  else r = solveAirborne(c, i, a);
  memo.set(i, r);
  return r;
}

/**
 * Solves analysis i of a case: its start speed with range, the "at least" minimum (low end
 * rounded down), every step, assumptions, warnings and the model for sensitivity. A slide that
 * runs into another analysis takes that analysis's speed (value, low, high) as its end speed. A
 * figure that cannot be computed is `{ ok: false, reason, path }`, never a NaN.
 * @example
 * const r = solveAnalysis(c, 0);
 * if (r.ok) console.log(r.solution.minimum); else console.error(r.reason);
 */
export function solveAnalysis(c: CaseInput, i: number): AnalysisOutcome {
  return solveInChain(c, i, new Map(), []);
}

/** Unknown fields warned about one by one; the rest are counted in one line. */
export const UNKNOWN_LISTED = 25;

/**
 * Solves every analysis of a validated case, each phase of a chain once and before the phase
 * that runs into it, and compares with the posted limit: `exceededAtMinimum` is true when some
 * analysis's low end is above the limit. `unknownFields`, the paths of fields the file holds
 * that its format does not define (as `loadCase` reports them), become warnings naming them, and so
 * do `duplicateKeys`, the keys its text gives twice in one object (as `loadCaseText` reports them).
 * @example
 * const loaded = loadCaseText(text);
 * if (loaded.ok) solveCase(loaded.case, loaded.unknownFields).analyses.forEach((r) => r.ok && r.solution.speed);
 */
export function solveCase(
  c: CaseInput,
  unknownFields: readonly string[] = [],
  duplicateKeys: readonly string[] = [],
): CaseSolution {
  const memo = new Map<number, AnalysisOutcome>();
  const analyses = c.analyses.map((_, i) => solveInChain(c, i, memo, []));
  const listed = unknownFields.slice(0, UNKNOWN_LISTED);
  const warnings = listed.map(
    (path) => `${path}: not a field of the case format; kept, but not used (misspelt?)`,
  );
  // A file with very many of them (a tool's export, a damaged file) gets one line for the rest.
  const rest = unknownFields.length - listed.length;
  if (rest > 0)
    warnings.push(
      `${rest} more fields are not of the case format (kept, but not used), the last ${unknownFields[unknownFields.length - 1]}`,
    );
  for (const path of duplicateKeys)
    warnings.push(`${path}: given twice in one object; the last one is used`);
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
