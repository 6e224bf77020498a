import type { Range } from './types.js';

/** Mean, smallest and largest of several figures: the reduction every repeated measure uses. */
export function reduceRepeated(xs: readonly number[]): Range {
  return {
    value: xs.reduce((a, b) => a + b, 0) / xs.length,
    // Reduced, not spread into Math.min/max: a file may hold more figures than a call's arguments.
    low: xs.reduce((a, b) => Math.min(a, b)),
    high: xs.reduce((a, b) => Math.max(a, b)),
  };
}
