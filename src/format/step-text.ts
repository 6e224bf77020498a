/** One step of a chain as text, and the kind of number a unit shows: shared by every text output. */
import type { Step } from '../engine/types.js';
import { formatRange } from './numbers.js';
import { type NumberKind } from '../engine/number-text.js';

/** The kind of number a step's result is, from its unit. */
export function kindOfUnit(unit: string): NumberKind {
  if (unit === 'mph' || unit === 'km/h') return 'speed';
  if (unit === 'ft' || unit === 'm') return 'length';
  if (unit === 's') return 'seconds';
  if (unit === '%' || unit === '°') return 'percent';
  return 'drag';
}

/**
 * A step's result with its range, as every output shows it: `43.3 mph (40.2 to 46.1)`; written
 * as the step's numbers line writes it (its `kind`, else its unit's).
 */
export function stepResultText(step: Step): string {
  return formatRange(
    { value: step.result, low: step.low, high: step.high },
    step.kind ?? kindOfUnit(step.unit),
    step.unit,
  );
}

/** One step as lines: name, formula, the numbers substituted, the result with its range, why. */
export function formatStepLines(step: Step, index: number): string[] {
  const r = stepResultText(step);
  return [
    `${index}. ${step.name}`,
    `   ${step.formula}`,
    `   ${step.substituted}`,
    `   result: ${r}`,
    `   why: ${step.why}`,
  ];
}
