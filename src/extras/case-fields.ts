import type { z } from 'zod';
import type { Case } from '../case/load.js';
import { fromZod } from '../case/issues.js';
import { fail, ok, type Outcome } from '../engine/types.js';
import type { SampleOptions } from './sampling.js';

import {
  offsetsFieldV1,
  samplingFieldV1,
  timeDistanceFieldV1,
  type OffsetsFieldV1,
  type TimeDistanceFieldV1,
} from '../case/v1/extras-fields.js';

/**
 * Readers of the case fields the extras use (`sampling`, `timeDistance`, `offsets`). The fields
 * are defined once, in src/case/v1/extras-fields.ts, and checked when the case loads; the readers
 * re-check a value (cheap) so that a hand-built Case gets the same path-naming failure.
 */
export { type OffsetsFieldV1, type TimeDistanceFieldV1 } from '../case/v1/extras-fields.js';

function read<T>(schema: z.ZodType<T>, value: unknown, path: string): Outcome<T | undefined> {
  if (value === undefined) return ok(undefined);
  const r = schema.safeParse(value);
  if (r.success) return ok(r.data);
  const first = fromZod(r.error)[0]!;
  const sub =
    first.path === '(file)' ? '' : first.path.startsWith('[') ? first.path : `.${first.path}`;
  return fail(first.message, `${path}${sub}`);
}

/**
 * The case's `sampling` field as options for sampleSpeeds (samples → n), or undefined when the
 * case has none; a bad field fails with its path (`sampling.seed`).
 */
export function samplingFromCase(c: Case): Outcome<SampleOptions | undefined> {
  const r = read(samplingFieldV1, c.sampling, 'sampling');
  if (!r.ok || r.value === undefined) return r as Outcome<undefined>;
  const o: SampleOptions = {};
  if (r.value.shape !== undefined) o.shape = r.value.shape;
  if (r.value.samples !== undefined) o.n = r.value.samples;
  if (r.value.seed !== undefined) o.seed = r.value.seed;
  return ok(o);
}

/** A skid analysis' `timeDistance` field, or undefined; a bad field fails with its path. */
export function timeDistanceFromCase(
  c: Case,
  analysisId: string,
): Outcome<TimeDistanceFieldV1 | undefined> {
  const i = c.analyses.findIndex((a) => a.id === analysisId);
  if (i < 0) return ok(undefined);
  return read(
    timeDistanceFieldV1,
    (c.analyses[i] as { timeDistance?: unknown }).timeDistance,
    `analyses[${i}].timeDistance`,
  );
}

/** A yaw analysis' `offsets` field, or undefined; a bad field fails with its path. */
export function offsetsFromCase(c: Case, analysisId: string): Outcome<OffsetsFieldV1 | undefined> {
  const i = c.analyses.findIndex((a) => a.id === analysisId);
  if (i < 0) return ok(undefined);
  return read(
    offsetsFieldV1,
    (c.analyses[i] as { offsets?: unknown }).offsets,
    `analyses[${i}].offsets`,
  );
}
