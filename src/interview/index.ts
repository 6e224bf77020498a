/**
 * The interview as a pure state machine: questions as data, a reducer over actions, and what the
 * screens show derived from the state. No React, no Ink, no I/O.
 */
export * from './types.js';
export { initialState, reduce, UNDO_LIMIT } from './reducer.js';
export { questionsFor, allQuestions, analysisSection, chainReason } from './questions.js';
export {
  currentQuestion,
  progress,
  questionStates,
  firstOpenQuestion,
  summaryOfDone,
  isMetaAnswer,
} from './derived.js';
export { buildCase, analysisId } from './build-case.js';
export { stateFromCase, answersFromCase, EDITED_NOTICE } from './from-case.js';
export { solveDraft } from './draft.js';
export { contextOf, defaultTextOf, explainOf } from './answer-values.js';
export { matchChoice } from './question-kinds.js';
export { REVIEW } from './navigate.js';
export { SURFACE_CHOICES, OTHER_SURFACE, rangesLine } from './drag-table.js';
export { quickFills } from './quick-fills.js';
export { signed } from './signed.js';
