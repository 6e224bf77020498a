import { z } from 'zod';

/**
 * A measured or estimated number: a plain number, or `{ value, low?, high?, note?, decimals? }`.
 * Missing `low`/`high` mean no spread on that input. `decimals` records how many decimals the
 * figure was typed with (`0.70` is 2), which a JSON number cannot keep; the record shows it so.
 */
export type Quantity =
  number | { value: number; low?: number; high?: number; note?: string; decimals?: number };

/** Most decimals a figure may say it was typed with (`decimals`). */
export const MAX_DECIMALS = 9;

/** The issue with a `decimals` field, or undefined when it is a whole number 0..9 (or absent). */
export function decimalsIssue(d: unknown): string | undefined {
  if (d === undefined) return undefined;
  return typeof d === 'number' && Number.isInteger(d) && d >= 0 && d <= MAX_DECIMALS
    ? undefined
    : `decimals must be a whole number from 0 to ${MAX_DECIMALS} (the decimals the figure was typed with)`;
}

/** Bounds a kind of quantity must respect, with the words used in messages. */
export interface QuantityRule {
  /** What the number is, as the message names it: "length", "drag factor", ... */
  what: string;
  /** Exclusive lower bound. */
  gt?: number;
  /** Inclusive lower bound. */
  min?: number;
  /** Inclusive upper bound. */
  max?: number;
  /** Exclusive upper bound. */
  lt?: number;
}

/** Message for a number outside a rule, or undefined when it fits. */
export function ruleViolation(rule: QuantityRule, n: number): string | undefined {
  if (!Number.isFinite(n)) return `${rule.what} must be a finite number`;
  if (rule.gt !== undefined && !(n > rule.gt))
    return `${rule.what} must be greater than ${rule.gt}`;
  if (rule.min !== undefined && n < rule.min) return `${rule.what} must be at least ${rule.min}`;
  if (rule.max !== undefined && n > rule.max) return `${rule.what} must be at most ${rule.max}`;
  if (rule.lt !== undefined && !(n < rule.lt)) return `${rule.what} must be less than ${rule.lt}`;
  return undefined;
}

/**
 * zod schema for one kind of quantity, with messages that name the kind. Checked by hand rather
 * than with a union so that the message says what is wrong ("length must be greater than 0")
 * instead of "no union member matched".
 */
export function quantity(rule: QuantityRule) {
  return z
    .custom<Quantity>(() => true)
    .superRefine((input, ctx) => {
      const check = (n: unknown, label: string, path: (string | number)[]) => {
        if (typeof n !== 'number') {
          ctx.addIssue({
            code: 'custom',
            path,
            message: n === undefined ? `${label} is required` : `${label} must be a number`,
          });
          return false;
        }
        const msg = ruleViolation({ ...rule, what: label }, n);
        if (msg) ctx.addIssue({ code: 'custom', path, message: msg });
        return !msg;
      };
      if (input === undefined) {
        ctx.addIssue({ code: 'custom', message: `${rule.what} is required` });
        return;
      }
      if (typeof input === 'number') {
        check(input, rule.what, []);
        return;
      }
      if (typeof input !== 'object' || input === null || Array.isArray(input)) {
        ctx.addIssue({
          code: 'custom',
          message: `${rule.what} must be a number or { "value": n, "low": n, "high": n }`,
        });
        return;
      }
      const q = input as Record<string, unknown>;
      const okV = check(q.value, rule.what, ['value']);
      const okL = q.low === undefined || check(q.low, `${rule.what} (low)`, ['low']);
      const okH = q.high === undefined || check(q.high, `${rule.what} (high)`, ['high']);
      if (q.note !== undefined && typeof q.note !== 'string')
        ctx.addIssue({ code: 'custom', path: ['note'], message: 'note must be text' });
      const dec = decimalsIssue(q.decimals);
      if (dec) ctx.addIssue({ code: 'custom', path: ['decimals'], message: dec });
      if (okV && okL && q.low !== undefined && (q.low as number) > (q.value as number))
        ctx.addIssue({
          code: 'custom',
          path: ['low'],
          message: `${rule.what}: low must not be above value`,
        });
      if (okV && okH && q.high !== undefined && (q.high as number) < (q.value as number))
        ctx.addIssue({
          code: 'custom',
          path: ['high'],
          message: `${rule.what}: high must not be below value`,
        });
    });
}

/**
 * A plain number field (one that is not a quantity) with the quantity's wording: missing is
 * "is required", text or another type "must be <expected>", and infinity (`1e999` in a file)
 * "must be a finite number", as for every quantity.
 * @example finiteNumber('drag factor').safeParse(Infinity) // issue: 'drag factor must be a finite number'
 */
export function finiteNumber(what: string, expected = 'a number') {
  return z.number({
    error: (iss: { input?: unknown }) =>
      iss.input === undefined
        ? `${what} is required`
        : typeof iss.input === 'number'
          ? `${what} must be a finite number`
          : `${what} must be ${expected}`,
  });
}

/** Common rules, shared by the schema and by the interview's answer checks. */
export const RULES = {
  length: { what: 'length', gt: 0, max: 100_000 },
  speed: { what: 'speed', min: 0, max: 1_000 },
  postedLimit: { what: 'posted limit', gt: 0, max: 1_000 },
  drag: { what: 'drag factor', gt: 0, max: 2 },
  efficiency: { what: 'braking efficiency', min: 0, max: 1 },
  share: { what: 'front axle share', min: 0, max: 1 },
  wheel: { what: 'wheel braking', min: 0, max: 1 },
  grade: { what: 'grade', gt: -100, lt: 100 },
  superelevation: { what: 'superelevation', gt: -100, lt: 100 },
  trackWidth: { what: 'track width', gt: 0, max: 100 },
  testSpeed: { what: 'test speed', gt: 0, max: 1_000 },
  sledWeight: { what: 'sled weight', gt: 0 },
  sledPull: { what: 'sled pull', gt: 0 },
  decel: { what: 'decelerometer reading', gt: 0, max: 2 },
  /** A drag factor worked out from one test skid (`factors` of test skids). */
  testFactor: { what: 'test drag factor', gt: 0, max: 2 },
  /** Height of take-off above landing; negative when the vehicle landed higher. */
  drop: { what: 'drop', min: -100_000, max: 100_000 },
  /** Take-off path as a signed percent grade (+ upward); ±100% is ±45°. */
  takeoffGrade: { what: 'take-off grade', gt: -100, lt: 100 },
} satisfies Record<string, QuantityRule>;
