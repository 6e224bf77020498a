import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { loadCaseText } from '../../src/case/load.js';
import { openCase, releaseAllLocks, restoreBackup, saveCase } from '../../src/store/index.js';
import { sampleCase, tempDir } from './helpers.js';

afterEach(() => releaseAllLocks());

/** A case saved twice (so a good backup exists), then its file replaced by `broken` text. */
async function brokenCase(id: string, broken: (goodText: string) => string) {
  const dir = tempDir('open');
  await saveCase(dir, sampleCase(id, [33.5]));
  await saveCase(dir, sampleCase(id, [33.5, 34.25]));
  await releaseAllLocks();
  const file = path.join(dir, `${id}.json`);
  const text = broken(fs.readFileSync(file, 'utf8'));
  fs.writeFileSync(file, text);
  return { dir, file, text };
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- edits a parsed JSON case at any depth
const edit = (f: (o: any) => void) => (good: string) => {
  const o = JSON.parse(good);
  f(o);
  return JSON.stringify(o, null, 2);
};

describe('openCase on a broken file', () => {
  it.each([
    ['truncated', (t: string) => t.slice(0, Math.floor(t.length / 2)), 'json', '(file)'],
    ['invalid JSON', () => '{ "format": "skidcase-case", "version": 1,, }', 'json', '(file)'],
    [
      'a wrong type',
      edit((o) => (o.analyses[0].marks[1] = 'long')),
      'invalid',
      'analyses[0].marks[1]',
    ],
    [
      'out of range by hand-edit',
      edit((o) => (o.analyses[0].segments[0].drag.value = 7)),
      'invalid',
      'analyses[0].segments[0].drag.value',
    ],
    ["another program's JSON", () => '{ "name": "something else" }', 'format', 'format'],
  ])(
    '%s: not overwritten, the message names the file and the field, the backup is offered',
    async (_what, breaker, kind, field) => {
      const id = `broken-${kind}-${Math.random().toString(36).slice(2, 8)}`;
      const { dir, file, text } = await brokenCase(id, breaker);
      const r = await openCase(dir, { id });
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.kind).toBe(kind);
      expect(r.message).toContain(file);
      expect(r.message).toContain(`${field}:`);
      expect(r.backup).toEqual({ path: `${file}.bak`, loadable: true });
      expect(r.message).toContain('a backup is available');
      // Untouched by opening, and untouched by a save of the same id (kept aside instead).
      expect(fs.readFileSync(file, 'utf8')).toBe(text);
      const s = await saveCase(dir, sampleCase(id));
      expect(s.ok && s.keptBroken && fs.readFileSync(s.keptBroken, 'utf8')).toBe(text);
    },
  );

  it('says so when the backup is broken too', async () => {
    const { dir, file } = await brokenCase('both-broken', () => '{');
    fs.writeFileSync(`${file}.bak`, '[');
    const r = await openCase(dir, { id: 'both-broken' });
    expect(!r.ok && r.backup).toEqual({ path: `${file}.bak`, loadable: false });
    expect(!r.ok && r.message).toContain('is broken too');
  });

  it('reports a missing case as missing, naming the file', async () => {
    const dir = tempDir('open');
    const r = await openCase(dir, { id: 'nothing-here' });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.kind).toBe('missing');
      expect(r.message).toContain(path.join(dir, 'nothing-here.json'));
    }
  });

  it('refuses an id that would escape the folder', async () => {
    const r = await openCase(tempDir('open'), { id: '../../etc/passwd' });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/case id/);
  });
});

describe('openCase racing another save', () => {
  it('returns the version saved between its read and its lock, not the older one', async () => {
    const dir = tempDir('open');
    const file = path.join(dir, 'raced.json');
    fs.writeFileSync(file, JSON.stringify(sampleCase('raced', [40]), null, 2));
    let calls = 0;
    // Runs after openCase read the file and before it takes the lock: the moment another
    // skidcase could still save and release. It saves a newer version the way that one would.
    const load = (text: string) => {
      if (calls++ === 0) {
        fs.writeFileSync(`${file}.new`, JSON.stringify(sampleCase('raced', [40, 41.5]), null, 2));
        fs.renameSync(`${file}.new`, file);
      }
      return loadCaseText(text);
    };
    const r = await openCase(dir, { id: 'raced', load });
    expect(r.ok && r.case.analyses[0]).toMatchObject({ marks: [40, 41.5] });
  });
});

describe('restoreBackup', () => {
  it('puts the backup back and keeps the broken file as <id>.broken-<time>.json', async () => {
    const { dir, file, text } = await brokenCase('restore-me', (t) => t.slice(0, 40));
    const r = await restoreBackup(dir, 'restore-me');
    if (!r.ok) throw new Error(r.message);
    expect(fs.readFileSync(r.keptBroken!, 'utf8')).toBe(text);
    expect(path.basename(r.keptBroken!)).toMatch(/^restore-me\.broken-\d{8}T\d{6}Z\.json$/);
    // the restored file is the earlier save (one mark) and the backup is still there
    const restored = loadCaseText(fs.readFileSync(file, 'utf8'));
    expect(restored.ok && restored.case.analyses[0]).toMatchObject({ marks: [33.5] });
    expect(fs.existsSync(`${file}.bak`)).toBe(true);
    const o = await openCase(dir, { id: 'restore-me' });
    expect(o.ok && !o.readOnly).toBe(true);
  });

  it('refuses when the backup does not load, touching nothing', async () => {
    const { dir, file, text } = await brokenCase('no-good-bak', () => 'x');
    fs.writeFileSync(`${file}.bak`, '{"format":"skidcase-case","version":1}');
    const r = await restoreBackup(dir, 'no-good-bak');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toContain('broken too');
    expect(fs.readFileSync(file, 'utf8')).toBe(text);
  });
});

describe('versions', () => {
  it('refuses a file from a newer version with a message, and leaves it alone', async () => {
    const dir = tempDir('open');
    const file = path.join(dir, 'from-future.json');
    const text = JSON.stringify({ ...sampleCase('from-future'), version: 2 }, null, 2);
    fs.writeFileSync(file, text);
    const r = await openCase(dir, { id: 'from-future' });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.kind).toBe('newer');
      expect(r.message).toMatch(
        /version: written by a newer skidcase \(file version 2; this one reads up to version 1\)/,
      );
      expect(r.message).toContain(file);
    }
    expect(fs.readFileSync(file, 'utf8')).toBe(text);
  });
});
