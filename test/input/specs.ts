/** Specs the interview would pass, shared by the input tests. */
import { RULES, type Quantity } from '../../src/case/quantity.js';
import { spread } from '../../src/engine/spread.js';
import type { QuantitySpec } from '../../src/input/index.js';
import { expect } from 'vitest';

const spec =
  (
    field: string,
    kind: QuantitySpec['kind'],
    rule: QuantitySpec['rule'],
    extra: Partial<QuantitySpec> = {},
  ) =>
  (units: QuantitySpec['units'] = 'imperial'): QuantitySpec => ({
    field,
    kind,
    units,
    rule,
    allowRange: true,
    ...extra,
  });

export const SPECS = {
  length: spec('mark length', 'length', RULES.length),
  lengthOne: spec('track width', 'length', RULES.trackWidth, { allowRange: false }),
  drag: spec('drag factor', 'factor', RULES.drag),
  efficiency: spec('braking efficiency', 'factor', RULES.efficiency),
  grade: spec('grade', 'percent', RULES.grade, { signed: false }),
  signedGrade: spec('grade', 'percent', RULES.grade),
  bank: spec('superelevation', 'percent', RULES.superelevation, {
    signed: false,
    negativeHint: 'choose "away from the centre" instead of typing a minus sign',
  }),
  speed: spec('end speed', 'speed', RULES.speed),
  time: spec('perception-reaction time', 'time', {
    what: 'perception-reaction time',
    gt: 0,
    max: 10,
  }),
  weight: spec('sled weight', 'weight', RULES.sledWeight),
  pull: spec('sled pull', 'force', RULES.sledPull),
};

/** Compares a parsed quantity with the expected one end by end, to 9 decimals (values are kept to 12 digits). */
export function expectQuantity(actual: Quantity, expected: Quantity): void {
  const a = spread(actual);
  const e = spread(expected);
  expect(typeof actual === 'number').toBe(typeof expected === 'number');
  expect(a.value).toBeCloseTo(e.value, 9);
  expect(a.low).toBeCloseTo(e.low, 9);
  expect(a.high).toBeCloseTo(e.high, 9);
}

/** Every number in a value, for the never-NaN checks. */
export function numbersIn(x: unknown): number[] {
  if (typeof x === 'number') return [x];
  if (Array.isArray(x)) return x.flatMap(numbersIn);
  if (x && typeof x === 'object') return Object.values(x).flatMap(numbersIn);
  return [];
}
