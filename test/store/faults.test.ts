// Faults between skidcase and the disk, put in through src/store/disk.ts: a disk that fills up
// half-way through a write, a write that reports success but keeps fewer bytes, a folder that
// refuses writes. Each test checks the files on disk afterwards.
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { loadCaseText } from '../../src/case/load.js';
import { openCase, releaseAllLocks, saveCase, saveCaseSync } from '../../src/store/index.js';
import { disk, realDisk } from '../../src/store/disk.js';
import { sampleCase, tempDir } from './helpers.js';

afterEach(async () => {
  Object.assign(disk, realDisk);
  await releaseAllLocks();
});

const errno = (code: string) => Object.assign(new Error(`${code}: injected`), { code });
const marksOf = (file: string) => {
  const r = loadCaseText(fs.readFileSync(file, 'utf8'));
  if (!r.ok) throw new Error(`${file} does not parse: ${r.issues[0]?.message}`);
  return (r.case.analyses[0] as { marks: unknown[] }).marks;
};
/** Only the case, its backup and its lock: no temp file left behind. */
const namesIn = (dir: string) => fs.readdirSync(dir).sort();

/** Two good saves, so that there is a case and a backup to lose. */
async function twoSaves(id: string) {
  const dir = tempDir('faults');
  const file = path.join(dir, `${id}.json`);
  for (const marks of [[40], [40, 41]]) {
    const r = await saveCase(dir, sampleCase(id, marks));
    if (!r.ok) throw new Error(r.message);
  }
  return { dir, file };
}

describe('a save that meets a full disk', () => {
  it('half-way through the write: says the disk is full, and the case and backup stay whole', async () => {
    const { dir, file } = await twoSaves('full-1');
    disk.writeSync = (fd, buf, off, len) => {
      if (len > 64) return realDisk.writeSync(fd, buf, off, 64);
      throw errno('ENOSPC');
    };
    const r = await saveCase(dir, sampleCase('full-1', [40, 41, 42]));
    expect(r).toMatchObject({ ok: false, kind: 'io', problem: 'full' });
    if (!r.ok) expect(r.message).toBe('not saved: the disk is full');
    expect(marksOf(file)).toEqual([40, 41]);
    expect(marksOf(`${file}.bak`)).toEqual([40]);
    expect(namesIn(dir)).toEqual(['full-1.json', 'full-1.json.bak', 'full-1.json.lock']);
  });

  it('a write that claims every byte but keeps fewer is caught by reading it back', async () => {
    const { dir, file } = await twoSaves('full-2');
    // The disk takes the call and drops the tail: the count says all, the file says otherwise.
    disk.writeSync = (fd, buf, off, len) => {
      realDisk.writeSync(fd, buf, off, Math.min(len, 16384 - off > 0 ? 100 : 0));
      return len;
    };
    const r = await saveCase(dir, sampleCase('full-2', [40, 41, 42]));
    expect(r).toMatchObject({ ok: false, kind: 'io', problem: 'short' });
    if (!r.ok) expect(r.message).toContain('did not keep the whole file');
    expect(marksOf(file)).toEqual([40, 41]);
    // Space again: the next save works, and its backup is the last good version, which parses.
    Object.assign(disk, realDisk);
    const ok = await saveCase(dir, sampleCase('full-2', [40, 41, 42]));
    expect(ok.ok).toBe(true);
    expect(marksOf(file)).toEqual([40, 41, 42]);
    expect(marksOf(`${file}.bak`)).toEqual([40, 41]);
    expect(namesIn(dir)).toEqual(['full-2.json', 'full-2.json.bak', 'full-2.json.lock']);
  });

  it('the quota is named as the quota', async () => {
    const { dir } = await twoSaves('full-3');
    disk.fsyncSync = () => {
      throw errno('EDQUOT');
    };
    const r = await saveCase(dir, sampleCase('full-3', [1]));
    if (r.ok) throw new Error('saved on a full quota');
    expect(r.message).toBe('not saved: the disk quota is used up');
  });
});

describe('a save to a folder that refuses writes', () => {
  for (const [code, words] of [
    ['EACCES', 'the folder cannot be written (permission denied)'],
    ['EROFS', 'the folder is on a read-only file system'],
  ] as const) {
    it(`${code}: a plain message without temp-file names; the file on disk is unchanged`, async () => {
      const { dir, file } = await twoSaves(`ro-${code.toLowerCase()}`);
      const before = fs.readFileSync(file, 'utf8');
      disk.openSync = () => {
        throw errno(code);
      };
      const r = await saveCase(dir, sampleCase(`ro-${code.toLowerCase()}`, [9]));
      if (r.ok) throw new Error('saved into a refusing folder');
      expect(r.message).toBe(`not saved: ${words}`);
      expect(r.message).not.toMatch(/\.new|\.tmp|\d{3,}-[0-9a-f]{8}/);
      expect(fs.readFileSync(file, 'utf8')).toBe(before);
    });
  }
});

describe('saveCaseSync (the interview’s save)', () => {
  it('is on disk when it returns, and is refused for a case not open here for writing', async () => {
    const { dir, file } = await twoSaves('sync-1');
    const r = saveCaseSync(dir, sampleCase('sync-1', [40, 41, 43]));
    expect(r.ok).toBe(true);
    expect(marksOf(file)).toEqual([40, 41, 43]);
    await releaseAllLocks();
    const other = saveCaseSync(dir, sampleCase('sync-1', [1]));
    expect(other).toMatchObject({ ok: false, kind: 'locked' });
    expect(marksOf(file)).toEqual([40, 41, 43]);
  });

  it('after an open, a garbage file put in its place is moved aside, and the save says where', async () => {
    const { dir, file } = await twoSaves('sync-2');
    await releaseAllLocks();
    const o = await openCase(dir, { id: 'sync-2' });
    if (!o.ok) throw new Error(o.message);
    fs.writeFileSync(file, 'not json at all');
    const r = saveCaseSync(dir, sampleCase('sync-2', [7]));
    if (!r.ok) throw new Error(r.message);
    expect(r.keptBroken).toMatch(/sync-2\.broken-\d{8}T\d{6}Z\.json$/);
    expect(fs.readFileSync(r.keptBroken!, 'utf8')).toBe('not json at all');
    expect(marksOf(file)).toEqual([7]);
    expect(marksOf(`${file}.bak`)).toEqual([40]); // the broken text never became the backup
  });
});
