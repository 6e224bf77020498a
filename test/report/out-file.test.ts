import { existsSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
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
    const noLinks = (s: string) => timeless(s).replace(/^!\[.*\]\(.*\)\n\n/gm, '');
    expect(noLinks(written)).toBe(noLinks(printed.out));
    expect(readdirSync(t.dir).filter((f) => f.endsWith('.part') || f.startsWith('.'))).toEqual([]);
  });

  it('refuses to overwrite an existing file without --force, names it, exits 1 and leaves it untouched', async () => {
    const out = path.join(t.dir, 'report.txt');
    writeFileSync(out, 'an earlier report, to keep\n');
    const r = await runReport(fixture('birchfield-yaw.json'), { format: 'txt', out });
    expect(r.code).toBe(1);
    expect(r.err).toContain(out);
    expect(r.err).toContain('already exists');
    expect(readFileSync(out, 'utf8')).toBe('an earlier report, to keep\n');
    expect(readdirSync(t.dir)).toEqual(['report.txt']);
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
    expect(r.err).toContain(out);
    expect(existsSync(out)).toBe(false);
  });
});
