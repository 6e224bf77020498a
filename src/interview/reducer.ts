/**
 * The interview reducer: `(state, action) => state`. A rejected answer sets `error` and keeps
 * every answer as it was; everything else (which questions apply, what is complete) is derived.
 */
import type { Action, Answers, InterviewMode, InterviewState, Question } from './types.js';
import { allQuestions, questionsFor } from './questions.js';
import { contextOf, defaultTextOf, explainOf } from './answer-values.js';
import { matchChoice } from './question-kinds.js';
import { nextOf, nextOpenAfter, previousOf, REVIEW, validCursor } from './navigate.js';
import { fillChanges, syncQuickLines } from './quick-sync.js';
import { holdBack } from './hold-back.js';

/** Undo keeps this many earlier states. */
export const UNDO_LIMIT = 100;

/** A fresh interview on its first question. Guided mode opens the explanations. */
export function initialState(mode: InterviewMode = 'guided'): InterviewState {
  const first = questionsFor({})[0]!;
  return { answers: {}, cursor: first.id, undo: [], mode, explain: mode === 'guided' };
}

/** "d, a, s, g or y": the keys of the choices, as a sentence. */
function keysOf(choices: readonly { key: string }[]): string {
  const k = choices.map((c) => c.key);
  return k.length > 1 ? `${k.slice(0, -1).join(', ')} or ${k.at(-1)}` : (k[0] ?? '');
}

/** Without error and notice: each action decides whether to set them again. */
function quiet(state: InterviewState): InterviewState {
  const { error: _e, notice: _n, ...rest } = state;
  return rest;
}

/** Parses fills (quick entry) through their own questions, so their values are set like typed ones. */
function withFills(answers: Answers, fills: Answers): Answers {
  let out = { ...answers, ...fills };
  const ctx = contextOf(out);
  const byId = new Map(allQuestions(out).map((q) => [q.id, q]));
  for (const [id, a] of Object.entries(fills)) {
    const q = byId.get(id);
    const r = q?.parse(a.text, ctx);
    out = { ...out, [id]: { text: a.text, value: r?.ok ? r.value : a.value } };
  }
  return out;
}

const UNITS_NOTE =
  'Units changed: numbers already typed without a unit are now read in the new units; numbers typed with a unit are converted.';

function submit(state: InterviewState, q: Question, typed: string, note?: string): InterviewState {
  let text = typed;
  if (text.trim() === '' && !q.optional) text = defaultTextOf(q, state.answers) ?? '';
  const r = q.parse(text, contextOf(state.answers));
  if (!r.ok) return { ...quiet(state), error: { id: q.id, text: typed, message: r.message } };
  // A choice is stored by its value, not the key pressed, so a later change of keys cannot re-read it.
  const stored = q.choices && typeof r.value === 'string' ? r.value : (r.text ?? text.trim());
  let answers: Answers = { ...state.answers, [q.id]: { text: stored, value: r.value } };
  if (r.fills) answers = withFills(answers, r.fills);
  const changes = r.fills ? fillChanges(state.answers, answers, Object.keys(r.fills)) : [];
  const held = holdBack(state, q.id, typed, r, changes);
  if (held)
    return { ...quiet(state), error: { id: q.id, text: typed, message: held, confirm: true } };
  answers = syncQuickLines(answers, q.id);
  const next: InterviewState = {
    ...quiet(state),
    answers,
    cursor: nextOpenAfter(answers, q.id),
    undo: [...state.undo, { answers: state.answers, cursor: state.cursor }].slice(-UNDO_LIMIT),
  };
  const unitsChanged =
    q.id === 'units' && state.answers.units && state.answers.units.value !== r.value;
  const applied = changes.length ? `Changed: ${changes.join('; ')}.` : undefined;
  const notice = unitsChanged
    ? UNITS_NOTE
    : [note && `${note}.`, r.notice, applied].filter(Boolean).join(' ') || explainOf(q, answers);
  return notice ? { ...next, notice } : next;
}

/** The state after one action. Never throws; an action that makes no sense here changes nothing but a notice. */
export function reduce(state: InterviewState, action: Action): InterviewState {
  const questions = questionsFor(state.answers);
  const cursor = validCursor(state, questions);
  const here = questions.find((q) => q.id === cursor);
  const s = cursor === state.cursor ? state : { ...state, cursor };
  switch (action.type) {
    case 'answer':
      return here
        ? submit(s, here, action.text, action.note)
        : { ...quiet(s), notice: 'The review is open: choose a question to change an answer.' };
    case 'accept-default': {
      if (!here) return quiet(s);
      const d = defaultTextOf(here, s.answers);
      if (d === undefined && !here.optional)
        return {
          ...quiet(s),
          error: {
            id: here.id,
            text: '',
            message: here.choices?.length
              ? 'pick one of the choices: type its letter, or move to it and press Enter'
              : `an answer is needed here${here.example ? `, e.g. ${here.example}` : ''}`,
          },
        };
      return submit(s, here, d ?? '');
    }
    case 'choose': {
      if (!here) return quiet(s);
      const c = here.choices && matchChoice(here.choices, action.value);
      if (!c)
        return {
          ...quiet(s),
          error: {
            id: here.id,
            text: action.value,
            message: `"${action.value}" is not one of the choices here: press ${keysOf(here.choices ?? [])}`,
          },
        };
      return submit(s, here, c.value);
    }
    case 'back':
      return { ...quiet(s), cursor: previousOf(questions, cursor) };
    case 'forward':
      return { ...quiet(s), cursor: nextOf(questions, cursor) };
    case 'jump':
      if (action.id === REVIEW || questions.some((q) => q.id === action.id))
        return { ...quiet(s), cursor: action.id };
      return { ...quiet(s), notice: 'That question does not apply with the answers given so far.' };
    case 'undo': {
      const last = s.undo[s.undo.length - 1];
      if (!last) return { ...quiet(s), notice: 'Nothing to undo.' };
      return {
        ...quiet(s),
        answers: last.answers,
        cursor: last.cursor,
        undo: s.undo.slice(0, -1),
        notice: 'Last answer undone.',
      };
    }
    case 'open-review':
      return { ...quiet(s), cursor: REVIEW };
    case 'set-mode':
      return { ...s, mode: action.mode, explain: action.mode === 'guided' };
    case 'toggle-explain':
      return { ...s, explain: !s.explain };
    case 'refuse':
      return here
        ? { ...quiet(s), error: { id: here.id, text: action.text, message: action.message } }
        : quiet(s);
    case 'clear-error': {
      const { error: _e, ...rest } = s;
      return rest;
    }
  }
}
