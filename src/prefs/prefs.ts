import fs from 'node:fs';
import Conf from 'conf';
import { DEFAULT_PREFS, PREF_FIELDS, readPrefs, type PrefKey, type Prefs } from './schema.js';

/** Overrides the folder of the preferences file (end-to-end tests point it at a temp folder). */
export const CONFIG_DIR_ENV = 'SKIDCASE_CONFIG_DIR';

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

interface Opened {
  conf: Conf<Record<string, unknown>>;
  /** Set when the file exists but is not JSON: conf then sees an empty store. */
  parseError?: string;
}

/**
 * Opens conf with a reader that never throws, so a broken file gives defaults (and, through
 * `parseError`, a warning) instead of a crash at start-up.
 */
function open(opts: PrefsOptions): Opened {
  const cwd = opts.cwd ?? (opts.env ?? process.env)[CONFIG_DIR_ENV];
  const opened: { parseError?: string } = {};
  const conf = new Conf<Record<string, unknown>>({
    projectName: 'skidcase',
    ...(cwd ? { cwd } : {}),
    clearInvalidConfig: false,
    deserialize: (text: string) => {
      try {
        return JSON.parse(text) as Record<string, unknown>;
      } catch (e) {
        opened.parseError = `not valid JSON (${reason(e)})`;
        return {};
      }
    },
  });
  return { conf, ...opened };
}

/**
 * Loads the preferences. A broken preferences file (not JSON, wrong types, out of range) never
 * stops the program: the bad parts fall back to their defaults and `warnings` says which.
 *
 * @example
 * const { prefs, warnings } = loadPrefs(); // prefs.units === 'imperial' on a fresh install
 */
export function loadPrefs(opts: PrefsOptions = {}): LoadedPrefs {
  try {
    const { conf, parseError } = open(opts);
    if (parseError)
      return {
        prefs: { ...DEFAULT_PREFS },
        warnings: [`${conf.path}: ${parseError}; defaults are used`],
        file: conf.path,
      };
    const { prefs, warnings } = readPrefs(conf.store);
    return { prefs, warnings: warnings.map((w) => `${conf.path}: ${w}`), file: conf.path };
  } catch (e) {
    // Unreadable folder or file: still never a crash.
    return {
      prefs: { ...DEFAULT_PREFS },
      warnings: [`preferences could not be read: ${reason(e)}; defaults are used`],
      file: '',
    };
  }
}

export type SavePrefResult =
  { ok: true; file: string; warning?: string } | { ok: false; message: string };

/**
 * Saves one preference after checking it (`reactionTime` 0.5 to 5 s, ...); `undefined` removes an
 * optional one (sessionsDir). A preferences file that is not JSON is moved aside as
 * `config.json.broken` first, so what was in it is not lost.
 *
 * @example
 * savePref('units', 'metric');
 */
export function savePref<K extends PrefKey>(
  key: K,
  value: Prefs[K],
  opts: PrefsOptions = {},
): SavePrefResult {
  const checked = PREF_FIELDS[key].safeParse(value);
  if (!checked.success)
    return { ok: false, message: checked.error.issues[0]?.message ?? `${key} is not valid` };
  try {
    let { conf, parseError } = open(opts);
    let warning: string | undefined;
    if (parseError) {
      fs.renameSync(conf.path, `${conf.path}.broken`);
      warning = `${conf.path} was ${parseError}; it was kept as ${conf.path}.broken`;
      ({ conf, parseError } = open(opts));
    }
    if (checked.data === undefined) conf.delete(key);
    else conf.set(key, checked.data);
    return warning ? { ok: true, file: conf.path, warning } : { ok: true, file: conf.path };
  } catch (e) {
    return { ok: false, message: `the preference could not be saved: ${reason(e)}` };
  }
}

const reason = (e: unknown) => (e instanceof Error ? e.message : String(e));
