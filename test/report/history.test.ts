import { execFile } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterEach, describe, expect, it } from 'vitest';
import { releaseAllLocks, saveCase } from '../../src/store/index.js';
import { runReport, runSolve } from './helpers.js';
import { readJson, sampleCase, tempDir } from '../store/helpers.js';

// Through the built program, as a user calls it (`npm test` builds dist/ first).
const run = promisify(execFile);
const BIN = 'dist/skidcase.js';

async function skidcase(...args: string[]) {
  try {
    const r = await run(process.execPath, [BIN, ...args], {
      env: { ...process.env, NO_COLOR: '1' },
    });
    return { code: 0, out: r.stdout, err: r.stderr };
  } catch (e) {
    const x = e as { code: number; stdout: string; stderr: string };
    return { code: x.code, out: x.stdout, err: x.stderr };
  }
}

afterEach(() => releaseAllLocks());

/** A case saved three times through the real save path, each save changing something. */
async function caseWithTrail(id: string) {
  const dir = tempDir('history');
  await saveCase(dir, sampleCase(id, [61.3, 59.8]));
  await saveCase(dir, { ...sampleCase(id, [62, 59.8]), postedLimit: 45 });
  await saveCase(dir, {
    ...sampleCase(id, [62, 59.8]),
    postedLimit: 40,
    details: { reference: 'Test renamed' },
  });
  return { dir, file: path.join(dir, `${id}.json`) };
}

describe('skidcase history', () => {
  it('lists each revision as a block: number, time and who, then each change from → to', async () => {
    const { dir, file } = await caseWithTrail('ash-1');
    const trail = readJson(file).revisions as { at: string }[];
    const r = await skidcase('--sessions', dir, 'history', 'ash-1');
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    const blocks = r.out.trim().split('\n\n');
    expect(blocks[0]).toContain('Revisions of case ash-1');
    expect(blocks[0]).toContain('3 revisions recorded, oldest first.');
    expect(blocks[1]).toBe(`1. ${trail[0]!.at}, interview\n   created`);
    expect(blocks[2]!.split('\n')).toEqual([
      `2. ${trail[1]!.at}, interview`,
      '   analyses[0].marks[0]: 61.3 → 62',
      '   postedLimit: (not set) → 45',
    ]);
    expect(blocks[3]!.split('\n')).toEqual([
      `3. ${trail[2]!.at}, interview`,
      '   details.reference: "Test ash-1" → "Test renamed"',
      '   postedLimit: 45 → 40',
    ]);
  });

  it('a hand edit found at a save says it was found then, made at some time before', async () => {
    const { dir, file } = await caseWithTrail('ash-3');
    // edited in a text editor: the limit changed without skidcase
    const edited = readJson(file);
    edited.postedLimit = 55;
    fs.writeFileSync(file, JSON.stringify(edited, null, 2));
    await saveCase(
      dir,
      {
        ...sampleCase('ash-3', [62, 59.8]),
        postedLimit: 50,
        details: { reference: 'Test renamed' },
      },
      { overwriteChanged: true },
    );
    const trail = readJson(file).revisions as { at: string; by: string }[];
    expect(trail.map((t) => t.by)).toEqual([
      'interview',
      'interview',
      'interview',
      'hand edit',
      'interview',
    ]);
    const r = await skidcase('--sessions', dir, 'history', 'ash-3');
    const blocks = r.out.trim().split('\n\n');
    expect(blocks[4]!.split('\n')[0]).toBe(
      `4. ${trail[3]!.at}, hand edit (found at this save; made at some time before it)`,
    );
    expect(blocks[4]).toContain('postedLimit: 40 → 55');
    expect(blocks[5]).toContain('postedLimit: 55 → 50');
  });

  it('takes a file path as well as an id', async () => {
    const { file } = await caseWithTrail('ash-2');
    const r = await skidcase('history', file);
    expect(r.code).toBe(0);
    expect(r.out).toContain('postedLimit: 45 → 40');
  });

  it('a hand-written file without a trail says so, exit 0', async () => {
    const dir = tempDir('history');
    const file = path.join(dir, 'plain.json');
    fs.writeFileSync(file, JSON.stringify(sampleCase('plain-1')));
    const r = await skidcase('history', file);
    expect(r.code).toBe(0);
    expect(r.out).toContain('No revisions recorded (hand-written file');
  });

  it('an unknown case is exit 2 with a message naming it and the folder looked in', async () => {
    const dir = tempDir('history');
    const r = await skidcase('--sessions', dir, 'history', 'no-such-case');
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toContain('no case "no-such-case"');
    expect(r.err).toContain(dir);
  });

  it('a malformed trail is exit 2, the message naming the field', async () => {
    const dir = tempDir('history');
    const file = path.join(dir, 'bad.json');
    const bad = { ...sampleCase('bad-2'), revisions: [{ at: '2026-12-01T10:00:00Z', by: 'me' }] };
    fs.writeFileSync(file, JSON.stringify(bad));
    const r = await skidcase('history', file);
    expect(r.code).toBe(2);
    expect(r.err.split('\n')[0]).toBe('revisions[0].by: by must be "interview" or "hand edit"');
    expect(r.err).toContain('revisions[0].changes');
  });

  it('solve reads no figure from the trail and warns nothing about it', async () => {
    const { file } = await caseWithTrail('ash-5');
    const withTrail = await runSolve(file, true);
    const bare = path.join(path.dirname(file), 'bare.json');
    const { revisions: _r, ...rest } = readJson(file);
    fs.writeFileSync(bare, JSON.stringify(rest));
    const without = await runSolve(bare, true);
    expect(withTrail.code).toBe(0);
    expect(JSON.parse(withTrail.out)).toEqual(JSON.parse(without.out));
    expect(JSON.parse(withTrail.out).warnings).toEqual([]);
  });

  it('is in --help', async () => {
    const r = await skidcase('--help');
    expect(r.out).toMatch(/history <case>\s+list the trail of changes/);
  });
});

describe('the report ends with the Revisions section', () => {
  it('in text: a heading, then every revision oldest first with its changes', async () => {
    const { dir } = await caseWithTrail('ash-3');
    const r = await runReport('ash-3', { format: 'txt', sessionsDir: dir });
    expect(r.code).toBe(0);
    const at = r.out.lastIndexOf('REVISIONS\n');
    expect(at).toBeGreaterThan(r.out.indexOf('ABOUT THIS REPORT'));
    const tail = r.out.slice(at);
    expect(tail).toContain('3 revisions recorded, oldest first.');
    expect(tail).toContain('  - analyses[0].marks[0]: 61.3 → 62');
    expect(tail).toContain('  - postedLimit: 45 → 40');
    expect(tail.indexOf('>> 1. ')).toBeLessThan(tail.indexOf('>> 2. '));
    expect(tail.indexOf('>> 2. ')).toBeLessThan(tail.indexOf('>> 3. '));
  });

  it('in JSON: the last section, the same revisions as the file', async () => {
    const { dir, file } = await caseWithTrail('ash-4');
    const r = await runReport('ash-4', { format: 'json', sessionsDir: dir });
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as {
      sections: {
        id: string;
        title: string;
        blocks: { kind: string; text?: string; items?: string[] }[];
      }[];
    };
    const last = doc.sections.at(-1)!;
    expect(last.title).toBe('Revisions');
    const trail = readJson(file).revisions as { at: string }[];
    const headings = last.blocks.filter((b) => b.kind === 'paragraph').map((b) => b.text);
    expect(headings.slice(1)).toEqual(trail.map((t, i) => `${i + 1}. ${t.at}, interview`));
    const lists = last.blocks.filter((b) => b.kind === 'list').map((b) => b.items);
    expect(lists[2]).toEqual([
      'details.reference: "Test ash-4" → "Test renamed"',
      'postedLimit: 45 → 40',
    ]);
  });

  it('a case without a trail says no revisions are recorded, in Markdown and HTML too', async () => {
    const dir = tempDir('history');
    const file = path.join(dir, 'plain.json');
    fs.writeFileSync(file, JSON.stringify(sampleCase('plain-2')));
    for (const format of ['md', 'html', 'txt'] as const) {
      const r = await runReport(file, { format });
      expect(r.code).toBe(0);
      const flat = r.out.replace(/\s+/g, ' ');
      expect(flat).toMatch(/revisions/i);
      expect(flat).toContain('No revisions recorded (hand-written file');
    }
  });
});
