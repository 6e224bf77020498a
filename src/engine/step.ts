import type { NumberKind } from './number-text.js';
import type { Range, Step, StepInput } from './types.js';

/** Lists up to this long are written out in full in a step; longer ones are cut to `LIST_HEAD`. */
export const LIST_IN_FULL = 12;
/** How many items of a long list a step shows before "… N more". */
export const LIST_HEAD = 8;

/**
 * Items of a list joined for a step's substituted numbers, a long list cut to its first items
 * and a count of the rest, so that a case with a thousand marks prints one readable line rather
 * than thousands of numbers (every value is still in the step's inputs).
 * @example joinList(['1', '2', '3'], ' + ') // '1 + 2 + 3'
 * @example joinList(Array(1000).fill('9'), ', ') // '9, 9, 9, 9, 9, 9, 9, 9, … 992 more'
 */
export function joinList(items: readonly string[], sep: string): string {
  if (items.length <= LIST_IN_FULL) return items.join(sep);
  return `${items.slice(0, LIST_HEAD).join(sep)}${sep}… ${items.length - LIST_HEAD} more`;
}

/** A Range with no spread. */
export const exact = (n: number): Range => ({ value: n, low: n, high: n });

/** A step input from a Range, with its unit and where it came from. */
export function input(r: Range, unit: string, source?: string): StepInput {
  const i: StepInput = { value: r.value, unit };
  if (r.low !== r.value) i.low = r.low;
  if (r.high !== r.value) i.high = r.high;
  if (source !== undefined) i.source = source;
  return i;
}

/** Builds a Step whose result, low and high come from one Range. */
export function makeStep(p: {
  name: string;
  formula: string;
  substituted: string;
  inputs: Record<string, StepInput>;
  result: Range;
  unit: string;
  kind?: NumberKind;
  why: string;
}): Step {
  return {
    name: p.name,
    formula: p.formula,
    substituted: p.substituted,
    inputs: p.inputs,
    result: p.result.value,
    low: p.result.low,
    high: p.result.high,
    unit: p.unit,
    ...(p.kind !== undefined ? { kind: p.kind } : {}),
    why: p.why,
  };
}
