import envPaths from 'env-paths';

/** Overrides the user cache folder (tests and the benchmark point it at a temp folder). */
export const CACHE_DIR_ENV = 'SKIDCASE_CACHE_DIR';

/**
 * The folder for what skidcase may throw away at any time (the list index): SKIDCASE_CACHE_DIR,
 * else the user's cache folder (`~/.cache/skidcase-nodejs` on Linux, beside conf's config folder).
 */
export function userCacheDir(env: NodeJS.ProcessEnv = process.env): string {
  return env[CACHE_DIR_ENV] || envPaths('skidcase', { suffix: 'nodejs' }).cache;
}
