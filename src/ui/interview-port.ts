/**
 * The few things the screens ask of the interview and the engine, in one place, so the screens
 * depend on this shape only. interview-live.ts binds it to src/interview and src/engine.
 */
import type { Case } from '../case/load.js';
import type { CaseSolution } from '../engine/types.js';
import type {
  Action,
  InterviewMode,
  InterviewState,
  Progress,
  Question,
  QuestionState,
} from '../interview/types.js';
import type { DraftView } from './draft-panel.js';

export interface InterviewPort {
  /** The interview's pure reducer. */
  reduce(state: InterviewState, action: Action): InterviewState;
  /** The question at the cursor; undefined on the review. */
  current(state: InterviewState): Question | undefined;
  progress(state: InterviewState): Progress;
  states(state: InterviewState): QuestionState[];
  /** The default Enter accepts for the current question, if any. */
  defaultText(state: InterviewState): string | undefined;
  /** What the current answer of the current question implies, in a sentence, if anything. */
  explain(state: InterviewState): string | undefined;
  /** The case the answers make, or why they do not make one yet. */
  build(
    state: InterviewState,
    base: Case,
  ): { ok: true; case: Case } | { ok: false; message: string };
  /** A new interview on its first question. */
  fresh(mode: InterviewMode): InterviewState;
  /** Resumes from a saved case: on the first open question. */
  fromCase(c: Case, mode: InterviewMode): InterviewState;
  /** Lines saying what is done, shown when a case is resumed. */
  summary(state: InterviewState): string[];
  /** The running chain for the side panel. */
  draft(state: InterviewState, base: Case): DraftView;
  solve(c: Case): CaseSolution;
  /**
   * An answer naming a file (`@points.csv`) on a question that takes lines: the action it makes
   * once `read` has read the file, or undefined when the answer names none.
   */
  fileAnswer(
    state: InterviewState,
    typed: string,
    read: (path: string) => { ok: true; text: string } | { ok: false; message: string },
  ): Action | undefined;
  /** Notes by analysis id that the case file cannot hold (anti-lock marks), for the review. */
  notes(state: InterviewState): Record<string, string[]>;
}
