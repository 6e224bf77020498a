/** User preferences (conf): units, reaction time, sessions folder, hints, mode. Never cases. */
export {
  loadPrefs,
  savePref,
  CONFIG_DIR_ENV,
  type LoadedPrefs,
  type PrefsOptions,
  type SavePrefResult,
} from './prefs.js';
export {
  DEFAULT_PREFS,
  PREF_FIELDS,
  REACTION_TIME,
  readPrefs,
  prefsSchema,
  type Prefs,
  type PrefKey,
} from './schema.js';
