/** What the screens show, derived from the state: current question, progress, jump list, resume lines. */
import { keptLines } from './kept-analyses.js';
import type { InterviewState, Progress, Question, QuestionState } from './types.js';
import { allQuestions } from './questions.js';
import { readAnswers } from './answer-values.js';
import { firstOpenIn, validCursor } from './navigate.js';
import { analysisCount, markLook, segmentCount, surfaceMode, unitsOf } from './answers-read.js';
import { showNumber } from '../input/index.js';
import { analysisSection } from './questions.js';
import { isMetaAnswer } from './kept-fields.js';

/** The question the cursor is on, or undefined on the review. */
export function currentQuestion(state: InterviewState): Question | undefined {
  const r = readAnswers(state.answers);
  const cursor = validCursor(state, r.questions);
  return r.questions.find((q) => q.id === cursor);
}

/** Answered (and valid) questions out of those that apply now. */
export function progress(state: InterviewState): Progress {
  const r = readAnswers(state.answers);
  return {
    answered: r.questions.filter((q) => r.status(q.id) === 'answered').length,
    applicable: r.questions.length,
  };
}

/**
 * Every applicable question with its status, and, in their place, the answers kept from branches
 * that no longer apply (status `unused`): they are never dropped.
 */
export function questionStates(state: InterviewState): QuestionState[] {
  const r = readAnswers(state.answers);
  const out: QuestionState[] = [];
  const seen = new Set<string>();
  for (const q of allQuestions(state.answers)) {
    if (seen.has(q.id)) continue;
    const status = r.status(q.id);
    const given = state.answers[q.id];
    const answer =
      given === undefined
        ? undefined
        : given.text === ''
          ? '(skipped)'
          : (q.choices?.find((c) => c.value === given.text)?.label ?? given.text);
    const row = (st: QuestionState['status']): QuestionState => ({
      id: q.id,
      title: q.title,
      section: q.section,
      status: st,
      ...(answer !== undefined ? { answer } : {}),
    });
    if (status) out.push(row(status));
    else if (given && !r.questions.some((x) => x.id === q.id)) out.push(row('unused'));
    else continue;
    seen.add(q.id);
  }
  for (const id of Object.keys(state.answers))
    if (!seen.has(id) && !isMetaAnswer(id))
      out.push({ id, title: id, section: 'Not used', status: 'unused' });
  return out;
}

/**
 * The questions that apply and still need an answer (not answered yet, or answered with text
 * that no longer reads), by title, in the order asked: what stands between the answers and a
 * figure. Optional questions are left out.
 */
export function stillToAnswer(state: InterviewState): string[] {
  const r = readAnswers(state.answers);
  return r.questions
    .filter((q) => !q.optional && r.status(q.id) !== 'answered')
    .map((q) => (r.status(q.id) === 'invalid' ? `${q.title} (does not read)` : q.title));
}

/** Where a resumed interview lands: the first open or invalid question, or the review. */
export function firstOpenQuestion(state: InterviewState): string {
  return firstOpenIn(state.answers);
}

const plural = (n: number, w: string) => `${n} ${w}${n === 1 ? '' : 's'}`;

/** Short lines for the resume screen: what is done, what is left. */
export function summaryOfDone(state: InterviewState): string[] {
  const a = state.answers;
  const r = readAnswers(a);
  const lines: string[] = [];
  const ref = a['details.reference']?.text;
  const metric = unitsOf(a) === 'metric';
  // Read fresh, so a limit typed with a unit shows in the case's unit.
  const limit = r.status('limit') === 'answered' ? r.value('limit') : undefined;
  lines.push(
    `Case${ref ? ` ${ref}` : ''}: ${metric ? 'metres and km/h' : 'feet and mph'}${typeof limit === 'number' ? `, posted limit ${showNumber(limit)} ${metric ? 'km/h' : 'mph'}` : ''}`,
  );
  const brakes = a['vehicle.brakes']?.value;
  const brakeWords =
    r.status('vehicle.brakes') === undefined
      ? 'brakes not needed (no slide)'
      : brakes === 'all'
        ? 'all brakes working'
        : brakes === 'estimate'
          ? 'braking efficiency estimated'
          : brakes === 'wheels'
            ? 'brakes wheel by wheel'
            : 'brakes not yet given';
  lines.push(
    `Vehicle${a['vehicle.label']?.text ? ` ${a['vehicle.label'].text}` : ''}: ${brakeWords}`,
  );
  lines.push(...keptLines(a));
  for (let i = 0; i < analysisCount(a); i++) {
    const look = markLook(a, i);
    const mine = r.questions.filter((q) => q.id.startsWith(`a${i}.`) && q.id !== `a${i}.more`);
    const left = mine.filter((q) => r.status(q.id) !== 'answered').length;
    let what =
      look === undefined
        ? 'marks not yet described'
        : look === 'yaw'
          ? 'yaw marks'
          : look === 'airborne'
            ? 'take-off to landing'
            : `${plural(Math.max(segmentCount(a, i), 0), 'segment')}`;
    if (
      look !== undefined &&
      look !== 'yaw' &&
      look !== 'airborne' &&
      surfaceMode(a, i) === undefined
    )
      what = 'slide, surfaces not yet given';
    lines.push(
      `${analysisSection(a, i)}: ${what}; ${left === 0 ? 'complete' : `${plural(left, 'question')} left`}`,
    );
  }
  const p = progress(state);
  lines.push(`${p.answered} of ${p.applicable} questions answered`);
  return lines;
}
