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
import { canonicalJson, caseFieldsOf } from '../case/revision-diff.js';

const savedSchema = z.object({
  version: z.literal(1),
  answers: z.record(z.string(), z.object({ text: z.string(), value: z.unknown().optional() })),
  cursor: z.string(),
  mode: z.enum(['guided', 'brisk']),
});

/** What the case says, apart from the interview, the timestamps and its trail of revisions. */
const figuresOf = (c: Case) => canonicalJson({ ...caseFieldsOf(c), created: undefined });

export const EDITED_NOTICE =
  'The file was changed outside the interview since it was saved: the answers are read again from its fields.';

/**
 * The state to resume a case with. The saved interview is used when it still makes exactly the
 * case in the file; if the file was edited by hand since, its fields win (the file is what
 * `solve` reads) and the answers are derived from them, with a notice.
 */
export function stateFromCase(c: Case): InterviewState {
  const saved = savedState(c);
  if (saved) {
    const { st, rebuilt } = saved;
    if (figuresOf(rebuilt) === figuresOf(c)) return st;
    const { mode } = st;
    return { ...fromFields(c), mode, explain: mode === 'guided', notice: EDITED_NOTICE };
  }
  return fromFields(c);
}

/** The saved interview's state and the case its answers build, when the case has one. */
function savedState(c: Case): { st: InterviewState; rebuilt: Case } | undefined {
  const saved = savedSchema.safeParse(c.interview);
  if (!saved.success) return undefined;
  const { answers, cursor, mode } = saved.data as {
    answers: Answers;
    cursor: string;
    mode: 'guided' | 'brisk';
  };
  const st: InterviewState = { answers, cursor, undo: [], mode, explain: mode === 'guided' };
  const meta = { id: c.id, units: c.units, ...(c.created ? { created: c.created } : {}) };
  return { st, rebuilt: buildCase(st, meta) };
}

/**
 * The case the saved interview answers build: what skidcase last wrote, when the fields were
 * since edited by hand (the store checks it against the trail's SHA-256 before it uses it as the
 * from-values of a hand edit). Undefined for a case without a saved interview.
 */
export const caseFromSavedAnswers = (c: Case): Case | undefined => savedState(c)?.rebuilt;

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
