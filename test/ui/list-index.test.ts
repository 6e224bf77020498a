import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { trackedTempDir } from '../temp-dirs.js';
import { liveInterview } from '../../src/ui/interview-live.js';
import { liveServices } from '../../src/ui/services-live.js';
import type { CaseRow } from '../../src/ui/services.js';

// The case list keeps each row in an index (user cache folder) and reuses it while the file's
// size, modification time and inode are unchanged, for the same build. Whatever the index holds,
// the list must show what the files say: a stale, foreign or damaged index only costs time.
const DEMOS = ['demo-kestrel-bend.json', 'demo-orchard-hill.json'];

function setUp(key = 'build-a') {
  const dir = trackedTempDir('skidcase-list-index-');
  const cache = trackedTempDir('skidcase-cache-');
  for (const n of DEMOS) fs.copyFileSync(path.join('sessions', n), path.join(dir, n));
  const file = path.join(cache, 'list.json');
  const services = (k = key) =>
    liveServices({
      sessionsDir: dir,
      sessionsFrom: 'flag',
      port: liveInterview,
      prefs: { cwd: cache },
      listIndex: { file, key: k },
    });
  const uncached = () =>
    liveServices({
      sessionsDir: dir,
      sessionsFrom: 'flag',
      port: liveInterview,
      prefs: { cwd: cache },
    });
  return { dir, file, services, uncached };
}

/** Lists, then waits for the index write that follows the list. */
async function list(s: ReturnType<typeof liveServices>): Promise<CaseRow[]> {
  const rows = await s.listCases();
  await new Promise((r) => setImmediate(r));
  return rows;
}

function tamperReference(file: string, to: string) {
  const j = JSON.parse(fs.readFileSync(file, 'utf8'));
  for (const v of Object.values(j.files) as { value: { reference?: string } }[])
    v.value.reference = to;
  fs.writeFileSync(file, JSON.stringify(j));
}

describe('the case list index', () => {
  it('lists the same rows as without an index, on the first and the second list', async () => {
    const t = setUp();
    const plain = await list(t.uncached());
    expect(plain.map((r) => r.id).sort()).toEqual(['demo-kestrel-bend', 'demo-orchard-hill']);
    expect(plain.every((r) => r.reference && r.progress)).toBe(true);
    expect(await list(t.services())).toEqual(plain);
    expect(fs.existsSync(t.file)).toBe(true);
    expect(await list(t.services())).toEqual(plain);
  });

  it('uses a kept row only while the file is unchanged: an edit of the same size is read again', async () => {
    const t = setUp();
    await list(t.services());
    // A kept row is used (a changed index shows through while the file stays as it was) ...
    tamperReference(t.file, 'KEPT');
    expect((await list(t.services())).map((r) => r.reference)).toEqual(['KEPT', 'KEPT']);
    // ... until the file changes, even to the same size.
    const f = path.join(t.dir, 'demo-orchard-hill.json');
    const text = fs.readFileSync(f, 'utf8');
    const ref: string = JSON.parse(text).details.reference;
    const edited = ref.slice(0, -1) + (ref.endsWith('X') ? 'Y' : 'X');
    const before = fs.statSync(f);
    fs.writeFileSync(f, text.replace(JSON.stringify(ref), JSON.stringify(edited)));
    expect(fs.statSync(f).size).toBe(before.size);
    fs.utimesSync(f, before.atime, new Date(before.mtimeMs + 2000));
    const rows = await list(t.services());
    expect(rows.find((r) => r.id === 'demo-orchard-hill')?.reference).toBe(edited);
    expect(rows.find((r) => r.id === 'demo-kestrel-bend')?.reference).toBe('KEPT');
  });

  it('ignores an index written by another build', async () => {
    const t = setUp('build-a');
    const plain = await list(t.uncached());
    await list(t.services('build-a'));
    tamperReference(t.file, 'OTHER BUILD');
    expect(await list(t.services('build-b'))).toEqual(plain);
  });

  it.each([
    ['not JSON', '{"format": "skidcase-list-index", "key": '],
    ['empty', ''],
    ['another shape', '[1, 2, 3]'],
  ])('an index that is %s gives the right rows and is rewritten', async (_name, text) => {
    const t = setUp();
    const plain = await list(t.uncached());
    fs.writeFileSync(t.file, text);
    expect(await list(t.services())).toEqual(plain);
    expect(JSON.parse(fs.readFileSync(t.file, 'utf8')).format).toBe('skidcase-list-index');
  });

  it('a kept row of the wrong shape is read again from the file', async () => {
    const t = setUp();
    const plain = await list(t.uncached());
    await list(t.services());
    const j = JSON.parse(fs.readFileSync(t.file, 'utf8'));
    for (const v of Object.values(j.files) as { value: unknown }[]) v.value = { id: 42 };
    fs.writeFileSync(t.file, JSON.stringify(j));
    expect(await list(t.services())).toEqual(plain);
  });

  it('a removed case leaves the list, and a broken file is shown as broken, not as kept', async () => {
    const t = setUp();
    await list(t.services());
    fs.rmSync(path.join(t.dir, 'demo-kestrel-bend.json'));
    fs.writeFileSync(path.join(t.dir, 'demo-orchard-hill.json'), '{"format": "skidcase-case", ');
    const rows = await list(t.services());
    expect(rows).toHaveLength(1);
    expect(rows[0]?.problem?.message).toBeTruthy();
    expect(rows[0]?.reference).toBeUndefined();
  });

  it('a cache folder that cannot be written only means no index', async () => {
    const t = setUp();
    const plain = await list(t.uncached());
    const blocked = path.join(trackedTempDir('skidcase-cache-'), 'a-file');
    fs.writeFileSync(blocked, 'not a folder');
    const s = liveServices({
      sessionsDir: t.dir,
      sessionsFrom: 'flag',
      port: liveInterview,
      listIndex: { file: path.join(blocked, 'list.json'), key: 'k' },
    });
    expect(await list(s)).toEqual(plain);
  });
});
