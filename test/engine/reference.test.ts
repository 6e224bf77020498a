import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { solveCase } from '../../src/engine/index.js';
import { caseOf, rel } from './helpers.js';

// A second, deliberately naive implementation written straight from docs/case-file.md: every
// input is a [value, low, high] triple and the low and high speeds are found by brute force over
// every corner of the input box (no monotonicity assumed). The engine must agree on value, low,
// high and minimum, and must fail exactly where some corner cannot be computed.

type T3 = [number, number, number];
type Q = number | { value: number; low?: number; high?: number };
const t3 = (q: Q): T3 =>
  typeof q === 'number' ? [q, q, q] : [q.value, q.low ?? q.value, q.high ?? q.value];
const ends = (t: T3) => [t[1], t[2]];

/** Every combination of low/high ends of the given triples (and the all-values point first). */
function corners(ts: T3[]): number[][] {
  let out: number[][] = [[]];
  for (const t of ts) out = out.flatMap((c) => ends(t).map((x) => [...c, x]));
  return out;
}
const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;

function refDrag(d: Record<string, unknown>, C: number): T3 {
  if (d.source === 'entered' || d.source === 'table') return t3(d as Q);
  const fs =
    d.source === 'test-skids'
      ? (d.tests as { speed: Q; distance: Q }[]).map(
          (t) => t3(t.speed)[0] ** 2 / (C * t3(t.distance)[0]),
        )
      : d.source === 'sled'
        ? (d.pulls as Q[]).map((p) => t3(p)[0] / t3(d.weight as Q)[0])
        : (d.readings as Q[]).map((r) => t3(r)[0]);
  return [mean(fs), Math.min(...fs), Math.max(...fs)];
}

function refN(v: Record<string, unknown>): T3[] {
  const b = v.brakes as Record<string, unknown>;
  if (b.mode === 'all') return [[1, 1, 1]];
  if (b.mode === 'estimate') return [t3(b.efficiency as Q)];
  return [
    t3(v.frontAxleShare as Q),
    ...['frontLeft', 'frontRight', 'rearLeft', 'rearRight'].map((k) => t3(b[k] as Q)),
  ];
}
const nOf = (x: number[]) =>
  x.length === 1 ? x[0]! : (x[0]! / 2) * (x[1]! + x[2]!) + ((1 - x[0]!) / 2) * (x[3]! + x[4]!);

type Ref = { ok: true; speed: T3 } | { ok: false };

function refSkid(units: string, v: Record<string, unknown>, a: Record<string, unknown>): Ref {
  const C = units === 'imperial' ? 30 : 254;
  const segs = a.segments as Record<string, unknown>[];
  let lengths: T3[];
  if (segs.length === 1 && segs[0]!.length === undefined) {
    const m = (a.marks as Q[]).map(t3);
    const pick = a.distanceRule === 'longest' ? (xs: number[]) => Math.max(...xs) : mean;
    lengths = [[pick(m.map((x) => x[0])), pick(m.map((x) => x[1])), pick(m.map((x) => x[2]))]];
  } else lengths = segs.map((s) => t3(s.length as Q));
  const fs = segs.map((s) => refDrag(s.drag as Record<string, unknown>, C));
  const gs = segs.map((s) => t3((s.grade as Q) ?? 0));
  const nParts = refN(v);
  const end = a.end as { mode: string; speed?: Q } | undefined;
  const se: T3 = end?.mode === 'speed' ? t3(end.speed!) : [0, 0, 0];
  const k = segs.length;
  const speedAt = (x: number[]) => {
    const n = nOf(x.slice(3 * k, 3 * k + nParts.length));
    let s2 = x[x.length - 1]! ** 2;
    for (let i = 0; i < k; i++) {
      const eff = x[k + i]! * n + x[2 * k + i]! / 100;
      if (!(eff > 0)) return undefined;
      s2 += C * x[i]! * eff;
    }
    return Math.sqrt(s2);
  };
  const all = [...lengths, ...fs, ...gs, ...nParts, se];
  const value = speedAt(all.map((t) => t[0]));
  const cs = corners(all).map(speedAt);
  if (value === undefined || cs.some((s) => s === undefined)) return { ok: false };
  return { ok: true, speed: [value, Math.min(...(cs as number[])), Math.max(...(cs as number[]))] };
}

function refYaw(units: string, v: Record<string, unknown>, a: Record<string, unknown>): Ref {
  const K = units === 'imperial' ? 15 : 127;
  const f = refDrag(a.drag as Record<string, unknown>, units === 'imperial' ? 30 : 254);
  const T: T3 = a.pathAdjustment === 'half-track' ? t3(v.trackWidth as Q) : [0, 0, 0];
  const all = [t3(a.chord as Q), t3(a.middleOrdinate as Q), f, t3((a.superelevation as Q) ?? 0), T];
  const speedAt = ([c, m, ff, sup, tw]: number[]) => {
    const e = sup! / 100;
    const R = c! ** 2 / (8 * m!) + m! / 2 - tw! / 2;
    if (!(R > 0) || !(ff! + e > 0) || !(1 - ff! * e > 0)) return undefined;
    return Math.sqrt((K * R * (ff! + e)) / (1 - ff! * e));
  };
  const value = speedAt(all.map((t) => t[0]));
  const cs = corners(all).map(speedAt);
  if (value === undefined || cs.some((s) => s === undefined)) return { ok: false };
  return { ok: true, speed: [value, Math.min(...(cs as number[])), Math.max(...(cs as number[]))] };
}

// Generators of valid inputs.
const num = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const qty = (min: number, max: number, w: number): fc.Arbitrary<Q> =>
  fc.oneof(
    num(min, max),
    fc
      .tuple(num(min, max), num(0, w), num(0, w))
      .map(([x, a, b]) => ({ value: x, low: Math.max(min, x - a), high: Math.min(max, x + b) })),
  );
const dragArb = fc.oneof(
  fc
    .tuple(num(0.1, 1.2), num(0, 0.15), num(0, 0.15))
    .map(([x, a, b]) => ({ source: 'entered', value: x, low: Math.max(0.05, x - a), high: x + b })),
  fc.tuple(num(0.1, 1.2), num(0, 0.15)).map(([x, a]) => ({
    source: 'table',
    surface: 'asphalt-dry-travelled',
    value: x,
    low: Math.max(0.05, x - a),
  })),
  fc
    .array(fc.record({ speed: num(15, 50), distance: num(10, 120) }), {
      minLength: 1,
      maxLength: 4,
    })
    .map((tests) => ({ source: 'test-skids', tests })),
  fc
    .tuple(num(50, 150), fc.array(num(0.3, 0.9), { minLength: 1, maxLength: 4 }))
    .map(([w, r]) => ({ source: 'sled', weight: w, pulls: r.map((x) => x * w) })),
  fc
    .array(num(0.2, 1.1), { minLength: 1, maxLength: 4 })
    .map((readings) => ({ source: 'decelerometer', readings })),
);
const brakesArb = fc.oneof(
  fc.constant({ mode: 'all' }),
  qty(0.2, 1, 0.1).map((efficiency) => ({ mode: 'estimate', efficiency })),
  fc.tuple(qty(0, 1, 0.2), qty(0, 1, 0.2), qty(0, 1, 0.2), qty(0, 1, 0.2)).map(([a, b, c, d]) => ({
    mode: 'wheels',
    frontLeft: a,
    frontRight: b,
    rearLeft: c,
    rearRight: d,
  })),
);
const skidArb = fc.oneof(
  fc.record({
    id: fc.constant('skid-a'),
    kind: fc.constant('skid'),
    marks: fc.array(qty(5, 200, 3), { minLength: 1, maxLength: 4 }),
    distanceRule: fc.constantFrom('average', 'longest'),
    segments: dragArb.chain((drag) => qty(-15, 15, 3).map((grade) => [{ drag, grade }])),
  }),
  fc.record({
    id: fc.constant('skid-b'),
    kind: fc.constant('skid'),
    segments: fc.array(
      fc.record({ length: qty(2, 100, 2), drag: dragArb, grade: qty(-15, 15, 3) }),
      { minLength: 1, maxLength: 2 },
    ),
    end: fc.oneof(
      fc.constant({ mode: 'stop' }),
      qty(0, 60, 8).map((speed) => ({ mode: 'speed', speed })),
    ),
  }),
);
const yawArb = fc
  .tuple(
    num(10, 60),
    num(0.02, 0.3),
    num(0, 0.03),
    dragArb,
    qty(-8, 10, 2),
    fc.constantFrom('none', 'half-track'),
  )
  .map(([C, ratio, w, drag, superelevation, pathAdjustment]) => ({
    id: 'yaw-a',
    kind: 'yaw',
    chord: { value: C, low: C * 0.99, high: C * 1.01 },
    middleOrdinate: { value: C * ratio, low: C * ratio * (1 - w), high: C * ratio * (1 + w) },
    drag,
    superelevation,
    pathAdjustment,
  }));

describe('engine against a brute-force reference implementation of docs/case-file.md', () => {
  it('agrees on value, low, high and minimum, and on which analyses cannot be computed', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('imperial', 'metric'),
        brakesArb,
        qty(0.45, 0.65, 0.05),
        qty(1.3, 2.0, 0.1),
        skidArb,
        yawArb,
        (units, brakes, share, track, skid, yaw) => {
          const vehicle = { brakes, frontAxleShare: share, trackWidth: track };
          const c = caseOf({
            units: units as 'imperial' | 'metric',
            vehicle,
            analyses: [skid, yaw],
          });
          const solved = solveCase(c).analyses;
          const refs = [refSkid(units, vehicle, skid), refYaw(units, vehicle, yaw)];
          refs.forEach((ref, i) => {
            const got = solved[i]!;
            expect(got.ok).toBe(ref.ok);
            if (!ref.ok || !got.ok) return;
            const [value, low, high] = ref.speed;
            expect(rel(got.solution.speed.value, value)).toBeLessThan(1e-9);
            expect(rel(got.solution.speed.low, low)).toBeLessThan(1e-9);
            expect(rel(got.solution.speed.high, high)).toBeLessThan(1e-9);
            expect(got.solution.minimum).toBe(Math.floor(low + 1e-9));
          });
        },
      ),
      { numRuns: 300 },
    );
  });
});
