import type { AnalysisModel, AnalysisSolution } from '../engine/types.js';

/** How the start speed moves when one input goes to the ends of its range, all others at value. */
export interface SensitivityRow {
  key: string;
  label: string;
  /** Unit of the input itself (ft, %, ...); the speed unit is the caller's. */
  unit: string;
  inputValue: number;
  inputLow: number;
  inputHigh: number;
  /** Start speed with every input at its value. */
  base: number;
  /** Start speed with this input at its low end; undefined where the figure cannot be computed. */
  atLow: number | undefined;
  /** Start speed with this input at its high end; undefined where the figure cannot be computed. */
  atHigh: number | undefined;
  /** The larger drop below `base` of the two ends (<= 0), 0 when neither end lowers the speed. */
  down: number;
  /** The larger rise above `base` of the two ends (>= 0). */
  up: number;
  /** `up - down`: the width of the bar, the sort key. */
  swing: number;
}

/** Inputs whose spread is smaller than this, relative to their value, count as having none. */
const NO_SPREAD = 1e-12;

function hasSpread(low: number, high: number, value: number): boolean {
  return high - low > NO_SPREAD * Math.max(1, Math.abs(value));
}

/**
 * One-at-a-time sensitivity of an analysis: for each model input with a spread, the start speed
 * at the input's low and high end with all other inputs at their value, sorted by swing
 * (`up - down`), largest first; ties keep the model's input order.
 *
 * Inputs without a spread are left out. An end where the model cannot compute a figure (for
 * example a downhill grade the drag factor cannot hold) gives `atLow`/`atHigh` undefined and adds
 * nothing to the swing; the caller shows it as "not computable".
 *
 * @example
 * // Slide to stop, S = sqrt(30 d f), d = 100 ft, f 0.70 (0.60 to 0.80):
 * sensitivity(solution)[0] // { key: 'f[0]', atLow: 42.4, atHigh: 49.0, down: -3.4, up: 3.2, ... }
 */
export function sensitivity(
  solution: AnalysisSolution | { model: AnalysisModel },
): SensitivityRow[] {
  const model = solution.model;
  const base = model.evaluate({});
  if (base === undefined || !Number.isFinite(base)) return [];
  const rows: SensitivityRow[] = [];
  for (const inp of model.inputs) {
    if (!hasSpread(inp.low, inp.high, inp.value)) continue;
    const atLow = finiteOrUndefined(model.evaluate({ [inp.key]: inp.low }));
    const atHigh = finiteOrUndefined(model.evaluate({ [inp.key]: inp.high }));
    const deltas = [atLow, atHigh].filter((s): s is number => s !== undefined).map((s) => s - base);
    const down = Math.min(0, ...deltas);
    const up = Math.max(0, ...deltas);
    rows.push({
      key: inp.key,
      label: inp.label,
      unit: inp.unit,
      inputValue: inp.value,
      inputLow: inp.low,
      inputHigh: inp.high,
      base,
      atLow,
      atHigh,
      down,
      up,
      swing: up - down,
    });
  }
  // Array.prototype.sort is stable, so equal swings keep the model's order.
  return rows.sort((a, b) => b.swing - a.swing);
}

function finiteOrUndefined(n: number | undefined): number | undefined {
  return n !== undefined && Number.isFinite(n) ? n : undefined;
}
