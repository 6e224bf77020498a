import type { AnalysisSolution, Units } from '../engine/types.js';
import { formatRange } from '../format/numbers.js';
import { formatNumber } from '../engine/number-text.js';
import { stepBlocks } from './analysis-section.js';
import { list, para, section, table, type Section } from './doc.js';

/**
 * A yaw analysis with offsets measured at stations along a chord (the case's `offsets` field):
 * the least-squares circle, its residuals and warnings, set beside the radius the chain uses.
 * Every figure is the engine's own fit, the one the chain's radius step used.
 */
export function offsetsSection(s: AnalysisSolution, id: string, u: Units): Section | undefined {
  if (!s.offsetsFit) return undefined;
  const title = 'Radius from offsets along the chord';
  const f = s.offsetsFit.fit;
  const stations = f.residuals.filter((x) => !x.chordEnd).length;
  const L = (n: number | undefined) =>
    n === undefined ? 'beyond the circle' : formatNumber(n, 'length');
  return section(`${id}-offsets`, title, [
    para(
      `Circle fitted to ${stations} offset${stations === 1 ? '' : 's'} and the chord's two ends: radius ${formatNumber(f.radius, 'length')} ${u.length}${f.radiusStdError !== undefined ? ` (standard error ${formatNumber(f.radiusStdError, 'length')} ${u.length})` : ''}, residuals RMS ${formatNumber(f.rms, 'length')} ${u.length}. The chain above uses the mark's radius as ${formatRange(s.offsetsFit.radius, 'length', u.length)} (the fit ± 2 standard errors, widened for the chord's tolerance).`,
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
