import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { resolveSessionsDir } from '../../src/store/index.js';

describe('resolveSessionsDir', () => {
  const cwd = path.resolve('/work/site');
  const all = { flag: '/f', env: { SKIDCASE_SESSIONS: '/e' }, prefs: { sessionsDir: '/p' }, cwd };

  it('takes the flag first', () => {
    expect(resolveSessionsDir(all)).toEqual({ dir: path.resolve('/f'), from: 'flag' });
  });
  it('then SKIDCASE_SESSIONS', () => {
    expect(resolveSessionsDir({ ...all, flag: undefined })).toEqual({
      dir: path.resolve('/e'),
      from: 'env',
    });
  });
  it('then the preference', () => {
    expect(resolveSessionsDir({ ...all, flag: undefined, env: {} })).toEqual({
      dir: path.resolve('/p'),
      from: 'preference',
    });
  });
  it('else <cwd>/sessions', () => {
    expect(resolveSessionsDir({ cwd })).toEqual({
      dir: path.join(cwd, 'sessions'),
      from: 'default',
    });
  });
  it('resolves relative settings from cwd and skips blank ones', () => {
    expect(
      resolveSessionsDir({ cwd, flag: '  ', env: { SKIDCASE_SESSIONS: 'field/cases' } }),
    ).toEqual({
      dir: path.join(cwd, 'field', 'cases'),
      from: 'env',
    });
  });
});
