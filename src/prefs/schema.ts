import { z } from 'zod';
import { DEFAULT_REACTION_TIME } from '../engine/constants.js';

/** Perception-reaction time bounds, seconds: what a preference may hold. */
export const REACTION_TIME = { min: 0.5, max: 5 } as const;

/** One schema per preference, so that a bad value resets only itself, with a warning naming it. */
export const PREF_FIELDS = {
  units: z.enum(['imperial', 'metric'], { error: 'units must be imperial or metric' }),
  reactionTime: z
    .number({ error: 'reactionTime must be a number of seconds' })
    .min(REACTION_TIME.min, `reactionTime must be at least ${REACTION_TIME.min} s`)
    .max(REACTION_TIME.max, `reactionTime must be at most ${REACTION_TIME.max} s`),
  sessionsDir: z
    .string({ error: 'sessionsDir must be a folder path' })
    .min(1, 'sessionsDir must not be empty')
    .optional(),
  hints: z.boolean({ error: 'hints must be true or false' }),
  mode: z.enum(['guided', 'brisk'], { error: 'mode must be guided or brisk' }),
} as const;

export const prefsSchema = z.object(PREF_FIELDS);

/** The user's preferences (never cases). */
export type Prefs = z.infer<typeof prefsSchema>;
export type PrefKey = keyof Prefs;

/** Defaults: imperial, 1.5 s reaction time (common practice), hints on, guided mode. */
export const DEFAULT_PREFS: Prefs = {
  units: 'imperial',
  reactionTime: DEFAULT_REACTION_TIME,
  hints: true,
  mode: 'guided',
};

/**
 * Reads a stored object field by field: each valid field is kept, each invalid one falls back to
 * its default with a warning naming it. Unknown keys are ignored (kept in the file by conf).
 */
export function readPrefs(stored: unknown): { prefs: Prefs; warnings: string[] } {
  const prefs: Prefs = { ...DEFAULT_PREFS };
  const warnings: string[] = [];
  if (typeof stored !== 'object' || stored === null || Array.isArray(stored))
    return {
      prefs,
      warnings:
        stored === undefined ? [] : ['the preferences are not an object; defaults are used'],
    };
  const obj = stored as Record<string, unknown>;
  for (const key of Object.keys(PREF_FIELDS) as PrefKey[]) {
    if (!(key in obj) || obj[key] === undefined) continue;
    const r = PREF_FIELDS[key].safeParse(obj[key]);
    if (r.success) (prefs as Record<string, unknown>)[key] = r.data;
    else warnings.push(`${key}: ${r.error.issues[0]?.message ?? 'invalid'}; using the default`);
  }
  return { prefs, warnings };
}
