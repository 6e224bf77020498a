/**
 * Migrations between case file versions. `MIGRATIONS[v]` turns a version-v object into a
 * version v+1 object; `loadCase` runs them in a chain. There is one version today, so the table
 * is empty; a version 2 adds `1: fromV1` here, a `v2/` schema folder, and a test per step.
 */
export type Migration = (old: Record<string, unknown>) => Record<string, unknown>;

export const MIGRATIONS: Record<number, Migration> = {};
