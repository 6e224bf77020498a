/** Moved to the engine (the yaw solver fits circles too); kept here so existing imports work. */
export { solve3, inverse3 } from '../engine/solve3.js';
