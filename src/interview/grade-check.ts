/**
 * A downhill grade steeper than the segment's friction can hold means the vehicle could not have
 * slowed by sliding there (DOMAIN.md, "Grade": f × n + G <= 0). The engine refuses such a segment at
 * the review; this says so at the grade question itself, while the investigator is still on scene
 * or at the measurement, so the grade or the drag factor can be checked at once.
 */
import { spread, type Quantity } from '../case/quantity.js';
import { brakingEfficiency, dragFactor, effectiveDrag } from '../engine/index.js';
import type { AnswerContext } from './types.js';
import { choiceOf } from './answers-read.js';
import { readAnswers } from './answer-values.js';
import { dragOf } from './build-parts.js';
import { brakesOf } from './build-case.js';

/** The note for a too-steep downhill on segment `prefix` (`a0.seg1`), or undefined. */
export function steepDownhillNote(
  prefix: string,
  value: unknown,
  ctx: AnswerContext,
): string | undefined {
  if (!/^a\d+\.seg\d+$/.test(prefix) || choiceOf(ctx.answers, `${prefix}.grade.dir`) !== 'downhill')
    return undefined;
  const r = readAnswers(ctx.answers);
  if (r.status(`${prefix}.drag.source`) !== 'answered') return undefined;
  let f;
  try {
    const d = dragFactor(dragOf(r, prefix), ctx.units);
    if (!d.ok) return undefined;
    f = d.value.f;
  } catch {
    return undefined; // the drag answers are not complete yet: nothing to compare with
  }
  const brakes = brakesOf(r);
  const share = r.value('vehicle.share') as Quantity | undefined;
  const n = brakes
    ? brakingEfficiency({ brakes, ...(share !== undefined ? { frontAxleShare: share } : {}) })
    : undefined;
  const nLow = n?.ok ? n.value.n.low : 1;
  const steepest = spread(value as Quantity).high; // the most downhill end of the range
  if (effectiveDrag(f.low, nLow, -steepest) > 0) return undefined;
  const nText = n?.ok ? ` × braking efficiency ${nLow.toFixed(2)}` : '';
  return `A ${steepest}% downhill is steeper than the drag factor ${f.low.toFixed(2)}${nText} can hold (f × n − G ≤ 0 at the low end): the vehicle could not have slowed by sliding here, so no speed can be computed. Check the grade and the drag factor.`;
}
