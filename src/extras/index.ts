/** Beyond a single figure: sensitivity, sampling, time and distance at the limit, offsets fit, pictures. */
export { sensitivity, type SensitivityRow } from './sensitivity.js';
export { sensitivityBars, type BarOptions } from './sensitivity-bars.js';
export {
  sampleSpeeds,
  DEFAULT_SAMPLES,
  DEFAULT_SEED,
  MAX_SAMPLES,
  type SampleOptions,
  type SampleShape,
  type SampleSummary,
} from './sampling.js';
export { quantileSorted } from './percentile.js';
export { limitComparison, type LimitComparison, type LimitOptions } from './limit-comparison.js';
export type { Verdict } from './limit-steps.js';
export { reactionTimeSource, segmentLabels } from './limit-inputs.js';
export {
  fitCircleToOffsets,
  type OffsetStation,
  type OffsetsFit,
  type OffsetsFitOptions,
  type OffsetResidual,
} from './offsets-fit.js';
export {
  circleThroughThree,
  kasaFit,
  geometricFit,
  type Circle,
  type Point,
} from './circle-fit.js';
export { speedAlongSlideChart, type SlideChartOptions } from './slide-chart.js';
export { yawArcSketch, arcOffset, type SketchOptions } from './yaw-sketch.js';
export { speedAlongSlideSvg, yawArcSvg, sensitivitySvg, type SvgOptions } from './pictures-svg.js';
export {
  samplingFieldV1,
  timeDistanceFieldV1,
  offsetsFieldV1,
  samplingFromCase,
  timeDistanceFromCase,
  offsetsFromCase,
  type SamplingFieldV1,
  type TimeDistanceFieldV1,
  type OffsetsFieldV1,
} from './case-fields.js';
export { yawFromOffsets, OFFSET_READING, type YawFromOffsets } from './yaw-offsets.js';
export { analysisExtras, type AnalysisExtras, type ExtrasOptions } from './analysis-extras.js';
