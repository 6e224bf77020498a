/**
 * The case's trail of revisions as text (docs/case-file.md, "Revisions"): the one wording that
 * `skidcase history` prints and every report's "Revisions" section carries.
 */
import type { Case } from '../case/load.js';
import type { ChangeV1, RevisionV1 } from '../case/v1/schema.js';

/** What a report or `history` says of a case that has no trail. */
export const NO_REVISIONS =
  'No revisions recorded (hand-written file, or saved before skidcase kept a trail).';

/** A value as stored: text quoted, numbers as written, objects and lists as compact JSON. */
export function revisionValue(v: unknown): string {
  return v === undefined ? '(not set)' : JSON.stringify(v);
}

/** `analyses[0].marks[1]: 61.3 → 62` */
export function changeText(ch: ChangeV1): string {
  return `${ch.field}: ${revisionValue(ch.from)} → ${revisionValue(ch.to)}`;
}

/**
 * `3. 2026-12-01T10:05:00.000Z, hand edit (found at this save; made at some time before it)`.
 * A hand edit's time is when skidcase found it, not when it was made: the heading says so.
 */
export function revisionHeading(r: RevisionV1, number: number): string {
  const by =
    r.by === 'hand edit' ? 'hand edit (found at this save; made at some time before it)' : r.by;
  return `${number}. ${r.at}, ${by}`;
}

/** The revision's changes, one line each, then its note and the changes not listed. */
export function revisionLines(r: RevisionV1): string[] {
  const lines = r.changes.map(changeText);
  if (r.note) lines.push(r.note);
  if (r.changesDropped) lines.push(`and ${r.changesDropped} further changes, not listed`);
  if (lines.length === 0) lines.push('no field changed');
  return lines;
}

/** One sentence on the trail as a whole: how many revisions, how many older ones were dropped. */
export function trailSummary(c: Case): string {
  const n = c.revisions?.length ?? 0;
  const dropped = c.revisionsDropped ?? 0;
  if (n === 0 && dropped === 0) return NO_REVISIONS;
  const kept = `${n} revision${n === 1 ? '' : 's'} recorded, oldest first`;
  return dropped
    ? `${kept}; ${dropped} older revision${dropped === 1 ? ' was' : 's were'} dropped to keep the file small.`
    : `${kept}.`;
}
