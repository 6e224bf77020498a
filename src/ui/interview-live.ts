/**
 * The screens' interview port bound to src/interview and src/engine. Every figure comes from
 * the engine through the interview's functions; nothing is computed here.
 */
import { loadCase, type Case } from '../case/load.js';
import { solveCase, type CaseSolution } from '../engine/index.js';
import { formatRange } from '../format/numbers.js';
import { initialState, reduce } from '../interview/reducer.js';
import {
  currentQuestion,
  firstOpenQuestion,
  progress,
  questionStates,
  stillToAnswer,
  summaryOfDone,
} from '../interview/derived.js';
import { buildCase, lookNotes } from '../interview/build-case.js';
import { earlySteps, solveDraft, type EarlyStep } from '../interview/draft.js';
import { defaultTextOf, explainOf } from '../interview/answer-values.js';
import { stateFromCase } from '../interview/from-case.js';
import type { InterviewState } from '../interview/types.js';
import { fileAnswer } from '../interview/read-points-file.js';
import { unitsOf } from '../interview/answers-read.js';
import type { DraftView } from './draft-panel.js';
import type { InterviewPort } from './interview-port.js';
import { atLeast } from './review-lines.js';
import { stepResultText } from '../format/step-text.js';

/** Solves a case exactly as `solve` would read it from its file: through the loader first. */
export function solveAsFile(c: Case): CaseSolution {
  const loaded = loadCase(JSON.parse(JSON.stringify(c)));
  if (!loaded.ok)
    return {
      id: c.id,
      units: c.units === 'metric' ? { length: 'm', speed: 'km/h' } : { length: 'ft', speed: 'mph' },
      analyses: [],
      warnings: loaded.issues.map((i) => `${i.path}: ${i.message}`),
    };
  return solveCase(loaded.case, loaded.unknownFields);
}

/**
 * The side panel's view of the running solution. `open` names the questions still to answer,
 * so that before the first figure the panel says what it waits for.
 */
export function draftView(
  sol: CaseSolution,
  open: readonly string[] = [],
  early: readonly EarlyStep[] = [],
): DraftView {
  const steps: DraftView['steps'] = [];
  const results: string[] = [];
  const problems: string[] = [];
  sol.analyses.forEach((a, i) => {
    if (!a.ok) return void problems.push(`Analysis ${i + 1}: ${a.reason}`);
    for (const s of a.solution.steps)
      steps.push({
        name: s.name,
        result: stepResultText(s),
      });
    results.push(
      `${sol.analyses.length > 1 ? `Analysis ${i + 1}: ` : ''}${formatRange(a.solution.speed, 'speed', sol.units.speed)}, ${atLeast(a.solution, sol.units.speed)}`,
    );
  });
  // Figures of an analysis still being answered, as soon as their own inputs are in.
  const many = sol.analyses.length + new Set(early.map((e) => e.analysis)).size > 1;
  for (const e of early)
    steps.push({
      name: `${many ? `Analysis ${e.analysis + 1}: ` : ''}${e.step.name}`,
      result: stepResultText(e.step),
    });
  const view: DraftView = { steps };
  if (results.length) view.result = results.join('; ');
  if (problems.length) view.note = problems.join('; ');
  else if (!results.length && open.length) {
    const more = open.length > 3 ? `, and ${open.length - 3} more` : '';
    const what = early.length ? 'The speed follows' : 'No figure yet';
    view.note = `${what}: still to answer: ${open.slice(0, 3).join('; ')}${more}.`;
  } else if (!results.length)
    view.note = 'No figure yet: the chain fills in once an analysis is complete.';
  return view;
}

/**
 * `f` remembered per state object. The reducer never changes a state it has returned (each
 * action makes a new one), so a state seen before has the same current question, progress and
 * default: every render and every key reads them without walking the questions again (a key
 * typed into an answer changes the line being edited, not the interview state).
 */
function perState<T>(f: (state: InterviewState) => T): (state: InterviewState) => T {
  const seen = new WeakMap<InterviewState, T>();
  return (state) => {
    if (seen.has(state)) return seen.get(state) as T;
    const value = f(state);
    seen.set(state, value);
    return value;
  };
}

const current = perState(currentQuestion);

export const liveInterview: InterviewPort = {
  reduce,
  current,
  progress: perState(progress),
  states: questionStates,
  defaultText: perState((state) => {
    const q = current(state);
    return q && defaultTextOf(q, state.answers);
  }),
  explain: perState((state) => {
    const q = current(state);
    return q && explainOf(q, state.answers);
  }),
  build(state, base) {
    const meta = { id: base.id, ...(base.created ? { created: base.created } : {}) };
    return { ok: true, case: buildCase(state, meta) };
  },
  fresh: (mode) => initialState(mode),
  fromCase(c, mode) {
    // Resume lands on the first open question, whatever the file's cursor says.
    const st = stateFromCase(c);
    return { ...st, cursor: firstOpenQuestion(st), mode, explain: mode === 'guided' };
  },
  summary: summaryOfDone,
  draft: (state, base) =>
    draftView(solveDraft(state, base.id), stillToAnswer(state), earlySteps(state)),
  solve: solveAsFile,
  notes: lookNotes,
  fileAnswer(state, typed, read) {
    const q = current(state);
    return q?.lines ? fileAnswer(typed, unitsOf(state.answers), read) : undefined;
  },
};
