import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { loadCaseText, type Case } from '../../src/case/load.js';
import { openCase, releaseAllLocks, saveCase } from '../../src/store/index.js';
import { manySegmentCase, readJson, sampleCase, tempDir } from './helpers.js';

afterEach(() => releaseAllLocks());

describe('saveCase', () => {
  it('writes <id>.json, pretty-printed with 2 spaces, and creates the folder on first save', async () => {
    const dir = path.join(tempDir('save'), 'sessions');
    const r = await saveCase(dir, sampleCase('elm-1'));
    expect(r.ok).toBe(true);
    const text = fs.readFileSync(path.join(dir, 'elm-1.json'), 'utf8');
    expect(text).toContain('\n  "format": "skidcase-case",\n');
    expect(text.endsWith('}\n')).toBe(true);
    expect(loadCaseText(text).ok).toBe(true);
  });

  it('sets updated to the save time and keeps created across saves', async () => {
    const dir = tempDir('save');
    const before = Date.now();
    const first = await saveCase(dir, sampleCase('elm-2'));
    if (!first.ok) throw new Error(first.message);
    const created = first.case.created!;
    expect(Date.parse(first.case.updated!)).toBeGreaterThanOrEqual(before - 1);
    // A caller that passes the case without timestamps again must not reset created.
    await new Promise((r) => setTimeout(r, 5));
    const second = await saveCase(dir, sampleCase('elm-2'));
    if (!second.ok) throw new Error(second.message);
    expect(second.case.created).toBe(created);
    expect(readJson(path.join(dir, 'elm-2.json')).created).toBe(created);
    expect(Date.parse(second.case.updated!)).toBeGreaterThan(Date.parse(created));
  });

  it('does not change the case it is given', async () => {
    const dir = tempDir('save');
    const c = sampleCase('elm-3');
    const copy = structuredClone(c);
    await saveCase(dir, c);
    expect(c).toEqual(copy);
  });

  it('never writes an invalid case; the message names the field', async () => {
    const dir = tempDir('save');
    await saveCase(dir, sampleCase('elm-4', [50.1]));
    const good = fs.readFileSync(path.join(dir, 'elm-4.json'), 'utf8');
    const bad = sampleCase('elm-4', [50.1, -3]);
    const r = await saveCase(dir, bad);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.kind).toBe('invalid');
      expect(r.message).toContain('analyses[0].marks[1]');
    }
    expect(fs.readFileSync(path.join(dir, 'elm-4.json'), 'utf8')).toBe(good);
  });

  it('keeps the previous good version as <id>.json.bak', async () => {
    const dir = tempDir('save');
    await saveCase(dir, sampleCase('elm-5', [10.5]));
    expect(fs.existsSync(path.join(dir, 'elm-5.json.bak'))).toBe(false);
    await saveCase(dir, sampleCase('elm-5', [10.5, 11.25]));
    await saveCase(dir, sampleCase('elm-5', [10.5, 11.25, 12]));
    const marks = (f: string) =>
      (readJson(path.join(dir, f)).analyses as { marks: number[] }[])[0]!.marks;
    expect(marks('elm-5.json')).toEqual([10.5, 11.25, 12]);
    expect(marks('elm-5.json.bak')).toEqual([10.5, 11.25]);
  });

  it('keeps unknown fields, at every level, exactly', async () => {
    const dir = tempDir('save');
    const c = sampleCase('elm-6') as Case & Record<string, unknown>;
    c.agencyFileNo = 'invented-77';
    (c.vehicle as Record<string, unknown>).colourCode = { paint: 'grey' };
    (c.analyses[0] as { segments: Record<string, unknown>[] }).segments[0]!.surveyPoint = 'P14';
    await saveCase(dir, c);
    const saved = readJson(path.join(dir, 'elm-6.json'));
    expect(saved.agencyFileNo).toBe('invented-77');
    expect((saved.vehicle as Record<string, unknown>).colourCode).toEqual({ paint: 'grey' });
    expect(
      (saved.analyses as { segments: Record<string, unknown>[] }[])[0]!.segments[0]!.surveyPoint,
    ).toBe('P14');
    // and they survive an open + save round trip
    const o = await openCase(dir, { id: 'elm-6' });
    if (!o.ok) throw new Error(o.message);
    expect(o.unknownFields).toEqual([
      'agencyFileNo',
      'vehicle.colourCode',
      'analyses[0].segments[0].surveyPoint',
    ]);
    await saveCase(dir, o.case);
    expect(readJson(path.join(dir, 'elm-6.json')).agencyFileNo).toBe('invented-77');
  });

  it('refuses to write over a file it never opened: another case, or a broken file', async () => {
    const dir = tempDir('save');
    const other = JSON.stringify(sampleCase('elm-7', [99]), null, 2);
    fs.writeFileSync(path.join(dir, 'elm-7.json'), other);
    fs.writeFileSync(path.join(dir, 'elm-7b.json'), '{"format": "skidcase-case", "vers');
    for (const id of ['elm-7', 'elm-7b']) {
      const r = await saveCase(dir, sampleCase(id));
      expect(r.ok).toBe(false);
      expect(!r.ok && r.kind).toBe('exists');
      expect(!r.ok && r.message).toContain(path.join(dir, `${id}.json`));
    }
    expect(fs.readFileSync(path.join(dir, 'elm-7.json'), 'utf8')).toBe(other);
    expect(fs.readFileSync(path.join(dir, 'elm-7b.json'), 'utf8')).toBe(
      '{"format": "skidcase-case", "vers',
    );
  });

  it('moves a file broken by hand while open aside instead of overwriting it', async () => {
    const dir = tempDir('save');
    const file = path.join(dir, 'elm-7c.json');
    await saveCase(dir, sampleCase('elm-7c', [12]));
    fs.writeFileSync(file, '{"format": "skidcase-case", "vers');
    const r = await saveCase(dir, sampleCase('elm-7c', [12, 13]));
    if (!r.ok) throw new Error(r.message);
    expect(r.keptBroken).toMatch(/elm-7c\.broken-\d{8}T\d{6}Z\.json$/);
    expect(fs.readFileSync(r.keptBroken!, 'utf8')).toBe('{"format": "skidcase-case", "vers');
    expect(loadCaseText(fs.readFileSync(file, 'utf8')).ok).toBe(true);
    // the broken text is not taken as the backup: no backup was made by this save
    expect(r.backup).toBeUndefined();
  });

  it('does not write over a file changed by hand behind its back: refuses, naming it, and keeps theirs on disk', async () => {
    const dir = tempDir('save');
    const file = path.join(dir, 'elm-8.json');
    await saveCase(dir, sampleCase('elm-8', [20]));
    const edited = { ...readJson(file), details: { reference: 'edited by hand' } };
    fs.writeFileSync(file, JSON.stringify(edited));
    const r = await saveCase(dir, sampleCase('elm-8', [20, 21]));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.kind).toBe('changed');
    expect(r.message).toBe(
      'not saved: elm-8.json was changed outside skidcase since it was last saved here',
    );
    expect(r.theirs?.details?.reference).toBe('edited by hand');
    expect((readJson(file).details as { reference: string }).reference).toBe('edited by hand');
  });

  it('keep mine over an outside change: theirs is kept beside the case and as the backup', async () => {
    const dir = tempDir('save');
    const file = path.join(dir, 'elm-8b.json');
    await saveCase(dir, sampleCase('elm-8b', [20]));
    const edited = { ...readJson(file), details: { reference: 'edited by hand' } };
    fs.writeFileSync(file, JSON.stringify(edited));
    const r = await saveCase(dir, sampleCase('elm-8b', [20, 21]), { overwriteChanged: true });
    if (!r.ok) throw new Error(r.message);
    expect(r.keptOutside).toMatch(/elm-8b\.outside-\d{8}T\d{6}Z\.json$/);
    expect((readJson(r.keptOutside!).details as { reference: string }).reference).toBe(
      'edited by hand',
    );
    expect((readJson(`${file}.bak`).details as { reference: string }).reference).toBe(
      'edited by hand',
    );
    expect((readJson(file).analyses as { marks: number[] }[])[0]!.marks).toEqual([20, 21]);
    // A later save is ours again: no second refusal.
    const again = await saveCase(dir, sampleCase('elm-8b', [20, 21, 22]));
    expect(again.ok).toBe(true);
  });

  it('serialises overlapping saves: the last one started is the one on disk', async () => {
    const dir = tempDir('save');
    const saves = [1, 2, 3, 4, 5].map((n) =>
      saveCase(
        dir,
        sampleCase(
          'elm-9',
          Array.from({ length: n }, () => 30),
        ),
      ),
    );
    const results = await Promise.all(saves);
    expect(results.every((r) => r.ok)).toBe(true);
    expect(
      (readJson(path.join(dir, 'elm-9.json')).analyses as { marks: number[] }[])[0]!.marks,
    ).toHaveLength(5);
    expect(
      (readJson(path.join(dir, 'elm-9.json.bak')).analyses as { marks: number[] }[])[0]!.marks,
    ).toHaveLength(4);
  });

  it('saves a 500-segment case that loads back the same', async () => {
    const dir = tempDir('save');
    const c = manySegmentCase('elm-10', 500);
    const r = await saveCase(dir, c);
    if (!r.ok) throw new Error(r.message);
    const back = loadCaseText(fs.readFileSync(r.path, 'utf8'));
    if (!back.ok) throw new Error(JSON.stringify(back.issues));
    expect(back.case.analyses[0]).toEqual(c.analyses[0]);
  });
});
