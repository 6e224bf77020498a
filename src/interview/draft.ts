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
  // Solved once per answers object (never mutated): screens may ask on every render.
  const hit = SOLVED.get(state.answers);
  if (hit && hit.id === id) return hit.solution;
  const solution = solveFresh(state, id);
  SOLVED.set(state.answers, { id, solution });
  return solution;
}

const SOLVED = new WeakMap<InterviewState['answers'], { id: string; solution: CaseSolution }>();

function solveFresh(state: InterviewState, id: string): CaseSolution {
  const built = buildCase(state, { id });
  // The built case is checked as any file would be, so the panel never shows a figure `solve` would refuse.
  const loaded = loadCase(JSON.parse(JSON.stringify(built)));
  if (!loaded.ok)
    return {
      id,
      units: engineUnits(unitsOf(state.answers)),
      analyses: [],
      warnings: loaded.issues.map(describeIssue),
    };
  return solveCase(loaded.case, loaded.unknownFields);
}
