import { factorKind, formatNumber } from './number-text.js';
import { tradeConstants, unitsOf } from './constants.js';
import { effectiveDrag, slideSquaredSpeed } from './formulas.js';
import {
  fail,
  ok,
  type Boundary,
  type Outcome,
  type Range,
  type Step,
  type UnitSystem,
} from './types.js';
import { input, makeStep } from './step.js';

/** One surface slid over: its length, drag factor and grade (signed percent, + uphill). */
export interface SlideSegment {
  label?: string;
  d: Range;
  f: Range;
  gradePercent: Range;
}

/** How the slide ended: at rest, or still moving at a speed found elsewhere (with its basis). */
export type SlideEnd =
  | { mode: 'stop' }
  /** `from` names where the speed was taken, for the step's formula (default "given"). */
  | { mode: 'speed'; speed: Range; basis?: string; from?: string };

export interface Slide {
  /** Speed where the marks begin. */
  speed: Range;
  /** Start of the marks, each segment boundary, end of the marks (in order of travel). */
  boundaries: Boundary[];
  steps: Step[];
}

/**
 * Effective drag of a segment over the ranges, f n + G/100 (see effectiveDrag): each end from the
 * matching ends of f, n and G, since it rises in each.
 * @example effectiveDragRange(exact(0.7), exact(1), exact(-2)).value // 0.68
 */
export function effectiveDragRange(f: Range, n: Range, gradePercent: Range): Range {
  return {
    value: effectiveDrag(f.value, n.value, gradePercent.value),
    low: effectiveDrag(f.low, n.low, gradePercent.low),
    high: effectiveDrag(f.high, n.high, gradePercent.high),
  };
}

const segName = (i: number, s: SlideSegment) => `segment ${i + 1}${s.label ? ` (${s.label})` : ''}`;

/** Why a segment cannot slow the vehicle, checked at its low corner (f low, n low, G low). */
function cannotSlow(i: number, s: SlideSegment, n: Range): string | undefined {
  if (effectiveDragRange(s.f, n, s.gradePercent).low > 0) return undefined;
  const G = s.gradePercent.low;
  const fn = `the drag factor ${formatNumber(s.f.low, 'drag')} × n ${formatNumber(n.low, 'efficiency')}`;
  if (G < 0)
    return `${segName(i, s)}: a ${formatNumber(-G, 'percent')}% downhill grade is steeper than ${fn} can hold; the vehicle could not slow by sliding there`;
  return `${segName(i, s)}: ${fn} gives no drag and there is no uphill grade; the vehicle could not slow by sliding there`;
}

/**
 * Speed at the start of a slide over one or more segments, working back from the end:
 * S_k² = S_(k+1)² + C d_k (f_k n + G_k/100), with S at the end = S_end (0 at rest). Equivalent to
 * the combined speed S = sqrt(S_1² + S_2² + … + S_end²) (common practice). Ranges come from the
 * matching ends of every input (speed rises with d, f, n, G and S_end). A segment whose
 * f n + G/100 is not positive anywhere in its range is a failure naming it (path `segments[i]`).
 * @example slideSpeed([{ d: exact(60), f: exact(0.75), gradePercent: exact(0) }], exact(1), { mode: 'stop' }, 'imperial') // speed 36.7 mph
 */
export function slideSpeed(
  segments: readonly SlideSegment[],
  n: Range,
  end: SlideEnd,
  system: UnitSystem,
): Outcome<Slide> {
  const C = tradeConstants(system).slide;
  const u = unitsOf(system);
  for (const [i, s] of segments.entries()) {
    const why = cannotSlow(i, s, n);
    if (why) return fail(why, `segments[${i}]`);
  }
  const steps: Step[] = [];
  const effs = segments.map((s) => effectiveDragRange(s.f, n, s.gradePercent));
  // One rule for the factors of a line (factorKind): the speed step writes the effective drag as
  // its own step did.
  const kinds = segments.map((s) => factorKind(s.gradePercent.value));
  segments.forEach((s, i) => {
    const G = s.gradePercent.value / 100;
    const k = kinds[i]!;
    steps.push(
      makeStep({
        name: `Effective drag, ${segName(i, s)}`,
        formula: 'f × n + G/100',
        substituted: `${formatNumber(s.f.value, k)} × ${formatNumber(n.value, k)} ${G < 0 ? '−' : '+'} ${formatNumber(Math.abs(G), k)} = ${formatNumber(effs[i]!.value, k)}`,
        inputs: { f: input(s.f, ''), n: input(n, ''), G: input(s.gradePercent, '%') },
        result: effs[i]!,
        unit: '',
        kind: k,
        why:
          s.gradePercent.value === 0 && s.gradePercent.low === 0 && s.gradePercent.high === 0
            ? 'level: braking efficiency scales the drag factor'
            : 'braking efficiency scales the friction only; the grade adds (uphill) or takes away (downhill)',
      }),
    );
  });
  const endSpeed: Range = end.mode === 'speed' ? end.speed : { value: 0, low: 0, high: 0 };
  if (end.mode === 'speed')
    steps.push(
      makeStep({
        name: 'Speed at the end of the marks',
        formula: `S_end = ${end.from ?? 'given'}`,
        substituted: `S_end = ${formatNumber(endSpeed.value, 'speed')} ${u.speed}`,
        inputs: { S_end: input(endSpeed, u.speed, end.basis) },
        result: endSpeed,
        unit: u.speed,
        why: end.basis ? `from ${end.basis}` : 'speed at the end of the marks, as entered',
      }),
    );
  const total: Range = segments.reduce(
    (a, s) => ({ value: a.value + s.d.value, low: a.low + s.d.low, high: a.high + s.d.high }),
    { value: 0, low: 0, high: 0 },
  );
  const boundaries: Boundary[] = [];
  let sq: Range = { value: endSpeed.value ** 2, low: endSpeed.low ** 2, high: endSpeed.high ** 2 };
  let at = total.value;
  boundaries.push({ label: 'end of the marks', at, speed: endSpeed });
  let after = endSpeed;
  for (let i = segments.length - 1; i >= 0; i--) {
    const s = segments[i]!;
    const e = effs[i]!;
    sq = {
      value: sq.value + slideSquaredSpeed(s.d.value, e.value, C),
      low: sq.low + slideSquaredSpeed(s.d.low, e.low, C),
      high: sq.high + slideSquaredSpeed(s.d.high, e.high, C),
    };
    const speed: Range = {
      value: Math.sqrt(sq.value),
      low: Math.sqrt(sq.low),
      high: Math.sqrt(sq.high),
    };
    at -= s.d.value;
    const isStart = i === 0;
    const where = isStart ? 'the start of the marks' : `the start of ${segName(i, s)}`;
    const hasEnd = after.value > 0 || after.high > 0;
    const endName = i === segments.length - 1 ? 'S_end' : `S_${i + 2}`;
    const sub = `${formatNumber(after.value, 'speed')}² + `;
    steps.push(
      makeStep({
        name: `Speed at ${where}`,
        formula: `S = sqrt(${hasEnd ? `${endName}² + ` : ''}${C} × d × (f × n + G/100))`,
        substituted: `S = sqrt(${hasEnd ? sub : ''}${C} × ${formatNumber(s.d.value, 'length')} ${u.length} × ${formatNumber(e.value, kinds[i]!)}) = ${formatNumber(speed.value, 'speed')} ${u.speed}`,
        inputs: {
          ...(hasEnd ? { [endName]: input(after, u.speed) } : {}),
          d: input(s.d, u.length),
          'f × n + G/100': input(e, ''),
        },
        result: speed,
        unit: u.speed,
        why:
          segments.length === 1
            ? hasEnd
              ? 'energy of the slide added to the energy still held at the end of the marks'
              : 'kinetic energy at the start of the marks used up by sliding friction over the distance'
            : `working back from the end: the speed ${segName(i, s)} took off is added (combined speed, common practice)`,
      }),
    );
    boundaries.unshift({
      label: isStart ? 'start of the marks' : `end of segment ${i} / start of segment ${i + 1}`,
      at: Math.max(0, at),
      speed,
    });
    after = speed;
  }
  boundaries[0]!.at = 0;
  return ok({ speed: boundaries[0]!.speed, boundaries, steps });
}
