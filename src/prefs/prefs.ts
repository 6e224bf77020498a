import fs from 'node:fs';
import path from 'node:path';
import envPaths from 'env-paths';
import { DEFAULT_PREFS, readPrefs, type Prefs } from './schema.js';

/** Overrides the folder of the preferences file (end-to-end tests point it at a temp folder). */
export const CONFIG_DIR_ENV = 'SKIDCASE_CONFIG_DIR';

/** The name conf keeps the preferences under (its folder is `skidcase-nodejs` by default). */
export const PROJECT_NAME = 'skidcase';

export interface PrefsOptions {
  /** conf's `cwd`: the folder holding config.json. Wins over SKIDCASE_CONFIG_DIR. */
  cwd?: string;
  /** Read instead of process.env (for tests). */
  env?: NodeJS.ProcessEnv;
}

export interface LoadedPrefs {
  prefs: Prefs;
  /** Problems found, each naming the preference; the affected ones fell back to their defaults. */
  warnings: string[];
  /** The preferences file (it may not exist yet). */
  file: string;
}

/** The folder conf is pointed at: `cwd`, else SKIDCASE_CONFIG_DIR, else conf's own default. */
export function prefsCwd(opts: PrefsOptions): string | undefined {
  return opts.cwd ?? (opts.env ?? process.env)[CONFIG_DIR_ENV];
}

/**
 * The preferences file, where conf keeps it: `config.json` in the chosen folder, or in the user's
 * config folder for `skidcase` with conf's `nodejs` suffix (env-paths, as conf computes it).
 */
export function prefsFile(opts: PrefsOptions = {}): string {
  const cwd = prefsCwd(opts) ?? envPaths(PROJECT_NAME, { suffix: 'nodejs' }).config;
  return path.resolve(cwd, 'config.json');
}

/**
 * Loads the preferences. A broken preferences file (not JSON, wrong types, out of range) never
 * stops the program: the bad parts fall back to their defaults and `warnings` says which.
 *
 * The file is read here as conf reads it (a missing file is an empty store and its folder is
 * made; any JSON value is spread into a plain object), without loading conf and its validator:
 * the start screen pays for conf only when a preference is saved (`save.ts`).
 *
 * @example
 * const { prefs, warnings } = loadPrefs(); // prefs.units === 'imperial' on a fresh install
 */
export function loadPrefs(opts: PrefsOptions = {}): LoadedPrefs {
  let file = '';
  try {
    file = prefsFile(opts);
    let text: string | undefined;
    try {
      text = fs.readFileSync(file, 'utf8');
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code !== 'ENOENT') throw e;
      fs.mkdirSync(path.dirname(file), { recursive: true });
    }
    let stored: unknown = {};
    if (text !== undefined) {
      try {
        stored = Object.assign(Object.create(null) as object, JSON.parse(text) as unknown);
      } catch (e) {
        return {
          prefs: { ...DEFAULT_PREFS },
          warnings: [`${file}: not valid JSON (${reason(e)}); defaults are used`],
          file,
        };
      }
    }
    const { prefs, warnings } = readPrefs(stored);
    return { prefs, warnings: warnings.map((w) => `${file}: ${w}`), file };
  } catch (e) {
    // Unreadable folder or file: still never a crash.
    return {
      prefs: { ...DEFAULT_PREFS },
      warnings: [`preferences could not be read: ${reason(e)}; defaults are used`],
      file: '',
    };
  }
}

export const reason = (e: unknown) => (e instanceof Error ? e.message : String(e));
