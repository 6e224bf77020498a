import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { trackedTempDir } from '../temp-dirs.js';
import { CONFIG_DIR_ENV, DEFAULT_PREFS, loadPrefs, savePref } from '../../src/prefs/index.js';

/** conf is always pointed at a fresh temp folder: the real user config is never touched. */
const tempConf = () => trackedTempDir('skidcase-prefs-');
const file = (cwd: string) => path.join(cwd, 'config.json');

describe('loadPrefs', () => {
  it('gives the defaults on a fresh install: imperial, 1.5 s, hints on, guided', () => {
    const cwd = tempConf();
    const r = loadPrefs({ cwd });
    expect(r.prefs).toEqual({ units: 'imperial', reactionTime: 1.5, hints: true, mode: 'guided' });
    expect(r.warnings).toEqual([]);
    expect(r.file).toBe(file(cwd));
  });

  it('reads back what savePref stored', () => {
    const cwd = tempConf();
    expect(savePref('units', 'metric', { cwd }).ok).toBe(true);
    expect(savePref('reactionTime', 2.5, { cwd }).ok).toBe(true);
    expect(savePref('sessionsDir', '/data/cases', { cwd }).ok).toBe(true);
    expect(savePref('hints', false, { cwd }).ok).toBe(true);
    expect(savePref('mode', 'brisk', { cwd }).ok).toBe(true);
    expect(loadPrefs({ cwd }).prefs).toEqual({
      units: 'metric',
      reactionTime: 2.5,
      sessionsDir: '/data/cases',
      hints: false,
      mode: 'brisk',
    });
    expect(savePref('sessionsDir', undefined, { cwd }).ok).toBe(true);
    expect(loadPrefs({ cwd }).prefs.sessionsDir).toBeUndefined();
  });

  it('a file that is not JSON gives the defaults and a warning naming it, never a throw', () => {
    const cwd = tempConf();
    fs.writeFileSync(file(cwd), '{"units": "metric", "reactionTime": ');
    const r = loadPrefs({ cwd });
    expect(r.prefs).toEqual(DEFAULT_PREFS);
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0]).toContain(file(cwd));
    expect(r.warnings[0]).toMatch(/not valid JSON/);
    // loading never rewrites it
    expect(fs.readFileSync(file(cwd), 'utf8')).toBe('{"units": "metric", "reactionTime": ');
  });

  it('a bad value resets only that preference, with a warning naming it', () => {
    const cwd = tempConf();
    fs.writeFileSync(
      file(cwd),
      JSON.stringify({ units: 'metric', reactionTime: 12, hints: 'yes', mode: 'turbo' }),
    );
    const r = loadPrefs({ cwd });
    expect(r.prefs).toEqual({ units: 'metric', reactionTime: 1.5, hints: true, mode: 'guided' });
    expect(r.warnings.map((w) => w.split(': ')[1])).toEqual(['reactionTime', 'hints', 'mode']);
    expect(r.warnings[0]).toContain('at most 5');
  });

  it('a JSON value that is not an object gives the defaults', () => {
    const cwd = tempConf();
    fs.writeFileSync(file(cwd), '[1, 2]');
    expect(loadPrefs({ cwd }).prefs).toEqual(DEFAULT_PREFS);
  });

  it('SKIDCASE_CONFIG_DIR chooses the folder when no cwd is given', () => {
    const dir = tempConf();
    expect(savePref('units', 'metric', { env: { [CONFIG_DIR_ENV]: dir } }).ok).toBe(true);
    expect(fs.existsSync(file(dir))).toBe(true);
    expect(loadPrefs({ env: { [CONFIG_DIR_ENV]: dir } }).prefs.units).toBe('metric');
  });
});

describe('savePref', () => {
  it.each([
    ['reactionTime', 0.4, 'at least 0.5'],
    ['reactionTime', 5.5, 'at most 5'],
    ['units', 'furlongs', 'imperial or metric'],
    ['sessionsDir', '', 'must not be empty'],
    ['mode', 'fast', 'guided or brisk'],
  ] as const)('refuses %s = %j and stores nothing', (key, value, msg) => {
    const cwd = tempConf();
    const r = savePref(key, value as never, { cwd });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toContain(msg);
    expect(fs.existsSync(file(cwd))).toBe(false);
  });

  it('accepts the ends of the reaction time range, 0.5 s and 5 s', () => {
    const cwd = tempConf();
    expect(savePref('reactionTime', 0.5, { cwd }).ok).toBe(true);
    expect(savePref('reactionTime', 5, { cwd }).ok).toBe(true);
    expect(loadPrefs({ cwd }).prefs.reactionTime).toBe(5);
  });

  it('keeps a broken file as config.json.broken before writing a new one', () => {
    const cwd = tempConf();
    fs.writeFileSync(file(cwd), 'units = metric');
    const r = savePref('hints', false, { cwd });
    expect(r.ok && r.warning).toContain('config.json.broken');
    expect(fs.readFileSync(`${file(cwd)}.broken`, 'utf8')).toBe('units = metric');
    expect(loadPrefs({ cwd }).prefs.hints).toBe(false);
  });
});
