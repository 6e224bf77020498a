/** Small helpers shared by the text pictures: every line they return fits the width asked for. */

/** Number of characters as a terminal shows them (code points; the pictures use no wide glyphs). */
export function textWidth(s: string): number {
  return [...s].length;
}

/** Cuts `s` to at most `width` characters, ending in "…" when something was cut. */
export function clip(s: string, width: number): string {
  if (width <= 0) return '';
  if (textWidth(s) <= width) return s;
  const chars = [...s];
  return width === 1 ? '…' : chars.slice(0, width - 1).join('') + '…';
}

/** `s` cut or padded with spaces on the right to exactly `width` characters. */
export function padEnd(s: string, width: number): string {
  const c = clip(s, width);
  return c + ' '.repeat(Math.max(0, width - textWidth(c)));
}

/** `s` cut or padded with spaces on the left to exactly `width` characters. */
export function padStart(s: string, width: number): string {
  const c = clip(s, width);
  return ' '.repeat(Math.max(0, width - textWidth(c))) + c;
}

/** A grid of spaces, `height` rows of `width` cells, drawn into by the pictures. */
export function blankGrid(width: number, height: number): string[][] {
  return Array.from({ length: Math.max(0, height) }, () =>
    Array<string>(Math.max(0, width)).fill(' '),
  );
}

/** Writes `text` into row `y` of a grid from column `x`, dropping what falls outside. */
export function put(grid: string[][], x: number, y: number, text: string): void {
  const row = grid[y];
  if (!row) return;
  let col = x;
  for (const ch of text) {
    if (col >= 0 && col < row.length) row[col] = ch;
    col++;
  }
}

/** The grid's rows as lines with trailing spaces removed. */
export function gridLines(grid: string[][]): string[] {
  return grid.map((r) => r.join('').replace(/\s+$/, ''));
}

/** A finite number with a fixed number of decimals, or "—" (never NaN on screen). */
export function num(n: number | undefined, dp: number): string {
  if (n === undefined || !Number.isFinite(n)) return '—';
  const s = n.toFixed(dp);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

/** A signed change: "+3.8", "-4.1", "0.0", or "—" when not computable. */
export function signed(n: number | undefined, dp: number): string {
  if (n === undefined || !Number.isFinite(n)) return '—';
  const s = num(n, dp);
  return n > 0 && s !== num(0, dp) ? `+${s}` : s;
}
