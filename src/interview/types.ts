/**
 * Shapes of the interview: questions as data, the reducer's state and its actions. Pure types,
 * shared with the screens (src/ui/), which render a state and turn keys into actions.
 */
import type { UnitSystem } from '../engine/types.js';
import type { QuantityKind } from '../input/index.js';

/** How a question takes its answer; the screen picks its widget from this. */
export type QuestionKind = 'text' | 'choice' | 'quantity' | 'list' | 'segments' | 'confirm';

/** One answer as the investigator typed it, with the parsed value the case is built from. */
export interface Answer {
  /** Exactly as typed (or the choice's value for choice questions). */
  text: string;
  /** Parsed: a string for choices and text, a Quantity, a list, ... depending on the question. */
  value: unknown;
}

/** Answers by question id (`units`, `vehicle.brakes`, `a0.seg1.drag.source`, ...). */
export type Answers = Record<string, Answer>;

/**
 * Parsed values of the answers that apply now (made by `readAnswers` in answer-values.ts, which
 * knows the list of questions). Question callbacks receive one, so that what a question says can
 * look at other answers without the questions importing their own list.
 */
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

/** What validation and parsing may look at: the case's units, the other answers and their reader. */
export interface AnswerContext {
  units: UnitSystem;
  answers: Answers;
  /** The reader of `answers`. */
  read: AnswerReader;
}

/** Why a question is asked and how to measure it, for a less experienced investigator. */
export interface Help {
  why: string;
  how?: string;
}

/** One option of a choice (or confirm) question. `key` is a single-key shortcut, unique per question. */
export interface Choice {
  value: string;
  key: string;
  label: string;
  /** A short line shown beside or under the option (a table range with its source, ...). */
  hint?: string;
}

/** Result of parsing a typed answer: the value, or the message the user sees. */
export type ParseResult =
  | {
      ok: true;
      value: unknown;
      notice?: string;
      fills?: Answers;
      /** The answer's text as stored, when not as typed (a pasted block of lines, as one line). */
      text?: string;
      /**
       * Something that looks like a slip (a list mixing feet and metres): the answer is taken only
       * when the same text is entered again after this message was shown.
       */
      confirm?: string;
    }
  | { ok: false; message: string };

/**
 * A question as data. The concrete list of questions that apply is `questionsFor(answers)`;
 * every question in that list has `appliesWhen(answers) === true`.
 */
export interface Question {
  /** Stable id, used as the key in saved answers. */
  id: string;
  /** Group heading: "Case", "Vehicle", "Analysis 1 - slide", ... */
  section: string;
  /** Short name for the jump list. */
  title: string;
  /** The question itself. */
  prompt: string;
  help: Help;
  kind: QuestionKind;
  /** For `choice` and `confirm`. */
  choices?: Choice[];
  /** Unit the answer is read in, for the prompt's hint ("ft", "mph", "%", "decimal"). */
  unitHint?: string;
  /** Kind of number asked (src/input/), from which `unitHint` is set for the case's units. */
  unitKind?: QuantityKind;
  /** An example of the expected input, e.g. `94 92 95 93` or `4 x 80.5`. */
  example?: string;
  /** The example for a metric case; `questionsFor` puts it in `example` when the case is metric. */
  metricExample?: string;
  /** True when an empty answer is accepted (it is stored as an empty text). */
  optional?: boolean;
  appliesWhen(answers: Answers): boolean;
  /** The message for a rejected answer, or undefined when the text is acceptable. */
  validate(text: string, ctx: AnswerContext): string | undefined;
  /** Reads the text. `fills` are extra answers set at once (quick entry of segments). */
  parse(text: string, ctx: AnswerContext): ParseResult;
  /** Text offered by Enter (accept-default), if any. */
  defaultText?(answers: Answers, read: AnswerReader): string | undefined;
  /** A sentence saying what the current answer implies (e.g. which formula chain and why). */
  explainChoice?(answers: Answers, read: AnswerReader): string | undefined;
  /**
   * The answer may hold several lines (surveyed points pasted from an export): a pasted block's
   * line breaks stay in the answer instead of ending it.
   */
  lines?: boolean;
  /** An empty answer keeps this preference (the screen shows its value as what Enter gives). */
  usesPreference?: 'reactionTime';
}

/** A question's state in the jump list. `unused`: answered, but its branch no longer applies. */
export type QuestionStatus = 'answered' | 'open' | 'invalid' | 'unused';

export interface QuestionState {
  id: string;
  title: string;
  section: string;
  status: QuestionStatus;
  /** The answer as the user would recognise it (a choice's words), when there is one. */
  answer?: string;
}

export type InterviewMode = 'guided' | 'brisk';

/** `review` is the review screen; anything else is a question id. */
export type Cursor = string;

/** One entry of the undo history: the answers and cursor before an answer was changed. */
export interface UndoEntry {
  answers: Answers;
  cursor: Cursor;
}

export interface InterviewState {
  answers: Answers;
  cursor: Cursor;
  /**
   * Set when the last answer was rejected; the answers are then unchanged. With `confirm`, the
   * answer was held back for a check: the same text entered again is taken.
   */
  error?: { id: string; text: string; message: string; confirm?: true };
  /** A one-line note for the user (a unit conversion, why a chain was picked, ...). */
  notice?: string;
  /** Most recent last; bounded in length. */
  undo: UndoEntry[];
  mode: InterviewMode;
  /** Explanations (help) shown open. Guided mode starts with them open. */
  explain: boolean;
}

export type Action =
  /** `note`: where the text came from (the file it was read from), said before the answer's notice. */
  | { type: 'answer'; text: string; note?: string }
  | { type: 'accept-default' }
  | { type: 'choose'; value: string }
  | { type: 'back' }
  | { type: 'forward' }
  | { type: 'jump'; id: string }
  | { type: 'undo' }
  | { type: 'open-review' }
  | { type: 'set-mode'; mode: InterviewMode }
  | { type: 'toggle-explain' }
  | { type: 'clear-error' }
  /** An answer the screen could not take (a points file it could not read): shown, answers kept. */
  | { type: 'refuse'; text: string; message: string };

/** Progress through the questions that currently apply. */
export interface Progress {
  answered: number;
  applicable: number;
}

/** What the case file stores under `interview`, so a half-finished case resumes. */
export interface SavedInterview {
  version: 1;
  answers: Answers;
  cursor: Cursor;
  mode: InterviewMode;
}

/** Identity of the case being built; `units` overrides the answer when given. */
export interface CaseMeta {
  id: string;
  created?: string;
  updated?: string;
  units?: UnitSystem;
}
