/** The parts of a case built from answers: drag factors, slopes, segments, and texts. */
import type { Quantity } from '../case/quantity.js';
import type { DragV1, SegmentV1 } from '../case/v1/schema.js';
import type { Answers } from './types.js';
import { formatSegmentLine } from '../input/index.js';
import { segmentCount, surfaceMode } from './answers-read.js';
import { readAnswers, type AnswerReader } from './answer-values.js';
import { OTHER_SURFACE } from './drag-table.js';
import { signed } from './signed.js';
export type Q = Quantity;

/** `{ value, low, high }` of a Quantity, for the drag shapes that take the fields flat. */
function flat(q: Q): { value: number; low?: number; high?: number } {
  return typeof q === 'number'
    ? { value: q }
    : {
        value: q.value,
        ...(q.low !== undefined ? { low: q.low } : {}),
        ...(q.high !== undefined ? { high: q.high } : {}),
      };
}

export function dragOf(r: AnswerReader, p: string): DragV1 {
  const source = r.value(`${p}.drag.source`);
  if (source === 'test-skids')
    return { source, tests: r.value(`${p}.drag.tests`) as { speed: Q; distance: Q }[] };
  if (source === 'sled')
    return {
      source,
      weight: r.value(`${p}.drag.weight`) as Q,
      pulls: r.value(`${p}.drag.pulls`) as Q[],
    };
  if (source === 'decelerometer') return { source, readings: r.value(`${p}.drag.readings`) as Q[] };
  const v = flat(r.value(`${p}.drag.value`) as Q);
  if (source === 'table') {
    const key = r.value(`${p}.drag.surface`) as string;
    const surface = key === OTHER_SURFACE ? (r.value(`${p}.drag.surfaceName`) as string) : key;
    return { source, surface, ...v };
  }
  return { source: 'entered', ...v };
}

export function slopeOf(
  r: AnswerReader,
  id: string,
  negativeWord: string,
  noneWord: string,
): Q | undefined {
  const dir = r.value(`${id}.dir`);
  if (dir === noneWord || dir === undefined) return undefined;
  return signed(r.value(`${id}.pct`) as Q, dir === negativeWord);
}

export const text = (r: AnswerReader, id: string) => {
  const v = r.value(id);
  return typeof v === 'string' && v !== '' ? v : undefined;
};

/** The segments of slide `i` as the case stores them; read only when their questions are complete. */
export function segmentsOf(r: AnswerReader, i: number): SegmentV1[] {
  const several = surfaceMode(r.answers, i) !== 'one';
  const segments: SegmentV1[] = [];
  for (let j = 0; j < segmentCount(r.answers, i); j++) {
    const sp = `a${i}.seg${j}`;
    const s: SegmentV1 = { drag: dragOf(r, sp) };
    const label = text(r, `${sp}.label`);
    if (label) s.label = label;
    if (several) s.length = r.value(`${sp}.length`) as Q;
    const g = slopeOf(r, `${sp}.grade`, 'downhill', 'level');
    if (g !== undefined) s.grade = g;
    segments.push(s);
  }
  return segments;
}

/**
 * The segments of slide `i` written on one quick-entry line, when every segment question is
 * answered and the line can say them (undefined otherwise): Enter then keeps them as they are.
 */
export function segmentsLine(answers: Answers, i: number): string | undefined {
  const r = readAnswers(answers);
  const own = new RegExp(`^a${i}\\.seg\\d+\\.`);
  if (segmentCount(answers, i) === 0 || !r.complete((id) => own.test(id))) return undefined;
  return formatSegmentLine(segmentsOf(r, i));
}
