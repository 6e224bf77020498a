/**
 * Plausibility warnings (common practice: warn, never refuse): a drag factor above 1.0, marks of
 * one vehicle more than a quarter apart, a yaw radius under 50 ft / 15 m. Each is read where the
 * user meets it: `solve --json`, `solve`'s text, the report, and the review of the typed case.
 * Numbers are invented for the test.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runReport, runSolve } from '../report/helpers.js';
import { fill, start } from '../interview/drive.js';
import { reviewText } from '../interview/review-of.js';

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const dir = mkdtempSync(join(tmpdir(), 'skidcase-plausible-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const kase = (id: string, units: string, analyses: Json[]) => ({
  format: 'skidcase-case',
  version: 1,
  id,
  units,
  vehicle: { brakes: { mode: 'all' } },
  analyses,
});
const entered = (value: number, low?: number, high?: number) => ({
  source: 'entered',
  value,
  ...(low !== undefined ? { low } : {}),
  ...(high !== undefined ? { high } : {}),
});
const skid = (marks: number[], drag: Json) => ({
  id: 's1',
  kind: 'skid',
  marks,
  segments: [{ drag }],
});
// R = C²/(8M) + M/2 (circle geometry): 20²/(8 × 1.5) + 0.75 = 34.08 ft; 6²/(8 × 0.5) + 0.25 = 9.25 m.
const yaw = (chord: number, middleOrdinate: number) => ({
  id: 'y1',
  kind: 'yaw',
  chord,
  middleOrdinate,
  drag: entered(0.7),
});

const CASES: [string, Json, RegExp][] = [
  [
    'drag-high',
    kase('drag-high', 'imperial', [skid([70], entered(0.9, 0.85, 1.05))]),
    /drag factor.*1\.05/,
  ],
  [
    'marks-apart',
    kase('marks-apart', 'imperial', [skid([60, 80], entered(0.7))]),
    /marks differ.*60.*80/,
  ],
  [
    'tight-ft',
    kase('tight-ft', 'imperial', [yaw(20, 1.5)]),
    /radius of the mark is 34\.1 ft, under 50 ft/,
  ],
  [
    'tight-m',
    kase('tight-m', 'metric', [yaw(6, 0.5)]),
    /radius of the mark is 9\.25? m, under 15 m/,
  ],
];

describe.each(CASES)('%s', (name, c, warning) => {
  const file = join(dir, `${name}.json`);
  writeFileSync(file, JSON.stringify(c));

  it('solve --json puts the warning in the analysis and still gives the figure', async () => {
    const r = await runSolve(file, true);
    expect(r.code).toBe(0);
    const a = JSON.parse(r.out).analyses[0];
    expect(a.speed.value).toBeGreaterThan(0);
    expect(a.warnings.join(' ')).toMatch(warning);
  });

  it("solve's text and the report show it", async () => {
    const text = await runSolve(file, false);
    expect(text.out.replace(/\s+/g, ' ')).toMatch(warning);
    const report = await runReport(file, { format: 'txt' });
    expect(report.code).toBe(0);
    expect(report.out.replace(/\s+/g, ' ')).toMatch(warning);
  });
});

describe('marks apart under the spread rule', () => {
  it('says the range already carries their disagreement, instead of suggesting the rule', async () => {
    const file = join(dir, 'spread.json');
    const a = { ...skid([60, 80], entered(0.7)), distanceRule: 'spread' };
    writeFileSync(file, JSON.stringify(kase('spread', 'imperial', [a])));
    const w = JSON.parse((await runSolve(file, true)).out).analyses[0].warnings.join(' ');
    expect(w).toMatch(/marks differ.*"spread" already carries their disagreement/);
    expect(w).not.toMatch(/consider the distance rule/);
  });
});

describe('a plausible case', () => {
  it('draws none of these warnings', async () => {
    const file = join(dir, 'plain.json');
    writeFileSync(
      file,
      JSON.stringify(kase('plain', 'imperial', [skid([70, 72], entered(0.72)), yaw(40, 2)])),
    );
    const r = await runSolve(file, true);
    const all = JSON.parse(r.out)
      .analyses.flatMap((a: Json) => a.warnings)
      .join(' ');
    expect(all).not.toMatch(/drag factor .* above 1\.0|marks differ|under 50 ft/);
  });
});

describe('typed into the interview', () => {
  it('marks typed more than a quarter apart are warned about in the review', () => {
    const s = fill(start(), {
      units: 'f',
      'vehicle.brakes': 'a',
      'a0.look': 'd',
      'a0.surfaces': 'o',
      'a0.count': '2',
      'a0.marks': '60 80',
      'a0.seg0.drag.source': 'e',
      'a0.seg0.drag.value': '0.72',
    });
    expect(reviewText(s)).toMatch(/marks differ by more than a quarter/);
  });
});
