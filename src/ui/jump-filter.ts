import type { QuestionState, QuestionStatus } from '../interview/types.js';

/**
 * The questions whose title, section or id holds every word typed (any order, any case), so
 * "seg 2 len" finds "Segment 2 length" in "Analysis 1 - slide".
 * @example filterQuestions(states, 'chord') // the chord questions only
 */
export function filterQuestions(states: readonly QuestionState[], typed: string): QuestionState[] {
  const words = typed.toLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0) return [...states];
  return states.filter((s) => {
    const hay = `${s.section} ${s.title} ${s.id}`.toLowerCase();
    return words.every((w) => hay.includes(w));
  });
}

/** How a state is written beside a question: in words, so it reads without colour. */
export const STATUS_WORD: Record<QuestionStatus, string> = {
  answered: 'answered',
  open: 'open',
  invalid: 'needs fixing',
  unused: 'not used now',
};
