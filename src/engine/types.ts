import type { NumberKind } from './number-text.js';
/**
 * Shared shapes of the calculation engine. The engine is pure: no I/O, no UI imports. Every
 * figure carries the steps that made it; the interview, the review screen, the report and
 * `solve --json` read those steps and never re-derive a number.
 */

export type UnitSystem = 'imperial' | 'metric';

/** Unit labels for a case's unit system. */
export interface Units {
  length: 'ft' | 'm';
  speed: 'mph' | 'km/h';
}

/** A figure with its spread: `low <= value <= high`. */
export interface Range {
  value: number;
  low: number;
  high: number;
}

/** One input of a step, as it entered the formula. */
export interface StepInput {
  value: number;
  low?: number;
  high?: number;
  unit: string;
  /** Where the number came from ("entered", "mean of 3 test skids", "table: dry asphalt ..."). */
  source?: string;
}

/**
 * One step in a formula chain. `substituted` is the formula with the numbers in it, e.g.
 * `S = sqrt(30 × 80.0 ft × 0.72 × 1.00) = 41.6 mph`.
 */
export interface Step {
  name: string;
  formula: string;
  substituted: string;
  inputs: Record<string, StepInput>;
  result: number;
  low: number;
  high: number;
  unit: string;
  /** How the result is written when its unit alone does not say (a factor line with 3 decimals). */
  kind?: NumberKind;
  why: string;
}

/** Typed failure: the engine never returns NaN or Infinity for the caller to find on screen. */
export type Outcome<T> = { ok: true; value: T } | { ok: false; reason: string; path?: string };

export const ok = <T>(value: T): Outcome<T> => ({ ok: true, value });
export const fail = (reason: string, path?: string): Outcome<never> =>
  path === undefined ? { ok: false, reason } : { ok: false, reason, path };

/**
 * A primary input of an analysis's model, for sensitivity and sampling. `key` is stable within
 * the analysis ("d", "f[0]", "G[1]", "n", "Send", "C", "M", "e", "T").
 */
export interface ModelInput {
  key: string;
  label: string;
  unit: string;
  value: number;
  low: number;
  high: number;
}

/**
 * The analysis as a function of its primary inputs. `evaluate` returns the start speed for the
 * given inputs (missing keys take their `value`), or `undefined` where the figure cannot be
 * computed for that combination (e.g. a downhill segment that cannot slow the vehicle).
 */
export interface AnalysisModel {
  inputs: ModelInput[];
  evaluate(x: Readonly<Record<string, number>>): number | undefined;
}

/** Speed at one point of a slide, counted from where the marks begin. */
export interface Boundary {
  label: string;
  /** Distance from the start of the marks to this point, in the case's length unit. */
  at: number;
  speed: Range;
}

/** Effect of a small reading error in a yaw mark's middle ordinate (percent changes). */
export interface OrdinateSensitivity {
  /** The reading error considered, in the case's length unit, and in words ("1 in", "1 cm"). */
  delta: number;
  label: string;
  /** Percent change when M is read `delta` too large (plus) and, if M allows, too small (minus). */
  radiusPercent: { plus: number; minus?: number };
  speedPercent: { plus: number; minus?: number };
  /** One sentence for the review screen and the report. */
  text: string;
}

/** The kinds of analysis a case holds. */
export type AnalysisKind = 'skid' | 'yaw' | 'airborne';

/** One phase of a chain: the analysis and the speed where its marks (or its flight) begin. */
export interface Phase {
  id: string;
  kind: AnalysisKind;
  label?: string;
  speed: Range;
}

/** How one point sits against the fitted circle. */
export interface OffsetResidual {
  at: number;
  offset: number;
  /** The fitted arc's offset at this station (undefined if the station lies beyond the circle). */
  fitted: number | undefined;
  /** Signed distance from the fitted circle: + the point lies outside it (away from the centre). */
  residual: number;
  /** True for the chord's two ends, which are points of the mark by the chord's definition. */
  chordEnd: boolean;
}

export interface OffsetsFit {
  radius: number;
  /** Standard error of the radius from the scatter (s² (JᵀJ)⁻¹); undefined with one station. */
  radiusStdError: number | undefined;
  /** Centre in the chord's frame: x along the chord from its start, y toward the mark. */
  centre: { x: number; y: number };
  /** The fitted arc's middle ordinate (its offset at the chord's midpoint). */
  middleOrdinate: number;
  residuals: OffsetResidual[];
  /** Root mean square of the residuals, chord ends included. */
  rms: number;
  iterations: number;
  warnings: string[];
  step: Step;
}

/** The least-squares circle through a yaw mark's surveyed points, as the step reports it. */
export interface PointsFitSummary {
  radius: number;
  /** Standard error of the radius from the scatter; undefined with exactly three points. */
  stdError: number | undefined;
  centre: { x: number; y: number };
  /** Root mean square and largest (by size, signed) of the distances from the points to the circle. */
  rms: number;
  largest: { index: number; residual: number };
  /** Signed distance of each point from the circle, in the order given (+ outside). */
  residuals: number[];
  count: number;
}

export interface AnalysisSolution {
  id: string;
  kind: AnalysisKind;
  label?: string;
  speed: Range;
  /** The low end rounded down to a whole speed unit: the "at least" figure. */
  minimum: number;
  steps: Step[];
  assumptions: string[];
  warnings: string[];
  /** Skid: speed at the start, at each segment boundary and at the end. */
  boundaries?: Boundary[];
  /** Skid: total slide distance; yaw: radius used (path radius). */
  distance?: Range;
  radius?: Range;
  /** Yaw: what a 1 in / 1 cm reading error in the middle ordinate does to R and S. */
  sensitivity?: OrdinateSensitivity;
  /** Yaw measured by surveyed points: the circle fit. */
  pointsFit?: PointsFitSummary;
  /** Yaw measured by offsets along a chord: the circle fit and the mark's radius it gives. */
  offsetsFit?: { fit: OffsetsFit; radius: Range };
  /**
   * A slide whose end is another analysis: this analysis and every one it runs into, in order of
   * travel, each with its start speed (the speed at each junction).
   */
  phases?: Phase[];
  model: AnalysisModel;
}

export type AnalysisOutcome =
  | { ok: true; solution: AnalysisSolution }
  | { ok: false; id: string; kind: AnalysisKind; reason: string; path?: string };

export interface CaseSolution {
  id: string;
  units: Units;
  analyses: AnalysisOutcome[];
  postedLimit?: { value: number; exceededAtMinimum: boolean };
  /** Warnings about the file itself (unknown fields, ...). */
  warnings: string[];
}
