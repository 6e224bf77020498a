/**
 * How hard the slow suites push. `npm test` runs each at a small count that still fails on the
 * first broken file or crash; `npm run soak` sets SKIDCASE_SOAK=1 and runs the full counts. A
 * suite's own variable (e.g. SKIDCASE_CRASH_KILLS) overrides both.
 */
export const SOAK = process.env.SKIDCASE_SOAK === '1';

/** The count for one suite: `name` from the environment, else the soak or the quick figure. */
export function soakCount(name: string, quick: number, full: number): number {
  const given = process.env[name];
  if (given === undefined || given === '') return SOAK ? full : quick;
  const n = Number(given);
  if (!Number.isInteger(n) || n < 1)
    throw new Error(`${name} must be a whole number from 1, not "${given}"`);
  return n;
}
