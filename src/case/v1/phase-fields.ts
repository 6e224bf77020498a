import { z } from 'zod';
import { finiteNumber, quantity, RULES } from '../quantity.js';
import { MAX_ITEMS, tooManyMessage } from '../limits.js';

/**
 * The fields that link analyses into phases and the new ways of measuring them
 * (docs/case-file.md): a slide's `end: { mode: "analysis", analysis: ID }`, a yaw's surveyed
 * `points`, and the `airborne` analysis (take-off to first landing).
 */

/**
 * Analysis ids are free text: they only need to tell analyses apart and print cleanly (file names
 * made from them are sanitised where they are written).
 */
export const analysisId = z
  .string({
    error: (iss: { input?: unknown }) =>
      iss.input === undefined ? 'id is required' : 'id must be text',
  })
  .min(1, 'id must not be empty')
  .max(64, 'id must be at most 64 characters')
  // eslint-disable-next-line no-control-regex
  .regex(/^[^\u0000-\u001f\u007f]*$/, 'id must not contain control characters');

/** A slide that ran on into the marks of another analysis of the same case. */
export const endAnalysisV1 = z.looseObject({
  mode: z.literal('analysis'),
  analysis: z.string({
    error: (iss: { input?: unknown }) =>
      iss.input === undefined
        ? 'analysis is required (the id of the analysis the marks ran into)'
        : 'analysis must be the id of another analysis (text)',
  }),
});

/** Largest coordinate a surveyed point may have, in the case's length unit. */
const COORDINATE_LIMIT = 10_000_000;

const coordinate = finiteNumber('a coordinate').refine(
  (n) => Number.isFinite(n) && Math.abs(n) <= COORDINATE_LIMIT,
  {
    message: `a coordinate must be a finite number of at most ${COORDINATE_LIMIT} in size`,
  },
);

/** Points surveyed along a yaw mark, `[x, y]` in the case's length unit; at least three. */
export const pointsFieldV1 = z
  .array(z.tuple([coordinate, coordinate], { error: 'a point must be [x, y]: two numbers' }), {
    error: 'points must be a list of [x, y] pairs',
  })
  .min(3, 'at least 3 points are needed for a circle')
  .max(MAX_ITEMS, tooManyMessage('points'));

/**
 * Points surveyed along a yaw mark but left out of the fit (past where the mark turns into a
 * scuff, a misread point), `[x, y]` as in `points`: kept so the case shows every point taken.
 */
export const pointsLeftOutFieldV1 = z
  .array(z.tuple([coordinate, coordinate], { error: 'a point must be [x, y]: two numbers' }), {
    error: 'pointsLeftOut must be a list of [x, y] pairs',
  })
  .max(MAX_ITEMS, tooManyMessage('pointsLeftOut'));

/** A vehicle that left the ground: horizontal distance, drop and take-off grade of its centre of mass. */
export const airborneV1 = z.looseObject({
  id: analysisId,
  kind: z.literal('airborne'),
  label: z.string({ error: 'label must be text' }).optional(),
  distance: quantity({ ...RULES.length, what: 'distance' }),
  drop: quantity(RULES.drop),
  takeoffGrade: quantity(RULES.takeoffGrade).optional(),
});

export type AirborneV1 = z.infer<typeof airborneV1>;

type Linked = { id: string; kind: string; end?: { mode: string; analysis?: string } | undefined };
type Issue = { path: (string | number)[]; message: string };

/**
 * Issues with the links between phases: each slide whose `end.analysis` names itself, names no
 * analysis of the case, or leads back to itself through other links. Each issue's path is
 * `analyses[i].end.analysis`.
 * @example chainIssues([{ id: 'a', kind: 'skid', end: { mode: 'analysis', analysis: 'b' } }])
 * // [{ path: ['analyses', 0, 'end', 'analysis'], message: 'there is no analysis "b" ...' }]
 */
export function chainIssues(analyses: readonly Linked[]): Issue[] {
  const byId = new Map(analyses.map((a, i) => [a.id, i] as const));
  const next = (i: number): number | undefined => {
    const e = analyses[i]!.end;
    return e?.mode === 'analysis' && e.analysis !== undefined ? byId.get(e.analysis) : undefined;
  };
  const out: Issue[] = [];
  analyses.forEach((a, i) => {
    if (a.end?.mode !== 'analysis' || a.end.analysis === undefined) return;
    const path = ['analyses', i, 'end', 'analysis'];
    const target = a.end.analysis;
    if (target === a.id) {
      out.push({ path, message: 'an analysis cannot run on into itself' });
      return;
    }
    if (!byId.has(target)) {
      const ids = analyses.filter((x) => x.id !== a.id).map((x) => x.id);
      out.push({
        path,
        message: `there is no analysis "${target}" in this case${ids.length ? ` (ids: ${ids.join(', ')})` : ''}`,
      });
      return;
    }
    const seen = [i];
    for (let j = next(i); j !== undefined; j = next(j)) {
      if (j === i) {
        const names = [...seen, i].map((k) => analyses[k]!.id).join(' → ');
        out.push({ path, message: `the phases loop back on themselves (${names})` });
        return;
      }
      if (seen.includes(j)) return; // a loop further on, reported at its own analyses
      seen.push(j);
    }
  });
  return out;
}
