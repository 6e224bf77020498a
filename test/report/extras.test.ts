import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { loadCaseText } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/solve-case.js';
import { demo, fixture, flat, runReport, shownAs, tempDir } from './helpers.js';

const read = (f: string) => JSON.parse(readFileSync(f, 'utf8')) as Record<string, unknown>;

describe('report sections from the extras', () => {
  let t: ReturnType<typeof tempDir>;
  beforeEach(() => void (t = tempDir()));
  afterEach(() => t.done());
  const write = (name: string, c: unknown) => {
    const p = path.join(t.dir, name);
    writeFileSync(p, JSON.stringify(c, null, 2));
    return p;
  };

  it('time and distance at the posted limit: the reaction distance at the limit, by hand', async () => {
    // Demo slide, posted limit 35 mph. Reaction distance = S × 5280/3600 × t:
    // 35 × 1.46667 × 1.5 = 77.0 ft (default 1.5 s, Green 2000); 35 × 1.46667 × 2.5 = 128.3 ft (AASHTO 2.5 s).
    const def = flat((await runReport(demo('demo-orchard-hill.json'), { format: 'txt' })).out);
    expect(def).toContain('Perception-reaction time 1.5 s (default;');
    expect(def).toMatch(/At the limit: distance during perception-reaction 77\.0 ft/);
    const pref = flat(
      (await runReport(demo('demo-orchard-hill.json'), { format: 'txt', reactionTime: 2.5 })).out,
    );
    expect(pref).toContain(
      'Perception-reaction time 2.5 s (from the preferences; AASHTO design value',
    );
    expect(pref).toMatch(/At the limit: distance during perception-reaction 128\.3 ft/);
  });

  it("the case's own reaction time and conflict point win over the preference", async () => {
    const c = read(demo('demo-orchard-hill.json'));
    (c.analyses as Record<string, unknown>[])[0]!.timeDistance = {
      reactionTime: 1.25,
      conflictAt: 40,
    };
    const text = flat(
      (await runReport(write('td.json', c), { format: 'txt', reactionTime: 2.5 })).out,
    );
    expect(text).toContain('Perception-reaction time 1.25 s (set in the case file;');
    // 35 × 5280/3600 × 1.25 = 64.2 ft.
    expect(text).toMatch(/At the limit: distance during perception-reaction 64\.2 ft/);
    expect(text).toMatch(/before the conflict point \(40\.0 ft from the start of the marks\)/);
  });

  it('a yaw analysis has no time-distance section; a slide without a posted limit neither', async () => {
    const yaw = flat((await runReport(fixture('birchfield-yaw.json'), { format: 'txt' })).out);
    expect(yaw).not.toContain('Time and distance at the posted limit');
    const c = read(fixture('quarry-lane-skid.json'));
    delete c.postedLimit;
    const skid = flat((await runReport(write('nolimit.json', c), { format: 'txt' })).out);
    expect(skid).not.toContain('Time and distance at the posted limit');
    expect(skid).not.toContain('Comparison with the posted limit');
  });

  it('sampling only when the case asks for it; seeded, so two reports agree; percentiles inside the bounds', async () => {
    const plain = flat((await runReport(fixture('quarry-lane-skid.json'), { format: 'txt' })).out);
    expect(plain).not.toContain('Spread of the speed by sampling');
    const c = {
      ...read(fixture('quarry-lane-skid.json')),
      sampling: { shape: 'normal', samples: 20000, seed: 7 },
    };
    const file = write('sampled.json', c);
    const one = flat((await runReport(file, { format: 'txt' })).out);
    const two = flat((await runReport(file, { format: 'txt' })).out);
    const re =
      /Low bound 5th 50th 95th High bound -+ -+ -+ -+ -+ ([\d.]+) ([\d.]+) ([\d.]+) ([\d.]+) ([\d.]+)/;
    const m1 = re.exec(one);
    expect(m1).not.toBeNull();
    expect(re.exec(two)!.slice(1)).toEqual(m1!.slice(1));
    const [lo, p5, p50, p95, hi] = m1!.slice(1).map(Number) as [
      number,
      number,
      number,
      number,
      number,
    ];
    expect(lo <= p5 && p5 <= p50 && p50 <= p95 && p95 <= hi).toBe(true);
    expect(one).toContain('20000 draws, each input drawn from a normal curve');
    expect(one).toContain('seed 7');
  });

  it('a bad sampling field makes the file invalid: exit 2 naming the field, no report', async () => {
    // `sampling` is part of the case file contract (docs/case-file.md), so a bad seed is a bad file.
    const c = { ...read(fixture('quarry-lane-skid.json')), sampling: { seed: -1 } };
    const r = await runReport(write('badseed.json', c), { format: 'txt' });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/sampling\.seed: seed must be at least 0/);
    expect(r.out).toBe('');
  });

  it('sensitivity: each end speed shown equals the engine model evaluated at that end', async () => {
    const file = fixture('birchfield-yaw.json');
    const loaded = loadCaseText(readFileSync(file, 'utf8'));
    if (!loaded.ok) throw new Error('fixture');
    const s = solveCase(loaded.case).analyses[0]!;
    if (!s.ok) throw new Error('solve');
    const text = flat((await runReport(file, { format: 'md' })).out);
    for (const inp of s.solution.model.inputs.filter((i) => i.high > i.low)) {
      const lo = s.solution.model.evaluate({ [inp.key]: inp.low })!;
      const hi = s.solution.model.evaluate({ [inp.key]: inp.high })!;
      // Each row is named by the input's plain name; the model's key (C, M, f[0]) is not shown.
      const name = inp.label.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
      const row = new RegExp(`\\| ${name} \\| [^|]+ \\| ([\\d.]+) \\| ([\\d.]+) \\|`).exec(text);
      expect(row, inp.label).not.toBeNull();
      expect(text).not.toContain(`| ${inp.key}:`);
      expect([row![1], row![2]]).toEqual([shownAs(lo, 1), shownAs(hi, 1)]);
    }
  });

  it('offsets along the chord: an exact circle gives back its radius (circle geometry)', async () => {
    // Circle of radius 60 m, chord 18 m: offset at x from the chord's start is
    // sqrt(R² − (x − C/2)²) − sqrt(R² − (C/2)²); the middle ordinate 60 − sqrt(3600 − 81) = 0.6789 m.
    const R = 60;
    const C = 18;
    const off = (x: number) =>
      Math.sqrt(R * R - (x - C / 2) ** 2) - Math.sqrt(R * R - (C / 2) ** 2);
    const c = read(fixture('birchfield-yaw.json'));
    const yaw = (c.analyses as Record<string, unknown>[])[0]!;
    // Offsets replace the chord and middle ordinate (one way of measuring the radius per analysis).
    delete yaw.chord;
    delete yaw.middleOrdinate;
    yaw.offsets = {
      chord: C,
      stations: [3, 6, 9, 12, 15].map((at) => ({ at, offset: off(at) })),
    };
    const text = flat((await runReport(write('offsets.json', c), { format: 'txt' })).out);
    expect(text).toContain('Radius from offsets along the chord');
    expect(text).toMatch(/Circle fitted to 5 offsets and the chord's two ends: radius 60\.0 m/);
    expect(text).toContain('The residuals do not suggest the mark departs from a circular arc.');
  });
});
