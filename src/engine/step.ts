import type { Range, Step, StepInput } from './types.js';

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
    why: p.why,
  };
}
