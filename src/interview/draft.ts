/** The running chain: the engine's solution of the analyses completed so far. */
import { loadCase } from '../case/load.js';
import { describeIssue } from '../case/issues.js';
import {
  dragFactor,
  solveCase,
  yawRadius,
  unitsOf as engineUnits,
  type CaseSolution,
} from '../engine/index.js';
import type { Step } from '../engine/types.js';
import { RULES } from '../case/quantity.js';
import type { InterviewState } from './types.js';
import { analysisId, buildCase, yawMeasure } from './build-case.js';
import { analysisCount, markLook, segmentCount, unitsOf } from './answers-read.js';
import { readAnswers } from './answer-values.js';
import type { AnswerReader } from './types.js';
import { dragOf, quantityOf } from './build-parts.js';

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

/**
 * The yaw's radius measure as the file would hold it (chord and ordinate, offsets, or points),
 * once every value of it is answered; undefined before.
 */
function radiusMeasure(r: AnswerReader, i: number): Parameters<typeof yawRadius>[0] | undefined {
  const m = yawMeasure(r, i) as Parameters<typeof yawRadius>[0];
  if (m.points !== undefined) return m.points.length >= 3 ? m : undefined;
  if (m.offsets !== undefined)
    return m.offsets.chord !== undefined && m.offsets.stations !== undefined ? m : undefined;
  const C = quantityOf(r, `a${i}.chord`, RULES.length);
  const M = quantityOf(r, `a${i}.ordinate`, { ...RULES.length, what: 'middle ordinate' });
  return C !== undefined && M !== undefined ? { chord: C, middleOrdinate: M } : undefined;
}

/** A figure of an analysis still being answered, with the analysis it belongs to. */
export interface EarlyStep {
  analysis: number;
  step: Step;
}

/**
 * The figures of the analyses not yet complete whose own inputs are all answered: a yaw mark's
 * radius once its chord and middle ordinate (or its offsets, or its points) are in, each drag factor once its source's answers
 * are (the mean of the test skids, the sled's pulls, ...). Each comes from the engine's own
 * function, the one the finished chain calls; the panel shows them before the chain is whole.
 */
export function earlySteps(state: InterviewState): EarlyStep[] {
  const solved = new Set(solveDraft(state).analyses.map((a) => (a.ok ? a.solution.id : a.id)));
  const r = readAnswers(state.answers);
  const system = unitsOf(state.answers);
  const u = engineUnits(system);
  const out: EarlyStep[] = [];
  for (let i = 0; i < analysisCount(state.answers); i++) {
    const look = markLook(state.answers, i);
    if (!look || solved.has(analysisId(state, i, look === 'yaw' ? 'yaw' : 'skid'))) continue;
    if (look === 'yaw') {
      const measure = radiusMeasure(r, i);
      if (measure) {
        const radius = yawRadius(measure, system, u);
        if (radius.ok) out.push({ analysis: i, step: radius.value.step });
      }
      const d = dragOf(r, `a${i}`);
      const f = d && dragFactor(d, system);
      if (f?.ok) out.push({ analysis: i, step: f.value.step });
      continue;
    }
    const n = segmentCount(state.answers, i);
    for (let j = 0; j < n; j++) {
      const d = dragOf(r, `a${i}.seg${j}`);
      const f = d && dragFactor(d, system);
      if (!f?.ok) continue;
      const step =
        n > 1 ? { ...f.value.step, name: `${f.value.step.name}, segment ${j + 1}` } : f.value.step;
      out.push({ analysis: i, step });
    }
  }
  return out;
}
