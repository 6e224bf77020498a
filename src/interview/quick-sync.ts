/**
 * The one-line segment entry never overrides a newer answer in silence. Its stored line is
 * rebuilt from the segments' own answers after each change, so a revisit shows (and Enter keeps)
 * the segments as they now are; and a line that would change answers already given says what it
 * would change before it does (see hold-back.ts).
 */
import type { Answers } from './types.js';
import { allQuestions } from './questions.js';
import { contextOf, readAnswers } from './answer-values.js';
import { analysisCount, segmentCount, surfaceMode } from './answers-read.js';
import { segmentsLine } from './build-parts.js';

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/**
 * The answers with every quick-entry line (`a0.quick`) rewritten from the current segment
 * answers, except `except` (the line just typed). A line the syntax cannot say (a segment's drag
 * factor from test skids) is left as it is; submitting it again is then held back.
 */
export function syncQuickLines(answers: Answers, except?: string): Answers {
  let out = answers;
  for (let i = 0; i < analysisCount(answers); i++) {
    const id = `a${i}.quick`;
    const had = answers[id];
    if (id === except || !had || surfaceMode(answers, i) !== 'quick') continue;
    const line = segmentsLine(readAnswers(answers), i);
    if (line === undefined || line === had.text) continue;
    const q = allQuestions(answers).find((x) => x.id === id);
    const r = q?.parse(line, contextOf(answers));
    if (r?.ok) out = { ...out, [id]: { text: line, value: r.value } };
  }
  return out;
}

/**
 * What answers `after` changes from `before` among the ids a line filled, as
 * "Grade percent, segment 1: 5 → 3", plus the segments a shorter line drops.
 */
export function fillChanges(before: Answers, after: Answers, filled: string[]): string[] {
  const titles = new Map(allQuestions(before).map((q) => [q.id, q.title]));
  const out: string[] = [];
  for (const id of filled) {
    const was = before[id];
    const now = after[id];
    if (!was || !now || was.text.trim() === '' || same(was.value, now.value)) continue;
    out.push(`${titles.get(id) ?? id}: ${was.text} → ${now.text || '(none)'}`);
  }
  const m = /^a(\d+)\./.exec(filled[0] ?? '');
  if (m) {
    const i = Number(m[1]);
    const had = segmentCount(before, i);
    const has = segmentCount(after, i);
    if (has < had)
      out.push(
        `segment${had - has === 1 ? '' : 's'} ${has + 1}${had - has > 1 ? `-${had}` : ''} left out`,
      );
  }
  return out;
}
