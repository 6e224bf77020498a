/**
 * The review's lines for what the extras add to one solved analysis: the time-distance comparison
 * at the posted limit, the distribution of speeds, the offsets fit, and the pictures as text.
 * Every figure is read from the result document (caseResult in src/extras); nothing is computed
 * here.
 */
import { spread } from '../engine/spread.js';
import type { Case } from '../case/load.js';
import type { AnalysisSolution, CaseSolution, Outcome, Range, Units } from '../engine/types.js';
import { caseResult, type AnalysisExtras, type CaseResult } from '../extras/analysis-extras.js';
import type { Verdict } from '../extras/limit-steps.js';
import type { LimitComparison } from '../extras/limit-comparison.js';
import type { SampleSummary } from '../extras/sampling.js';
import { speedAlongSlideChart } from '../pictures/slide-chart.js';
import { yawArcSketch } from '../pictures/yaw-sketch.js';
import { formatRange, withUnit } from '../format/numbers.js';
import { limitFraming, verdictWords } from '../format/verdict.js';
import { formatNumber } from '../engine/number-text.js';
import type { ShownLine } from './review-step.js';
import { pushWrapped, stepLines } from './review-step.js';

/** What the review needs beside the solution to show the extras. */
export interface ReviewContext {
  case: Case;
  /** The investigator's preferred perception-reaction time, s (the case's own wins). */
  reactionTime?: number;
  /** Notes by analysis id that the case file cannot hold (the marks' look), shown by the result. */
  notes?: Record<string, string[]>;
}

function verdictLines(out: ShownLine[], v: Verdict, u: Units, width: number) {
  const w = verdictWords(v, u);
  pushWrapped(out, w.headline, width, '    ', {
    bold: true,
    tone: v.stops === 'no' ? 'warning' : 'result',
  });
  pushWrapped(out, w.detail, width, '      ');
}

function limitLines(out: ShownLine[], t: LimitComparison, speed: Range, u: Units, width: number) {
  const limit = withUnit(t.postedLimit, 'speed', u.speed);
  out.push({ text: `  Time and distance at the posted limit (${limit})`, bold: true });
  for (const l of limitFraming(t, speed, u)) pushWrapped(out, l, width, '    ');
  pushWrapped(
    out,
    `reaction time ${formatNumber(t.reactionTime, 'seconds')} s: ${t.reactionSource}`,
    width,
    '    ',
  );
  const rows: [string, string][] = [
    ['this vehicle, reaction distance', formatRange(t.reactionDistance, 'length', u.length)],
    ['this vehicle, slide duration', formatRange(t.slideDuration, 'seconds', 's')],
    ['at the limit, reaction distance', withUnit(t.atLimit.reactionDistance, 'length', u.length)],
    ['at the limit, braking distance', formatRange(t.atLimit.brakingDistance, 'length', u.length)],
    [
      'at the limit, stopping distance',
      formatRange(t.atLimit.stoppingDistance, 'length', u.length),
    ],
  ];
  for (const [k, v] of rows) pushWrapped(out, `${k}: ${v}`, width, '    ');
  verdictLines(out, t.endOfMarks, u, width);
  if (t.conflict) verdictLines(out, t.conflict, u, width);
  t.steps.forEach((s, j) => stepLines(out, s, j + 1, width, '    '));
  for (const a of t.assumptions) pushWrapped(out, `- ${a}`, width, '    ');
}

function samplingLines(out: ShownLine[], d: SampleSummary, u: Units, width: number) {
  const s = (n: number) => formatNumber(n, 'speed');
  out.push({ text: '  Distribution of the speed', bold: true });
  pushWrapped(
    out,
    `${d.samples} draws, ${d.shape}, seed ${d.seed}: 5th percentile ${s(d.p5)}, median ${s(d.p50)}, 95th percentile ${s(d.p95)} ${u.speed} (mean ${s(d.mean)})`,
    width,
    '    ',
    { tone: 'result' },
  );
  pushWrapped(out, d.method, width, '    ', { tone: 'muted' });
  if (d.skipped > 0)
    pushWrapped(out, `${d.skipped} draws gave no speed and were left out`, width, '    ', {
      tone: 'warning',
    });
  pushWrapped(out, 'The minimum reported stays the low end of the range.', width, '    ');
}

function offsetsLines(
  out: ShownLine[],
  o: NonNullable<AnalysisSolution['offsetsFit']>,
  u: Units,
  width: number,
  shown: readonly string[],
) {
  out.push({ text: '  Circle fitted to the offsets', bold: true });
  const se = o.fit.radiusStdError;
  pushWrapped(
    out,
    `radius ${withUnit(o.fit.radius, 'length', u.length)}${se === undefined ? '' : ` (standard error ${withUnit(se, 'length', u.length)})`}, used as ${formatRange(o.radius, 'length', u.length)}; RMS scatter ${withUnit(o.fit.rms, 'length', u.length)}`,
    width,
    '    ',
  );
  for (const r of o.fit.residuals.filter((x) => !x.chordEnd))
    pushWrapped(
      out,
      `at ${withUnit(r.at, 'length', u.length)}: offset ${formatNumber(r.offset, 'length')}, arc ${r.fitted === undefined ? 'none' : formatNumber(r.fitted, 'length')}, off the circle by ${withUnit(r.residual, 'length', u.length)}`,
      width,
      '    ',
    );
  // A warning the chain already listed (the scatter) is not repeated here.
  for (const w of o.fit.warnings.filter((x) => !shown.includes(x)))
    pushWrapped(out, `! ${w}`, width, '    ', { tone: 'warning' });
}

/** Shows a part that computed; one that could not says why, in one line. */
function part<T>(
  out: ShownLine[],
  what: string,
  x: Outcome<T> | undefined,
  width: number,
  show: (v: T) => void,
) {
  if (!x) return;
  if (x.ok) return show(x.value);
  pushWrapped(out, `${what}: cannot be computed: ${x.reason}`, width, '  ', { tone: 'warning' });
}

function pictures(
  out: ShownLine[],
  s: AnalysisSolution,
  c: Case,
  x: AnalysisExtras,
  u: Units,
  width: number,
) {
  const w = Math.max(20, width - 4);
  let pic: string[] = [];
  if (s.kind === 'skid') {
    pic = speedAlongSlideChart(s, w, 9, {
      segmentLabels: x.segmentLabels,
      speedUnit: u.speed,
      lengthUnit: u.length,
    });
    if (pic.length) out.push({ text: '  Speed along the slide', bold: true });
  } else {
    const a = c.analyses.find((y) => y.id === s.id);
    const chord = a?.kind === 'yaw' ? (a.chord ?? a.offsets?.chord) : undefined;
    const ordinate =
      a?.kind === 'yaw' && a.middleOrdinate !== undefined
        ? spread(a.middleOrdinate).value
        : s.offsetsFit?.fit.middleOrdinate;
    if (chord !== undefined && ordinate !== undefined) {
      pic = yawArcSketch(spread(chord).value, ordinate, w, 8, { unit: u.length });
      out.push({ text: '  The arc measured', bold: true });
    }
  }
  for (const l of pic) out.push({ text: `    ${l}` });
}

/**
 * Everything the review shows that takes work: the result document (the solution and every
 * extra), built once per case and answers, and the notes the case file cannot hold; laying the
 * lines out for a width (`reviewLinesOf`) reads them and computes nothing.
 */
export interface ReviewFigures {
  result: CaseResult;
  /** Notes by analysis id that the case file cannot hold (the marks' look). */
  notes: Record<string, string[]>;
}

/**
 * @example const figures = reviewFigures(solveCase(c), { case: c }); reviewLinesOf(figures, 80)
 */
export function reviewFigures(solution: CaseSolution, ctx: ReviewContext): ReviewFigures {
  const settings = ctx.reactionTime !== undefined ? { reactionTime: ctx.reactionTime } : {};
  return { result: caseResult(ctx.case, solution, settings), notes: ctx.notes ?? {} };
}

/**
 * The extras' lines for one solved analysis of case `c`, at most `width` columns each, from its
 * extras in the result document.
 */
export function extrasLines(
  s: AnalysisSolution,
  u: Units,
  c: Case,
  x: AnalysisExtras,
  width: number,
): ShownLine[] {
  const out: ShownLine[] = [];
  part(out, 'Time and distance at the posted limit', x.limit, width, (v) =>
    limitLines(out, v, s.speed, u, width),
  );
  part(out, 'Distribution of the speed', x.sampling, width, (v) => samplingLines(out, v, u, width));
  if (s.offsetsFit) offsetsLines(out, s.offsetsFit, u, width, s.warnings);
  pictures(out, s, c, x, u, width);
  return out;
}
