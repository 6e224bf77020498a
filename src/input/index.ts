/**
 * Typed-answer parsing and quick entry: what the interview calls to read and check what the
 * investigator types. Pure: no UI, no I/O. Every failure is a message naming the field, written to
 * be shown as it is.
 */
export { parseQuantity } from './parse-quantity.js';
export { parseList, parseCount } from './parse-list.js';
export { parseMarksLine } from './marks-line.js';
export { parseSegmentLine } from './segment-line.js';
export { formatSegmentLine } from './format-segment-line.js';
export { QUICK_ENTRY_HELP, UNIT_SUFFIX_HELP, unitSuffixes } from './help.js';
export { caseUnitOf } from './units.js';
export { showNumber } from './show.js';
export { withTypedDecimals } from './typed-decimals.js';

export type { QuantityKind, QuantitySpec, ListSpec } from './types.js';
