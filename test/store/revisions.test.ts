import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { loadCaseText, type Case } from '../../src/case/load.js';
import {
  openCase,
  releaseAllLocks,
  restoreBackup,
  saveCase,
  saveCaseSync,
} from '../../src/store/index.js';
import { readJson, sampleCase, tempDir } from './helpers.js';

afterEach(() => releaseAllLocks());

type Trail = { at: string; by: string; note?: string; sha256?: string; changes: unknown[] }[];
const trailOf = (file: string) => readJson(file).revisions as Trail;

describe('the trail of revisions a save records', () => {
  it('a new case starts with one "created" entry; a second save lists each changed field, from and to', async () => {
    const dir = tempDir('rev');
    const file = path.join(dir, 'oak-1.json');
    expect((await saveCase(dir, sampleCase('oak-1', [61.3, 59.8]))).ok).toBe(true);
    const changed = sampleCase('oak-1', [62, 59.8]);
    changed.postedLimit = 45;
    (changed.vehicle as { label?: string }).label = 'Unit A, blue van';
    expect((await saveCase(dir, changed)).ok).toBe(true);

    const trail = trailOf(file);
    expect(trail).toHaveLength(2);
    expect(trail[0]).toMatchObject({ by: 'interview', note: 'created', changes: [] });
    expect(trail[1]!.by).toBe('interview');
    expect(trail[1]!.changes).toEqual([
      { field: 'vehicle.label', from: 'Unit A, grey van', to: 'Unit A, blue van' },
      { field: 'analyses[0].marks[0]', from: 61.3, to: 62 },
      { field: 'postedLimit', to: 45 },
    ]);
    // The time of the save, the same one `updated` records.
    expect(trail[1]!.at).toBe(readJson(file).updated);
    // Only the newest entry carries the fields' fingerprint.
    expect(trail[0]!.sha256).toBeUndefined();
    expect(trail[1]!.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(loadCaseText(fs.readFileSync(file, 'utf8')).ok).toBe(true);
  });

  it('a field removed is listed with its old value and no "to"; a list that grows lists the new items', async () => {
    const dir = tempDir('rev');
    await saveCase(dir, { ...sampleCase('oak-2', [50]), postedLimit: 30 });
    await saveCase(dir, sampleCase('oak-2', [50, 51.5]));
    expect(trailOf(path.join(dir, 'oak-2.json'))[1]!.changes).toEqual([
      { field: 'analyses[0].marks[1]', to: 51.5 },
      { field: 'postedLimit', from: 30 },
    ]);
  });

  it('a save that changes nothing but updated and the interview records nothing', async () => {
    const dir = tempDir('rev');
    const file = path.join(dir, 'oak-3.json');
    await saveCase(dir, sampleCase('oak-3'));
    const first = fs.readFileSync(file, 'utf8');
    await saveCase(dir, { ...sampleCase('oak-3'), interview: { cursor: 'review' } } as Case);
    await saveCase(dir, { ...sampleCase('oak-3'), interview: { cursor: 'limit' } } as Case);
    expect(trailOf(file)).toEqual(JSON.parse(first).revisions);
    expect(trailOf(file)).toHaveLength(1);
  });

  it('the trail is the file’s: a stale or made-up trail in the case being saved is not written', async () => {
    const dir = tempDir('rev');
    const file = path.join(dir, 'oak-4.json');
    await saveCase(dir, sampleCase('oak-4', [40]));
    const forged = {
      ...sampleCase('oak-4', [41]),
      revisions: [{ at: '2020-01-01T00:00:00Z', by: 'interview', changes: [] }],
    } as Case;
    await saveCase(dir, forged);
    const trail = trailOf(file);
    expect(trail.map((r) => r.at)).not.toContain('2020-01-01T00:00:00Z');
    expect(trail[1]!.changes).toEqual([{ field: 'analyses[0].marks[0]', from: 40, to: 41 }]);
  });

  it('keeps the newest 500 entries and counts the ones dropped', async () => {
    const dir = tempDir('rev');
    const file = path.join(dir, 'oak-5.json');
    const old = Array.from({ length: 500 }, (_, i) => ({
      at: `2026-01-01T00:00:${String(i % 60).padStart(2, '0')}Z`,
      by: 'interview',
      changes: [{ field: 'postedLimit', from: i, to: i + 1 }],
    }));
    fs.writeFileSync(
      file,
      JSON.stringify({ ...sampleCase('oak-5', [40]), revisions: old, revisionsDropped: 7 }),
    );
    const opened = await openCase(file);
    if (!opened.ok) throw new Error(opened.message);
    expect(saveCaseSync(dir, sampleCase('oak-5', [44]), { file }).ok).toBe(true);
    const c = readJson(file);
    const trail = c.revisions as Trail;
    expect(trail).toHaveLength(500);
    expect(c.revisionsDropped).toBe(8);
    expect(trail[0]!.changes).toEqual([{ field: 'postedLimit', from: 1, to: 2 }]);
    expect(trail.at(-1)!.changes).toEqual([{ field: 'analyses[0].marks[0]', from: 40, to: 44 }]);
  });
});

describe('a backup put back', () => {
  it('ends the trail with an entry saying so, and the next save finds no hand edit', async () => {
    const dir = tempDir('rev');
    const file = path.join(dir, 'oak-9.json');
    expect((await saveCase(dir, sampleCase('oak-9', [40]))).ok).toBe(true);
    expect((await saveCase(dir, sampleCase('oak-9', [41]))).ok).toBe(true);
    releaseAllLocks();
    // the file cut short (a disk fault); its backup holds the first save
    fs.writeFileSync(file, fs.readFileSync(file, 'utf8').slice(0, 40));
    const r = await restoreBackup(dir, 'oak-9');
    if (!r.ok) throw new Error(r.message);
    const trail = trailOf(file);
    expect(trail.map((t) => t.note)).toEqual([
      'created',
      `restored from the backup copy oak-9.json.bak; the file it replaced was kept as ${path.basename(r.keptBroken!)}`,
    ]);
    expect((readJson(file) as { analyses: { marks: unknown }[] }).analyses[0]!.marks).toEqual([40]);
    // opened and saved with a change: one interview entry, no hand edit
    releaseAllLocks();
    const opened = await openCase(file);
    if (!opened.ok) throw new Error(opened.message);
    expect(saveCaseSync(dir, sampleCase('oak-9', [42]), { file }).ok).toBe(true);
    const after = trailOf(file);
    expect(after.map((t) => t.by)).toEqual(['interview', 'interview', 'interview']);
    expect(after.at(-1)!.changes).toEqual([{ field: 'analyses[0].marks[0]', from: 40, to: 42 }]);
  });
});

describe('hand edits', () => {
  /** Saves a case, then edits its file on disk as a person with a text editor would. */
  async function savedThenEdited(id: string, edit: (c: Record<string, unknown>) => void) {
    const dir = tempDir('rev');
    const file = path.join(dir, `${id}.json`);
    const written = await saveCase(dir, sampleCase(id, [61.3, 59.8]));
    if (!written.ok) throw new Error(written.message);
    await releaseAllLocks();
    const json = readJson(file);
    edit(json);
    fs.writeFileSync(file, JSON.stringify(json, null, 2));
    return { dir, file, written: written.case };
  }

  it('opened and saved again: a "hand edit" entry lists the edited field from what skidcase wrote', async () => {
    const { dir, file, written } = await savedThenEdited('elm-h1', (c) => {
      (c.vehicle as Record<string, unknown>).label = 'Unit B, red car';
    });
    const opened = await openCase(file);
    if (!opened.ok) throw new Error(opened.message);
    const next = { ...opened.case, postedLimit: 40 };
    expect(saveCaseSync(dir, next, { file, lastWritten: () => written }).ok).toBe(true);
    const trail = trailOf(file);
    expect(trail.map((r) => r.by)).toEqual(['interview', 'hand edit', 'interview']);
    expect(trail[1]!.changes).toEqual([
      { field: 'vehicle.label', from: 'Unit A, grey van', to: 'Unit B, red car' },
    ]);
    expect(trail[2]!.changes).toEqual([{ field: 'postedLimit', to: 40 }]);
  });

  it('without a record of what skidcase wrote, the hand edit is noted with its changes unknown', async () => {
    const { dir, file } = await savedThenEdited('elm-h2', (c) => {
      c.postedLimit = 55;
    });
    const opened = await openCase(file);
    if (!opened.ok) throw new Error(opened.message);
    // A rebuilt case that is not what was written (its fields do not have the trail's SHA-256).
    const wrong = { ...opened.case, postedLimit: 10 };
    expect(saveCaseSync(dir, opened.case, { file, lastWritten: () => wrong }).ok).toBe(true);
    const trail = trailOf(file);
    expect(trail).toHaveLength(2);
    expect(trail[1]).toMatchObject({ by: 'hand edit', changes: [] });
    expect(trail[1]!.note).toContain('unknown');
  });

  it('a hand edit that only moved the interview or the time is not a change', async () => {
    const { dir, file } = await savedThenEdited('elm-h3', (c) => {
      c.updated = '2030-01-01T00:00:00Z';
      c.interview = { cursor: 'somewhere' };
    });
    const opened = await openCase(file);
    if (!opened.ok) throw new Error(opened.message);
    expect(saveCaseSync(dir, opened.case, { file }).ok).toBe(true);
    expect(trailOf(file).map((r) => r.by)).toEqual(['interview']);
  });

  it('a file changed while open and written over at the user’s choice: the hand edit is from what this process wrote', async () => {
    const dir = tempDir('rev');
    const file = path.join(dir, 'elm-h4.json');
    await saveCase(dir, sampleCase('elm-h4', [30]));
    const json = readJson(file);
    json.postedLimit = 25;
    fs.writeFileSync(file, JSON.stringify(json, null, 2));
    const refused = await saveCase(dir, sampleCase('elm-h4', [31]));
    expect(refused.ok).toBe(false);
    expect(fs.readFileSync(file, 'utf8')).toContain('"postedLimit": 25');
    expect((await saveCase(dir, sampleCase('elm-h4', [31]), { overwriteChanged: true })).ok).toBe(
      true,
    );
    const trail = trailOf(file);
    expect(trail.map((r) => [r.by, r.changes])).toEqual([
      ['interview', []],
      ['hand edit', [{ field: 'postedLimit', to: 25 }]],
      [
        'interview',
        // In the order of the fields in the file before the save.
        [
          { field: 'postedLimit', from: 25 },
          { field: 'analyses[0].marks[0]', from: 30, to: 31 },
        ],
      ],
    ]);
  });
});

describe('a malformed trail in a file', () => {
  const withTrail = (revisions: unknown) => JSON.stringify({ ...sampleCase('bad-1'), revisions });

  it.each([
    [[{ at: 'yesterday', by: 'interview', changes: [] }], 'revisions[0].at', 'ISO 8601'],
    [[{ at: '2026-12-01T10:00:00Z', by: 'robot', changes: [] }], 'revisions[0].by', 'hand edit'],
    [[{ at: '2026-12-01T10:00:00Z', by: 'interview' }], 'revisions[0].changes', 'list'],
    [
      [{ at: '2026-12-01T10:00:00Z', by: 'interview', changes: [{ from: 1 }] }],
      'revisions[0].changes[0].field',
      'text',
    ],
    ['all of it', 'revisions', 'list'],
  ])('%j is refused naming %s', (revisions, field, words) => {
    const r = loadCaseText(withTrail(revisions));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues[0]!.path).toBe(field);
    expect(r.issues[0]!.message).toContain(words);
  });

  it('a good trail is read, and its unknown keys are kept and reported', () => {
    const r = loadCaseText(
      withTrail([{ at: '2026-12-01T10:00:00Z', by: 'hand edit', changes: [], who: 'me' }]),
    );
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.unknownFields).toEqual(['revisions[0].who']);
  });
});
