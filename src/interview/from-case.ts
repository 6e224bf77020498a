/**
 * Resume: the interview state of a case. From its saved `interview` when present; for a
 * hand-written case, the answers are derived from its fields so it can be reviewed and edited.
 */
import { z } from 'zod';
import type { Case } from '../case/load.js';
import type { Answers, InterviewState } from './types.js';
import { firstOpenIn, REVIEW } from './navigate.js';
import { buildCase } from './build-case.js';
import { answersFromCase } from './answers-from-case.js';

const savedSchema = z.object({
  version: z.literal(1),
  answers: z.record(z.string(), z.object({ text: z.string(), value: z.unknown().optional() })),
  cursor: z.string(),
  mode: z.enum(['guided', 'brisk']),
});

/** JSON with object keys sorted, so two cases compare by content and not by key order. */
function canonical(x: unknown): string {
  return JSON.stringify(x, (_k, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(
          Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : 1)),
        )
      : v,
  );
}

/** What the case says, apart from the interview and the timestamps. */
const figuresOf = (c: Case) =>
  canonical({ ...c, interview: undefined, created: undefined, updated: undefined });

export const EDITED_NOTICE =
  'The file was changed outside the interview since it was saved: the answers are read again from its fields.';

/**
 * The state to resume a case with. The saved interview is used when it still makes exactly the
 * case in the file; if the file was edited by hand since, its fields win (the file is what
 * `solve` reads) and the answers are derived from them, with a notice.
 */
export function stateFromCase(c: Case): InterviewState {
  const saved = savedSchema.safeParse(c.interview);
  if (saved.success) {
    const { answers, cursor, mode } = saved.data as {
      answers: Answers;
      cursor: string;
      mode: 'guided' | 'brisk';
    };
    const st: InterviewState = { answers, cursor, undo: [], mode, explain: mode === 'guided' };
    const meta = { id: c.id, units: c.units, ...(c.created ? { created: c.created } : {}) };
    if (figuresOf(buildCase(st, meta)) === figuresOf(c)) return st;
    return { ...fromFields(c), mode, explain: mode === 'guided', notice: EDITED_NOTICE };
  }
  return fromFields(c);
}

function fromFields(c: Case): InterviewState {
  const answers = answersFromCase(c);
  const cursor = firstOpenIn(answers);
  return {
    answers,
    cursor: cursor === REVIEW ? REVIEW : cursor,
    undo: [],
    mode: 'guided',
    explain: true,
  };
}
