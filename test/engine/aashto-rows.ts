// AASHTO, A Policy on Geometric Design of Highways and Streets (the "Green Book", 2011/2018): the
// one copy of its rows the tests compare the engine with (docs/physics.md, "Check values").
// Each figure says whether it was read from the printed table or is AASHTO's formula worked again
// here with the table's rounding.

/** Perception-reaction time of the tables, s. */
export const AASHTO_T = 2.5;
/** a/g of the tables' deceleration: 11.2 ft/s² over 32.2 ft/s². */
export const AASHTO_F_US = 0.348;
/** a/g of the metric tables' deceleration: 3.4 m/s² over standard gravity. */
export const AASHTO_F_SI = 3.4 / 9.80665;

export interface StoppingRow {
  V: number;
  /** 1.47 V t (US) or 0.278 V t (metric), to 0.1: AASHTO's formula. */
  reaction: number;
  /** 1.075 V²/a (US) or 0.039 V²/a (metric), to 0.1: AASHTO's formula. */
  braking: number;
  /** The design stopping sight distance, rounded up to the next 5. */
  design: number;
  /** Whether the design value was read from the printed table (a reprint) or is AASHTO's formula. */
  designFrom: 'printed table' | "AASHTO's formula";
}

/** Table 3-1, stopping sight distance, US customary (ft). */
export const STOPPING_US: readonly StoppingRow[] = [
  { V: 30, reaction: 110.3, braking: 86.4, design: 200, designFrom: 'printed table' },
  { V: 40, reaction: 147.0, braking: 153.6, design: 305, designFrom: "AASHTO's formula" },
  { V: 50, reaction: 183.8, braking: 240.0, design: 425, designFrom: 'printed table' },
  { V: 60, reaction: 220.5, braking: 345.5, design: 570, designFrom: 'printed table' },
  { V: 70, reaction: 257.3, braking: 470.3, design: 730, designFrom: "AASHTO's formula" },
];

/** Table 3-1, stopping sight distance, metric (m): every figure AASHTO's formula. */
export const STOPPING_METRIC: readonly StoppingRow[] = [
  { V: 50, reaction: 34.8, braking: 28.7, design: 65, designFrom: "AASHTO's formula" },
  { V: 100, reaction: 69.5, braking: 114.7, design: 185, designFrom: "AASHTO's formula" },
];

/**
 * Table 3-2's formula, stopping distance on a grade: 1.47 V t + V²/(30 (a/32.2 ± G)), reaction
 * included, rounded up to the foot. AASHTO's formula worked again, not the printed table figure.
 */
export const STOPPING_ON_GRADE: readonly { V: number; grade: number; distance: number }[] = [
  { V: 60, grade: -6, distance: 638 },
  { V: 60, grade: 6, distance: 515 },
];

/**
 * Table 3-7, minimum radius with e_max = 8%: R = V²/(15 (0.01 e + f)) (US) or V²/(127 (0.01 e + f))
 * (metric). The side friction factors f were read from the table; every radius is AASHTO's formula
 * worked again (whole feet, or to 0.1 where the rounding would hide the check).
 */
export const MINIMUM_RADIUS: readonly {
  V: number;
  f: number;
  R: number;
  system: 'imperial' | 'metric';
}[] = [
  { V: 30, f: 0.2, R: 214, system: 'imperial' },
  { V: 50, f: 0.14, R: 758, system: 'imperial' },
  { V: 60, f: 0.12, R: 1200, system: 'imperial' },
  { V: 70, f: 0.1, R: 1814.8, system: 'imperial' },
  { V: 100, f: 0.12, R: 393.7, system: 'metric' },
];
