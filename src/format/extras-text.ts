import type { Range, Units } from '../engine/types.js';
import { formatStepLines, kindOfUnit } from './step-text.js';
import { withUnit } from './numbers.js';
import { formatNumber } from '../engine/number-text.js';
import type { AnalysisExtras } from '../extras/analysis-extras.js';
import { limitFraming, verdictSentence } from './verdict.js';

const speedOr = (s: number | undefined, u: Units) =>
  s === undefined ? 'not computable' : withUnit(s, 'speed', u.speed);

/**
 * The extras as lines of `solve`'s text chain, indented under the analysis: the sensitivity
 * rows (largest swing first), the time and distance at the posted limit with its steps, and the
 * sampled percentiles. A part that cannot be computed says why, in one line.
 */
export function extrasTextLines(x: AnalysisExtras, u: Units, speed: Range): string[] {
  const out: string[] = [];
  if (x.sensitivity.length > 0) {
    out.push('  Sensitivity (each input at the ends of its range, the others at their value):');
    for (const r of x.sensitivity)
      out.push(
        `    ${r.label} ${formatNumber(r.inputLow, kindOfUnit(r.unit))} to ${withUnit(r.inputHigh, kindOfUnit(r.unit), r.unit)}: ` +
          `${speedOr(r.atLow, u)} to ${speedOr(r.atHigh, u)}, swing ${withUnit(r.swing, 'speed', u.speed)}`,
      );
  }
  const td = x.limit;
  if (td && !td.ok)
    out.push(
      `  Time and distance at the posted limit: cannot be computed: ${td.reason}${td.path ? ` [${td.path}]` : ''}`,
    );
  else if (td) {
    const t = td.value;
    // The reaction time's value and source are the first step.
    out.push(
      `  Time and distance at the posted limit (${withUnit(t.postedLimit, 'speed', u.speed)}):`,
    );
    for (const l of limitFraming(t, speed, u)) out.push(`    ${l}`);
    t.steps.forEach((st, j) => out.push(...formatStepLines(st, j + 1).map((l) => `    ${l}`)));
    out.push(`    ${verdictSentence(t.endOfMarks, u)}`);
    if (t.conflict) out.push(`    ${verdictSentence(t.conflict, u)}`);
    for (const a of t.assumptions) out.push(`    - ${a}`);
  }
  const d = x.sampling;
  if (d && !d.ok) out.push(`  Sampled speeds: cannot be computed: ${d.reason}`);
  else if (d) {
    const v = d.value;
    const s = (n: number) => formatNumber(n, 'speed');
    out.push(
      `  Sampled speeds (${v.samples} draws, ${v.shape}, seed ${v.seed}): 5th percentile ${s(v.p5)}, median ${s(v.p50)}, 95th percentile ${s(v.p95)} ${u.speed}; mean ${s(v.mean)}`,
      `    ${v.method}${v.skipped > 0 ? `; ${v.skipped} draws gave no speed and were left out` : ''}`,
    );
  }
  return out;
}
