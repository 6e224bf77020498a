import { mkdtempSync, rmSync, writeFileSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { fixture, runSolve } from './run-solve.js';

// What a person gets from `skidcase solve` for the new kinds of analysis and for chains. Expected
// figures are worked here from first principles (circle geometry, projectile motion with standard
// gravity 9.80665 m/s² and the international foot), not read from the program.

const dir = mkdtempSync(join(tmpdir(), 'skidcase-phases-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const base = () =>
  JSON.parse(readFileSync(fixture('chain-slide-yaw-fall.json'), 'utf8')) as {
    analyses: Record<string, unknown>[];
  };
function write(name: string, edit: (c: ReturnType<typeof base>) => void): string {
  const c = base();
  edit(c);
  const f = join(dir, name);
  writeFileSync(f, JSON.stringify(c));
  return f;
}

interface Out {
  analyses: {
    id: string;
    kind: string;
    speed: { value: number; low: number; high: number };
    phases?: { id: string; speed: { value: number } }[];
    pointsFit?: { radius: number; rms: number; count: number };
    steps: { name: string; formula: string }[];
  }[];
}

describe('solve: a slide that runs into a hand-surveyed yaw', () => {
  it('--json gives the chain’s phases and the slide’s combined speed from the yaw’s', async () => {
    const r = await runSolve(fixture('chain-slide-yaw-fall.json'), true);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as Out;
    const [skid, yaw, fall] = j.analyses;
    expect(yaw!.pointsFit!.count).toBe(6);
    // The six points were placed on a circle of radius about 160 ft through (0, 0) by hand
    // (y = R − sqrt(R² − x²) rounded to 0.01 ft): the fit lands near it.
    expect(Math.abs(yaw!.pointsFit!.radius - 160)).toBeLessThan(0.5);
    expect(yaw!.pointsFit!.rms).toBeLessThan(0.01);
    const sYaw = Math.sqrt(15 * 0.7 * yaw!.pointsFit!.radius);
    expect(yaw!.speed.value).toBeCloseTo(sYaw, 9);
    expect(skid!.speed.value).toBeCloseTo(Math.sqrt(sYaw ** 2 + 30 * 38 * 0.74), 9);
    expect(skid!.phases!.map((p) => p.id)).toEqual(['skid-1', 'yaw-1']);
    // Airborne, take-off grade −4%: v = d / (cos θ sqrt(2 (d tan θ + h)/g)), worked in ft and ft/s.
    const g = 9.80665 / 0.3048;
    const th = Math.atan(-0.04);
    const v = 48 / (Math.cos(th) * Math.sqrt((2 * (48 * Math.tan(th) + 6.5)) / g));
    expect(fall!.speed.value).toBeCloseTo((v * 3600) / 5280, 9);
  });

  it('the text shows the line of phases with the speed at the junction', async () => {
    const r = await runSolve(fixture('chain-slide-yaw-fall.json'));
    expect(r.code).toBe(0);
    expect(r.out).toMatch(
      /Phases in order of travel: skid-1 \(slide\), marks begin: \d+\.\d mph \(.*\) → yaw-1 \(critical speed\), yaw begins: \d+\.\d mph/,
    );
    expect(r.out).toContain('Radius from surveyed points (least-squares circle)');
    expect(r.out).toContain('Analysis 3: fall-1 (airborne: take-off to landing)');
    expect(r.out).toContain('S = K_a × d / (cos θ × sqrt(d × tan θ + h))');
  });
});

describe('solve: links and measures that are not valid', () => {
  it('a slide naming a missing analysis is exit 2 naming analyses[0].end.analysis', async () => {
    const f = write('missing.json', (c) => {
      (c.analyses[0]!.end as { analysis: string }).analysis = 'yaw-9';
    });
    const r = await runSolve(f, true);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err.split('\n')[0]).toBe(
      'analyses[0].end.analysis: there is no analysis "yaw-9" in this case (ids: yaw-1, fall-1)',
    );
  });

  it('a loop of phases is exit 2 naming the link of each analysis in it', async () => {
    const f = write('loop.json', (c) => {
      c.analyses.push(
        { ...c.analyses[0]!, id: 'skid-2', end: { mode: 'analysis', analysis: 'skid-3' } },
        { ...c.analyses[0]!, id: 'skid-3', end: { mode: 'analysis', analysis: 'skid-2' } },
      );
    });
    const r = await runSolve(f, true);
    expect(r.code).toBe(2);
    expect(r.err).toContain(
      'analyses[3].end.analysis: the phases loop back on themselves (skid-2 → skid-3 → skid-2)',
    );
    expect(r.err).toContain('analyses[4].end.analysis');
  });

  it('a slide that runs into itself is exit 2', async () => {
    const f = write('self.json', (c) => {
      (c.analyses[0]!.end as { analysis: string }).analysis = 'skid-1';
    });
    const r = await runSolve(f);
    expect(r.code).toBe(2);
    expect(r.err.split('\n')[0]).toBe(
      'analyses[0].end.analysis: an analysis cannot run on into itself',
    );
  });

  it('a yaw with points and a chord is exit 2; too few points is exit 2 naming points', async () => {
    const both = write('both.json', (c) =>
      Object.assign(c.analyses[1]!, { chord: 40, middleOrdinate: 2 }),
    );
    const r1 = await runSolve(both);
    expect(r1.code).toBe(2);
    expect(r1.err.split('\n')[0]).toBe(
      'analyses[1].points: give exactly one of: chord and middleOrdinate, offsets, or points',
    );
    const few = write('few.json', (c) =>
      Object.assign(c.analyses[1]!, {
        points: [
          [0, 0],
          [1, 1],
        ],
      }),
    );
    const r2 = await runSolve(few);
    expect(r2.code).toBe(2);
    expect(r2.err.split('\n')[0]).toBe(
      'analyses[1].points: at least 3 points are needed for a circle',
    );
    const bad = write('bad.json', (c) =>
      Object.assign(c.analyses[1]!, {
        points: [
          [0, 0],
          [1, 'x'],
          [2, 1],
        ],
      }),
    );
    const r3 = await runSolve(bad);
    expect(r3.code).toBe(2);
    expect(r3.err.split('\n')[0]).toMatch(/^analyses\[1\]\.points\[1\]/);
  });

  it('a landing no path reaches is exit 3 with the reason, and so is the slide that runs into it', async () => {
    const f = write('nopath.json', (c) => {
      (c.analyses[0]!.end as { analysis: string }).analysis = 'fall-1';
      c.analyses[2]!.drop = -5;
    });
    const r = await runSolve(f, true);
    expect(r.code).toBe(3);
    expect(r.out).toBe('');
    expect(r.err).toContain('analyses[2] (fall-1): cannot be computed: with distance');
    expect(r.err).toContain(
      'analyses[0] (skid-1): cannot be computed: the marks run into analysis "fall-1"',
    );
  });
});
