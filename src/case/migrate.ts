/**
 * Migrations between case file versions. `MIGRATIONS[v]` turns a version-v object into a
 * version v+1 object; `loadCase` runs them in a chain (`migrate`). There is one version today, so
 * the table is empty; a version 2 adds `1: fromV1` here, a `v2/` schema folder, and a test per step.
 */
export type Migration = (old: Record<string, unknown>) => Record<string, unknown>;
export type MigrationTable = Readonly<Record<number, Migration>>;

export const MIGRATIONS: MigrationTable = {};

/** The oldest version a table can bring up to `latest`: the first of an unbroken chain of steps. */
export function oldestVersion(table: MigrationTable, latest: number): number {
  let v = latest;
  while (table[v - 1]) v--;
  return v;
}

/**
 * Runs the steps from `from` up to `to`, each on the previous one's result. Fails naming the
 * first version the table has no step from.
 */
export function migrate(
  obj: Record<string, unknown>,
  from: number,
  to: number,
  table: MigrationTable = MIGRATIONS,
): { ok: true; value: Record<string, unknown> } | { ok: false; missing: number } {
  let current = obj;
  for (let v = from; v < to; v++) {
    const step = table[v];
    if (!step) return { ok: false, missing: v };
    current = step(current);
  }
  return { ok: true, value: current };
}
