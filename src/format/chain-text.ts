import type { Case } from '../case/load.js';
import type { AnalysisSolution, CaseSolution, Units } from '../engine/types.js';
import type { AnalysisResult, CaseResult } from '../extras/analysis-extras.js';
import { isAboveLimit } from '../engine/solution.js';
import { CAUTIONS } from './cautions.js';
import { formatStepLines } from './step-text.js';
import { extrasTextLines } from './extras-text.js';
import { KIND_NAMES } from './kind-names.js';
import { formatRange, withUnit, zeroRangeNote } from './numbers.js';
import { phasesLine } from './phases-text.js';

/** "at least 40 mph" with the range beside it. */
export function formatAtLeast(s: AnalysisSolution, units: Units): string {
  return `at least ${s.minimum} ${units.speed}: ${formatRange(s.speed, 'speed', units.speed)}`;
}

/** Appends lines one by one: a case file may carry hundreds of thousands of them (unknown fields),
 * more than `push(...lines)` can pass as arguments. */
function append(out: string[], lines: readonly string[]): void {
  for (const l of lines) out.push(l);
}

function list(title: string, items: readonly string[]): string[] {
  if (items.length === 0) return [];
  return [`${title}:`, ...items.map((t) => `  - ${t}`)];
}

function analysisLines(ar: AnalysisResult, i: number, units: Units, c: Case): string[] {
  const r = ar.outcome;
  const label = c.analyses[i]?.label;
  const id = r.ok ? r.solution.id : r.id;
  const kind = r.ok ? r.solution.kind : r.kind;
  const head = `Analysis ${i + 1}: ${id} (${KIND_NAMES[kind].marks})${label ? `, ${label}` : ''}`;
  if (!r.ok) return [head, `  cannot be computed: ${r.reason}${r.path ? ` [${r.path}]` : ''}`];
  const s = r.solution;
  const out = [head];
  s.steps.forEach((st, j) =>
    append(
      out,
      formatStepLines(st, j + 1).map((l) => `  ${l}`),
    ),
  );
  if (s.boundaries && s.boundaries.length > 2) {
    out.push('  Speed along the slide:');
    for (const b of s.boundaries)
      out.push(
        `    ${withUnit(b.at, 'length', units.length)} ${b.label}: ${formatRange(b.speed, 'speed', units.speed)}`,
      );
  }
  if (s.phases) out.push(`  Phases in order of travel: ${phasesLine(s.phases, units)}`);
  out.push(`  Result: ${formatAtLeast(s, units)}`);
  const zero = zeroRangeNote(s.speed);
  if (zero) out.push(`  ${zero}`);
  if (ar.extras) append(out, extrasTextLines(ar.extras, units, s.speed));
  append(
    out,
    list('  Assumptions', s.assumptions).map((l, k) => (k === 0 ? l : `  ${l}`)),
  );
  append(
    out,
    list('  Warnings', s.warnings).map((l, k) => (k === 0 ? l : `  ${l}`)),
  );
  return out;
}

/** The posted limit comparison in words; states numbers only, never fault. */
export function formatPostedLimit(solution: CaseSolution): string | undefined {
  const p = solution.postedLimit;
  if (!p) return undefined;
  const u = solution.units.speed;
  // Nothing can be said about the limit without a figure to compare with it.
  const computed = solution.analyses.flatMap((r) => (r.ok ? [r.solution] : []));
  if (computed.length === 0) return undefined;
  const above = computed.filter((s) => isAboveLimit(s.speed.low, p.value));
  const limit = withUnit(p.value, 'speed', u);
  const some =
    computed.length < solution.analyses.length
      ? ' (only the analyses that could be computed are compared)'
      : '';
  if (above.length === 0) return `Posted limit ${limit}: no analysis’s low end is above it${some}.`;
  const names = above.map((s) => `${s.id} (${withUnit(s.speed.low, 'speed', u)})`);
  return `Posted limit ${limit}: the low end of ${names.join(', ')} is above it${some}.`;
}

/**
 * The human-readable chain `solve` prints: per analysis every step (name, formula, numbers,
 * result with range, why), the "at least" figure, assumptions and warnings; then the posted limit
 * comparison, the file's warnings and the cautions.
 * @example process.stdout.write(formatChainText(caseResult(c, solveCase(c))));
 */
export function formatChainText(result: CaseResult): string {
  const { solution, case: c } = result;
  const u = solution.units;
  const out: string[] = [`Case ${solution.id} (${c.units}: ${u.length}, ${u.speed})`, ''];
  result.analyses.forEach((r, i) => append(out, [...analysisLines(r, i, u, c), '']));
  const limit = formatPostedLimit(solution);
  if (limit) out.push(limit, '');
  if (solution.warnings.length) append(out, [...list('File warnings', solution.warnings), '']);
  append(out, list('Cautions', CAUTIONS));
  return out.join('\n') + '\n';
}
