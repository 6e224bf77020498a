import { spread } from '../engine/spread.js';
import type { Case } from '../case/load.js';
import { effectiveDrag, reactionDistance, tradeConstants, unitsOf } from '../engine/index.js';
import {
  fail,
  ok,
  type AnalysisSolution,
  type Outcome,
  type Range,
  type Step,
} from '../engine/types.js';
import { formatNumber } from '../engine/number-text.js';
import {
  reactionTimeSource,
  segmentLabels,
  slideCorner,
  type Corner,
  type SlideCorner,
} from './limit-inputs.js';
import { speedAt, stretchesFrom, walkToRest, type Walk } from './limit-walk.js';
import { verdictAt, walkSteps, type Verdict } from './limit-steps.js';
import { slideTime } from './slide-time.js';

export interface LimitOptions {
  /** Perception-reaction time in seconds (the UI passes the preference, default 1.5 s). */
  reactionTime: number;
  /** Where t came from ("preference", "case file"); the step adds the published source. */
  reactionOrigin?: string;
  /** A conflict point: distance from the start of the marks, in the case's length unit. */
  conflictAt?: number;
}

export interface LimitComparison {
  reactionTime: number;
  reactionSource: string;
  postedLimit: number;
  /** This vehicle, at the computed speed (range from the speed's range). */
  reactionDistance: Range;
  slideDuration: Range;
  /** A vehicle at the posted limit, perceiving at the same point and braking on the same road. */
  atLimit: {
    reactionDistance: number;
    /** Where it would start braking, from the start of the marks (negative: before them). */
    brakingStartsAt: Range;
    restAt: Range;
    brakingDistance: Range;
    /** From the point of perception to rest: reaction distance + braking distance. */
    stoppingDistance: Range;
  };
  endOfMarks: Verdict;
  conflict?: Verdict;
  steps: Step[];
  assumptions: string[];
}

/** Everything for one corner of the inputs. */
interface Scenario {
  corner: SlideCorner;
  rS: number;
  rV: number;
  brakeAt: number;
  walk: Walk;
  restAt: number;
}

const hull = (v: number, xs: number[]): Range => ({
  value: v,
  low: Math.min(v, ...xs),
  high: Math.max(v, ...xs),
});

/**
 * Time and distance at the posted limit, for a skid analysis. With perception-reaction time t:
 * this vehicle's reaction distance (k S t) and slide duration (Σ (v_in - v_out) / a over the
 * segments) at the computed speed; then a vehicle at the posted limit V perceiving at the same
 * point (k S t before the marks) reacts over k V t, brakes from there on the slide's surfaces in
 * order (the first surface assumed before the marks, the last beyond them), and either stops
 * before the end of the marks (and the conflict point, if given) or passes it at a speed
 * v = sqrt(V² - C Σ L (f n + G/100)). Each figure is a Step; ranges and "depends" come from the
 * solution's low and high corners (every input at its low, or high, end).
 *
 * Fails for a yaw analysis, a case without a posted limit, or a bad reaction time or conflict point.
 * @example limitComparison(c, solution, { reactionTime: 1.5 }).value.endOfMarks.stops // 'yes'
 */
export function limitComparison(
  c: Case,
  solution: AnalysisSolution,
  opts: LimitOptions,
): Outcome<LimitComparison> {
  if (solution.kind !== 'skid')
    return fail('time and distance at the posted limit need a skid analysis');
  if (c.postedLimit === undefined) return fail('the case has no posted limit', 'postedLimit');
  const t = opts.reactionTime;
  if (!(Number.isFinite(t) && t >= 0 && t <= 10))
    return fail('perception-reaction time must be between 0 and 10 s', 'timeDistance.reactionTime');
  if (opts.conflictAt !== undefined && !(Number.isFinite(opts.conflictAt) && opts.conflictAt >= 0))
    return fail(
      'the conflict point must be a distance of 0 or more from the start of the marks',
      'timeDistance.conflictAt',
    );
  const system = c.units;
  const u = unitsOf(system);
  const C = tradeConstants(system).slide;
  const V = spread(c.postedLimit).value;

  const scenario = (k: Corner): Scenario | undefined => {
    const corner = slideCorner(solution, k);
    if (!corner) return undefined;
    const rS = reactionDistance(corner.S, t, system).distance;
    const rV = reactionDistance(V, t, system).distance;
    const brakeAt = rV - rS;
    const effs = corner.f.map((f, j) => effectiveDrag(f, corner.n, corner.G[j]!));
    const walk = walkToRest(V, stretchesFrom(brakeAt, corner.lengths, effs), C);
    return walk.restAt === undefined
      ? undefined
      : { corner, rS, rV, brakeAt, walk, restAt: walk.restAt };
  };
  const mid = scenario('value');
  const lo = scenario('low');
  const hi = scenario('high');
  if (!mid || !lo || !hi)
    return fail('a vehicle at the posted limit would not stop on these surfaces and grades');
  const ends = [lo, hi];
  const range = (f: (s: Scenario) => number) => hull(f(mid), ends.map(f));
  const labels = segmentLabels(c, solution.id);
  const steps: Step[] = [];
  const assumptions: string[] = [];

  const source = `${opts.reactionOrigin ? `${opts.reactionOrigin}; ` : ''}${reactionTimeSource(t)}`;
  steps.push({
    name: 'Perception-reaction time',
    formula: 't = chosen',
    substituted: `t = ${formatNumber(t, 'seconds')} s`,
    inputs: { t: { value: t, unit: 's', source } },
    result: t,
    low: t,
    high: t,
    unit: 's',
    why: `the time from seeing the hazard to braking: ${source}`,
  });

  const reaction = range((s) => s.rS);
  const rStep = reactionDistance(mid.corner.S, t, system).step;
  steps.push({
    ...rStep,
    name: 'Distance during perception-reaction, this vehicle',
    low: reaction.low,
    high: reaction.high,
  });

  const dur = slideTime(mid.corner, system);
  const durLo = slideTime(lo.corner, system);
  const durHi = slideTime(hi.corner, system);
  if (!dur.ok || !durLo.ok || !durHi.ok)
    return fail('the slide duration cannot be computed for these inputs');
  const duration = hull(dur.value.seconds, [durLo.value.seconds, durHi.value.seconds]);
  steps.push({ ...dur.value.step, low: duration.low, high: duration.high });

  steps.push({
    ...reactionDistance(V, t, system).step,
    name: 'Distance during perception-reaction at the posted limit',
  });
  const brakeAt = range((s) => s.brakeAt);
  steps.push({
    name: 'Where a vehicle at the posted limit starts braking',
    formula:
      'x_b = d_r(limit) − d_r(this vehicle)  (from the start of the marks; negative: before them)',
    substituted: `x_b = ${formatNumber(mid.rV, 'length')} − ${formatNumber(mid.rS, 'length')} = ${formatNumber(mid.brakeAt, 'length')} ${u.length}`,
    inputs: {
      'd_r(limit)': { value: mid.rV, unit: u.length },
      'd_r(this vehicle)': {
        value: mid.rS,
        low: reaction.low,
        high: reaction.high,
        unit: u.length,
      },
    },
    result: mid.brakeAt,
    low: brakeAt.low,
    high: brakeAt.high,
    unit: u.length,
    why: 'both drivers perceive at the same point; the slower vehicle covers less ground while reacting',
  });
  const walked = walkSteps(mid, V, labels, system, C);
  if (!walked.ok) return walked;
  steps.push(...walked.value.steps);
  if (mid.brakeAt < 0)
    assumptions.push(
      `Before the marks the road is taken to have the surface and grade of ${labels[0] ?? 'the first segment'}.`,
    );
  const total = mid.corner.lengths.reduce((a, d) => a + d, 0);
  if (mid.restAt > total)
    assumptions.push(
      `Beyond the marks the road is taken to continue with the surface and grade of ${labels[labels.length - 1] ?? 'the last segment'}.`,
    );
  assumptions.push(
    'The vehicle at the posted limit is this vehicle (same braking efficiency) on the same surfaces and grades; only its speed differs.',
  );

  const restAt = range((s) => s.restAt);
  const brakingD = range((s) => s.restAt - s.brakeAt);
  const stopping = range((s) => s.rV + s.restAt - s.brakeAt);
  steps.push({
    name: 'Stopping distance at the posted limit, from the point of perception',
    formula: 'd_stop = d_r(limit) + d_braking',
    substituted: `d_stop = ${formatNumber(mid.rV, 'length')} + ${formatNumber(brakingD.value, 'length')} = ${formatNumber(stopping.value, 'length')} ${u.length}`,
    inputs: {
      'd_r(limit)': { value: mid.rV, unit: u.length },
      d_braking: { value: brakingD.value, low: brakingD.low, high: brakingD.high, unit: u.length },
    },
    result: stopping.value,
    low: stopping.low,
    high: stopping.high,
    unit: u.length,
    why: 'reaction at constant speed, then braking on the same road to rest',
  });

  const at = (P: number, what: string) =>
    verdictAt(P, what, { mid, ends }, V, C, u, (s, x) => speedAt(V, s.brakeAt, s.walk, x, C));
  const endOfMarks = at(total, 'the end of the marks');
  steps.push(endOfMarks.step);
  const conflict =
    opts.conflictAt === undefined ? undefined : at(opts.conflictAt, 'the conflict point');
  if (conflict) steps.push(conflict.step);

  return ok({
    reactionTime: t,
    reactionSource: source,
    postedLimit: V,
    reactionDistance: reaction,
    slideDuration: duration,
    atLimit: {
      reactionDistance: mid.rV,
      brakingStartsAt: brakeAt,
      restAt,
      brakingDistance: brakingD,
      stoppingDistance: stopping,
    },
    endOfMarks: endOfMarks.verdict,
    ...(conflict ? { conflict: conflict.verdict } : {}),
    steps,
    assumptions,
  });
}
