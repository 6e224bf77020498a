import { spread } from './spread.js';
import type { CaseInput, SkidInput } from './input.js';
import { formatNumber } from './number-text.js';
import { unitsOf } from './constants.js';
import { dragAboveOne, marksDisagree } from './plausibility.js';
import { slideDistanceFromMarks } from './distance.js';
import { dragFactor } from './drag.js';
import { brakingEfficiency } from './efficiency.js';
import { skidModel } from './skid-model.js';
import { slideSpeed, type SlideEnd, type SlideSegment } from './slide.js';
import { input, joinList, makeStep } from './step.js';
import { phaseEnd } from './phase-end.js';
import type { AnalysisOutcome, AnalysisSolution, Range, Step } from './types.js';
import { solvedAnalysis } from './solution.js';

/** Marks and segment lengths further apart than this (relative) draw a warning. */
export const MARKS_MISMATCH = 0.05;

const sumRanges = (rs: Range[]): Range =>
  rs.reduce((a, r) => ({ value: a.value + r.value, low: a.low + r.low, high: a.high + r.high }), {
    value: 0,
    low: 0,
    high: 0,
  });

/** The caveat each look of the marks carries (docs/physics.md, "Look of the marks"; common practice). */
export const APPEARANCE_NOTES: Record<'locked' | 'abs' | 'skip' | 'gap', string | undefined> = {
  locked: undefined,
  abs: 'The marks were faint, evenly dashed marks (anti-lock brakes): they show hard braking, but the slide figure is an estimate from anti-lock marks and must be reported as such (common practice).',
  skip: 'Skip skid: the tire bounced, so the short regular gaps are part of the slide and the whole length, gaps included, counts as sliding distance (common practice).',
  gap: 'Gap skid: the brakes were released and reapplied, so the gaps are not braking; only the marked parts count, each as its own segment (common practice).',
};

/**
 * Solves one skid analysis of a case (index i) into its speed, steps, assumptions and model.
 * `next` is the solved analysis its marks ran into, when its end is `{ mode: "analysis" }`.
 */
export function solveSkid(
  c: CaseInput,
  i: number,
  a: SkidInput,
  next?: AnalysisSolution,
): AnalysisOutcome {
  const system = c.units;
  const u = unitsOf(system);
  const p = `analyses[${i}]`;
  const failed = (reason: string, path?: string): AnalysisOutcome =>
    path === undefined
      ? { ok: false, id: a.id, kind: 'skid', reason }
      : { ok: false, id: a.id, kind: 'skid', reason, path };
  const steps: Step[] = [];
  const assumptions: string[] = [];
  const warnings: string[] = [];

  const eff = brakingEfficiency(c.vehicle);
  if (!eff.ok) return failed(eff.reason, eff.path);
  const n = eff.value.n;
  warnings.push(...eff.value.warnings);

  const marks = (a.marks ?? []).map(spread);
  const disagree = marksDisagree(marks, u, a.distanceRule);
  if (disagree) warnings.push(disagree);
  const rule = a.distanceRule ?? 'average';
  const fromMarks = marks.length > 0 ? slideDistanceFromMarks(marks, rule, u) : undefined;
  const singleFromMarks = a.segments.length === 1 && a.segments[0]!.length === undefined;
  let lengths: Range[];
  if (singleFromMarks) {
    steps.push(fromMarks!.step);
    lengths = [fromMarks!.distance];
  } else {
    lengths = a.segments.map((s) => spread(s.length!));
    const total = sumRanges(lengths);
    const several = a.segments.length > 1;
    steps.push(
      makeStep({
        name: 'Slide distance',
        formula: several ? 'd = d_1 + d_2 + …' : 'd = the segment’s measured length',
        substituted: several
          ? `d = ${joinList(
              lengths.map((l) => formatNumber(l.value, 'length')),
              ' + ',
            )} = ${formatNumber(total.value, 'length')} ${u.length}`
          : `d = ${formatNumber(total.value, 'length')} ${u.length}`,
        inputs: Object.fromEntries(lengths.map((l, j) => [`d_${j + 1}`, input(l, u.length)])),
        result: total,
        unit: u.length,
        why: several
          ? 'the segments slid over, in order of travel, end to end'
          : 'the length measured for the one surface slid over',
      }),
    );
    if (
      fromMarks &&
      Math.abs(total.value - fromMarks.distance.value) > MARKS_MISMATCH * fromMarks.distance.value
    )
      warnings.push(
        `The segment lengths add up to ${formatNumber(total.value, 'length')} ${u.length} but the marks give ${formatNumber(fromMarks.distance.value, 'length')} ${u.length} (more than 5% apart); the segment lengths were used.`,
      );
  }

  const segments: SlideSegment[] = [];
  for (const [j, s] of a.segments.entries()) {
    const d = dragFactor(s.drag, system);
    if (!d.ok) return failed(d.reason, `${p}.segments[${j}].drag`);
    const label = s.label ?? (s.drag.source === 'table' ? s.drag.surface : undefined);
    const high = dragAboveOne(
      d.value.f,
      a.segments.length > 1 ? `segment ${j + 1}${label ? ` (${label})` : ''}` : 'the slide',
    );
    if (high) warnings.push(high);
    const step = d.value.step;
    steps.push(
      a.segments.length > 1
        ? { ...step, name: `${step.name}, segment ${j + 1}${label ? ` (${label})` : ''}` }
        : step,
    );
    for (const note of d.value.notes) if (!assumptions.includes(note)) assumptions.push(note);
    const seg: SlideSegment = { d: lengths[j]!, f: d.value.f, gradePercent: spread(s.grade ?? 0) };
    if (label !== undefined) seg.label = label;
    segments.push(seg);
  }
  steps.push(eff.value.step);

  const endV = a.end ?? { mode: 'stop' as const };
  if (endV.mode === 'analysis' && !next)
    return failed(`the analysis "${endV.analysis}" was not solved first`, `${p}.end.analysis`);
  const chain = endV.mode === 'analysis' && next ? phaseEnd(next) : undefined;
  const end: SlideEnd = chain
    ? chain.end
    : endV.mode === 'speed'
      ? { mode: 'speed', speed: spread(endV.speed), ...(endV.basis ? { basis: endV.basis } : {}) }
      : { mode: 'stop' };
  const slide = slideSpeed(segments, n, end, system);
  if (!slide.ok) return failed(slide.reason, slide.path ? `${p}.${slide.path}` : p);
  steps.push(...slide.value.steps);

  if (chain) {
    assumptions.push(chain.assumption);
    warnings.push(...chain.warnings);
  } else if (end.mode === 'stop')
    assumptions.push(
      'The vehicle came to rest at the end of the marks. If the marks end at an impact, the figure is a minimum: energy taken by the impact is not counted.',
    );
  else
    assumptions.push(
      `The speed at the end of the marks (${formatNumber(end.speed.value, 'speed')} ${u.speed}) comes from ${end.basis ?? 'an analysis done elsewhere'}.`,
    );
  assumptions.push(
    'Speed lost before the marks began (before the wheels locked) is not counted: the figure is a minimum for the speed where the marks begin.',
  );
  const look = APPEARANCE_NOTES[a.appearance ?? 'locked'];
  if (look) assumptions.push(look);
  if (a.segments.some((s) => s.grade !== undefined))
    assumptions.push(
      'Grade enters as f × n + G/100 (trade approximation of f n cos θ + sin θ, under 0.5% apart below a 10% grade).',
    );

  const own = skidModel(a, lengths, segments, n, end, system);
  const speed = slide.value.speed;
  return solvedAnalysis(a, 'skid', speed, {
    steps,
    assumptions,
    warnings,
    boundaries: slide.value.boundaries,
    distance: sumRanges(lengths),
    ...(chain
      ? {
          phases: chain.phases({
            id: a.id,
            kind: 'skid',
            ...(a.label !== undefined ? { label: a.label } : {}),
            speed,
          }),
        }
      : {}),
    model: chain ? chain.model(own) : own,
  });
}
