/** Where the cursor goes: the next open question, the first open one, back and forward. */
import type { Answers, Cursor, InterviewState, Question } from './types.js';
import { readAnswers } from './answer-values.js';

export const REVIEW = 'review';

/** First question that is open or invalid, or the review when every question is answered. */
export function firstOpenIn(answers: Answers): Cursor {
  const r = readAnswers(answers);
  return r.questions.find((q) => r.status(q.id) !== 'answered')?.id ?? REVIEW;
}

/** The next open (or invalid) question after `from`, wrapping to the start; the review if none. */
export function nextOpenAfter(answers: Answers, from: string): Cursor {
  const r = readAnswers(answers);
  const qs = r.questions;
  const at = qs.findIndex((q) => q.id === from);
  const open = (q: Question) => r.status(q.id) !== 'answered';
  return qs.slice(at + 1).find(open)?.id ?? qs.slice(0, at + 1).find(open)?.id ?? REVIEW;
}

/** The question before the cursor (the last one from the review); stays on the first. */
export function previousOf(questions: Question[], cursor: Cursor): Cursor {
  if (questions.length === 0) return REVIEW;
  if (cursor === REVIEW) return questions[questions.length - 1]!.id;
  const at = questions.findIndex((q) => q.id === cursor);
  return at <= 0 ? questions[0]!.id : questions[at - 1]!.id;
}

/** The question after the cursor, or the review after the last one. */
export function nextOf(questions: Question[], cursor: Cursor): Cursor {
  if (cursor === REVIEW) return REVIEW;
  const at = questions.findIndex((q) => q.id === cursor);
  return questions[at + 1]?.id ?? REVIEW;
}

/** The cursor if it is the review or a question that applies, else the first open question. */
export function validCursor(
  state: Pick<InterviewState, 'answers' | 'cursor'>,
  questions: Question[],
): Cursor {
  if (state.cursor === REVIEW || questions.some((q) => q.id === state.cursor)) return state.cursor;
  return firstOpenIn(state.answers);
}
