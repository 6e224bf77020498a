/** The running chain: the engine's solution of the analyses completed so far. */
import { loadCase } from '../case/load.js';
import { describeIssue } from '../case/issues.js';
import { solveCase, unitsOf as engineUnits, type CaseSolution } from '../engine/index.js';
import type { InterviewState } from './types.js';
import { buildCase } from './build-case.js';
import { unitsOf } from './answers-read.js';

/**
 * Solves the case as built so far (only complete analyses), so the panel can show each step
 * with its numbers. Every figure comes from the engine; nothing is re-derived here.
 */
export function solveDraft(state: InterviewState, id = 'draft'): CaseSolution {
  const built = buildCase(state, { id });
  // The built case is checked as any file would be, so the panel never shows a figure `solve` would refuse.
  const loaded = loadCase(JSON.parse(JSON.stringify(built)));
  if (!loaded.ok)
    return { id, units: engineUnits(unitsOf(state.answers)), analyses: [], warnings: loaded.issues.map(describeIssue) };
  return solveCase(loaded.case);
}
