// Small statistics and table printing for the benchmark. Plain JavaScript: `npm run bench` runs
// with node alone, before or without any TypeScript loader.

/** Median of a list of numbers (mean of the two middle ones for an even count). */
export function median(xs) {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** The p-th percentile (0..100) by the nearest-rank method: the value at rank ceil(p/100 * n). */
export function percentile(xs, p) {
  const s = [...xs].sort((a, b) => a - b);
  const rank = Math.max(1, Math.ceil((p / 100) * s.length));
  return s[rank - 1];
}

/**
 * Interleaves two measurements run by run (subject, baseline, subject, ...), so that a slow
 * moment of a shared machine weighs on both alike. Each function returns one duration in ms.
 */
export async function interleaved(subject, baseline, { runs, warmup = 1 }) {
  for (let i = 0; i < warmup; i++) {
    await baseline();
    await subject();
  }
  const a = [];
  const b = [];
  for (let i = 0; i < runs; i++) {
    b.push(await baseline());
    a.push(await subject());
  }
  return { subject: a, baseline: b };
}

const fmtMs = (ms) =>
  ms === undefined ? '-' : ms < 10 ? `${ms.toFixed(2)} ms` : `${ms.toFixed(1)} ms`;

/** One row of the printed table. */
function cells(r) {
  if (!r.available) return [r.figure, 'not available yet', '-', '-', '-'];
  const ratio = r.baseline > 0 ? r.measured / r.baseline : undefined;
  const ratioText = ratio === undefined ? '-' : `${ratio.toFixed(2)}x`;
  const goal =
    r.goal.kind === 'ratio'
      ? `${ratioText} / <= ${r.goal.limit.toFixed(1)}x`
      : r.goal.kind === 'ms'
        ? `${ratioText} / < ${r.goal.limit} ms`
        : `${ratioText} / no goal`;
  const result = r.goal.kind === 'none' ? '-' : r.pass ? 'pass' : 'miss';
  return [r.figure, fmtMs(r.measured), fmtMs(r.baseline), goal, result];
}

/** The results as a plain-text table: figure, measured, baseline, ratio/goal, pass/miss. */
export function table(results) {
  const head = ['figure', 'measured', 'baseline', 'ratio / goal', 'result'];
  const rows = [head, ...results.map(cells)];
  const widths = head.map((_, i) => Math.max(...rows.map((r) => r[i].length)));
  const line = (r) =>
    r
      .map((c, i) => c.padEnd(widths[i]))
      .join('  ')
      .trimEnd();
  return [line(head), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.slice(1).map(line)].join(
    '\n',
  );
}

/** The same table in Markdown, dated, for the README's performance section (.bench/last.md). */
export function markdownTable(results, when, runsNote) {
  const rows = results.map((r) => `| ${cells(r).join(' | ')} |`);
  return [
    `Measured ${when} with \`npm run bench\` (${runsNote}).`,
    '',
    '| figure | measured | baseline | ratio / goal | result |',
    '| --- | --- | --- | --- | --- |',
    ...rows,
    '',
  ].join('\n');
}
