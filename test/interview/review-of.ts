/**
 * What the user reads on the review for an interview state: the case built from the answers,
 * solved as `solve` reads the saved file, rendered by the review's own lines.
 */
import { buildCase, type InterviewState } from '../../src/interview/index.js';
import { lookNotes } from '../../src/interview/build-case.js';
import { liveInterview, solveAsFile } from '../../src/ui/interview-live.js';
import { reviewLines } from '../../src/ui/review-lines.js';
import { inputFor } from '../../src/ui/session.js';
import type { Case } from '../../src/case/load.js';

/** The case as the interview saves it. */
export const savedCase = (s: InterviewState): Case => buildCase(s, { id: 'typed-case' });

/** The review's lines as one string with single spaces (wrapping undone). */
export function reviewText(s: InterviewState, width = 100): string {
  const c = savedCase(s);
  return reviewLines(solveAsFile(c), width, { case: c, notes: lookNotes(s) })
    .map((l) => l.text)
    .join(' ')
    .replace(/\s+/g, ' ');
}

/** The text the input line starts with on the current question, as the screen offers it. */
export const shownLine = (s: InterviewState): string => inputFor(liveInterview, s).line.value;
