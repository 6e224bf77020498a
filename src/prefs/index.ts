/** User preferences (conf): units, reaction time, sessions folder, hints, mode. Never cases. */
export { loadPrefs, prefsFile, CONFIG_DIR_ENV } from './prefs.js';
export { savePref } from './save.js';
export { DEFAULT_PREFS } from './schema.js';
