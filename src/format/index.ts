/** Number, range and chain formatting shared by `solve`, the report and the screens. */
export { formatNumber, formatRange, withUnit, NOT_A_NUMBER, type NumberKind } from './numbers.js';
export { formatChainText, formatAtLeast, formatPostedLimit } from './chain-text.js';
export { formatStepLines, kindOfUnit } from './step-text.js';
export { CAUTIONS } from './cautions.js';
