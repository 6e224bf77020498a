/**
 * The interview as a pure state machine: questions as data, a reducer over actions, and what the
 * screens show derived from the state. No React, no Ink, no I/O.
 */
export * from './types.js';
export { initialState, reduce } from './reducer.js';
export { questionsFor, allQuestions } from './questions.js';
export {
  currentQuestion,
  progress,
  questionStates,
  firstOpenQuestion,
  summaryOfDone,
} from './derived.js';
export { buildCase } from './build-case.js';
export { stateFromCase } from './from-case.js';
export { solveDraft } from './draft.js';
export { contextOf } from './answer-values.js';

export { REVIEW } from './navigate.js';

export { signed } from './signed.js';
