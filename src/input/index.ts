/**
 * Typed-answer parsing and quick entry: what the interview calls to read and check what the
 * investigator types. Pure: no UI, no I/O. Every failure is a message naming the field, written to
 * be shown as it is.
 */
export { parseQuantity } from './parse-quantity.js';
export { parseList, parseCount } from './parse-list.js';
export { parseMarksLine, type MarksContext, type MarksResult } from './marks-line.js';
export { parseSegmentLine, type SegmentContext, type SegmentsResult } from './segment-line.js';
export { formatSegmentLine, formatRangeText } from './format-segment-line.js';
export { QUICK_ENTRY_HELP, UNIT_SUFFIX_HELP, unitSuffixes } from './help.js';
export { caseUnitOf, KIND_EXAMPLE } from './units.js';
export { showNumber } from './show.js';
export { DEFAULT_NEGATIVE_HINT } from './check.js';
export type { SpeedBand } from './table-drag.js';
export type {
  QuantityKind,
  QuantitySpec,
  QuantityResult,
  ListSpec,
  ListResult,
  CountSpec,
  CountResult,
} from './types.js';
