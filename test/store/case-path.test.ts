import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { caseFilePath, slugifyId, uniqueId } from '../../src/store/index.js';
import { saveCase } from '../../src/store/index.js';
import { sampleCase, tempDir } from './helpers.js';

describe('caseFilePath', () => {
  const dir = tempDir('paths');

  it('maps a valid id to <dir>/<id>.json', () => {
    expect(caseFilePath(dir, 'harbor-road-0412')).toEqual({
      ok: true,
      path: path.join(dir, 'harbor-road-0412.json'),
    });
  });

  it.each([
    ['../x', 'parent folder'],
    ['a/b', 'sub-folder'],
    ['/etc/passwd', 'absolute path'],
    ['.', 'dot'],
    ['..', 'dot dot'],
    ['ok\u0000id', 'NUL'],
    ['Harbor', 'upper case'],
    ['a'.repeat(65), '65 characters'],
    ['', 'empty'],
    ['a\\b', 'backslash'],
    ['x.json', 'a dot'],
  ])('refuses %j (%s) with a message', (id) => {
    const r = caseFilePath(dir, id);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/case id/);
  });

  it('shows a NUL in the message instead of hiding it', () => {
    const r = caseFilePath(dir, 'a\u0000b');
    expect(!r.ok && r.message).toContain('a\\u0000b');
  });

  it('accepts exactly 64 characters', () => {
    expect(caseFilePath(dir, 'a'.repeat(64)).ok).toBe(true);
  });

  it('refuses a case file that is a symbolic link (here, to a file outside the folder)', async () => {
    const outside = path.join(tempDir('outside'), 'target.json');
    fs.writeFileSync(outside, 'precious');
    fs.symlinkSync(outside, path.join(dir, 'linked.json'));
    const r = caseFilePath(dir, 'linked');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/symbolic link/);
    // and a save through that id writes nothing outside
    const s = await saveCase(dir, sampleCase('linked'));
    expect(s.ok).toBe(false);
    expect(fs.readFileSync(outside, 'utf8')).toBe('precious');
  });

  it('saveCase refuses an escaping id and writes nothing anywhere', async () => {
    const root = tempDir('escape');
    const dir2 = path.join(root, 'sessions');
    const r = await saveCase(dir2, { ...sampleCase('x'), id: '../escaped' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.kind).toBe('path');
    expect(fs.readdirSync(root)).toEqual([]);
  });
});

describe('slugifyId', () => {
  it.each([
    ['Harbor Rd 04/12', 'harbor-rd-04-12'],
    ['  Élan Crossing #7 ', 'elan-crossing-7'],
    ['../../etc', 'etc'],
    ['', 'case'],
    ['///', 'case'],
    ['A--B', 'a-b'],
  ])('%j -> %j', (text, id) => {
    expect(slugifyId(text)).toBe(id);
  });

  it('stays within 64 characters and never ends on a dash', () => {
    const id = slugifyId(`${'x'.repeat(63)} y`);
    expect(id.length).toBeLessThanOrEqual(64);
    expect(id).toMatch(/^[a-z0-9-]{1,64}$/);
    expect(id.endsWith('-')).toBe(false);
  });
});

describe('uniqueId', () => {
  it('adds -2, -3 ... while the name is taken', async () => {
    const dir = tempDir('unique');
    expect(uniqueId(dir, 'Pine St')).toBe('pine-st');
    await saveCase(dir, sampleCase('pine-st'));
    expect(uniqueId(dir, 'Pine St')).toBe('pine-st-2');
    await saveCase(dir, sampleCase('pine-st-2'));
    expect(uniqueId(dir, 'pine-st')).toBe('pine-st-3');
  });

  it('keeps a long id within 64 characters when adding the number', () => {
    const dir = tempDir('unique-long');
    const base = 'q'.repeat(64);
    fs.writeFileSync(path.join(dir, `${base}.json`), '{}');
    const id = uniqueId(dir, base);
    expect(id).toBe(`${'q'.repeat(62)}-2`);
  });
});
