import type { Case } from '../case/load.js';
import { slideDuration } from '../engine/index.js';
import { fail, ok, type Outcome, type Step } from '../engine/types.js';
import { formatNumber } from '../engine/number-text.js';
import type { SlideCorner } from './limit-inputs.js';

/**
 * Duration of this vehicle's slide: on each segment t_j = t_stop(S_in) - t_stop(S_out), the
 * engine's time to stop at that segment's deceleration from the speeds at its two boundaries.
 */
export function slideTime(
  k: SlideCorner,
  system: Case['units'],
): Outcome<{ seconds: number; step: Step }> {
  const parts: number[] = [];
  for (let j = 0; j < k.lengths.length; j++) {
    const tin = slideDuration(k.speeds[j]!, k.f[j]!, k.n, k.G[j]!, system);
    const tout = slideDuration(k.speeds[j + 1]!, k.f[j]!, k.n, k.G[j]!, system);
    if (!tin.ok || !tout.ok) return fail(tin.ok ? (tout as { reason: string }).reason : tin.reason);
    if (k.lengths.length === 1 && k.speeds[1] === 0)
      return ok({ seconds: tin.value.seconds, step: tin.value.step });
    parts.push(tin.value.seconds - tout.value.seconds);
  }
  const seconds = parts.reduce((a, b) => a + b, 0);
  return ok({
    seconds,
    step: {
      name: 'Duration of the slide',
      formula: 't = Σ (v_in − v_out) / ((f × n + G/100) × g), segment by segment',
      substituted: `t = ${parts.map((p) => formatNumber(p, 'seconds')).join(' + ')} = ${formatNumber(seconds, 'seconds')} s`,
      inputs: Object.fromEntries(parts.map((p, j) => [`t_${j + 1}`, { value: p, unit: 's' }])),
      result: seconds,
      low: seconds,
      high: seconds,
      unit: 's',
      why: 'at a constant deceleration on each segment the speed falls linearly with time',
    },
  });
}
