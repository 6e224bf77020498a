import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, copyFileSync } from 'node:fs';
import path from 'node:path';
import { trackedTempDir } from '../temp-dirs.js';
import { loadCaseText } from '../../src/case/load.js';
import { writeCaseReport } from '../../src/ui/write-report.js';
import type { OpenCase } from '../../src/ui/services.js';
import { sha256Of } from '../../src/io/sha256.js';
import { releaseAllLocks, saveCase } from '../../src/store/index.js';

const DEMO = path.join(__dirname, '../../sessions/demo-orchard-hill.json');

describe('"write report" from the review', () => {
  it('writes the Markdown with its speed picture beside it, using the reaction-time preference', async () => {
    const dir = trackedTempDir('skidcase-review-report-');
    const file = path.join(dir, 'demo-orchard-hill.json');
    copyFileSync(DEMO, file);
    const loaded = loadCaseText(readFileSync(file, 'utf8'));
    if (!loaded.ok) throw new Error('demo case must load');
    const open = { case: loaded.case, file, release: async () => {} } as unknown as OpenCase;
    const r = await writeCaseReport(open, loaded.case, new Date('2026-12-01T10:00:00Z'), 2);
    expect(r.ok).toBe(true);
    const written = readdirSync(dir).sort();
    expect(written.some((f) => f.endsWith('.md'))).toBe(true);
    expect(written.some((f) => f.endsWith('-speed.svg'))).toBe(true);
    const md = readFileSync(r.ok ? r.path : '', 'utf8');
    // The demo has a posted limit (35 mph), so the report compares stopping at the limit, with the
    // reaction time of the preference passed in (2 s), not the default 1.5 s:
    // 35 mph × 5280/3600 ft/s per mph × 2 s = 102.7 ft during perception-reaction at the limit.
    expect(md).toContain('Perception-reaction time 2 s (from the preferences');
    expect(md).toMatch(/At the limit: distance during perception-reaction \| 102\.7 ft/);
    // The report records the file it was made from: the case file's bytes on disk.
    expect(md).toContain(`case file SHA-256 ${sha256Of(readFileSync(file))}`);
    // Never over an existing file: the same moment again is refused.
    const again = await writeCaseReport(open, loaded.case, new Date('2026-12-01T10:00:00Z'), 2);
    expect(again.ok).toBe(false);
  });

  it('claims no file when the file on disk holds another version of the case', async () => {
    const dir = trackedTempDir('skidcase-review-report-');
    const file = path.join(dir, 'demo-orchard-hill.json');
    copyFileSync(DEMO, file);
    const loaded = loadCaseText(readFileSync(file, 'utf8'));
    if (!loaded.ok) throw new Error('demo case must load');
    const open = { case: loaded.case, file, release: async () => {} } as unknown as OpenCase;
    // The screen's case differs from the file (as after a save that failed).
    const shown = { ...loaded.case, postedLimit: 40 };
    const r = await writeCaseReport(open, shown, new Date('2026-12-01T11:00:00Z'));
    const md = readFileSync(r.ok ? r.path : '', 'utf8');
    expect(md).not.toContain('SHA-256');
    expect(md).toContain('Posted limit: 40 mph');
  });

  it('ends with the file’s trail of revisions, which the screen’s case does not carry, and still records the file', async () => {
    const dir = trackedTempDir('skidcase-review-report-');
    const loaded = loadCaseText(readFileSync(DEMO, 'utf8'));
    if (!loaded.ok) throw new Error('demo case must load');
    const first = { ...loaded.case, id: 'trail-1' };
    await saveCase(dir, first);
    const saved = await saveCase(dir, { ...first, postedLimit: 40 });
    await releaseAllLocks();
    if (!saved.ok) throw new Error(saved.message);
    const file = path.join(dir, 'trail-1.json');
    // What the screen holds: the case the answers build, without the trail the save added.
    const { revisions: _r, ...shown } = saved.case;
    const open = { case: saved.case, file, release: async () => {} } as unknown as OpenCase;
    const r = await writeCaseReport(open, shown, new Date('2026-12-01T12:00:00Z'));
    const md = readFileSync(r.ok ? r.path : '', 'utf8');
    expect(md).toContain(`case file SHA-256 ${sha256Of(readFileSync(file))}`);
    const tail = md.slice(md.lastIndexOf('Revisions'));
    expect(tail).toContain('2 revisions recorded');
    expect(tail).toContain('postedLimit: 35 → 40');
  });
});
