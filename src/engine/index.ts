/** Public API of the calculation engine: pure functions, each figure with the step that made it. */
export * from './types.js';
export {
  unitsOf,
  tradeConstants,
  speedUnitToLengthPerSecond,
  gravityOf,
  ordinateReadingStep,
  STANDARD_GRAVITY_SI,
  STANDARD_GRAVITY_FT,
  type TradeConstants,
} from './constants.js';
export { slideDistanceFromMarks, type DistanceRule } from './distance.js';
export { brakingEfficiency, wheelsEfficiency, type Efficiency } from './efficiency.js';
export { dragFactor, type Drag } from './drag.js';
export { testSkidDrag, testSkidsDrag } from './drag-tests.js';
export { reduceRepeated } from './reduce.js';
export {
  DRAG_TABLE,
  DRAG_TABLE_NOTE,
  dragTableRow,
  dragTableBand,
  type DragTableRow,
  type DragBand,
  type RowKnown,
} from './drag-table.js';
export {
  slideSpeed,
  slideStartSpeed,
  effectiveDrag,
  type Slide,
  type SlideSegment,
  type SlideEnd,
} from './slide.js';
export {
  radiusFromChord,
  pathRadius,
  criticalSpeed,
  criticalSpeedOf,
  ordinateSensitivity,
  NEAR_STRAIGHT_RATIO,
} from './yaw.js';
export { reactionDistance, brakingDistance, slideDuration } from './time-distance.js';
export { solveCase, solveAnalysis } from './solve-case.js';
export { MARKS_MISMATCH, APPEARANCE_NOTES } from './solve-skid.js';
export { minimumOf, isAboveLimit, solvedAnalysis } from './solution.js';
export { exact } from './step.js';
export {
  fitCircleToOffsets,
  type OffsetStation,
  type OffsetsFit,
  type OffsetsFitOptions,
  type OffsetResidual,
} from './offsets-fit.js';
export { radiusFromOffsets, OFFSET_READING, type OffsetsRadius } from './radius-offsets.js';
export { skidModel } from './skid-model.js';
