import { describe, expect, it } from 'vitest';
import { loadCase, type Case } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { reviewLines } from '../../src/ui/review-lines.js';
import { ABS_NOTE, lookNotes } from '../../src/interview/build-case.js';
import { fill, start } from '../interview/drive.js';

function load(raw: unknown): Case {
  const r = loadCase(raw);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.case;
}

// Invented scenario: a 100 ft slide to rest, f 0.70 (0.60-0.80), all brakes, limit 40 mph,
// a conflict point 50 ft into the marks, reaction time 1.5 s given in the case.
const slide = (extra: Record<string, unknown> = {}) =>
  load({
    format: 'skidcase-case',
    version: 1,
    id: 'ui-extras',
    units: 'imperial',
    postedLimit: 40,
    vehicle: { brakes: { mode: 'all' } },
    analyses: [
      {
        id: 'skid-1',
        kind: 'skid',
        marks: [100],
        segments: [{ drag: { source: 'entered', value: 0.7, low: 0.6, high: 0.8 } }],
        timeDistance: { reactionTime: 1.5, conflictAt: 50 },
      },
    ],
    ...extra,
  });

const review = (c: Case, width = 80, notes: Record<string, string[]> = {}) =>
  reviewLines(solveCase(c), width, { case: c, notes }).map((l) => l.text);
const flat = (lines: string[]) => lines.join(' ').replace(/\s+/g, ' ');

describe('the review shows the extras', () => {
  it('compares with a vehicle at the posted limit: stops before the end of the marks, depends at the conflict point', () => {
    const all = flat(review(slide()));
    // docs/physics.md: reaction distance 1.466 × S × t. At 40 mph and 1.5 s: 88.0 ft. Braking from 40 mph
    // at f 0.70: 40² / (30 × 0.70) = 76.2 ft, so stopping distance 88.0 + 76.2 = 164.2 ft.
    expect(all).toContain('at the limit, reaction distance: 88.0 ft');
    expect(all).toMatch(/at the limit, braking distance: 76\.2 ft/);
    expect(all).toMatch(/at the limit, stopping distance: 164\.2 ft/);
    // This vehicle at S = sqrt(30 × 100 × 0.70) = 45.83 mph reacts over 1.466 × 45.83 × 1.5 = 100.8
    // ft, so the one at the limit brakes 12.8 ft before the marks and rests 76.2 - 12.8 = 63.4 ft
    // in: short of the end (100 ft) at every end of f (f 0.60: rest at 83.6 ft; f 0.80: 46.9 ft),
    // but beyond the conflict point (50 ft) at f 0.70 and short of it at f 0.80: depends.
    expect(all).toContain(
      'Would have stopped before the end of the marks (100.0 ft from the start of the marks): yes',
    );
    expect(all).toContain(
      'Would have stopped before the conflict point (50.0 ft from the start of the marks): depends on the inputs',
    );
    expect(all).toContain('M. Green');
  });

  it('shows the percentiles of the distribution, inside the range of the speed', () => {
    const c = slide({ sampling: { shape: 'uniform', samples: 2000, seed: 7 } });
    const lines = review(c);
    const line = flat(lines).match(
      /2000 draws, uniform, seed 7: 5th percentile ([\d.]+), median ([\d.]+), 95th percentile ([\d.]+) mph/,
    );
    expect(line).not.toBeNull();
    const [p5, p50, p95] = line!.slice(1).map(Number);
    // Every draw lies between the ends of the range: 42.4 and 49.0 mph (sqrt(30 × 100 × 0.60 | 0.80)).
    expect(p5).toBeGreaterThanOrEqual(42.4);
    expect(p95).toBeLessThanOrEqual(49.0);
    expect(p5).toBeLessThan(p50!);
    expect(p50).toBeLessThan(p95!);
    expect(flat(review(slide()))).not.toContain('Distribution of the speed');
  });

  it('draws the speed along the slide as text, within the width', () => {
    for (const width of [80, 60]) {
      const lines = review(slide(), width);
      const at = lines.indexOf('  Speed along the slide');
      expect(at).toBeGreaterThan(0);
      expect(lines.slice(at + 1, at + 9).some((l) => l.includes('•'))).toBe(true);
      for (const l of lines) expect(l.length).toBeLessThanOrEqual(width);
    }
  });

  it('shows the offsets fit with its scatter warning, and sketches the arc', () => {
    // Invented offsets on a 40 ft chord, the middle one well off a circle through the others.
    const c = load({
      format: 'skidcase-case',
      version: 1,
      id: 'ui-offsets',
      units: 'imperial',
      vehicle: {},
      analyses: [
        {
          id: 'yaw-1',
          kind: 'yaw',
          offsets: {
            chord: 40,
            stations: [
              { at: 10, offset: 1.5 },
              { at: 15, offset: 2.4 },
              { at: 20, offset: 2.0 },
              { at: 25, offset: 2.4 },
              { at: 30, offset: 1.5 },
            ],
          },
          drag: { source: 'entered', value: 0.7 },
        },
      ],
    });
    const lines = review(c);
    const all = flat(lines);
    expect(all).toContain('Circle fitted to the offsets');
    expect(all).toMatch(/at 15\.0 ft: offset 2\.40, arc [\d.]+, off the circle by/);
    expect(all).toMatch(/! The offsets scatter/);
    // Said once: in the chain's warnings, not again under the fit.
    expect(all.split('The offsets scatter').length - 1).toBe(1);
    expect(lines).toContain('  The arc measured');
    expect(all).toMatch(/chord C 40\.0+ ft/);
  });

  it('says the slide figure is an estimate from anti-lock marks when the marks were faint and dashed', () => {
    const answers = {
      units: 'f',
      'a0.look': 'a',
      'vehicle.brakes': 'a',
      'a0.surfaces': 'o',
      'a0.count': '1',
      'a0.marks': '100',
      'a0.seg0.drag.source': 'e',
      'a0.seg0.drag.value': '0.7',
      'a0.seg0.grade.dir': 'l',
    };
    const abs = fill(start(), answers);
    expect(lookNotes(abs)).toEqual({ 'skid-1': [ABS_NOTE] });
    expect(lookNotes(fill(start(), { ...answers, 'a0.look': 'd' }))).toEqual({});
    const all = flat(review(slide(), 80, lookNotes(abs)));
    expect(all).toContain('the slide figure is an estimate from anti-lock marks');
    expect(all).toContain('(common practice)');
    // Beside the result, before the sensitivity bars.
    const text = review(slide(), 80, lookNotes(abs)).join('\n');
    expect(text.indexOf('anti-lock')).toBeLessThan(text.indexOf('What moves the result'));
    expect(text.indexOf('anti-lock')).toBeGreaterThan(text.indexOf('Result: at least'));
  });
});

describe('the help documents the offsets syntax', () => {
  it('shows both forms, and the example it gives is read as written', async () => {
    const { helpLines } = await import('../../src/ui/help-overlay.js');
    const { readStations } = await import('../../src/interview/read-stations.js');
    const text = flat(helpLines(76, []).map((l) => l.text));
    expect(text).toContain('Offsets of a yaw mark');
    expect(text).toContain('e.g. 5 0.21, 10 0.36, 15 0.41 (or 5:0.21, 10:0.36)');
    expect(readStations('5 0.21, 10 0.36, 15 0.41', 'imperial')).toEqual({
      ok: true,
      value: [
        { at: 5, offset: 0.21 },
        { at: 10, offset: 0.36 },
        { at: 15, offset: 0.41 },
      ],
    });
    expect(readStations('5:0.21, 10:0.36', 'imperial').ok).toBe(true);
  });
});

describe('the anti-lock caution in the review', () => {
  it('appears once, beside the result, when the case file records anti-lock marks', () => {
    // The same invented slide, its marks recorded as anti-lock marks: the engine lists the caution
    // among the assumptions and the review shows it beside the result; it must not say it twice.
    const base = slide();
    const abs = load({
      ...base,
      analyses: base.analyses.map((a) => ({ ...a, appearance: 'abs' })),
    });
    const text = flat(review(abs, 80, { 'skid-1': [ABS_NOTE] }));
    const times = text.split('estimate from anti-lock marks').length - 1;
    expect(times).toBe(1);
    expect(text.indexOf('anti-lock')).toBeGreaterThan(text.indexOf('Result: at least'));
    expect(text.indexOf('anti-lock')).toBeLessThan(text.indexOf('Assumptions'));
  });
});

describe('the limit comparison says which way the distance goes', () => {
  // The verdict and the sentence under it, up to the first numbered step that follows.
  const lineAbout = (c: Case) =>
    flat(review(c, 100)).match(
      /Would have stopped before the end of the marks.*?(?= \d+\. [A-Z]| Would have)/,
    )?.[0] ?? '';

  it('a vehicle at the limit that would not stop in time: still moving, and a positive distance beyond', () => {
    // Invented: 30 ft of marks at f 0.70 give sqrt(30 × 30 × 0.70) = 25.1 mph, well under the 40 mph
    // limit, so a vehicle at the limit from the same point of perception passes the end of the marks.
    const base = slide();
    const short = load({ ...base, analyses: base.analyses.map((a) => ({ ...a, marks: [30] })) });
    const text = lineAbout(short);
    expect(text).toMatch(/: no it reaches it still moving at [\d.]+ mph/);
    expect(text).toMatch(/comes to rest [\d.]+ ft \([\d.]+ to [\d.]+\) beyond it/);
    expect(text).not.toMatch(/-\d/);
  });
  it('one that would stop in time: short of it, by a positive distance', () => {
    // 100 ft at f 0.70: sqrt(30 × 100 × 0.70) = 45.8 mph, above the limit; at 40 mph it stops sooner.
    const text = lineAbout(slide());
    expect(text).toMatch(/: yes it comes to rest [\d.]+ ft/);
    expect(text).not.toMatch(/-\d/);
  });
  it('at a conflict point the ranges straddle: each end named by its side, no negative distance', () => {
    // The invented conflict point 50 ft into the 100 ft slide: at the limit the vehicle comes to
    // rest near it, before or after depending on the drag factor's range.
    const text =
      flat(review(slide(), 100)).match(
        /Would have stopped before the conflict point.*?(?= \d+\. [A-Z])/,
      )?.[0] ?? '';
    expect(text).toMatch(
      /depends on the inputs over the input ranges it comes to rest anywhere from [\d.]+ ft beyond it to [\d.]+ ft short of it/,
    );
    expect(text).not.toMatch(/-\d/);
  });
});
