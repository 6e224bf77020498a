/**
 * The parts of a case built from answers: drag factors, slopes, segments, and texts. Each part is
 * read through the case file's own schema (src/case/v1/schema.ts), so nothing half-answered or
 * mistyped reaches the engine: a part the answers do not make yet is undefined.
 */
import { quantity, RULES, type Quantity, type QuantityRule } from '../case/quantity.js';
import {
  brakesV1,
  dragV1,
  segmentV1,
  type BrakesV1,
  type DragV1,
  type SegmentV1,
} from '../case/v1/schema.js';
import type { AnswerReader } from './types.js';
import { formatSegmentLine } from '../input/index.js';
import { factorsLevel, isSegment, segmentCount, slideInParts, testWhere } from './answers-read.js';
import { OTHER_SURFACE } from './drag-table.js';
import { signed } from './signed.js';
import { WHEELS } from './wheels.js';
export type Q = Quantity;

/** The answer `id` as a Quantity under `rule`, read with the file's schema; undefined otherwise. */
export function quantityOf(r: AnswerReader, id: string, rule: QuantityRule): Q | undefined {
  const v = r.value(id);
  if (v === undefined) return undefined;
  const p = quantity(rule).safeParse(v);
  return p.success ? p.data : undefined;
}

/** `{ value, low, high }` of a Quantity, for the drag shapes that take the fields flat. */
function flat(q: unknown): Record<string, unknown> {
  if (typeof q !== 'object' || q === null) return { value: q };
  return Object.fromEntries(Object.entries(q).filter(([k]) => k !== 'note'));
}

/** The drag answers under `p` as the file would hold them, before the schema reads them. */
function rawDrag(r: AnswerReader, p: string, withTestGrade: boolean): Record<string, unknown> {
  const source = r.value(`${p}.drag.source`);
  if (source === 'test-skids') {
    const testGrade = withTestGrade ? testGradeOf(r, p) : undefined;
    const tests = r.value(`${p}.drag.tests`);
    // Typed as the factors worked out from the tests, or as each test's speed and distance.
    const factors =
      typeof tests === 'object' && tests !== null && 'factors' in tests ? tests.factors : undefined;
    const level = factors !== undefined && factorsLevel(r.answers, p);
    return {
      source,
      ...(factors !== undefined ? { factors } : { tests }),
      ...(level ? { gradeTakenOut: true } : {}),
      ...(testGrade !== undefined ? { testGrade } : {}),
    };
  }
  if (source === 'sled')
    return { source, weight: r.value(`${p}.drag.weight`), pulls: r.value(`${p}.drag.pulls`) };
  if (source === 'decelerometer') return { source, readings: r.value(`${p}.drag.readings`) };
  const v = flat(r.value(`${p}.drag.value`));
  if (source === 'table') {
    const key = r.value(`${p}.drag.surface`);
    const surface = key === OTHER_SURFACE ? r.value(`${p}.drag.surfaceName`) : key;
    return { source, surface, ...v };
  }
  return { source, ...v };
}

/**
 * The drag factor answered under `p` (`a0.seg1`, `a2`), or undefined while the answers make none.
 * `withTestGrade: false` leaves the tests' grade out (read as level): the grade question's own
 * check uses it, since with tests on the same stretch the tests' grade is that very answer.
 */
export function dragOf(r: AnswerReader, p: string, withTestGrade = true): DragV1 | undefined {
  const parsed = dragV1.safeParse(rawDrag(r, p, withTestGrade));
  return parsed.success ? parsed.data : undefined;
}

/**
 * The grade the test skids under `p` were run on (signed percent): the segment's own grade when
 * they ran on its stretch in its direction (0 when it is level), else the grade answered for them.
 * Undefined while it is not answered.
 */
export function testGradeOf(r: AnswerReader, p: string): Q | undefined {
  if (isSegment(p) && testWhere(r.answers, p) === 'same')
    return r.status(`${p}.grade.dir`) === 'answered'
      ? (slopeOf(r, `${p}.grade`, 'downhill', 'level') ?? 0)
      : undefined;
  if (r.status(`${p}.drag.testGrade.dir`) !== 'answered') return undefined;
  return slopeOf(r, `${p}.drag.testGrade`, 'downhill', 'level') ?? 0;
}

export function slopeOf(
  r: AnswerReader,
  id: string,
  negativeWord: string,
  noneWord: string,
): Q | undefined {
  const dir = r.value(`${id}.dir`);
  if (dir === noneWord || dir === undefined) return undefined;
  const pct = quantityOf(r, `${id}.pct`, RULES.grade);
  return pct === undefined ? undefined : signed(pct, dir === negativeWord);
}

export const text = (r: AnswerReader, id: string) => {
  const v = r.value(id);
  return typeof v === 'string' && v !== '' ? v : undefined;
};

/**
 * The segments of slide `i` as the case stores them, read with the file's schema; undefined when
 * one of them is not complete and valid.
 */
export function segmentsOf(r: AnswerReader, i: number): SegmentV1[] | undefined {
  const several = slideInParts(r.answers, i);
  const segments: SegmentV1[] = [];
  for (let j = 0; j < segmentCount(r.answers, i); j++) {
    const sp = `a${i}.seg${j}`;
    const label = text(r, `${sp}.label`);
    const grade = slopeOf(r, `${sp}.grade`, 'downhill', 'level');
    const parsed = segmentV1.safeParse({
      ...(label ? { label } : {}),
      ...(several ? { length: r.value(`${sp}.length`) } : {}),
      drag: dragOf(r, sp),
      ...(grade !== undefined ? { grade } : {}),
    });
    if (!parsed.success) return undefined;
    segments.push(parsed.data);
  }
  return segments;
}

/**
 * The segments of slide `i` written on one quick-entry line, when every segment question is
 * answered and the line can say them (undefined otherwise): Enter then keeps them as they are.
 */
export function segmentsLine(r: AnswerReader, i: number): string | undefined {
  const own = new RegExp(`^a${i}\\.seg\\d+\\.`);
  if (segmentCount(r.answers, i) === 0 || !r.complete((id) => own.test(id))) return undefined;
  const segments = segmentsOf(r, i);
  return segments && formatSegmentLine(segments);
}

/** The brakes as answered so far, or undefined while they are not. */
export function brakesOf(r: AnswerReader): BrakesV1 | undefined {
  // Not asked (no slide in the case) or not yet answered: no brakes to write.
  if (r.status('vehicle.brakes') !== 'answered') return undefined;
  if (
    !r.complete(
      (id) =>
        id.startsWith('vehicle.brakes') ||
        id === 'vehicle.share' ||
        id.startsWith('vehicle.wheel.'),
    )
  )
    return undefined;
  const mode = r.value('vehicle.brakes');
  const basis = text(r, 'vehicle.brakes.basis');
  const wheel = (w: (typeof WHEELS)[number]): unknown => {
    const v = r.value(`vehicle.wheel.${w.id}`);
    return v === 'working' ? 1 : v === 'none' ? 0 : r.value(`vehicle.wheel.${w.id}.fraction`);
  };
  const raw =
    mode === 'estimate'
      ? { mode, efficiency: r.value('vehicle.brakes.efficiency'), ...(basis ? { basis } : {}) }
      : mode === 'wheels'
        ? { mode, ...Object.fromEntries(WHEELS.map((w) => [w.key, wheel(w)])) }
        : { mode };
  // Read with the file's schema: a wheel or an efficiency not (validly) answered makes no brakes.
  const parsed = brakesV1.safeParse(raw);
  return parsed.success ? parsed.data : undefined;
}
