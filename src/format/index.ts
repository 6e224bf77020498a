/** Number, range and chain formatting shared by `solve`, the report and the screens. */
export { formatRange, withUnit } from './numbers.js';
export { formatNumber, NOT_A_NUMBER, type NumberKind } from '../engine/number-text.js';
export { formatChainText, formatAtLeast, formatPostedLimit } from './chain-text.js';
export { formatStepLines, kindOfUnit } from './step-text.js';
export { CAUTIONS } from './cautions.js';
