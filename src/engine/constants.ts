import type { UnitSystem, Units } from './types.js';

/** Standard gravity, m/s² (CGPM 1901; the conventional value NIST uses). */
export const STANDARD_GRAVITY_SI = 9.80665;
/** Standard gravity in ft/s², from 9.80665 m/s² and the international foot of 0.3048 m. */
export const STANDARD_GRAVITY_FT = STANDARD_GRAVITY_SI / 0.3048;

/** Unit labels of a case's unit system. @example unitsOf('metric') // { length: 'm', speed: 'km/h' } */
export function unitsOf(system: UnitSystem): Units {
  return system === 'imperial' ? { length: 'ft', speed: 'mph' } : { length: 'm', speed: 'km/h' };
}

/** The trade's rounded constants of the slide and yaw formulas. */
export interface TradeConstants {
  /** C in S² = C d f: 30 (mph, ft) or 254 (km/h, m). */
  slide: 30 | 254;
  /** K in S² = K R f: 15 (mph, ft) or 127 (km/h, m). */
  yaw: 15 | 127;
}

const IMPERIAL: Readonly<TradeConstants> = Object.freeze({ slide: 30, yaw: 15 });
const METRIC: Readonly<TradeConstants> = Object.freeze({ slide: 254, yaw: 127 });

/**
 * The trade constants. From v² = 2 a d with a = f g and a speed unit conversion k (speed unit to
 * length unit per second), S² = (2 g / k²) d f:
 * - imperial: k = 5280/3600 ft/s per mph, g = 32.174 ft/s², 2 g / k² = 2 × 32.174 × (3600/5280)²
 *   = 29.91, rounded to 30; half of it (v² = f g R) 14.96, rounded to 15.
 * - metric: k = 1/3.6 m/s per km/h, g = 9.80665 m/s², 2 × 9.80665 × 3.6² = 254.19, rounded to 254;
 *   half 127.09, rounded to 127.
 * The rounding changes a speed by about 0.15%, far below the drag factor's uncertainty.
 * @example tradeConstants('imperial') // { slide: 30, yaw: 15 }
 */
export function tradeConstants(system: UnitSystem): Readonly<TradeConstants> {
  // Two shared frozen objects: the models call this in sampling loops, so nothing is allocated.
  return system === 'imperial' ? IMPERIAL : METRIC;
}

/**
 * Length per second in one speed unit: 5280/3600 = 1.4667 ft/s per mph (exact), 1/3.6 m/s per km/h.
 * @example speedUnitToLengthPerSecond('imperial') // 1.4666…
 */
export function speedUnitToLengthPerSecond(system: UnitSystem): number {
  return system === 'imperial' ? 5280 / 3600 : 1 / 3.6;
}

/** Gravity in the system's length unit per second squared. */
export function gravityOf(system: UnitSystem): number {
  return system === 'imperial' ? STANDARD_GRAVITY_FT : STANDARD_GRAVITY_SI;
}

/**
 * The reading error the middle ordinate sensitivity is shown for: 1 inch (1/12 ft) or 1 cm.
 */
export function ordinateReadingStep(system: UnitSystem): { size: number; label: string } {
  return system === 'imperial' ? { size: 1 / 12, label: '1 in' } : { size: 0.01, label: '1 cm' };
}

/**
 * Published perception-reaction times, s: M. Green, "How long does it take to stop?",
 * Transportation Human Factors 2(3), 2000 (about 0.7 to 0.75 s for a fully expected event,
 * 1.25 s for an unexpected but common one, 1.5 s for a surprise); AASHTO, A Policy on Geometric
 * Design of Highways and Streets (2.5 s, the design value).
 */
export const REACTION_TIMES = Object.freeze({
  expected: { low: 0.7, high: 0.75 },
  unexpected: 1.25,
  surprise: 1.5,
  design: 2.5,
});

/**
 * The perception-reaction time used when neither the case nor the user's preference sets one:
 * the surprise value (common practice). The one definition: the preferences' default, the review,
 * `solve` and the report read it from here.
 */
export const DEFAULT_REACTION_TIME: number = REACTION_TIMES.surprise;
