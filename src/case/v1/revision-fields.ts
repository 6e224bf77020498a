import { z } from 'zod';
import { MAX_ITEMS, tooManyMessage } from '../limits.js';

/**
 * The case's trail of changes (docs/case-file.md, "Revisions"): optional top-level `revisions`, a
 * list of entries, each saying when, who and which fields changed from what to what, and
 * `revisionsDropped`, how many older entries were dropped to keep the file small. Loose objects,
 * as everywhere in v1, so that unknown keys are kept.
 */

/** Who made a revision: skidcase's own save, or a change to the file it found and did not make. */
export const REVISION_BY = ['interview', 'hand edit'] as const;

/** The note of a new case's first entry (it lists no changes). */
export const CREATED_NOTE = 'created';

/** An ISO 8601 time as JavaScript writes it, with a zone: `2026-12-01T10:00:00.000Z`. */
const isoTime = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/;

/** One field that changed: its path as a reader writes it, and its value before and after. */
const changeV1 = z.looseObject(
  {
    field: z
      .string({ error: 'field must be text (the path of the field that changed)' })
      .min(1, 'field must not be empty'),
    // Absent: the field was not there (before) or is gone (after). Any JSON value otherwise.
    from: z.unknown().optional(),
    to: z.unknown().optional(),
  },
  { error: 'a change must be an object { "field", "from", "to" }' },
);

const revisionV1 = z.looseObject(
  {
    at: z
      .string({ error: 'at must be text: the time of the save, e.g. 2026-12-01T10:00:00Z' })
      .regex(isoTime, 'at must be an ISO 8601 time, e.g. 2026-12-01T10:00:00Z'),
    by: z.enum(REVISION_BY, { error: 'by must be "interview" or "hand edit"' }),
    changes: z
      .array(changeV1, { error: 'changes must be a list of { "field", "from", "to" }' })
      .max(MAX_ITEMS, tooManyMessage('changes')),
    /** What the changes do not say: "created", or why a hand edit's changes are not known. */
    note: z.string({ error: 'note must be text' }).optional(),
    /** How many further changes this save made that were not listed (the entry's own cap). */
    changesDropped: z
      .number({ error: 'changesDropped must be a whole number' })
      .int('changesDropped must be a whole number')
      .min(0, 'changesDropped must be 0 or more')
      .optional(),
    /** SHA-256 of the case fields as this save wrote them (kept on the newest entry only). */
    sha256: z
      .string({ error: 'sha256 must be text' })
      .regex(/^[0-9a-f]{64}$/, 'sha256 must be 64 lower-case hexadecimal digits')
      .optional(),
  },
  { error: 'a revision must be an object { "at", "by", "changes" }' },
);

/** Top level `revisions`: oldest first. */
export const revisionsFieldV1 = z
  .array(revisionV1, { error: 'revisions must be a list of { "at", "by", "changes" }' })
  .max(MAX_ITEMS, tooManyMessage('revisions'));

/** Top level `revisionsDropped`: older entries dropped from the front of the list. */
export const revisionsDroppedFieldV1 = z
  .number({ error: 'revisionsDropped must be a whole number' })
  .int('revisionsDropped must be a whole number')
  .min(0, 'revisionsDropped must be 0 or more');

export type RevisionV1 = z.infer<typeof revisionV1>;
export type ChangeV1 = z.infer<typeof changeV1>;
