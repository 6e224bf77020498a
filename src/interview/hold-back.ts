/**
 * An answer that parses but looks like a slip, or that would change answers given before, is
 * held back once with a message saying why; the same text entered again is taken. A held answer
 * changes nothing, so the previous good answer stays.
 */
import type { InterviewState, ParseResult } from './types.js';

/** Ends every held-back message: what the investigator can do next. */
export const AGAIN = 'Press Enter again to take it as typed, or change it.';

/**
 * The message to hold `text` back with, or undefined when it is to be taken now: nothing to
 * check, or the same text was already held back for this question.
 */
export function holdBack(
  state: InterviewState,
  id: string,
  text: string,
  r: Extract<ParseResult, { ok: true }>,
  changes: string[],
): string | undefined {
  const reasons = [
    ...(r.confirm ? [r.confirm] : []),
    ...(changes.length ? [`This line would change: ${changes.join('; ')}.`] : []),
  ];
  if (reasons.length === 0) return undefined;
  const e = state.error;
  if (e?.confirm && e.id === id && e.text.trim() === text.trim()) return undefined;
  return `${reasons.join(' ')} ${AGAIN}`;
}
