/**
 * A downhill grade steeper than the segment's friction can hold means the vehicle could not have
 * slowed by sliding there (docs/physics.md, "Effective drag on a grade": f × n + G/100 <= 0). The
 * engine refuses such a segment at the review; this says so at the grade question itself, while the
 * investigator is still on scene or at the measurement, so the grade or the drag factor can be
 * checked at once.
 */
import { quantity, RULES } from '../case/quantity.js';
import { spread } from '../engine/spread.js';
import { brakingEfficiency, dragFactor, effectiveDrag } from '../engine/index.js';
import type { AnswerContext } from './types.js';
import { choiceOf } from './answers-read.js';
import { brakesOf, dragOf, quantityOf } from './build-parts.js';

/** The note for a too-steep downhill on segment `prefix` (`a0.seg1`), or undefined. */
export function steepDownhillNote(
  prefix: string,
  value: unknown,
  ctx: AnswerContext,
): string | undefined {
  if (!/^a\d+\.seg\d+$/.test(prefix) || choiceOf(ctx.answers, `${prefix}.grade.dir`) !== 'downhill')
    return undefined;
  const r = ctx.read;
  if (r.status(`${prefix}.drag.source`) !== 'answered') return undefined;
  // Read with the file's schema: undefined until the drag answers make a drag factor. The tests'
  // grade is asked after this one, so test skids are read as run level here.
  const drag = dragOf(r, prefix, false);
  if (!drag) return undefined;
  const d = dragFactor(drag, ctx.units);
  if (!d.ok) return undefined;
  const f = d.value.f;
  const brakes = brakesOf(r);
  const share = quantityOf(r, 'vehicle.share', RULES.share);
  const n = brakes
    ? brakingEfficiency({ brakes, ...(share !== undefined ? { frontAxleShare: share } : {}) })
    : undefined;
  const nLow = n?.ok ? n.value.n.low : 1;
  const grade = quantity(RULES.grade).safeParse(value);
  if (!grade.success) return undefined;
  const steepest = spread(grade.data).high; // the most downhill end of the range
  if (effectiveDrag(f.low, nLow, -steepest) > 0) return undefined;
  const nText = n?.ok ? ` × braking efficiency ${nLow.toFixed(2)}` : '';
  return `A ${steepest}% downhill is steeper than the drag factor ${f.low.toFixed(2)}${nText} can hold (f × n − G ≤ 0 at the low end): the vehicle could not have slowed by sliding here, so no speed can be computed. Check the grade and the drag factor.`;
}
