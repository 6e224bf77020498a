import { existsSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseReportJson } from '../../src/report/render-json.js';
import { fixture, runReport, tempDir } from './helpers.js';

// Every line of a report except the generation time, which differs between two runs.
const timeless = (s: string) => s.replace(/\d{4}-\d\d-\d\dT[\d:.]+Z/g, '<time>');

describe('report --out', () => {
  let t: ReturnType<typeof tempDir>;
  beforeEach(() => void (t = tempDir()));
  afterEach(() => t.done());

  it('writes the whole report, the same as it prints to stdout, and leaves no temporary file', async () => {
    const out = path.join(t.dir, 'quarry.md');
    const printed = await runReport(fixture('quarry-lane-skid.json'), { format: 'md' });
    const r = await runReport(fixture('quarry-lane-skid.json'), { format: 'md', out });
    expect(r.code).toBe(0);
    expect(r.out).toContain(`wrote ${out}`);
    const written = readFileSync(out, 'utf8');
    // Complete: the last section is there and the file ends with its final newline.
    expect(written).toContain('## About this report');
    expect(written.endsWith('\n')).toBe(true);
    // Same content as stdout, except that the written form may link its pictures.
    const noLinks = (s: string) =>
      timeless(s)
        .split('\n')
        .filter((l) => l !== '' && !l.startsWith('![') && !l.startsWith('(The picture is written'))
        .join('\n');
    expect(noLinks(written)).toBe(noLinks(printed.out));
    expect(readdirSync(t.dir).filter((f) => f.endsWith('.part') || f.startsWith('.'))).toEqual([]);
  });

  it('writes the pictures beside the report as <name>-<picture>.svg and links them from the Markdown', async () => {
    const out = path.join(t.dir, 'quarry.md');
    const r = await runReport(fixture('quarry-lane-skid.json'), { format: 'md', out });
    expect(r.code).toBe(0);
    const files = readdirSync(t.dir).sort();
    expect(files).toEqual(['quarry-sensitivity.svg', 'quarry-speed.svg', 'quarry.md']);
    const md = readFileSync(out, 'utf8');
    for (const svg of files.filter((f) => f.endsWith('.svg'))) {
      expect(md).toContain(`](${svg})`);
      const text = readFileSync(path.join(t.dir, svg), 'utf8');
      expect(text.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
      expect(text.trimEnd().endsWith('</svg>')).toBe(true);
      expect(r.out).toContain(`wrote ${path.join(t.dir, svg)}`);
    }
  });

  it('a yaw case gets its arc picture; the text form names the picture file', async () => {
    const out = path.join(t.dir, 'bend.txt');
    const r = await runReport(fixture('birchfield-yaw.json'), { format: 'txt', out });
    expect(r.code).toBe(0);
    expect(readdirSync(t.dir).sort()).toEqual([
      'bend-sensitivity.svg',
      'bend-yaw-arc.svg',
      'bend.txt',
    ]);
    expect(readFileSync(out, 'utf8')).toContain('(Picture: bend-yaw-arc.svg.)');
  });

  it('an existing picture file also stops the whole write without --force', async () => {
    const out = path.join(t.dir, 'quarry.md');
    writeFileSync(path.join(t.dir, 'quarry-speed.svg'), 'mine');
    const r = await runReport(fixture('quarry-lane-skid.json'), { format: 'md', out });
    expect(r.code).toBe(1);
    expect(r.err).toContain(path.join(t.dir, 'quarry-speed.svg'));
    expect(readdirSync(t.dir)).toEqual(['quarry-speed.svg']);
    expect(readFileSync(path.join(t.dir, 'quarry-speed.svg'), 'utf8')).toBe('mine');
  });

  it('refuses to overwrite an existing file without --force, names it, exits 1 and leaves it untouched', async () => {
    const out = path.join(t.dir, 'report.txt');
    writeFileSync(out, 'an earlier report, to keep\n');
    const r = await runReport(fixture('birchfield-yaw.json'), { format: 'txt', out });
    expect(r.code).toBe(1);
    expect(r.err).toContain(out);
    expect(r.err).toContain('already exists');
    expect(readFileSync(out, 'utf8')).toBe('an earlier report, to keep\n');
    expect(readdirSync(t.dir)).toEqual(['report.txt']); // and no picture written either
  });

  it('a reader never sees a half-written file while --force replaces it again and again', async () => {
    const out = path.join(t.dir, 'live.html');
    expect((await runReport(fixture('quarry-lane-skid.json'), { format: 'html', out })).code).toBe(
      0,
    );
    let writing = true;
    const seen: string[] = [];
    const reader = (async () => {
      while (writing) {
        seen.push(await readFile(out, 'utf8'));
        await new Promise((r) => setImmediate(r));
      }
    })();
    for (let k = 0; k < 12; k++) {
      const file = k % 2 ? 'quarry-lane-skid.json' : 'birchfield-yaw.json';
      expect((await runReport(fixture(file), { format: 'html', out, force: true })).code).toBe(0);
    }
    writing = false;
    await reader;
    expect(seen.length).toBeGreaterThan(0);
    for (const s of seen) {
      expect(s.startsWith('<!DOCTYPE html>')).toBe(true);
      expect(s.endsWith('</html>\n')).toBe(true);
    }
  });

  it('replaces the file with --force', async () => {
    const out = path.join(t.dir, 'report.json');
    writeFileSync(out, 'old');
    const r = await runReport(fixture('birchfield-yaw.json'), { format: 'json', out, force: true });
    expect(r.code).toBe(0);
    const doc = parseReportJson(readFileSync(out, 'utf8'));
    expect(doc?.caseId).toBe('birchfield-yaw');
  });

  it('a second run to the same path is refused and the first report stays complete', async () => {
    const out = path.join(t.dir, 'twice.html');
    expect((await runReport(fixture('quarry-lane-skid.json'), { format: 'html', out })).code).toBe(
      0,
    );
    const first = readFileSync(out, 'utf8');
    const again = await runReport(fixture('quarry-lane-skid.json'), { format: 'html', out });
    expect(again.code).toBe(1);
    expect(readFileSync(out, 'utf8')).toBe(first);
    expect(first.trimEnd().endsWith('</html>')).toBe(true);
  });

  it('writes nothing into a folder that does not exist, with a message naming the file', async () => {
    const out = path.join(t.dir, 'missing-folder', 'r.md');
    const r = await runReport(fixture('quarry-lane-skid.json'), { format: 'md', out });
    expect(r.code).toBe(1);
    expect(r.err).toContain(path.join(t.dir, 'missing-folder'));
    expect(existsSync(out)).toBe(false);
  });
});
