/**
 * The p-quantile of sorted numbers by linear interpolation between order statistics:
 * h = (N - 1) p, Q = x[floor h] + (h - floor h) (x[floor h + 1] - x[floor h]). This is
 * definition 7 of Hyndman & Fan (The American Statistician 50(4), 1996), the default of R, NumPy
 * and mathjs' quantileSeq.
 *
 * `sorted` must be ascending and non-empty; `p` in [0, 1].
 * @example quantileSorted(Float64Array.of(1, 2, 3, 4), 0.5) // 2.5
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  const h = (n - 1) * Math.min(1, Math.max(0, p));
  const i = Math.floor(h);
  const lo = sorted[i]!;
  if (i + 1 >= n) return lo;
  return lo + (h - i) * (sorted[i + 1]! - lo);
}
