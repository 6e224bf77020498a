/**
 * What the review says beside a figure whose drag factor came from test skids: where the tests
 * were run, and so what was done with their grade. The file holds only the grade (`testGrade`);
 * whether it is the slide's own stretch is the investigator's answer, read here.
 */
import { formatNumber } from '../engine/number-text.js';
import { spread } from '../engine/spread.js';
import type { AnswerReader } from './types.js';
import {
  slideInParts,
  choiceOf,
  factorsLevel,
  isSegment,
  testsAsFactors,
  markLook,
  segmentCount,
  testWhere,
} from './answers-read.js';
import { testGradeOf } from './build-parts.js';

const pct = (n: number) => `${n > 0 ? '+' : ''}${formatNumber(n, 'percent')}%`;

/** One drag prefix's sentence, or undefined when its drag is not from test skids. */
function noteFor(r: AnswerReader, p: string, where: string): string | undefined {
  if (choiceOf(r.answers, `${p}.drag.source`) !== 'test-skids') return undefined;
  const g = testGradeOf(r, p);
  if (g === undefined) return undefined;
  const G = spread(g).value;
  if (testsAsFactors(r.answers, p) && factorsLevel(r.answers, p) && G !== 0)
    return `${where}: the drag factors typed are level-ground factors (the tests' ${pct(G)} grade already taken out): no grade is taken off them.`;
  if (isSegment(p) && testWhere(r.answers, p) === 'same')
    return G === 0
      ? `${where}: the test skids ran on this level stretch, in the slide's direction.`
      : `${where}: the test skids ran on this stretch, in the slide's direction: its ${pct(G)} grade is already in the test ratio, so it is taken off once to give the level drag factor and applied once as the segment's grade (with every wheel braking the two cancel).`;
  return G === 0
    ? `${where}: the test skids ran elsewhere, on level ground: the test ratio is the level drag factor.`
    : `${where}: the test skids ran elsewhere, on a ${pct(G)} grade (in their direction): it is taken off the test ratio to give the level drag factor.`;
}

/** The sentences for analysis `i`: one per segment (or for the yaw) with test skids. */
export function testGradeNotes(r: AnswerReader, i: number): string[] {
  const p = `a${i}`;
  if (markLook(r.answers, i) === 'yaw')
    return [noteFor(r, p, 'Drag factor')].flatMap((n) => n ?? []);
  const several = slideInParts(r.answers, i) || segmentCount(r.answers, i) > 1;
  const out: string[] = [];
  for (let j = 0; j < segmentCount(r.answers, i); j++) {
    const n = noteFor(r, `${p}.seg${j}`, several ? `Segment ${j + 1}` : 'Drag factor');
    if (n) out.push(n);
  }
  return out;
}
