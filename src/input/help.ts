/**
 * Help text for the quick-entry syntax and the unit suffixes, for the help overlay. Generated from
 * the same unit table the parsers read, so the two cannot disagree. Examples are invented.
 */
import { suffixList, unitsFor, type QuantityKind } from './units.js';

/** The quick-entry syntax, one line per entry. */
export const QUICK_ENTRY_HELP: readonly string[] = [
  'Quick entry: a whole slide on one line.',
  '  Marks:    94 92 95 93   or   94, 92, 95   or   94 ft 2 in, 92',
  '            4 x 80.5      four marks of 80.5 each (count first)',
  '  Segments, in order of travel, separated by , or ;',
  '            LENGTH @DRAG GRADE label',
  '            48 @0.74 +2%, 31 @0.55 gravel, 22 @0.40 -3% [grass, wet]',
  '  LENGTH    in the case unit, or with a suffix: 15 m, 48 ft 6 in',
  '  @DRAG     a decimal: @0.74; with a range: @0.70-0.78 or @0.74 (0.70-0.80)',
  '            a table row: @gravel-loose, @asphalt-dry-travelled/over30',
  '            your pick in a row: @gravel-loose=0.5, @gravel-loose=0.45-0.6',
  '            (/under30 or /over30: the speed band, for rows that give two)',
  '  GRADE     signed percent, + uphill in the direction of travel: +2%, -3%',
  '            no grade means level; a range: -3% ± 0.5 or -3% (-4 to -2)',
  '            after a drag range the % may go: @0.70-0.80 -3',
  '  label     a surface name shown in the report (optional), last;',
  '            in [brackets] when it holds a comma',
  '  A slide of one segment may leave out its length (taken from the marks):',
  '            @0.74 -1%',
  '  The line may be typed straight at "one surface, or several?".',
  'Ranges: 0.65-0.80, 0.65 to 0.80, 0.72 (0.65-0.80), 80 +/- 1, 80 ± 1.',
  'Decimals take a dot: 0.72, not 0,72.',
];

const KIND_LABEL: Record<QuantityKind, string> = {
  length: 'Lengths',
  speed: 'Speeds',
  percent: 'Grades, banks',
  factor: 'Drag factors',
  time: 'Times',
  count: 'Counts',
  weight: 'Weights, sled pulls',
  force: 'Forces',
};

const NOTES: Partial<Record<QuantityKind, string>> = {
  length: '; also 12 ft 3 1/8 in',
  percent: '; degrees of slope become percent (100 × tan)',
  time: '; no suffix means seconds',
  weight: ' (N read as kg-force, ÷ 9.80665)',
};

/** Accepted suffixes for each kind, one line per kind. */
export const UNIT_SUFFIX_HELP: readonly string[] = (
  ['length', 'speed', 'percent', 'factor', 'time', 'weight'] as const
).map(
  (k) => `${KIND_LABEL[k]}: ${unitsFor(k).length ? suffixList(k) : 'no unit'}${NOTES[k] ?? ''}`,
);

/** The accepted suffixes of one kind, for a prompt's hint: `ft (or '), in (or "), yd, m, ...`. */
export function unitSuffixes(kind: QuantityKind): string {
  return suffixList(kind);
}
