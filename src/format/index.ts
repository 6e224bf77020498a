/** Number, range and chain formatting shared by `solve`, the report and the screens. */
export {
  formatNumber,
  formatRange,
  withUnit,
  zeroRangeNote,
  NOT_A_NUMBER,
  type NumberKind,
} from './numbers.js';
export {
  formatChainText,
  formatStepLines,
  formatAtLeast,
  formatPostedLimit,
  kindOfUnit,
} from './chain-text.js';
export { CAUTIONS } from './cautions.js';
