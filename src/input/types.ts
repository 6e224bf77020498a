/** Shapes shared by the typed-answer parsers. */
import type { Quantity, QuantityRule } from '../case/quantity.js';
import type { UnitSystem } from '../engine/types.js';
import type { QuantityKind } from './units.js';

export type { QuantityKind } from './units.js';

/** What a typed quantity must be. */
export interface QuantitySpec {
  /** The field as messages name it: "mark length", "drag factor", "grade". */
  field: string;
  kind: QuantityKind;
  /** The case's unit system: lengths are stored in ft or m, speeds in mph or km/h. */
  units: UnitSystem;
  /** Bounds, checked in the case's units with the file validator's words (`RULES.length`, ...). */
  rule: QuantityRule;
  /** Accept `0.65-0.80`, `0.72 (0.65-0.80)` and `80 ± 1`. */
  allowRange: boolean;
  /**
   * False where the sign is asked separately (grade as uphill/downhill + percent): a minus sign is
   * then rejected with `negativeHint`. Default true (the rule alone decides).
   */
  signed?: boolean;
  /** What to do instead of a minus sign; default "choose downhill instead of typing a minus sign". */
  negativeHint?: string;
}

/** A typed quantity read, or the message to show. */
export type QuantityResult =
  | {
      ok: true;
      /** In the case's units: a plain number, or `{ value, low, high }` for a range or tolerance. */
      value: Quantity;
      /** Set when a unit was converted: `24.4 m = 80.05 ft`. */
      converted?: string;
    }
  | { ok: false; message: string };

/** Several values on one line. */
export interface ListSpec extends QuantitySpec {
  /** What one item is called in messages: "mark" gives "mark 3: ...". */
  item: string;
  /** Fewest and most items accepted; default 1 and 64. */
  minItems?: number;
  maxItems?: number;
}

export type ListResult =
  { ok: true; values: Quantity[]; converted?: string } | { ok: false; message: string };

/** A whole number of things ("number of marks"). */
export interface CountSpec {
  field: string;
  /** Default 1. */
  min?: number;
  max?: number;
}

export type CountResult = { ok: true; value: number } | { ok: false; message: string };
