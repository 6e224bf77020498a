import type { ModelInput, Range } from './types.js';

/** One primary input of an analysis model, from its range (for sensitivity and sampling). */
export const modelInput = (key: string, label: string, unit: string, r: Range): ModelInput => ({
  key,
  label,
  unit,
  value: r.value,
  low: r.low,
  high: r.high,
});
