import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { loadCaseText, type LoadResult } from '../../src/case/load.js';
import type { MigrationTable } from '../../src/case/migrate.js';
import { listCases, openCase, releaseAllLocks, saveCase } from '../../src/store/index.js';
import { readJson, tempDir } from './helpers.js';

afterEach(() => releaseAllLocks());

/**
 * A test-only "version 0" (invented for this test: one skid with its marks and one drag factor
 * at the top level) and its migration to version 1. The real loader runs it: loadCaseText with
 * this table in place of the (still empty) MIGRATIONS, injected through openCase's `load` option.
 * The store's part is what is tested: migrate in memory, write only on save, keep the original.
 */
function fromV0(o: Record<string, unknown>): Record<string, unknown> {
  const { skid, ...rest } = o as { skid: { marks: number[]; drag: number } };
  return {
    ...rest,
    version: 1,
    analyses: [
      {
        id: 'skid-1',
        kind: 'skid',
        marks: skid.marks,
        segments: [{ drag: { source: 'entered', value: skid.drag } }],
      },
    ],
  };
}
const WITH_V0: MigrationTable = { 0: fromV0 };
const loadWithV0 = (text: string): LoadResult => loadCaseText(text, WITH_V0);

const V0 = {
  format: 'skidcase-case',
  version: 0,
  id: 'old-format',
  units: 'metric',
  vehicle: { brakes: { mode: 'all' } },
  skid: { marks: [18.4, 17.9], drag: 0.66 },
};

function writeV0(): { dir: string; file: string; text: string } {
  const dir = tempDir('migrate');
  const file = path.join(dir, 'old-format.json');
  const text = JSON.stringify(V0, null, 2);
  fs.writeFileSync(file, text);
  return { dir, file, text };
}

describe('opening an older version', () => {
  it('migrates in memory and leaves the file as it was until the user goes on', async () => {
    const { dir, file, text } = writeV0();
    const r = await openCase(dir, { id: 'old-format', load: loadWithV0 });
    if (!r.ok) throw new Error(r.message);
    expect(r.migratedFrom).toBe(0);
    expect(r.case.version).toBe(1);
    expect(r.case.analyses[0]).toMatchObject({ kind: 'skid', marks: [18.4, 17.9] });
    expect(fs.readFileSync(file, 'utf8')).toBe(text);
    expect(fs.readdirSync(dir).sort()).toEqual(['old-format.json', 'old-format.json.lock']);
  });

  it('on the first save keeps the original as <id>.v0.json and writes version 1', async () => {
    const { dir, file, text } = writeV0();
    const r = await openCase(dir, { id: 'old-format', load: loadWithV0 });
    if (!r.ok) throw new Error(r.message);
    const s = await saveCase(dir, r.case);
    if (!s.ok) throw new Error(s.message);
    expect(s.keptOriginal).toBe(path.join(dir, 'old-format.v0.json'));
    expect(fs.readFileSync(s.keptOriginal!, 'utf8')).toBe(text);
    expect(readJson(file).version).toBe(1);
    expect(loadCaseText(fs.readFileSync(file, 'utf8')).ok).toBe(true);
    // later saves keep no further copies
    const again = await saveCase(dir, s.case);
    expect(again.ok && again.keptOriginal).toBeUndefined();
    expect(fs.readdirSync(dir).filter((n) => n.includes('.v0')).length).toBe(1);
    // and the kept original is not listed as a case of its own
    expect((await listCases(dir)).map((e) => path.basename(e.path))).toEqual(['old-format.json']);
  });

  it('never overwrites an original kept by an earlier migration', async () => {
    const { dir, text } = writeV0();
    fs.writeFileSync(path.join(dir, 'old-format.v0.json'), 'kept earlier');
    const r = await openCase(dir, { id: 'old-format', load: loadWithV0 });
    if (!r.ok) throw new Error(r.message);
    const s = await saveCase(dir, r.case);
    expect(s.ok && path.basename(s.keptOriginal!)).toBe('old-format.v0-2.json');
    expect(fs.readFileSync(path.join(dir, 'old-format.v0.json'), 'utf8')).toBe('kept earlier');
    expect(fs.readFileSync(path.join(dir, 'old-format.v0-2.json'), 'utf8')).toBe(text);
  });
});
