import path from 'node:path';

/** Where the sessions folder setting came from, shown on screen beside the folder. */
export type SessionsDirSource = 'flag' | 'env' | 'preference' | 'default';

/** The environment variable that overrides the sessions folder. */
export const SESSIONS_ENV = 'SKIDCASE_SESSIONS';

export interface SessionsDirOptions {
  /** `--sessions DIR` from the command line. */
  flag?: string;
  /** Usually `process.env`; only `SKIDCASE_SESSIONS` is read. */
  env?: NodeJS.ProcessEnv;
  /** The saved preferences; only `sessionsDir` is read. */
  prefs?: { sessionsDir?: string };
  /** The working directory: the default folder lives under it, and relative settings resolve from it. */
  cwd: string;
}

/**
 * Chooses the sessions folder: `--sessions` flag, then `SKIDCASE_SESSIONS`, then the preference,
 * then `<cwd>/sessions`. Empty or blank settings are skipped. The folder is not created here; the
 * first save creates it, so listing cases never leaves an empty folder behind.
 *
 * @example
 * resolveSessionsDir({ cwd: '/cases', env: { SKIDCASE_SESSIONS: 'field' } })
 * // => { dir: '/cases/field', from: 'env' }
 */
export function resolveSessionsDir(opts: SessionsDirOptions): {
  dir: string;
  from: SessionsDirSource;
} {
  const candidates: [string | undefined, SessionsDirSource][] = [
    [opts.flag, 'flag'],
    [opts.env?.[SESSIONS_ENV], 'env'],
    [opts.prefs?.sessionsDir, 'preference'],
  ];
  for (const [value, from] of candidates) {
    if (value !== undefined && value.trim() !== '')
      return { dir: path.resolve(opts.cwd, value.trim()), from };
  }
  return { dir: path.resolve(opts.cwd, 'sessions'), from: 'default' };
}
