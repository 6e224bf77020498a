/**
 * Parsed values of the answers that apply now, read fresh from the typed text with the current
 * units, so that a change to an earlier answer (the units, a chord) is always taken into account.
 */
import type { Answers, AnswerContext, AnswerReader, Question } from './types.js';
import { unitsOf } from './answers-read.js';
import { questionsFor } from './questions.js';

export function contextOf(answers: Answers): AnswerContext {
  return {
    units: unitsOf(answers),
    answers,
    get read() {
      return readAnswers(answers);
    },
  };
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
  const ctx: AnswerContext = { units: unitsOf(answers), answers, read: undefined! };
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
  const reader: AnswerReader = {
    answers,
    questions,
    status,
    value: (id) => parsed(id).value,
    complete: (pick) => questions.every((q) => !pick(q.id) || status(q.id) === 'answered'),
  };
  ctx.read = reader;
  return reader;
}

/** The text Enter would give question `q` with these answers, if any. */
export function defaultTextOf(q: Question, answers: Answers): string | undefined {
  return q.defaultText?.(answers, readAnswers(answers));
}

/** What the current answer of `q` implies, in a sentence, if it says anything. */
export function explainOf(q: Question, answers: Answers): string | undefined {
  return q.explainChoice?.(answers, readAnswers(answers));
}
