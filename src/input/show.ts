/**
 * Numbers as shown in conversion notes and messages: a few decimals, never "NaN". Values stored in
 * the case are not rounded by this; see `tidy`.
 */

/**
 * A number rounded for reading: 1 decimal from 100, 2 from 1, else 2 significant digits past the
 * leading zeros; trailing zeros dropped.
 * @example showNumber(80.0524934) // "80.05"
 * @example showNumber(984.2519685) // "984.3"
 * @example showNumber(0.0254) // "0.0254"
 */
export function showNumber(n: number): string {
  if (!Number.isFinite(n)) return '—';
  const a = Math.abs(n);
  const dp = a >= 100 ? 1 : a >= 1 || a === 0 ? 2 : 1 - Math.floor(Math.log10(a)) + 1;
  let s = n.toFixed(Math.min(dp, 12));
  if (s.includes('.')) s = s.replace(/0+$/, '').replace(/\.$/, '');
  return s === '-0' ? '0' : s;
}

/**
 * Removes the noise of binary arithmetic from a computed figure (`3.8100000000000005` -> `3.81`),
 * keeping 12 significant digits: far finer than any tape or drag sled.
 * @example tidy(12.5 * 0.3048) // 3.81
 */
export function tidy(n: number): number {
  if (!Number.isFinite(n) || n === 0) return n === 0 ? 0 : n;
  return Number(n.toPrecision(12));
}
