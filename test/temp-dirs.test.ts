import { existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import config from '../vitest.config.js';
import { removeTrackedTempDirs, trackedTempDir } from './temp-dirs.js';

describe('temporary folders of the tests', () => {
  it('a tracked folder, with what was written in it, is gone after the removal, and only once', () => {
    const dir = trackedTempDir('skidcase-tracked-');
    writeFileSync(join(dir, 'case.json'), '{}');
    expect(existsSync(dir)).toBe(true);
    expect(removeTrackedTempDirs()).toContain(dir);
    expect(existsSync(dir)).toBe(false);
    expect(removeTrackedTempDirs()).not.toContain(dir);
  });

  it('every test file ends with the removal: each project of the vitest config has the setup file', () => {
    const projects = (config.test?.projects ?? []) as {
      test?: { name?: string; setupFiles?: string[] };
    }[];
    expect(projects.length).toBeGreaterThan(0);
    for (const p of projects)
      expect(p.test?.setupFiles, p.test?.name).toContain('test/setup/temp-cleanup.ts');
  });
});
