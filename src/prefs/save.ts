import fs from 'node:fs';
import Conf from 'conf';
import { PREF_FIELDS, type PrefKey, type Prefs } from './schema.js';
import { PROJECT_NAME, prefsCwd, reason, type PrefsOptions } from './prefs.js';

interface Opened {
  conf: Conf<Record<string, unknown>>;
  /** Set when the file exists but is not JSON: conf then sees an empty store. */
  parseError?: string;
}

/**
 * Opens conf with a reader that never throws, so a broken file gives defaults (and, through
 * `parseError`, a warning) instead of a crash. Only saving loads conf (and its validator).
 */
function open(opts: PrefsOptions): Opened {
  const cwd = prefsCwd(opts);
  const opened: { parseError?: string } = {};
  const conf = new Conf<Record<string, unknown>>({
    projectName: PROJECT_NAME,
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
