import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { listCases, releaseAllLocks, saveCase } from '../../src/store/index.js';
import { sampleCase, tempDir } from './helpers.js';
import { buildStoreBundle } from './bundle.js';
import { NOBODY, assertPassableForNobody, runsAsRoot } from '../as-nobody.js';

afterEach(() => releaseAllLocks());

/** listCases(dir) in a child process run as the user nobody, the folder opened for reading. */
async function listAsNobody(
  dir: string,
): Promise<{ id: string; problem?: string; case?: unknown }[]> {
  const bundle = await buildStoreBundle('list');
  try {
    fs.chmodSync(dir, 0o755);
    assertPassableForNobody(dir);
    assertPassableForNobody(bundle);
    const script =
      'const m = await import(process.argv[1]); process.stdout.write(JSON.stringify(await m.listCases(process.argv[2])));';
    const out = execFileSync(process.execPath, ['--input-type=module', '-e', script, bundle, dir], {
      ...NOBODY,
      encoding: 'utf8',
    });
    return JSON.parse(out);
  } finally {
    fs.rmSync(bundle, { force: true });
  }
}

const write = (dir: string, name: string, content: unknown) =>
  fs.writeFileSync(
    path.join(dir, name),
    typeof content === 'string' ? content : JSON.stringify(content, null, 2),
  );

describe('listCases', () => {
  it('is empty for a folder that does not exist yet, and does not create it', async () => {
    const dir = path.join(tempDir('list'), 'not-yet');
    expect(await listCases(dir)).toEqual([]);
    expect(fs.existsSync(dir)).toBe(false);
  });

  it('lists every case newest first, with broken and foreign files as entries with a problem', async () => {
    const dir = tempDir('list');
    write(dir, 'older.json', { ...sampleCase('older'), updated: '2026-11-02T10:00:00Z' });
    write(dir, 'newer.json', { ...sampleCase('newer'), updated: '2026-11-20T09:30:00Z' });
    write(dir, 'middle.json', { ...sampleCase('middle'), updated: '2026-11-10T12:00:00+01:00' });
    write(dir, 'cut-short.json', '{"format": "skidcase-case", "version": 1, "id": "cut');
    write(dir, 'bad-mark.json', {
      ...sampleCase('bad-mark', [20, 0]),
      updated: '2026-11-01T00:00:00Z',
    });
    write(dir, 'package.json', { name: 'not-a-case' });
    write(dir, 'newer.json.bak', sampleCase('newer'));
    write(dir, 'newer.v0.json', { version: 0 });
    write(dir, 'newer.broken-20261120T093000Z.json', '{');
    write(dir, 'notes.txt', 'not json at all');
    fs.mkdirSync(path.join(dir, 'folder.json'));
    const unreadable = path.join(dir, 'locked-away.json');
    write(dir, 'locked-away.json', sampleCase('locked-away'));
    fs.chmodSync(unreadable, 0o000);

    const list = await listCases(dir);
    const byId = Object.fromEntries(list.map((e) => [e.id, e]));
    const valid = list.filter((e) => e.case).map((e) => e.id);
    // valid ones in order of their updated time (middle is 11:00Z)
    expect(valid.filter((id) => ['older', 'newer', 'middle'].includes(id))).toEqual([
      'newer',
      'middle',
      'older',
    ]);
    expect(byId.middle!.updated).toBe('2026-11-10T11:00:00.000Z');
    expect(byId['cut-short']!.problem).toMatch(/^\(file\): not valid JSON/);
    expect(byId['bad-mark']!.problem).toMatch(
      /^analyses\[0\]\.marks\[1\]: length must be greater than 0/,
    );
    expect(byId['bad-mark']!.case).toBeUndefined();
    expect(byId.package!.problem).toMatch(/^format: /);
    expect(byId.folder!.problem).toBe('not a file');
    // Root reads the file anyway: there the folder is listed by a child run as nobody.
    const unreadableEntry = runsAsRoot()
      ? (await listAsNobody(dir)).find((e) => e.id === 'locked-away')
      : byId['locked-away'];
    expect(unreadableEntry?.problem).toMatch(/cannot be read \(EACCES\)/);
    expect(unreadableEntry?.case).toBeUndefined();
    // side files are not cases of their own
    expect(list.map((e) => path.basename(e.path)).sort()).toEqual(
      [
        'bad-mark.json',
        'cut-short.json',
        'folder.json',
        'locked-away.json',
        'middle.json',
        'newer.json',
        'older.json',
        'package.json',
      ].sort(),
    );
    fs.chmodSync(unreadable, 0o644);
  });

  it('uses the file time when a case has no updated field, and flags an id that differs from the file name', async () => {
    const dir = tempDir('list');
    write(dir, 'renamed.json', sampleCase('original-name'));
    const t = new Date('2026-10-05T08:15:00Z');
    fs.utimesSync(path.join(dir, 'renamed.json'), t, t);
    const [e] = await listCases(dir);
    expect(e!.updated).toBe('2026-10-05T08:15:00.000Z');
    expect(e!.id).toBe('original-name');
    expect(e!.warning).toContain('renamed.json');
  });

  it('shows a saved case right after saving', async () => {
    const dir = tempDir('list');
    await saveCase(dir, sampleCase('just-saved'));
    const list = await listCases(dir);
    expect(list.map((e) => e.id)).toEqual(['just-saved']);
    expect(list[0]!.case?.details?.reference).toBe('Test just-saved');
  });
});
