import type { SkidInput } from './input.js';
import { modelInput } from './model-input.js';
import { tradeConstants, unitsOf } from './constants.js';
import { effectiveDrag, slideSquaredSpeed } from './formulas.js';
import type { SlideEnd, SlideSegment } from './slide.js';
import type { AnalysisModel, ModelInput, Range, UnitSystem } from './types.js';

/**
 * The skid analysis as a function of its primary inputs, for sensitivity and sampling:
 * S = sqrt(S_end² + C Σ d_j (f_j n + G_j/100)), C = 30 (mph, ft) or 254 (km/h, m); undefined where
 * a segment's f n + G/100 is not positive. Keys: "d" (one segment) or "d[j]", "f[j]", "G[j]" (when
 * the segment has a grade), "n", "Send" (when the slide ends at a speed).
 *
 * `evaluate` runs in sampling loops (100,000 calls and more), so the key strings and the base
 * values are built once here, and each call is a plain loop with no allocation.
 * @example skidModel(a, [{ value: 60, ... }], segments, exact(1), { mode: 'stop' }, 'imperial')
 *   .evaluate({ 'f[0]': 0.75 }) // sqrt(30 × 60 × 0.75) = 36.74
 */
export function skidModel(
  a: SkidInput,
  lengths: readonly Range[],
  segments: readonly SlideSegment[],
  n: Range,
  end: SlideEnd,
  system: UnitSystem,
): AnalysisModel {
  const single = segments.length === 1;
  const count = segments.length;
  const u = unitsOf(system);
  const inputs: ModelInput[] = [];
  const dKeys: string[] = [];
  const fKeys: string[] = [];
  const gKeys: string[] = [];
  const d0 = new Float64Array(count);
  const f0 = new Float64Array(count);
  const g0 = new Float64Array(count);
  segments.forEach((s, j) => {
    const tag = single ? '' : ` (segment ${j + 1})`;
    dKeys.push(single ? 'd' : `d[${j}]`);
    fKeys.push(`f[${j}]`);
    gKeys.push(`G[${j}]`);
    d0[j] = lengths[j]!.value;
    f0[j] = s.f.value;
    // A segment without a grade has no G input; its grade is 0 unless a caller sets G[j].
    g0[j] = a.segments[j]!.grade !== undefined ? s.gradePercent.value : 0;
    inputs.push(modelInput(dKeys[j]!, `slide distance${tag}`, u.length, lengths[j]!));
    inputs.push(modelInput(fKeys[j]!, `drag factor${tag}`, '', s.f));
    if (a.segments[j]!.grade !== undefined)
      inputs.push(modelInput(gKeys[j]!, `grade${tag}`, '%', s.gradePercent));
  });
  inputs.push(modelInput('n', 'braking efficiency', '', n));
  const atSpeed = end.mode === 'speed';
  if (atSpeed) inputs.push(modelInput('Send', 'speed at the end of the marks', u.speed, end.speed));
  const n0 = n.value;
  const send0 = atSpeed ? end.speed.value : 0;
  const C = tradeConstants(system).slide;
  return {
    inputs,
    evaluate(x) {
      const nn = x.n ?? n0;
      const se = atSpeed ? (x.Send ?? send0) : 0;
      let s2 = se * se;
      for (let j = 0; j < count; j++) {
        const eff = effectiveDrag(x[fKeys[j]!] ?? f0[j]!, nn, x[gKeys[j]!] ?? g0[j]!);
        if (!(eff > 0)) return undefined;
        s2 += slideSquaredSpeed(x[dKeys[j]!] ?? d0[j]!, eff, C);
      }
      const S = Math.sqrt(s2);
      return Number.isFinite(S) ? S : undefined;
    },
  };
}
