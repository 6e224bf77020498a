/**
 * Types a whole interview into the real program, the way a person does: read the question on
 * screen, type the answer (or press the choice's letter), Enter, wait for the next question.
 *
 * A script maps question ids to answers (`''` is Enter alone: the offered default, or a skip).
 * Which question comes next is not guessed: a mirror of the interview's pure reducer is fed the
 * same answers, so the test knows which question the screen must show, and fails, naming it, if
 * the screen shows anything else.
 */
import { defaultTextOf } from '../../src/interview/answer-values.js';
import { initialState, reduce } from '../../src/interview/reducer.js';
import { currentQuestion } from '../../src/interview/derived.js';
import type { InterviewMode, InterviewState, Question } from '../../src/interview/types.js';
import type { Term } from './harness.js';

/**
 * Answers by question id. For a choice, the choice's value (`wheels`) or its letter (`w`); for
 * text, what to type; `''` presses Enter alone (accept the default, or skip an optional question).
 */
export type Script = Record<string, string>;

export const squash = (s: string) => s.replace(/\s+/g, ' ').trim();

/** The screens mark the line being typed with `> ` at its start (src/ui's text field). */
const INPUT_LINE = /^\s*>\s(.*)$/;

/** True when a screen's input line starts with the text typed (the rest of the row may hold a side panel). */
export function onInputLine(screen: string, typed: string): boolean {
  const want = squash(typed);
  return screen.split('\n').some((l) => {
    const m = INPUT_LINE.exec(l);
    return m !== null && squash(m[1]!).startsWith(want);
  });
}

/** A piece of the prompt short enough to stay on one screen line at 60 columns. */
export const promptMark = (q: Question) => squash(q.prompt).slice(0, 26);

const isChoice = (q: Question) =>
  (q.kind === 'choice' || q.kind === 'confirm') && (q.choices?.length ?? 0) > 0;

/** A choice answered by its key: the script names a choice (a quick line typed there is text). */
const byKey = (q: Question, answer: string) =>
  isChoice(q) && answer !== '' && q.choices!.some((c) => c.value === answer || c.key === answer);

function choiceFor(q: Question, answer: string) {
  const c = q.choices!.find((c) => c.value === answer) ?? q.choices!.find((c) => c.key === answer);
  if (!c)
    throw new Error(
      `script: "${answer}" is not a choice of ${q.id} (${q.choices!.map((c) => c.value).join(', ')})`,
    );
  return c;
}

/** One answer fed to the mirror, as the screen would turn it into an action. */
function mirrorStep(state: InterviewState, q: Question, answer: string): InterviewState {
  if (answer === '') return reduce(state, { type: 'accept-default' });
  if (byKey(q, answer)) return reduce(state, { type: 'choose', value: choiceFor(q, answer).value });
  return reduce(state, { type: 'answer', text: answer });
}

export interface DriveOptions {
  /** Stop before this question (its id), leaving it on screen unanswered. */
  stopAt?: string;
  /** Stop after this many answers. */
  maxAnswers?: number;
  timeoutMs?: number;
  /** Called after each answer with the question id and the key presses it took. */
  onAnswer?: (id: string, keys: number) => void;
}

/**
 * The script's answer. A question the script does not mention is answered as a person who does
 * not care would: Enter, when it is optional or offers a default (said on the console, so a new
 * question shows up in the test output); otherwise the script is incomplete and the test fails.
 */
function answerFor(script: Script, q: Question, state: InterviewState): string {
  const answer = script[q.id];
  if (answer !== undefined) return answer;
  if (q.optional) return '';
  const offered = defaultTextOf(q, state.answers);
  if (offered !== undefined) {
    console.log(
      `interview driver: ${q.id} is not in the script; Enter takes its default "${offered}"`,
    );
    return '';
  }
  throw new Error(`script has no answer for ${q.id}: "${q.prompt}"`);
}

/**
 * A test for "the whole answer is on screen now". A short answer must start the input line; a
 * long one wraps there, so its last characters must show once more than before it was typed.
 */
function typedShown(before: string, answer: string, cols: number): (s: string) => boolean {
  if (answer.length < cols / 2) return (s) => onInputLine(s, answer);
  const tail = answer.slice(-8);
  const times = (s: string) => s.split(tail).length - 1;
  const n = times(before);
  return (s) => times(s) > n;
}

/**
 * Runs the script through the reducer alone (no terminal), to the review or to `opts.stopAt`.
 * Throws naming the first question the script has no answer for, or an answer it rejects.
 */
export function dryRun(
  script: Script,
  opts: DriveOptions = {},
  from: InterviewState = initialState(),
): InterviewState {
  let state = from;
  for (let n = 0; n < 500; n++) {
    const q = currentQuestion(state);
    if (!q || q.id === opts.stopAt || n === opts.maxAnswers) return state;
    const answer = answerFor(script, q, state);
    state = mirrorStep(state, q, answer);
    if (state.error)
      throw new Error(`script answer "${answer}" for ${q.id} was rejected: ${state.error.message}`);
  }
  throw new Error('script: more than 500 answers without reaching the review (a loop?)');
}

/**
 * Every state of the script's walk, one answer at a time, from a fresh interview to the review:
 * element k is the state after k answers (what `dryRun(script, { maxAnswers: k })` returns),
 * made in one walk instead of one walk per k.
 */
export function walkStates(script: Script): InterviewState[] {
  const states = [initialState()];
  for (let state = states[0]!; currentQuestion(state); states.push(state)) {
    if (states.length > 500)
      throw new Error('script: more than 500 answers without reaching the review (a loop?)');
    state = dryRun(script, { maxAnswers: 1 }, state);
  }
  return states;
}

/** The question ids in the order the script answers them, from a fresh interview to the review. */
export function answerOrder(script: Script): string[] {
  return walkStates(script)
    .map((s) => currentQuestion(s)?.id)
    .filter((id): id is string => id !== undefined);
}

/**
 * Types the script into the terminal, from whatever question is on screen (the mirror `from`
 * must match it: a fresh interview, or a resumed one). Returns the mirror's final state.
 */
export async function typeInterview(
  t: Term,
  script: Script,
  opts: DriveOptions = {},
  from?: InterviewState,
  mode: InterviewMode = 'guided',
): Promise<InterviewState> {
  let state = from ?? initialState(mode);
  const wait = { timeoutMs: opts.timeoutMs ?? 10_000 };
  for (let n = 0; ; n++) {
    const q = currentQuestion(state);
    if (!q || q.id === opts.stopAt || n === opts.maxAnswers) return state;
    const answer = answerFor(script, q, state);
    const mark = promptMark(q);
    let screen = await t.waitFor((s) => squash(s).includes(mark), {
      what: `question ${q.id} ("${mark}")`,
      ...wait,
    });
    const keysBefore = t.keyCount;
    if (byKey(q, answer)) await t.type(choiceFor(q, answer).key);
    else {
      if (answer !== '') {
        // Enter only once the whole answer shows on the input line, as a person watching the
        // screen would (the prompt or a hint may hold the same words, so only that line counts).
        const shown = typedShown(screen, answer, t.cols);
        await t.type(answer);
        screen = await t.waitFor(shown, {
          what: `the typed answer "${answer}" on the input line, for ${q.id}`,
          ...wait,
        });
      }
      await t.press('enter');
    }
    state = mirrorStep(state, q, answer);
    if (state.error)
      throw new Error(`script answer "${answer}" for ${q.id} was rejected: ${state.error.message}`);
    opts.onAnswer?.(q.id, t.keyCount - keysBefore);
    await t.waitForChange(screen, { what: `the screen to move on from ${q.id}`, ...wait });
  }
}
