import { describe, expect, it } from 'vitest';
import { solveCase } from '../../src/engine/index.js';
import type { AnalysisSolution } from '../../src/engine/types.js';
import { caseOf } from './helpers.js';

// A yaw analysis measured by offsets along a chord instead of one middle ordinate. The arcs are
// generated here from a known radius with circle geometry (R = C²/(8M) + M/2, any
// circle): with the chord's midpoint at x = C/2, the mark's offset from the chord at x is
// y(x) = sqrt(R² − (x − C/2)²) − (R − M), M = R − sqrt(R² − (C/2)²). Invented scenarios.

/** Middle ordinate of chord C on a circle of radius R (the sagitta). */
const sagitta = (R: number, C: number) => R - Math.sqrt(R * R - (C / 2) ** 2);
/** Exact offsets of that arc at the given stations. */
const arcOffsets = (R: number, C: number, at: number[]) =>
  at.map((x) => ({ at: x, offset: Math.sqrt(R * R - (x - C / 2) ** 2) - (R - sagitta(R, C)) }));

function solvedAll(c: ReturnType<typeof caseOf>): AnalysisSolution[] {
  return solveCase(c).analyses.map((r) => {
    if (!r.ok) throw new Error(r.reason);
    return r.solution;
  });
}

describe('yaw from offsets, solved end to end', () => {
  it.each([
    ['imperial, level', 'imperial', 140, 46, 0, undefined],
    ['imperial, banked 4%, half-track', 'imperial', 95, 38, 4, 5.6],
    ['metric, banked −2%', 'metric', 52, 16, -2, undefined],
  ] as const)(
    '%s: an exact arc gives the same speed as chord + middle ordinate of that arc (within 1e-6)',
    (_name, units, R, C, e, track) => {
      const drag = { source: 'entered', value: 0.74, low: 0.68, high: 0.8 };
      const common = {
        drag,
        superelevation: e,
        ...(track !== undefined ? { pathAdjustment: 'half-track' } : {}),
      };
      const c = caseOf({
        units,
        vehicle: { brakes: { mode: 'all' }, ...(track !== undefined ? { trackWidth: track } : {}) },
        analyses: [
          { id: 'by-chord', kind: 'yaw', chord: C, middleOrdinate: sagitta(R, C), ...common },
          {
            id: 'by-offsets',
            kind: 'yaw',
            offsets: {
              chord: C,
              stations: arcOffsets(R, C, [C * 0.2, C * 0.4, C * 0.5, C * 0.7, C * 0.85]),
            },
            ...common,
          },
        ],
      });
      const [byChord, byOffsets] = solvedAll(c);
      expect(Math.abs(byOffsets!.speed.value - byChord!.speed.value)).toBeLessThan(1e-6);
      // S = sqrt(K × R_path × (f + e)/(1 − f e)), K = 15 (mph, ft) or 127 (km/h, m) (docs/physics.md, "Critical speed").
      const K = units === 'imperial' ? 15 : 127;
      const Rp = R - (track ?? 0) / 2;
      const f = 0.74;
      const ee = e / 100;
      expect(byOffsets!.speed.value).toBeCloseTo(Math.sqrt((K * Rp * (f + ee)) / (1 - f * ee)), 6);
      // An exact arc has no scatter: the range comes from the drag factor alone.
      expect(byOffsets!.speed.low).toBeCloseTo(
        Math.sqrt((K * Rp * (0.68 + ee)) / (1 - 0.68 * ee)),
        5,
      );
      expect(byOffsets!.speed.high).toBeCloseTo(
        Math.sqrt((K * Rp * (0.8 + ee)) / (1 - 0.8 * ee)),
        5,
      );
      const fit = byOffsets!.steps[0]!;
      expect(fit.name).toMatch(/offsets/);
      expect(fit.result).toBeCloseTo(R, 6);
      expect(fit.substituted).toMatch(/RMS 0\.000/);
      expect(byOffsets!.warnings).toEqual([]);
      expect(byOffsets!.minimum).toBe(byChord!.minimum);
    },
  );

  it('the model takes the fitted radius as one input (key R), and the speed follows sqrt(15 f R)', () => {
    const C = 40;
    const c = caseOf({
      analyses: [
        {
          id: 'y',
          kind: 'yaw',
          offsets: { chord: C, stations: arcOffsets(120, C, [10, 20, 30]) },
          drag: { source: 'entered', value: 0.7, low: 0.6, high: 0.8 },
        },
      ],
    });
    const [s] = solvedAll(c);
    expect(s!.model.inputs.map((i) => i.key)).toEqual(['R', 'f']);
    // Critical speed: S = sqrt(15 × f × R), mph and ft.
    expect(s!.model.evaluate({ R: 150, f: 0.5 })).toBeCloseTo(Math.sqrt(15 * 0.5 * 150), 9);
    expect(s!.radius?.value).toBeCloseTo(120, 6);
  });

  it('a chord with a spread widens the radius to the fits at its two ends', () => {
    const R = 110;
    const C = 42;
    const stations = arcOffsets(R, C, [8, 16, 21, 28, 35]);
    const at = (chord: unknown) =>
      solvedAll(
        caseOf({
          analyses: [
            {
              id: 'y',
              kind: 'yaw',
              offsets: { chord, stations },
              drag: { source: 'entered', value: 0.7 },
            },
          ],
        }),
      )[0]!.radius!;
    const wide = at({ value: C, low: C - 0.3, high: C + 0.3 });
    const lowEnd = at(C - 0.3);
    const highEnd = at(C + 0.3);
    expect(wide.value).toBeCloseTo(R, 6);
    // The offsets stay; a longer chord with the same offsets is a flatter arc, so R grows with C.
    expect(lowEnd.value).toBeLessThan(R);
    expect(highEnd.value).toBeGreaterThan(R);
    expect(wide.low).toBeLessThanOrEqual(lowEnd.value);
    expect(wide.high).toBeGreaterThanOrEqual(highEnd.value);
  });

  it('a mark that is not an arc draws a warning; one station says there is nothing to check it by', () => {
    const C = 40;
    const bent = arcOffsets(100, C, [5, 10, 15, 20, 25, 30, 35]);
    bent[3]!.offset += 0.4; // one offset misread by about 5 inches
    const c = caseOf({
      analyses: [
        {
          id: 'bent',
          kind: 'yaw',
          offsets: { chord: C, stations: bent },
          drag: { source: 'entered', value: 0.7 },
        },
        {
          id: 'one',
          kind: 'yaw',
          offsets: { chord: C, stations: arcOffsets(100, C, [20]) },
          drag: { source: 'entered', value: 0.7 },
        },
      ],
    });
    const [b, one] = solvedAll(c);
    expect(b!.warnings.join(' ')).toMatch(/may not be a circular arc/);
    expect(one!.warnings.join(' ')).toMatch(/nothing to check/);
    // One station at the middle is the middle ordinate itself: R = 100 exactly.
    expect(one!.radius!.value).toBeCloseTo(100, 9);
  });

  it('offsets that cannot be fitted are exit-3 material naming the field', () => {
    // Stations on a straight line at the chord's height 0 cannot be given (offsets must be > 0),
    // so the impossible case is an arc of more than half a circle: offsets far above C/2.
    const c = caseOf({
      analyses: [
        {
          id: 'y',
          kind: 'yaw',
          offsets: {
            chord: 10,
            stations: [
              { at: 2, offset: 7 },
              { at: 5, offset: 9 },
              { at: 8, offset: 7 },
            ],
          },
          drag: { source: 'entered', value: 0.7 },
        },
      ],
    });
    const r = solveCase(c).analyses[0]!;
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.path).toMatch(/^analyses\[0\]\.offsets\.stations/);
  });
});
