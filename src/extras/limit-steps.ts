import { brakingDistance, effectiveDrag, slideSquaredSpeed, unitsOf } from '../engine/index.js';
import {
  fail,
  ok,
  type Outcome,
  type Range,
  type Step,
  type UnitSystem,
  type Units,
} from '../engine/types.js';
import { formatNumber } from '../engine/number-text.js';
import type { SlideCorner } from './limit-inputs.js';
import type { Walk } from './limit-walk.js';

/** The parts of a scenario the steps read. */
interface Walked {
  corner: SlideCorner;
  brakeAt: number;
  walk: Walk;
  restAt: number;
}

/** Whether the vehicle at the limit stops before a point, over the range of the inputs. */
export interface Verdict {
  /** The point, from the start of the marks. */
  at: number;
  what: string;
  /** 'depends' when the low and high corners of the inputs disagree. */
  stops: 'yes' | 'no' | 'depends';
  /** Point minus rest position: positive, it stops that far short. */
  margin: Range;
  /** Its speed at the point (0 where it has stopped). */
  speedThere: Range;
}

const where = (from: number, label: string, u: Units) =>
  from < 0
    ? `${label} (from ${formatNumber(-from, 'length')} ${u.length} before the marks)`
    : label;

/**
 * One step per stretch the vehicle at the limit brakes over: the speed it leaves the stretch
 * with, v_out = sqrt(v_in² − C L (f n + G/100)), or on the last one the engine's braking distance
 * to rest, d = v_in² / (C (f n + G/100)).
 */
export function walkSteps(
  s: Walked,
  V: number,
  labels: readonly string[],
  system: UnitSystem,
  C: number,
): Outcome<{ steps: Step[] }> {
  const u = unitsOf(system);
  const steps: Step[] = [];
  for (const leg of s.walk.legs) {
    const j = leg.stretch.segment;
    const f = s.corner.f[j]!;
    const G = s.corner.G[j]!;
    const n = s.corner.n;
    const vIn = Math.sqrt(leg.v2In);
    const label = where(leg.stretch.from, labels[j] ?? `segment ${j + 1}`, u);
    if (leg.stoppedAt !== undefined) {
      const b = brakingDistance(vIn, f, n, G, system);
      if (!b.ok) return fail(b.reason);
      steps.push({ ...b.value.step, name: `Braking to rest at the posted limit, on ${label}` });
      continue;
    }
    const L = leg.stretch.to - leg.stretch.from;
    const eff = effectiveDrag(f, n, G);
    const vOut = Math.sqrt(Math.max(0, leg.v2In - slideSquaredSpeed(L, eff, C)));
    steps.push({
      name: `Speed at the posted limit leaving ${label}`,
      formula: `v_out = sqrt(v_in² − ${C} × L × (f × n + G/100))`,
      substituted: `v_out = sqrt(${formatNumber(vIn, 'speed')}² − ${C} × ${formatNumber(L, 'length')} × ${formatNumber(eff, 'ratio')}) = ${formatNumber(vOut, 'speed')} ${u.speed}`,
      inputs: {
        v_in: { value: vIn, unit: u.speed },
        L: { value: L, unit: u.length },
        f: { value: f, unit: '' },
        n: { value: n, unit: '' },
        G: { value: G, unit: '%' },
      },
      result: vOut,
      low: vOut,
      high: vOut,
      unit: u.speed,
      why:
        vIn === V
          ? 'braking from the posted limit over this surface'
          : 'the speed carried in from the previous surface, braking on this one',
    });
  }
  return ok({ steps });
}

/**
 * Whether the vehicle at the limit stops before point P, at the computed values and at the two
 * corners of the inputs; its margin and its speed there, with the step that states it.
 */
export function verdictAt<T extends Walked>(
  P: number,
  what: string,
  s: { mid: T; ends: T[] },
  V: number,
  C: number,
  u: Units,
  speedOf: (s: T, x: number) => number,
): { verdict: Verdict; step: Step } {
  const all = [s.mid, ...s.ends];
  const margins = all.map((x) => P - x.restAt);
  const speeds = all.map((x) => speedOf(x, P));
  const stopsEach = margins.map((m) => m >= 0);
  const stops = stopsEach.every(Boolean) ? 'yes' : stopsEach.some(Boolean) ? 'depends' : 'no';
  const margin: Range = {
    value: margins[0]!,
    low: Math.min(...margins),
    high: Math.max(...margins),
  };
  const speedThere: Range = {
    value: speeds[0]!,
    low: Math.min(...speeds),
    high: Math.max(...speeds),
  };
  const L = (x: number) => `${formatNumber(x, 'length')} ${u.length}`;
  const rangeNote =
    stops === 'depends'
      ? ' Over the range of the inputs the answer depends on them: at one end it stops, at the other it does not.'
      : ' The answer holds over the whole range of the inputs.';
  const stopsMid = margins[0]! >= 0;
  const step: Step = stopsMid
    ? {
        name: `Does a vehicle at the posted limit stop before ${what}?`,
        formula: 'margin = x_point − x_rest',
        substituted: `margin = ${L(P)} − ${L(s.mid.restAt)} = ${L(margin.value)}: it stops short`,
        inputs: {
          x_point: { value: P, unit: u.length },
          x_rest: { value: s.mid.restAt, unit: u.length },
        },
        result: margin.value,
        low: margin.low,
        high: margin.high,
        unit: u.length,
        why: `At the computed values it comes to rest ${L(margin.value)} before ${what}.${rangeNote}`,
      }
    : {
        name: `Does a vehicle at the posted limit stop before ${what}?`,
        formula: `v = sqrt(v_in² − ${C} × Σ L × (f × n + G/100)) at the point`,
        substituted: `rest at ${L(s.mid.restAt)}, beyond ${L(P)}: still moving at ${formatNumber(speedThere.value, 'speed')} ${u.speed}`,
        inputs: {
          x_point: { value: P, unit: u.length },
          x_rest: { value: s.mid.restAt, unit: u.length },
          V: { value: V, unit: u.speed },
        },
        result: speedThere.value,
        low: speedThere.low,
        high: speedThere.high,
        unit: u.speed,
        why: `At the computed values it would not have stopped before ${what}; this is its speed there.${rangeNote}`,
      };
  return { verdict: { at: P, what, stops, margin, speedThere }, step };
}
