/** Moved to the engine (the yaw solver fits circles too); kept here so existing imports work. */
export { circleThroughThree, kasaFit, geometricFit, type Point } from '../engine/circle-fit.js';
