import type { Case } from '../case/load.js';
import type { AnalysisSolution, Units } from '../engine/types.js';
import { offsetsFromCase } from '../extras/case-fields.js';
import { fitCircleToOffsets } from '../extras/offsets-fit.js';
import { formatRange } from '../format/numbers.js';
import { formatNumber } from '../engine/number-text.js';
import { stepBlocks } from './analysis-section.js';
import { list, para, section, table, type Section } from './doc.js';

/**
 * A yaw analysis with offsets measured at stations along a chord (the case's `offsets` field):
 * the least-squares circle, its residuals and warnings, set beside the radius the chain uses.
 * The chain itself still runs on the chord and middle ordinate; this is a check on them.
 */
export function offsetsSection(
  c: Case,
  s: AnalysisSolution,
  id: string,
  u: Units,
): Section | undefined {
  if (s.kind !== 'yaw') return undefined;
  const field = offsetsFromCase(c, s.id);
  const title = 'Radius from offsets along the chord';
  if (!field.ok)
    return section(`${id}-offsets`, title, [
      para(`Not fitted: ${field.reason}${field.path ? ` (field ${field.path})` : ''}.`),
    ]);
  if (!field.value) return undefined;
  const r = fitCircleToOffsets(field.value.chord, field.value.stations, { unit: u.length });
  if (!r.ok)
    return section(`${id}-offsets`, title, [
      para(`Not fitted: ${r.reason}${r.path ? ` (field ${r.path})` : ''}.`),
    ]);
  const f = r.value;
  const L = (n: number | undefined) =>
    n === undefined ? 'beyond the circle' : formatNumber(n, 'length');
  return section(`${id}-offsets`, title, [
    para(
      `Circle fitted to ${field.value.stations.length} offset${field.value.stations.length === 1 ? '' : 's'} and the chord's two ends: radius ${formatNumber(f.radius, 'length')} ${u.length}${f.radiusStdError !== undefined ? ` (standard error ${formatNumber(f.radiusStdError, 'length')} ${u.length})` : ''}, residuals RMS ${formatNumber(f.rms, 'length')} ${u.length}. The chain above uses ${s.radius ? formatRange(s.radius, 'length', u.length) : 'the radius from the chord and middle ordinate'}.`,
    ),
    ...stepBlocks([f.step]),
    table(
      `Offsets and the fitted arc (${u.length})`,
      ['At', 'Offset', 'Fitted', 'Residual'],
      f.residuals.map((x) => [
        formatNumber(x.at, 'length') + (x.chordEnd ? ' (chord end)' : ''),
        formatNumber(x.offset, 'length'),
        L(x.fitted),
        formatNumber(x.residual, 'length'),
      ]),
      ['right', 'right', 'right', 'right'],
    ),
    f.warnings.length
      ? list(f.warnings)
      : para('The residuals do not suggest the mark departs from a circular arc.'),
  ]);
}
