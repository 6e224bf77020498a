/**
 * How many decimals a number is written with. The engine writes each step's substituted numbers
 * with this rule (they are part of the step it returns), and every output above it uses the same
 * rule, so a figure reads the same in a step, on screen and in a report.
 */
/**
 * What a number is, which fixes how many decimals it is shown with. Speeds 1 dp, drag factors
 * and braking efficiency 2 dp (`fine-factor` 3 dp, see factorKind), lengths 2 dp below 10 and 1 dp from 10, grades as decimals
 * (`grade`) up to 3 dp, percentages up to 1 dp, seconds 1 dp.
 */
export type NumberKind =
  | 'speed'
  | 'length'
  | 'drag'
  | 'fine-factor'
  | 'efficiency'
  | 'grade'
  | 'percent'
  | 'seconds'
  | 'ratio'
  | 'integer';

/** Shown instead of a number that is not finite: never "NaN" or "Infinity" on screen. */
export const NOT_A_NUMBER = '—';

function fixed(n: number, dp: number): string {
  const s = n.toFixed(dp);
  // "-0.0" reads as a sign error to a reader; a rounded zero has no sign.
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

function trimmed(n: number, maxDp: number, minDp: number): string {
  let s = fixed(n, maxDp);
  if (s.includes('.')) {
    s = s.replace(/0+$/, '');
    const dp = s.length - s.indexOf('.') - 1;
    if (dp < minDp) s += '0'.repeat(minDp - dp);
    if (s.endsWith('.')) s = s.slice(0, -1);
  }
  return s;
}

/**
 * The one rule for the dimensionless factors of a step (drag factor, braking efficiency, a grade
 * or bank as a decimal, the effective drag): every factor in the line, its result included, is
 * written with 2 decimals, or with 3 when a grade or bank in it has a fraction of a percent
 * (2.5% is 0.025, which 2 decimals would misstate as 0.03). `percents` are those grades and banks.
 * @example factorKind(-3) // 'drag': 0.69 × 0.90 − 0.03 = 0.59
 * @example factorKind(-2.5) // 'fine-factor': 0.690 × 0.900 − 0.025 = 0.596
 */
export function factorKind(...percents: number[]): 'drag' | 'fine-factor' {
  return percents.some((p) => Number.isFinite(p) && Math.abs(Math.round(p * 10)) % 10 !== 0)
    ? 'fine-factor'
    : 'drag';
}

/**
 * Formats a number for people: fixed decimals per kind, never "NaN".
 * @example formatNumber(41.63, 'speed') // "41.6"
 * @example formatNumber(0.7, 'drag') // "0.70"
 * @example formatNumber(-0.12, 'grade') // "-0.12"
 */
export function formatNumber(n: number, kind: NumberKind): string {
  if (!Number.isFinite(n)) return NOT_A_NUMBER;
  switch (kind) {
    case 'speed':
    case 'seconds':
      return fixed(n, 1);
    case 'length':
      return fixed(n, Math.abs(n) < 10 ? 2 : 1);
    case 'drag':
    case 'efficiency':
      return fixed(n, 2);
    case 'fine-factor':
      return fixed(n, 3);
    case 'grade':
      return trimmed(n, 3, 2);
    case 'percent':
      return trimmed(n, 1, 0);
    case 'ratio':
      return trimmed(n, 4, 1);
    case 'integer':
      return fixed(Math.round(n), 0);
  }
}

/** Decimals a number is written with by plain JSON (`0.7` has 1, `80` none). */
export function jsonDecimals(n: number): number {
  const s = String(n);
  return s.includes('e') ? 0 : s.includes('.') ? s.length - s.indexOf('.') - 1 : 0;
}

/**
 * A figure as it was typed: with the decimals recorded for it (a quantity's `decimals`: `0.70`),
 * else as the file holds it (`0.7`). For the record of what was entered, not for computed figures.
 * @example typedText(0.7, 2) // "0.70"
 */
export function typedText(n: number, decimals: number | undefined): string {
  return decimals !== undefined && decimals > jsonDecimals(n) ? n.toFixed(decimals) : String(n);
}
