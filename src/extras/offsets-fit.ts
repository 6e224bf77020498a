import { type Quantity } from '../case/quantity.js';
import { spread } from '../engine/spread.js';
import {
  fitCircleToOffsets as fitInEngine,
  type OffsetStation,
  type OffsetsFit,
  type OffsetsFitOptions,
} from '../engine/offsets-fit.js';
import type { Outcome } from '../engine/types.js';

export type { OffsetStation, OffsetsFit, OffsetsFitOptions } from '../engine/offsets-fit.js';

/**
 * The least-squares circle through a chord's ends and its offset stations (the fit itself now
 * lives in the engine, which solves yaw analyses from offsets). The chord may be given as the
 * case file's quantity: its value is used.
 * @example fitCircleToOffsets({ value: 40, low: 39.9 }, stations) // same as fitCircleToOffsets(40, stations)
 */
export function fitCircleToOffsets(
  chord: Quantity,
  stations: readonly OffsetStation[],
  opts: OffsetsFitOptions = {},
): Outcome<OffsetsFit> {
  return fitInEngine(spread(chord).value, stations, opts);
}
