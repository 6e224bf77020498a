/**
 * The revision a save adds to the case's trail (docs/case-file.md, "Revisions"): what changed
 * between the case fields in the file before and the ones being written, and, when the file's
 * fields are not the ones skidcase last wrote, a "hand edit" entry for the difference first.
 */
import type { Case } from '../case/load.js';
import { canonicalJson, caseFieldsOf, diffCases } from '../case/revision-diff.js';
import type { ChangeV1, RevisionV1 } from '../case/v1/schema.js';
import { CREATED_NOTE } from '../case/v1/revision-fields.js';
import { sha256Of } from '../io/sha256.js';

/** The newest entries a file keeps; older ones are dropped and counted in `revisionsDropped`. */
export const REVISIONS_KEPT = 500;
/** The most changes one entry lists; the rest are counted in its `changesDropped`. */
export const CHANGES_KEPT = 200;

/** The note of a hand edit whose changes cannot be listed. */
export const HAND_EDIT_UNKNOWN_NOTE =
  'the file was changed outside skidcase; what changed is unknown (the fields skidcase last wrote are not on record)';

/** SHA-256 of a case's fields (without `updated`, `interview` and the trail), keys sorted. */
export const fieldsSha256 = (c: Case): string => sha256Of(canonicalJson(caseFieldsOf(c)));

/** What the save knows of the case before this write. */
export interface Before {
  /** The case in the file now (undefined: there is no file yet, the case is new). */
  onDisk?: Case;
  /**
   * The case this process last read or wrote, when the file on disk is not that one (changed
   * outside skidcase and written over at the user's choice): the from-values of the hand edit.
   */
  ours?: Case;
  /**
   * The case skidcase last wrote as the caller can rebuild it (the interview's saved answers),
   * asked for only when the file's fields are not what its trail says skidcase wrote; used when
   * its fields have the trail's SHA-256.
   */
  lastWritten?: () => Case | undefined;
}

function entry(at: string, by: RevisionV1['by'], changes: ChangeV1[], note?: string): RevisionV1 {
  const e: RevisionV1 = { at, by, changes: changes.slice(0, CHANGES_KEPT) };
  if (changes.length > CHANGES_KEPT) e.changesDropped = changes.length - CHANGES_KEPT;
  if (note !== undefined) e.note = note;
  return e;
}

/** The entries noticing a hand edit of the file on disk, if it was edited. */
function handEdit(at: string, before: Before & { onDisk: Case }): RevisionV1[] {
  if (before.ours) {
    const changes = diffCases(before.ours, before.onDisk);
    return changes.length ? [entry(at, 'hand edit', changes)] : [];
  }
  const sealed = before.onDisk.revisions?.at(-1)?.sha256;
  if (sealed === undefined || sealed === fieldsSha256(before.onDisk)) return [];
  const base = before.lastWritten?.();
  if (base && fieldsSha256(base) === sealed)
    return [entry(at, 'hand edit', diffCases(base, before.onDisk))];
  return [entry(at, 'hand edit', [], HAND_EDIT_UNKNOWN_NOTE)];
}

/**
 * The case to write, with its trail: the trail of the file on disk (a new file: the case's own,
 * so that a copy keeps its source's), plus a "hand edit" entry when the file's fields were
 * changed outside skidcase, plus an "interview" entry listing what this save changes (none when
 * only `updated` or `interview` differ; "created" for a new case). The newest entry carries the
 * SHA-256 of the fields written; the trail keeps its newest REVISIONS_KEPT entries.
 * @example withRevision(next, { onDisk }, '2026-12-01T10:00:00.000Z').revisions?.at(-1)?.changes
 */
export function withRevision(next: Case, before: Before, at: string): Case {
  const from = before.onDisk ?? next;
  const added: RevisionV1[] = before.onDisk
    ? [
        ...handEdit(at, { ...before, onDisk: before.onDisk }),
        ...interviewEntry(at, before.onDisk, next),
      ]
    : [entry(at, 'interview', [], CREATED_NOTE)];
  const { revisions: _r, revisionsDropped: _d, ...rest } = next;
  const trail = from.revisions ?? [];
  const dropped = from.revisionsDropped ?? 0;
  if (added.length === 0) return withTrail(rest as Case, trail, dropped);
  added[added.length - 1]!.sha256 = fieldsSha256(next);
  const all = [...trail.map(withoutSeal), ...added];
  const cut = Math.max(0, all.length - REVISIONS_KEPT);
  return withTrail(rest as Case, all.slice(cut), dropped + cut);
}

function interviewEntry(at: string, onDisk: Case, next: Case): RevisionV1[] {
  // `created` set by the save itself on a file that had none is the save's stamp, not a change.
  const changes = diffCases(onDisk, next).filter(
    (ch) => !(ch.field === 'created' && ch.from === undefined),
  );
  return changes.length ? [entry(at, 'interview', changes)] : [];
}

function withoutSeal(r: RevisionV1): RevisionV1 {
  if (r.sha256 === undefined) return r;
  const { sha256: _s, ...rest } = r;
  return rest;
}

/**
 * The case with one more entry by skidcase that changes no field but records an act on the file
 * (a backup put back): its note says what was done; it carries the SHA-256 of the fields, so the
 * next open does not take the act for a hand edit.
 * @example withNote(backup, '2026-12-01T10:00:00.000Z', 'restored from the backup copy').revisions?.at(-1)?.note
 */
export function withNote(c: Case, at: string, note: string): Case {
  const { revisions: _r, revisionsDropped: _d, ...rest } = c;
  const added = { ...entry(at, 'interview', [], note), sha256: fieldsSha256(c) };
  const all = [...(c.revisions ?? []).map(withoutSeal), added];
  const cut = Math.max(0, all.length - REVISIONS_KEPT);
  return withTrail(rest as Case, all.slice(cut), (c.revisionsDropped ?? 0) + cut);
}

function withTrail(c: Case, trail: RevisionV1[], dropped: number): Case {
  const out: Case = { ...c };
  if (trail.length) out.revisions = trail;
  if (dropped) out.revisionsDropped = dropped;
  return out;
}
