/**
 * Scrolling a list of lines taller than the terminal: Ink draws everything it is given, so the
 * screens cut their long text to a window and move it with the keys.
 */

/** The first line to show so that `top` stays within the text (never past its end). */
export function clampTop(top: number, total: number, height: number): number {
  return Math.max(0, Math.min(top, total - height));
}

/** The window of `lines` starting at `top`, `height` lines long, with what is hidden above/below. */
export function windowOf<T>(lines: readonly T[], top: number, height: number) {
  const h = Math.max(1, height);
  const start = clampTop(top, lines.length, h);
  return {
    start,
    shown: lines.slice(start, start + h),
    above: start,
    below: Math.max(0, lines.length - start - h),
  };
}
