/** Drives the interview reducer as the screens would: typing answers, or filling by question id. */
import {
  currentQuestion,
  initialState,
  questionsFor,
  reduce,
  REVIEW,
  type Action,
  type InterviewMode,
  type InterviewState,
} from '../../src/interview/index.js';

export const start = (mode: InterviewMode = 'guided'): InterviewState => initialState(mode);

export const act = (s: InterviewState, ...actions: Action[]): InterviewState =>
  actions.reduce(reduce, s);

/** Types each text as an answer to the current question; fails the test on a rejected answer. */
export function type(s: InterviewState, ...texts: string[]): InterviewState {
  for (const text of texts) {
    const id = s.cursor;
    s = reduce(s, { type: 'answer', text });
    if (s.error) throw new Error(`${id}: "${text}" rejected: ${s.error.message}`);
  }
  return s;
}

/**
 * Answers the current question from `byId` (the text typed), or with Enter (the default) when it
 * is not listed, until the review opens. Fails on a rejected answer or a question without default.
 */
export function fill(s: InterviewState, byId: Record<string, string>, limit = 400): InterviewState {
  for (let n = 0; n < limit && s.cursor !== REVIEW; n++) {
    const q = currentQuestion(s);
    if (!q) throw new Error(`cursor ${s.cursor} is not a question`);
    const text = byId[q.id];
    s = reduce(s, text === undefined ? { type: 'accept-default' } : { type: 'answer', text });
    if (s.error)
      throw new Error(
        `${q.id}: ${text === undefined ? '(default)' : `"${text}"`} rejected: ${s.error.message}`,
      );
  }
  if (s.cursor !== REVIEW) throw new Error('the interview did not reach the review');
  return s;
}

/** Ids of the questions that apply now. */
export const ids = (s: InterviewState): string[] => questionsFor(s.answers).map((q) => q.id);

/** Fills up to (not including) question `until`, answering from `byId` or by default. */
export function fillUntil(
  s: InterviewState,
  byId: Record<string, string>,
  until: string,
  limit = 400,
): InterviewState {
  for (let n = 0; n < limit && s.cursor !== until; n++) {
    if (s.cursor === REVIEW) throw new Error(`reached the review before ${until}`);
    const q = currentQuestion(s)!;
    const text = byId[q.id];
    s = reduce(s, text === undefined ? { type: 'accept-default' } : { type: 'answer', text });
    if (s.error) throw new Error(`${q.id}: rejected: ${s.error.message}`);
  }
  return s;
}

/** Answers the current question once, from `byId` or with Enter. */
export function step(s: InterviewState, byId: Record<string, string>): InterviewState {
  const q = currentQuestion(s);
  if (!q) throw new Error('on the review');
  const text = byId[q.id];
  const t = reduce(s, text === undefined ? { type: 'accept-default' } : { type: 'answer', text });
  if (t.error) throw new Error(`${q.id}: rejected: ${t.error.message}`);
  return t;
}
