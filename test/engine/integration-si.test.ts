import { describe, expect, it } from 'vitest';
import { slideSpeed, type SlideSegment } from '../../src/engine/index.js';
import { rel } from './helpers.js';

// First principles in SI: step Newton's second law through the slide in small time steps, in
// metres and seconds, with g = 9.80665 m/s² (CGPM 1901 standard gravity), and compare with the
// combined-speed result. Independent of the trade constant 254 (which is 2 g 3.6² = 254.19
// rounded, so speeds differ by about 0.04%).
const G0 = 9.80665;
const KMH = 1 / 3.6;

interface Seg {
  d: number;
  f: number;
  G: number;
}

/**
 * Works back from the speed at the end of the marks (m/s): over each segment, from last to first,
 * the vehicle is run backwards in time (its speed grows by a h per step), as the slide formula
 * works back from the end. Returns the speed at each boundary from the start of the marks (m/s).
 */
function integrateBack(
  vEnd: number,
  segs: Seg[],
  n: number,
  exactGrade: boolean,
  dt = 2e-5,
): number[] {
  const out = [vEnd];
  let v = vEnd;
  for (const s of [...segs].reverse()) {
    const theta = Math.atan(s.G / 100);
    // exact: friction on the normal force m g cos θ plus the slope component m g sin θ
    const a = exactGrade
      ? G0 * (s.f * n * Math.cos(theta) + Math.sin(theta))
      : G0 * (s.f * n + s.G / 100);
    let x = 0;
    while (x < s.d) {
      // midpoint step; the last step is cut to land on the boundary
      const h = Math.min(dt, (s.d - x) / Math.max(v + a * dt, 1e-9));
      x += (v + (a * h) / 2) * h;
      v += a * h;
    }
    out.unshift(v);
  }
  return out;
}

const r = (x: number) => ({ value: x, low: x, high: x });
const seg = (d: number, f: number, G: number): SlideSegment => ({
  d: r(d),
  f: r(f),
  gradePercent: r(G),
});

describe('first-principles SI integration against the combined-speed result', () => {
  // Invented slide: 18 m of asphalt uphill 3%, 7 m of gravel downhill 5%, 12 m of grass level;
  // n 0.9; still moving at 25 km/h at the end of the marks.
  const segs: Seg[] = [
    { d: 18, f: 0.72, G: 3 },
    { d: 7, f: 0.5, G: -5 },
    { d: 12, f: 0.35, G: 0 },
  ];
  const n = 0.9;
  const endKmh = 25;
  const solved = slideSpeed(
    segs.map((s) => seg(s.d, s.f, s.G)),
    r(n),
    { mode: 'speed', speed: r(endKmh) },
    'metric',
  );
  if (!solved.ok) throw new Error(solved.reason);
  const b = solved.value.boundaries;

  it('working back from the end speed step by step gives the engine’s speed at every boundary', () => {
    const v = integrateBack(endKmh * KMH, segs, n, false);
    expect(v).toHaveLength(4);
    // within 0.1%: the trade constant 254 vs 2 g 3.6² = 254.19 (at most 0.04% in speed) and the time step
    v.forEach((vi, i) => expect(rel(vi / KMH, b[i]!.speed.value)).toBeLessThan(0.001));
  });

  it('with the exact slope (f n cos θ + sin θ) it stays within 0.5% below a 10% grade', () => {
    const v = integrateBack(endKmh * KMH, segs, n, true);
    v.forEach((vi, i) => expect(rel(vi / KMH, b[i]!.speed.value)).toBeLessThan(0.005));
  });

  it('a slide to a stop covers exactly the slide distance', () => {
    const stop = slideSpeed(
      segs.map((s) => seg(s.d, s.f, s.G)),
      r(n),
      { mode: 'stop' },
      'metric',
    );
    if (!stop.ok) throw new Error(stop.reason);
    const v0 = stop.value.speed.value * KMH;
    // run the integration a little further than the marks: it must stop within 0.2% of 37 m
    let v = v0;
    let x = 0;
    let i = 0;
    let inSeg = 0;
    while (v > 0) {
      const s = segs[i] ?? segs[segs.length - 1]!;
      const a = G0 * (s.f * n + s.G / 100);
      const h = 1e-5;
      x += (v - (a * h) / 2) * h;
      inSeg += (v - (a * h) / 2) * h;
      v -= a * h;
      if (i < segs.length && inSeg >= s.d) {
        inSeg = 0;
        i++;
      }
    }
    expect(rel(x, 37)).toBeLessThan(0.002);
  });
});
