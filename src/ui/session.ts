/**
 * The case being worked on, as the screens hold it: the interview state plus what only the
 * screen needs (the line being typed, the highlighted choice, save status, scroll position).
 * Pure helpers here; the hook in use-app-model.ts owns the state.
 */
import type { Case } from '../case/load.js';
import type { Action, InterviewState } from '../interview/types.js';
import type { InterviewPort } from './interview-port.js';
import { EMPTY_LINE, lineOf, type Line } from './line-edit.js';
import { isChoice } from './question-view.js';
import type { OpenCase } from './services.js';

export interface Session {
  open: OpenCase;
  state: InterviewState;
  line: Line;
  highlight: number;
  /** When the answers were last written to disk and checked (the header's "saved" time). */
  savedAt?: Date;
  saveError?: string;
  /** Something the last save did beside writing (a broken file moved aside, theirs kept). */
  saveNote?: string;
  /** The file was changed outside skidcase: the save waits for the user's choice. */
  conflict?: { theirs: Case };
  reviewTop: number;
  reportMessage?: string;
  /** "Write report" was pressed: the review waits for the form to write (keys.ts, report-form). */
  choosingReport?: boolean;
  /** What was already done, shown on resume until the first key that changes something. */
  summary?: string[];
}

/** The line and highlight a question starts with: its current answer, else its default choice. */
export function inputFor(
  port: InterviewPort,
  state: InterviewState,
): { line: Line; highlight: number } {
  const q = port.current(state);
  if (!q) return { line: EMPTY_LINE, highlight: 0 };
  const answer = state.answers[q.id];
  if (isChoice(q)) {
    const wanted = answer?.text ?? port.defaultText(state);
    const i = q.choices!.findIndex((c) => c.value === wanted || c.key === wanted);
    return { line: EMPTY_LINE, highlight: Math.max(0, i) };
  }
  return { line: answer ? lineOf(answer.text) : EMPTY_LINE, highlight: 0 };
}

/**
 * Applies an interview action to a session. When the cursor moves, the input is reset for the
 * new question; when the answer was rejected the typed text stays, so it can be corrected.
 */
export function applyAction(port: InterviewPort, s: Session, action: Action): Session {
  const next = port.reduce(s.state, action);
  if (next === s.state) return s;
  const moved = next.cursor !== s.state.cursor || next.answers !== s.state.answers;
  const keepTyped = next.error !== undefined && next.cursor === s.state.cursor;
  const input =
    moved && !keepTyped ? inputFor(port, next) : { line: s.line, highlight: s.highlight };
  const { reportMessage: _drop, summary: _seen, ...rest } = s;
  return {
    ...rest,
    state: next,
    ...input,
    reviewTop: next.cursor === s.state.cursor ? s.reviewTop : 0,
  };
}

/**
 * The action Enter makes: the typed text, or the default when nothing is typed. On a choice, the
 * text typed on its line (words of a choice, a signed grade), else the highlighted choice.
 */
export function submitAction(port: InterviewPort, s: Session): Action {
  const q = port.current(s.state);
  if (q && isChoice(q))
    return s.line.value.trim() !== ''
      ? { type: 'answer', text: s.line.value }
      : { type: 'choose', value: q.choices![s.highlight]!.value };
  return s.line.value.trim() === ''
    ? { type: 'accept-default' }
    : { type: 'answer', text: s.line.value };
}
