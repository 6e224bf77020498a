/**
 * The review as plain lines, built from the engine's solution: each step with its formula, the
 * numbers substituted and its result; the range and the "at least" figure; the posted limit;
 * assumptions, warnings, sensitivity bars, the extras (with the case: time and distance at the
 * limit, distribution, offsets fit, pictures as text) and the cautions. Pure, so the screen only scrolls it
 * and the tests read the same lines the user reads.
 */
import type { AnalysisSolution, CaseSolution } from '../engine/types.js';
import { CAUTIONS } from '../format/cautions.js';
import { KIND_NAMES } from '../format/kind-names.js';
import { formatRange, zeroRangeNote } from '../format/numbers.js';
import { formatNumber } from '../engine/number-text.js';
import { phasesLine } from '../format/phases-text.js';
import { limitWord } from '../format/verdict.js';
import { sensitivityBars } from '../pictures/sensitivity-bars.js';
import { pushWrapped, stepLines, type ShownLine } from './review-step.js';
import {
  extrasLines,
  reviewFigures,
  type ReviewContext,
  type ReviewFigures,
} from './review-extras.js';

/** "at least 41 mph": the low end rounded down, as the engine gives it in `minimum`. */
export function atLeast(s: AnalysisSolution, speedUnit: string): string {
  return `at least ${formatNumber(s.minimum, 'integer')} ${speedUnit}`;
}

function analysisLines(
  out: ShownLine[],
  s: AnalysisSolution,
  i: number,
  width: number,
  fig: ReviewFigures,
) {
  const sol = fig.result.solution;
  const unit = sol.units.speed;
  const x = fig.result.analyses[i]?.extras;
  const notes = fig.notes[s.id] ?? [];
  const rows = x?.sensitivity ?? [];
  s.steps.forEach((step, i) => stepLines(out, step, i + 1, width, '  '));
  out.push({ text: '' });
  pushWrapped(
    out,
    `Speed when the marks began: ${formatRange(s.speed, 'speed', unit)}`,
    width,
    '  ',
    {
      tone: 'result',
      bold: true,
    },
  );
  pushWrapped(out, `Result: ${atLeast(s, unit)} (the low end, rounded down).`, width, '  ', {
    tone: 'result',
    bold: true,
  });
  if (s.phases)
    pushWrapped(out, `Phases in order of travel: ${phasesLine(s.phases, sol.units)}`, width, '  ', {
      tone: 'result',
    });
  for (const n of notes) pushWrapped(out, `! ${n}`, width, '  ', { tone: 'warning', bold: true });
  if (sol.postedLimit) {
    const v = sol.postedLimit.value;
    // A limit converted from the other unit is not whole: show it as converted, not rounded.
    const limit = `${formatNumber(v, Number.isInteger(v) ? 'integer' : 'speed')} ${unit}`;
    const word = limitWord(s.speed.low, sol.postedLimit.value);
    pushWrapped(out, `Posted limit ${limit}: the low end is ${word} the limit.`, width, '  ', {
      tone: word === 'above' ? 'warning' : undefined,
    });
  }
  if (s.assumptions.length) {
    out.push({ text: '  Assumptions', bold: true });
    // A caution already shown beside the result (the anti-lock note) is not repeated here.
    for (const a of s.assumptions) if (!notes.includes(a)) pushWrapped(out, `- ${a}`, width, '   ');
  }
  if (s.warnings.length) {
    out.push({ text: '  Warnings', bold: true, tone: 'warning' });
    for (const w of s.warnings) pushWrapped(out, `! ${w}`, width, '   ', { tone: 'warning' });
  }
  if (rows.length) {
    out.push({ text: '  What moves the result', bold: true });
    for (const l of sensitivityBars(rows, width - 2, { speedUnit: unit }))
      out.push({ text: '  ' + l });
  }
  const zero = zeroRangeNote(s.speed);
  if (zero) pushWrapped(out, zero, width, '  ', { tone: 'muted' });
  if (x) out.push(...extrasLines(s, sol.units, fig.result.case, x, width));
}

/**
 * The figures first, one line per analysis, so the answer is on the first screen and the chain
 * below is there to check it. Worded apart from the per-analysis lines ("Result: ...") on purpose.
 */
export function glanceLines(sol: CaseSolution, width: number): ShownLine[] {
  if (sol.analyses.length === 0) return [];
  const out: ShownLine[] = [{ text: 'At a glance', bold: true, tone: 'heading' }];
  sol.analyses.forEach((a, i) => {
    const kind = KIND_NAMES[a.ok ? a.solution.kind : a.kind].short;
    const what = a.ok
      ? `${atLeast(a.solution, sol.units.speed)}; ${formatRange(a.solution.speed, 'speed', sol.units.speed)}`
      : 'cannot be computed, the reason is below';
    pushWrapped(out, `Analysis ${i + 1} (${kind}): ${what}`, width, '  ', {
      tone: a.ok ? 'result' : 'error',
    });
  });
  pushWrapped(
    out,
    'A result is a minimum estimate. Every step follows; the cautions close the review.',
    width,
    '  ',
    {
      tone: 'muted',
    },
  );
  out.push({ text: '' });
  return out;
}

/**
 * Lines of the review for a solved case, at most `width` columns each.
 * @example reviewLines(solveCase(c), 80, { case: c })[0] // { text: 'At a glance', ... }
 */
export function reviewLines(sol: CaseSolution, width: number, ctx: ReviewContext): ShownLine[] {
  return reviewLinesOf(reviewFigures(sol, ctx), width);
}

/** The review's lines laid out for `width` from figures already computed: nothing is computed here. */
export function reviewLinesOf(fig: ReviewFigures, width: number): ShownLine[] {
  const sol = fig.result.solution;
  const out: ShownLine[] = glanceLines(sol, width);
  sol.analyses.forEach((a, i) => {
    const head = a.ok ? a.solution : a;
    const kind = KIND_NAMES[head.kind].heading;
    const label = a.ok && a.solution.label ? ` · ${a.solution.label}` : '';
    pushWrapped(out, `Analysis ${i + 1} · ${kind} · ${head.id}${label}`, width, '', {
      tone: 'heading',
      bold: true,
    });
    if (a.ok) analysisLines(out, a.solution, i, width, fig);
    else
      pushWrapped(
        out,
        `Cannot be computed${a.path ? ` (${a.path})` : ''}: ${a.reason}`,
        width,
        '  ',
        {
          tone: 'error',
        },
      );
    out.push({ text: '' });
  });
  if (sol.analyses.length === 0)
    out.push({ text: 'No analysis yet: answer the questions about the marks.', tone: 'warning' });
  if (sol.postedLimit?.exceededAtMinimum)
    pushWrapped(
      out,
      'At its low end, at least one analysis is above the posted limit.',
      width,
      '',
      {
        tone: 'warning',
      },
    );
  if (sol.warnings.length) {
    out.push({ text: 'About the file', bold: true, tone: 'warning' });
    for (const w of sol.warnings) pushWrapped(out, `! ${w}`, width, '  ', { tone: 'warning' });
  }
  out.push({ text: 'Cautions', bold: true, tone: 'warning' });
  for (const c of CAUTIONS) pushWrapped(out, `* ${c}`, width, '  ');
  return out;
}
