import type { Table } from './doc.js';
import { pad, width, wrap } from './wrap.js';

const GAP = 2;
const MIN_COL = 6;

/**
 * Column widths that fit `total` columns: each column's natural width, then the widest column
 * narrowed one step at a time until the row fits (cells wrap inside their column).
 */
export function columnWidths(t: Table, total: number): number[] {
  const natural = t.columns.map((h, i) =>
    Math.max(width(h), ...t.rows.map((r) => width(r[i] ?? ''))),
  );
  const w = natural.map((n) => Math.max(1, n));
  const budget = total - GAP * (w.length - 1);
  for (;;) {
    const sum = w.reduce((a, b) => a + b, 0);
    if (sum <= budget) return w;
    const widest = w.indexOf(Math.max(...w));
    if (w[widest]! <= MIN_COL) return w;
    w[widest] = w[widest]! - 1;
  }
}

function renderRow(cells: string[], w: number[], align: Table['align']): string[] {
  const wrapped = w.map((cw, i) => wrap(cells[i] ?? '', cw));
  const height = Math.max(...wrapped.map((c) => c.length));
  const lines: string[] = [];
  for (let k = 0; k < height; k++) {
    const parts = w.map((cw, i) => pad(wrapped[i]![k] ?? '', cw, align[i] ?? 'left'));
    lines.push(parts.join(' '.repeat(GAP)).trimEnd());
  }
  return lines;
}

/** A table as plain text lines no wider than `total` columns, header underlined with dashes. */
export function textTable(t: Table, total: number): string[] {
  const w = columnWidths(t, total);
  const lines = renderRow(t.columns, w, t.align);
  lines.push(w.map((cw) => '-'.repeat(cw)).join(' '.repeat(GAP)));
  for (const r of t.rows) lines.push(...renderRow(r, w, t.align));
  return lines;
}
