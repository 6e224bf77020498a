import { z } from 'zod';
import type { Case } from '../case/load.js';
import { fromZod } from '../case/issues.js';
import { fail, ok, type Outcome } from '../engine/types.js';
import type { SampleOptions } from './sampling.js';

/**
 * Proposed optional case fields for the extras (the lead adds them to the v1 schema and to
 * docs/case-file.md). Until then the loose schema keeps them as unknown fields, and the readers
 * below validate them here.
 */

/** Top level `sampling`: how to draw the inputs for the percentiles. */
export const samplingFieldV1 = z.object({
  shape: z.enum(['uniform', 'normal'], { error: 'shape must be uniform or normal' }).optional(),
  samples: z
    .number({ error: 'samples must be a number' })
    .int('samples must be a whole number')
    .min(1000, 'samples must be at least 1000')
    .max(1_000_000, 'samples must be at most 1000000')
    .optional(),
  seed: z
    .number({ error: 'seed must be a number' })
    .int('seed must be a whole number')
    .min(0, 'seed must be at least 0')
    .max(0xffffffff, 'seed must be at most 4294967295')
    .optional(),
});

/** Per skid analysis `timeDistance`: a reaction time for this case and a conflict point. */
export const timeDistanceFieldV1 = z.object({
  reactionTime: z
    .number({ error: 'reactionTime must be a number of seconds' })
    .min(0, 'reactionTime must be at least 0 s')
    .max(10, 'reactionTime must be at most 10 s')
    .optional(),
  conflictAt: z
    .number({ error: 'conflictAt must be a distance' })
    .min(0, 'conflictAt must be 0 or more (a distance from the start of the marks)')
    .max(100_000, 'conflictAt must be at most 100000')
    .optional(),
});

/** Per yaw analysis `offsets`: offsets at stations along one chord, instead of one middle ordinate. */
export const offsetsFieldV1 = z.object({
  chord: z.number({ error: 'chord must be a length' }).gt(0, 'chord must be greater than 0'),
  stations: z
    .array(
      z.object({
        at: z
          .number({ error: 'at must be a distance along the chord' })
          .gt(0, 'at must be greater than 0'),
        offset: z
          .number({ error: 'offset must be a length' })
          .gt(0, 'offset must be greater than 0'),
      }),
      { error: 'stations must be a list of { "at": n, "offset": n }' },
    )
    .min(1, 'at least one station is needed'),
});

export type SamplingFieldV1 = z.infer<typeof samplingFieldV1>;
export type TimeDistanceFieldV1 = z.infer<typeof timeDistanceFieldV1>;
export type OffsetsFieldV1 = z.infer<typeof offsetsFieldV1>;

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
  const r = read(samplingFieldV1, (c as Record<string, unknown>).sampling, 'sampling');
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
    (c.analyses[i] as Record<string, unknown>).timeDistance,
    `analyses[${i}].timeDistance`,
  );
}

/** A yaw analysis' `offsets` field, or undefined; a bad field fails with its path. */
export function offsetsFromCase(c: Case, analysisId: string): Outcome<OffsetsFieldV1 | undefined> {
  const i = c.analyses.findIndex((a) => a.id === analysisId);
  if (i < 0) return ok(undefined);
  return read(
    offsetsFieldV1,
    (c.analyses[i] as Record<string, unknown>).offsets,
    `analyses[${i}].offsets`,
  );
}
