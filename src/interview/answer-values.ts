/**
 * Parsed values of the answers that apply now, read fresh from the typed text with the current
 * units, so that a change to an earlier answer (the units, a chord) is always taken into account.
 */
import type { Answers, AnswerContext, Question, QuestionStatus } from './types.js';
import { unitsOf } from './answers-read.js';
import { questionsFor } from './questions.js';

export function contextOf(answers: Answers): AnswerContext {
  return { units: unitsOf(answers), answers };
}

export interface AnswerReader {
  answers: Answers;
  /** Applicable questions in order. */
  questions: Question[];
  /** 'answered', 'open' or 'invalid' for an applicable question id; undefined if it does not apply. */
  status(id: string): Exclude<QuestionStatus, 'unused'> | undefined;
  /** Parsed value of an applicable, valid answer; undefined otherwise. */
  value(id: string): unknown;
  /** Every applicable question whose id passes `pick` is answered and valid. */
  complete(pick: (id: string) => boolean): boolean;
}

const READERS = new WeakMap<Answers, AnswerReader>();

/** The reader of these answers; kept per answers object, which is never mutated. */
export function readAnswers(answers: Answers): AnswerReader {
  let r = READERS.get(answers);
  if (!r) {
    r = makeReader(answers);
    READERS.set(answers, r);
  }
  return r;
}

function makeReader(answers: Answers): AnswerReader {
  const questions = questionsFor(answers);
  const ctx = contextOf(answers);
  const byId = new Map(questions.map((q) => [q.id, q]));
  const cache = new Map<string, { ok: boolean; value: unknown }>();
  const parsed = (id: string) => {
    let c = cache.get(id);
    if (c) return c;
    const q = byId.get(id);
    const a = answers[id];
    if (!q || !a) c = { ok: false, value: undefined };
    else {
      const r = q.parse(a.text, ctx);
      c = r.ok ? { ok: true, value: r.value } : { ok: false, value: undefined };
    }
    cache.set(id, c);
    return c;
  };
  const status = (id: string) => {
    if (!byId.has(id)) return undefined;
    if (!answers[id]) return 'open' as const;
    return parsed(id).ok ? ('answered' as const) : ('invalid' as const);
  };
  return {
    answers,
    questions,
    status,
    value: (id) => parsed(id).value,
    complete: (pick) => questions.every((q) => !pick(q.id) || status(q.id) === 'answered'),
  };
}
