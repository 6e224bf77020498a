/** Public API of the calculation engine: pure functions, each figure with the step that made it. */
export * from './types.js';
export {
  unitsOf,
  tradeConstants,
  speedUnitToLengthPerSecond,
  STANDARD_GRAVITY_FT,
} from './constants.js';
export { slideDistanceFromMarks } from './distance.js';
export { brakingEfficiency, wheelsEfficiency } from './efficiency.js';
export { dragFactor } from './drag.js';

export {
  DRAG_TABLE,
  dragTableRow,
  dragTableBand,
  type DragTableRow,
  type DragBand,
} from './drag-table.js';
export {
  effectiveDrag,
  slideSquaredSpeed,
  slideDistanceFor,
  slideStartSpeed,
  arcRadius,
  centreRadius,
  criticalSpeedOf,
  wheelsBraking,
  testSkidDrag,
  levelTestDrag,
} from './formulas.js';
export { slideSpeed, type SlideSegment } from './slide.js';
export { radiusFromChord, pathRadius, criticalSpeed, ordinateSensitivity } from './yaw.js';
export { reactionDistance, brakingDistance, slideDuration } from './time-distance.js';
export { solveCase, solveAnalysis } from './solve-case.js';
export { yawRadius } from './solve-yaw.js';
export { APPEARANCE_NOTES } from './solve-skid.js';

export { exact } from './step.js';
