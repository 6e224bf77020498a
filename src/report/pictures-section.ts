import { spread } from '../engine/spread.js';
import type { Case } from '../case/load.js';
import type { AnalysisSolution, Units } from '../engine/types.js';
import { segmentLabels } from '../extras/limit-inputs.js';
import { speedAlongSlideSvg, yawArcSvg } from '../pictures/pictures-svg.js';
import { speedAlongSlideChart } from '../pictures/slide-chart.js';
import { yawArcSketch } from '../pictures/yaw-sketch.js';
import { fileSafe, section, type Figure, type Section } from './doc.js';
import { TEXT_WIDTH } from './render-text.js';

/** Width of the text pictures: the text page less a small margin. */
const PICTURE_WIDTH = TEXT_WIDTH - 4;

/** `speed` for a one-analysis case, `<id>-speed` when several analyses share the report's folder. */
export function figureName(c: Case, analysisId: string, what: string): string {
  return fileSafe(c.analyses.length > 1 ? `${analysisId}-${what}` : what);
}

function slideFigure(c: Case, s: AnalysisSolution, u: Units): Figure | undefined {
  if (!s.boundaries || s.boundaries.length < 2) return undefined;
  const labels = segmentLabels(c, s.id);
  const opts = { segmentLabels: labels, speedUnit: u.speed, lengthUnit: u.length };
  return {
    kind: 'figure',
    name: figureName(c, s.id, 'speed'),
    caption: `Speed along the slide, ${s.id}: speed at each segment boundary, segments named by surface`,
    svg: speedAlongSlideSvg(s, opts),
    textLines: speedAlongSlideChart(s, PICTURE_WIDTH, 14, opts),
  };
}

function yawFigure(c: Case, s: AnalysisSolution, u: Units): Figure | undefined {
  const a = c.analyses.find((x) => x.id === s.id);
  // Drawn from a chord and middle ordinate; a mark measured by offsets is shown by its fit section.
  if (!a || a.kind !== 'yaw' || a.chord === undefined || a.middleOrdinate === undefined)
    return undefined;
  // The chord and middle ordinate as measured (their values), drawn to show the geometry.
  const C = spread(a.chord).value;
  const M = spread(a.middleOrdinate).value;
  return {
    kind: 'figure',
    name: figureName(c, s.id, 'yaw-arc'),
    caption: `Yaw mark ${s.id}: the chord and its middle ordinate as measured (height stretched)`,
    svg: yawArcSvg(C, M, { lengthUnit: u.length }),
    textLines: yawArcSketch(C, M, PICTURE_WIDTH, 10, { unit: u.length }),
  };
}

/** The analysis drawn: the speed along a slide, or the yaw mark's arc. */
export function picturesSection(
  c: Case,
  s: AnalysisSolution,
  id: string,
  u: Units,
): Section | undefined {
  const f = s.kind === 'skid' ? slideFigure(c, s, u) : yawFigure(c, s, u);
  return f
    ? section(
        `${id}-picture`,
        s.kind === 'skid' ? 'Speed along the slide, drawn' : 'The yaw mark, drawn',
        [f],
      )
    : undefined;
}
