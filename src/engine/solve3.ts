/**
 * Solves the 3 x 3 linear system A x = b by Gaussian elimination with partial pivoting.
 * `a` is row-major, 9 numbers; neither argument is changed. Returns undefined when A is singular
 * (a pivot below 1e-14 of the largest entry), never NaN.
 * @example solve3([2, 0, 0, 0, 4, 0, 0, 0, 8], [2, 4, 8]) // [1, 1, 1]
 */
export function solve3(
  a: readonly number[],
  b: readonly number[],
): [number, number, number] | undefined {
  const m = [
    [a[0]!, a[1]!, a[2]!, b[0]!],
    [a[3]!, a[4]!, a[5]!, b[1]!],
    [a[6]!, a[7]!, a[8]!, b[2]!],
  ];
  const scale = Math.max(...a.map(Math.abs));
  if (!(scale > 0) || !Number.isFinite(scale)) return undefined;
  for (let col = 0; col < 3; col++) {
    let piv = col;
    for (let r = col + 1; r < 3; r++) if (Math.abs(m[r]![col]!) > Math.abs(m[piv]![col]!)) piv = r;
    if (Math.abs(m[piv]![col]!) < 1e-14 * scale) return undefined;
    [m[col], m[piv]] = [m[piv]!, m[col]!];
    const p = m[col]!;
    for (let r = col + 1; r < 3; r++) {
      const row = m[r]!;
      const k = row[col]! / p[col]!;
      for (let c = col; c < 4; c++) row[c] = row[c]! - k * p[c]!;
    }
  }
  const x = [0, 0, 0];
  for (let r = 2; r >= 0; r--) {
    const row = m[r]!;
    let s = row[3]!;
    for (let c = r + 1; c < 3; c++) s -= row[c]! * x[c]!;
    x[r] = s / row[r]!;
  }
  if (!x.every(Number.isFinite)) return undefined;
  return [x[0]!, x[1]!, x[2]!];
}

/** Inverse of a symmetric positive definite 3 x 3 matrix (row-major), by solving for each column. */
export function inverse3(a: readonly number[]): number[] | undefined {
  const cols = [0, 1, 2].map((j) => solve3(a, [j === 0 ? 1 : 0, j === 1 ? 1 : 0, j === 2 ? 1 : 0]));
  if (cols.some((c) => c === undefined)) return undefined;
  const c = cols as [number, number, number][];
  return [0, 1, 2].flatMap((i) => [c[0]![i]!, c[1]![i]!, c[2]![i]!]);
}
