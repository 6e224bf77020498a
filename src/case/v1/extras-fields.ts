import { z } from 'zod';
import { finiteNumber, quantity, RULES } from '../quantity.js';
import { MAX_ITEMS, tooManyMessage } from '../limits.js';

/**
 * The optional fields of case v1 that feed the extras (docs/case-file.md, "Sampling",
 * "Time and distance", "Offsets"). Additive to version 1: a file without them is unchanged.
 * Loose objects, as everywhere in v1, so that unknown keys are kept (and warned about by solve).
 */

/** Top level `sampling`: how to draw the inputs for the percentiles. */
export const samplingFieldV1 = z.looseObject(
  {
    shape: z.enum(['uniform', 'normal'], { error: 'shape must be uniform or normal' }).optional(),
    samples: finiteNumber('samples')
      .int('samples must be a whole number')
      .min(1000, 'samples must be at least 1000')
      .max(1_000_000, 'samples must be at most 1000000')
      .optional(),
    seed: finiteNumber('seed')
      .int('seed must be a whole number')
      .min(0, 'seed must be at least 0')
      .max(0xffffffff, 'seed must be at most 4294967295')
      .optional(),
  },
  { error: 'sampling must be an object { "shape", "samples", "seed" }' },
);

/** Per skid analysis `timeDistance`: a reaction time for this case and a conflict point. */
export const timeDistanceFieldV1 = z.looseObject(
  {
    reactionTime: finiteNumber('reactionTime', 'a number of seconds')
      .min(0, 'reactionTime must be at least 0 s')
      .max(10, 'reactionTime must be at most 10 s')
      .optional(),
    conflictAt: finiteNumber('conflictAt', 'a distance')
      .min(0, 'conflictAt must be 0 or more (a distance from the start of the marks)')
      .max(100_000, 'conflictAt must be at most 100000')
      .optional(),
  },
  { error: 'timeDistance must be an object { "reactionTime", "conflictAt" }' },
);

/** One offset station: `at` along the chord from its start, `offset` from the chord to the mark. */
export const offsetStationV1 = z.looseObject(
  {
    at: finiteNumber('at', 'a distance along the chord').gt(0, 'at must be greater than 0'),
    offset: finiteNumber('offset', 'a length').gt(0, 'offset must be greater than 0'),
  },
  { error: 'station must be an object { "at": n, "offset": n }' },
);

/**
 * Per yaw analysis `offsets`: offsets at stations along one chord, instead of one middle
 * ordinate. The chord is a quantity (its spread widens the fitted radius); the offsets are plain
 * readings (their scatter about the circle gives the fit's own spread).
 */
export const offsetsFieldV1 = z.looseObject(
  {
    chord: quantity({ ...RULES.length, what: 'chord' }),
    stations: z
      .array(offsetStationV1, { error: 'stations must be a list of { "at": n, "offset": n }' })
      .min(1, 'at least one station is needed')
      .max(MAX_ITEMS, tooManyMessage('stations')),
  },
  { error: 'offsets must be an object { "chord": n, "stations": [...] }' },
);

export type TimeDistanceFieldV1 = z.infer<typeof timeDistanceFieldV1>;
export type OffsetsFieldV1 = z.infer<typeof offsetsFieldV1>;
