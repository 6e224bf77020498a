import fs from 'node:fs';
import path from 'node:path';
import Conf from 'conf';
import { build } from 'esbuild';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { trackedTempDir } from '../temp-dirs.js';
import { loadPrefs, prefsFile } from '../../src/prefs/index.js';

// Preferences are read without conf (start-up speed) but written with it: the two must agree on
// the file and on what it holds.
const tempConf = () => trackedTempDir('skidcase-prefs-');

describe('preferences read without conf', () => {
  afterEach(() => vi.unstubAllEnvs());

  it('reads what conf itself wrote, in the file conf chose', () => {
    const cwd = tempConf();
    const conf = new Conf<Record<string, unknown>>({ projectName: 'skidcase', cwd });
    conf.set('units', 'metric');
    conf.set('reactionTime', 2.5);
    conf.set('mode', 'brisk');
    conf.set('somethingElse', { kept: true });
    const r = loadPrefs({ cwd });
    expect(r.file).toBe(conf.path);
    expect(r.warnings).toEqual([]);
    expect(r.prefs).toEqual({ units: 'metric', reactionTime: 2.5, hints: true, mode: 'brisk' });
  });

  it('names the same default file as conf (user config folder, skidcase-nodejs)', () => {
    const home = tempConf();
    vi.stubEnv('XDG_CONFIG_HOME', home);
    vi.stubEnv('APPDATA', home);
    const conf = new Conf<Record<string, unknown>>({ projectName: 'skidcase' });
    expect(prefsFile({ env: {} })).toBe(conf.path);
    if (process.platform === 'linux')
      expect(conf.path).toBe(path.join(home, 'skidcase-nodejs', 'config.json'));
  });

  it('never writes the file when reading, and makes its folder as conf did', () => {
    const cwd = path.join(tempConf(), 'not-yet');
    expect(loadPrefs({ cwd }).prefs.units).toBe('imperial');
    expect(fs.existsSync(cwd)).toBe(true);
    expect(fs.existsSync(path.join(cwd, 'config.json'))).toBe(false);
  });

  it('a file that is not readable as a file gives the defaults and a warning', () => {
    const cwd = tempConf();
    fs.mkdirSync(path.join(cwd, 'config.json'));
    const r = loadPrefs({ cwd });
    expect(r.prefs.units).toBe('imperial');
    expect(r.warnings[0]).toMatch(/^preferences could not be read: .*; defaults are used$/);
  });

  it('reading the preferences does not bundle conf or its validator', async () => {
    const r = await build({
      entryPoints: ['src/prefs/prefs.ts'],
      bundle: true,
      write: false,
      metafile: true,
      platform: 'node',
      format: 'esm',
      logLevel: 'silent',
    });
    const inputs = Object.keys(r.metafile.inputs);
    expect(inputs.some((p) => p.includes('src/prefs/schema.ts'))).toBe(true);
    expect(inputs.filter((p) => /node_modules\/(conf|ajv|ajv-formats|semver)\//.test(p))).toEqual(
      [],
    );
  });
});
