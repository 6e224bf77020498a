import { describe, expect, it } from 'vitest';
import { limitComparison, type LimitComparison } from '../../src/extras/limit-comparison.js';
import type { Case } from '../../src/case/load.js';
import {
  AASHTO_F_SI,
  AASHTO_F_US,
  AASHTO_T,
  STOPPING_METRIC,
  STOPPING_ON_GRADE,
  STOPPING_US,
} from '../engine/aashto-rows.js';
import { caseOf, clean, rel, solved } from './helpers.js';

const K = 5280 / 3600; // ft/s per mph, exact

function run(c: Case, t: number, conflictAt?: number): LimitComparison {
  const r = limitComparison(
    c,
    solved(c),
    conflictAt === undefined ? { reactionTime: t } : { reactionTime: t, conflictAt },
  );
  if (!r.ok) throw new Error(r.reason);
  return r.value;
}

/** One level or graded segment with a single drag factor, all brakes working (n = 1). */
const oneSurface = (
  limit: number,
  f: number,
  grade: number,
  units: 'imperial' | 'metric' = 'imperial',
) =>
  caseOf({
    units,
    postedLimit: limit,
    analyses: [
      {
        id: 's',
        kind: 'skid',
        segments: [{ length: 100, drag: { source: 'entered', value: f }, grade }],
      },
    ],
  });

// AASHTO, A Policy on Geometric Design of Highways and Streets (Green Book 2011/2018), Table 3-1,
// stopping sight distance, t = 2.5 s, a = 11.2 ft/s² (a/g = 0.348): the reaction and braking
// figures of AASHTO's formula (the rows in test/engine/aashto-rows.ts; docs/physics.md, "Check
// values"). Our reaction uses 5280/3600 exactly (AASHTO 1.47) and braking S²/(30 f), within 0.5%
// of AASHTO's braking term.
describe("stopping distance at the posted limit vs AASHTO's stopping sight distance formula (f = 0.348, n = 1, t = 2.5 s)", () => {
  for (const row of STOPPING_US)
    it(`${row.V} mph: ${row.reaction} + ${row.braking} ft`, () => {
      const r = run(oneSurface(row.V, AASHTO_F_US, 0), AASHTO_T);
      expect(rel(r.atLimit.reactionDistance, row.reaction)).toBeLessThan(0.003);
      expect(rel(r.atLimit.brakingDistance.value, row.braking)).toBeLessThan(0.005);
      expect(rel(r.atLimit.stoppingDistance.value, row.reaction + row.braking)).toBeLessThan(0.005);
    });

  // Metric rows of Table 3-1: 0.278 V t + 0.039 V²/a, a = 3.4 m/s²; 50 km/h 34.8 + 28.7 m,
  // 100 km/h 69.5 + 114.7 m. AASHTO's 0.039 is 1/(2 × 3.6²) = 0.0386 rounded up, so
  // its braking column sits about 1% above S²/(254 f) with f = 3.4 / 9.80665: tolerance 1.2%.
  for (const row of STOPPING_METRIC)
    it(`${row.V} km/h: ${row.reaction} + ${row.braking} m`, () => {
      const r = run(oneSurface(row.V, AASHTO_F_SI, 0, 'metric'), AASHTO_T);
      expect(rel(r.atLimit.reactionDistance, row.reaction)).toBeLessThan(0.003);
      expect(rel(r.atLimit.brakingDistance.value, row.braking)).toBeLessThan(0.012);
      expect(rel(r.atLimit.stoppingDistance.value, row.reaction + row.braking)).toBeLessThan(0.012);
    });
});

describe("AASHTO's formula for stopping distance on grades (Green Book Table 3-2; reaction included, rounded up to the foot)", () => {
  for (const row of STOPPING_ON_GRADE)
    it(`${row.V} mph on a ${Math.abs(row.grade)}% ${row.grade < 0 ? 'downgrade' : 'upgrade'}: ${row.distance} ft`, () => {
      const r = run(oneSurface(row.V, AASHTO_F_US, row.grade), AASHTO_T);
      expect(rel(r.atLimit.stoppingDistance.value, row.distance)).toBeLessThan(0.005);
    });
});

describe('a hand-worked case (invented numbers)', () => {
  // 90 ft of marks on one surface, f 0.75, n 1, level, posted 30 mph, t 1.5 s.
  // S = sqrt(30 × 90 × 0.75) = sqrt(2025) = 45.0 mph.
  // This vehicle reacts over 1.4667 × 45 × 1.5 = 99.0 ft; at 30 mph, 1.4667 × 30 × 1.5 = 66.0 ft,
  // so the vehicle at the limit starts braking 33.0 ft before the marks, needs 30² / (30 × 0.75)
  // = 40.0 ft and stops 7.0 ft past the start of the marks: 83.0 ft short of their end; from the
  // point of perception 66 + 40 = 106.0 ft. Slide: v = 66 ft/s, a = 0.75 × 32.174 ft/s², t = 2.735 s.
  const c = caseOf({
    postedLimit: 30,
    analyses: [
      {
        id: 's',
        kind: 'skid',
        marks: [90],
        segments: [{ drag: { source: 'entered', value: 0.75 } }],
      },
    ],
  });
  const r = run(c, 1.5);

  it('figures for this vehicle', () => {
    expect(r.reactionDistance.value).toBeCloseTo(99.0, 9);
    expect(r.slideDuration.value).toBeCloseTo(66 / (0.75 * (9.80665 / 0.3048)), 9);
  });

  it('a vehicle at the posted limit stops 83.0 ft before the end of the marks', () => {
    expect(r.atLimit.reactionDistance).toBeCloseTo(66.0, 9);
    expect(r.atLimit.brakingStartsAt.value).toBeCloseTo(-33.0, 9);
    expect(r.atLimit.brakingDistance.value).toBeCloseTo(40.0, 9);
    expect(r.atLimit.restAt.value).toBeCloseTo(7.0, 9);
    expect(r.atLimit.stoppingDistance.value).toBeCloseTo(106.0, 9);
    expect(r.endOfMarks).toMatchObject({ at: 90, stops: 'yes' });
    expect(r.endOfMarks.margin.value).toBeCloseTo(83.0, 9);
    expect(r.endOfMarks.speedThere.value).toBe(0);
  });

  it('but not before a conflict point 5 ft into the marks: v² = 30² − 30 × 0.75 × 38 = 45, 6.71 mph', () => {
    const k = run(c, 1.5, 5).conflict!;
    expect(k.stops).toBe('no');
    expect(k.speedThere.value).toBeCloseTo(Math.sqrt(45), 9);
    expect(k.margin.value).toBeCloseTo(-2.0, 9);
  });

  it('every number has a step, the reaction time with its published source', () => {
    const withConflict = run(c, 1.5, 5);
    const t = withConflict.steps[0]!;
    expect(t.name).toBe('Perception-reaction time');
    expect(t.inputs.t!.source).toMatch(/Green.*2000/);
    expect(run(c, 2.5).reactionSource).toMatch(/AASHTO/);
    for (const s of withConflict.steps) {
      expect(clean(JSON.stringify(s))).toBe(true);
      expect(s.substituted.length).toBeGreaterThan(0);
      expect(s.why.length).toBeGreaterThan(0);
    }
    expect(withConflict.steps.map((s) => s.name)).toEqual([
      'Perception-reaction time',
      'Distance during perception-reaction, this vehicle',
      'Duration of the slide',
      'Distance during perception-reaction at the posted limit',
      'Where a vehicle at the posted limit starts braking',
      'Braking to rest at the posted limit, on segment 1 (from 33.0 ft before the marks)',
      'Stopping distance at the posted limit, from the point of perception',
      'Does a vehicle at the posted limit stop before the end of the marks?',
      'Does a vehicle at the posted limit stop before the conflict point?',
    ]);
    expect(withConflict.assumptions.join(' ')).toMatch(/before the marks/i);
  });
});

describe('ranges: the answer "depends" when the ends of the inputs disagree', () => {
  // Same case with f 0.75 (0.70 to 0.80). Conflict point 5 ft into the marks.
  // f 0.70: S = sqrt(1890) = 43.47, braking starts 1.4667 × 1.5 × (43.47 − 30) = 29.64 ft before,
  //   needs 900 / 21 = 42.86 ft: rest at 13.2 ft, past the point.
  // f 0.80: S = sqrt(2160) = 46.48, starts 36.25 ft before, needs 37.5 ft: rest at 1.25 ft, short.
  const c = caseOf({
    postedLimit: 30,
    analyses: [
      {
        id: 's',
        kind: 'skid',
        marks: [90],
        segments: [{ drag: { source: 'entered', value: 0.75, low: 0.7, high: 0.8 } }],
      },
    ],
  });
  it('stops at one end and not at the other', () => {
    const r = run(c, 1.5, 5);
    expect(r.conflict!.stops).toBe('depends');
    const restLow = -K * 1.5 * (Math.sqrt(30 * 90 * 0.8) - 30) + 900 / (30 * 0.8);
    const restHigh = -K * 1.5 * (Math.sqrt(30 * 90 * 0.7) - 30) + 900 / (30 * 0.7);
    expect(r.atLimit.restAt.low).toBeCloseTo(restLow, 9);
    expect(r.atLimit.restAt.high).toBeCloseTo(restHigh, 9);
    expect(r.steps.at(-1)!.why).toMatch(/depends/);
  });
});

describe('several surfaces, segment by segment', () => {
  // Invented: 20 ft at f 0.80, then 60 ft at f 0.50, level, n 1; posted 35 mph, t 1.5 s.
  const c = caseOf({
    postedLimit: 35,
    analyses: [
      {
        id: 's',
        kind: 'skid',
        segments: [
          { label: 'asphalt', length: 20, drag: { source: 'entered', value: 0.8 } },
          { label: 'gravel', length: 60, drag: { source: 'entered', value: 0.5 } },
        ],
      },
    ],
  });
  it('brakes through the first surface and stops on the second', () => {
    // Worked here independently: S² = 30 (20 × 0.8 + 60 × 0.5) = 1380.
    const S = Math.sqrt(1380);
    const brakeAt = K * 1.5 * (35 - S); // negative: before the marks, on asphalt
    const v2 = 35 ** 2 - 30 * 0.8 * (20 - brakeAt); // leaving the asphalt
    const rest = 20 + v2 / (30 * 0.5);
    const r = run(c, 1.5);
    expect(r.atLimit.brakingStartsAt.value).toBeCloseTo(brakeAt, 9);
    expect(r.atLimit.restAt.value).toBeCloseTo(rest, 9);
    expect(r.endOfMarks.stops).toBe('yes');
    expect(r.endOfMarks.margin.value).toBeCloseTo(80 - rest, 9);
    const leaving = r.steps.find((s) =>
      s.name.startsWith('Speed at the posted limit leaving asphalt'),
    )!;
    expect(leaving.result).toBeCloseTo(Math.sqrt(v2), 9);
    // Slide duration: on each segment (v_in − v_out) / (f g), v in ft/s.
    const g = 9.80665 / 0.3048;
    const S2 = Math.sqrt(30 * 60 * 0.5);
    expect(r.slideDuration.value).toBeCloseTo((K * (S - S2)) / (0.8 * g) + (K * S2) / (0.5 * g), 9);
  });

  it("a limit above this vehicle's speed: braking starts after the marks, stopping beyond them", () => {
    const fast = caseOf({ ...c, postedLimit: 50 });
    // S = sqrt(1380) = 37.15 mph; braking starts 1.4667 × 1.5 × (50 − 37.15) = 28.3 ft into the
    // marks, past the 20 ft of asphalt: on the gravel.
    const r = run(fast, 1.5);
    const S = Math.sqrt(1380);
    const brakeAt = K * 1.5 * (50 - S);
    expect(brakeAt).toBeGreaterThan(20);
    const leftAt80 = 2500 - 30 * 0.5 * (80 - brakeAt);
    expect(r.endOfMarks.stops).toBe('no');
    expect(r.endOfMarks.speedThere.value).toBeCloseTo(Math.sqrt(leftAt80), 9);
    expect(r.atLimit.restAt.value).toBeCloseTo(80 + leftAt80 / (30 * 0.5), 9);
    expect(r.assumptions.join(' ')).toMatch(/Beyond the marks/);
  });
});

describe('what it refuses', () => {
  it('a yaw analysis, a case without a posted limit, a bad reaction time or conflict point', () => {
    const yaw = caseOf({
      postedLimit: 30,
      analyses: [
        {
          id: 'y',
          kind: 'yaw',
          chord: 40,
          middleOrdinate: 2.5,
          drag: { source: 'entered', value: 0.7 },
        },
      ],
    });
    expect(limitComparison(yaw, solved(yaw), { reactionTime: 1.5 }).ok).toBe(false);
    const noLimit = caseOf({
      analyses: [
        {
          id: 's',
          kind: 'skid',
          marks: [90],
          segments: [{ drag: { source: 'entered', value: 0.75 } }],
        },
      ],
    });
    expect(limitComparison(noLimit, solved(noLimit), { reactionTime: 1.5 })).toMatchObject({
      ok: false,
      path: 'postedLimit',
    });
    const c = oneSurface(30, 0.7, 0);
    expect(limitComparison(c, solved(c), { reactionTime: -1 }).ok).toBe(false);
    expect(limitComparison(c, solved(c), { reactionTime: Number.NaN }).ok).toBe(false);
    expect(limitComparison(c, solved(c), { reactionTime: 1.5, conflictAt: -3 }).ok).toBe(false);
  });
});

describe('metric slide ending at a known speed (invented numbers)', () => {
  // 22 m asphalt f 0.70, 1.5 m kerb strip f 0.50, 9 m grass f 0.35, level, n 1; 15 km/h at the end.
  // Working back (S² = S_end² + 254 d f): 225 + 800.1 = 1025.1 (32.02 km/h); + 190.5 = 1215.6
  // (34.87); + 3911.6 = 5127.2 (71.60). Duration per segment (v_in − v_out) / 3.6 / (f g):
  // 1.486 + 0.161 + 1.377 = 3.02 s.
  const c = caseOf({
    units: 'metric',
    postedLimit: 50,
    analyses: [
      {
        id: 's',
        kind: 'skid',
        segments: [
          { label: 'asphalt', length: 22, drag: { source: 'entered', value: 0.7 } },
          { label: 'kerb strip', length: 1.5, drag: { source: 'entered', value: 0.5 } },
          { label: 'grass', length: 9, drag: { source: 'entered', value: 0.35 } },
        ],
        end: { mode: 'speed', speed: 15 },
      },
    ],
  });
  it('slide duration and the stop at 50 km/h', () => {
    const r = run(c, 1.5);
    const g = 9.80665;
    const v = [Math.sqrt(5127.2), Math.sqrt(1215.6), Math.sqrt(1025.1), 15];
    const t = [0.7, 0.5, 0.35].reduce((s, f, j) => s + (v[j]! - v[j + 1]!) / 3.6 / (f * g), 0);
    expect(r.slideDuration.value).toBeCloseTo(t, 3);
    // At 50 km/h: reacts 50 × 1.5 / 3.6 = 20.83 m, starts braking 20.83 − 71.60 × 1.5 / 3.6 = −9.00 m,
    // needs 50² / (254 × 0.7) = 14.06 m: rest 5.06 m into the marks, 27.4 m short of their end.
    expect(r.atLimit.restAt.value).toBeCloseTo(
      (50 * 1.5) / 3.6 - (Math.sqrt(5127.2) * 1.5) / 3.6 + 2500 / (254 * 0.7),
      2,
    );
    expect(r.endOfMarks.stops).toBe('yes');
    expect(r.steps.find((s) => s.name === 'Duration of the slide')!.substituted).toMatch(
      /= 3\.0 s$/,
    );
  });
});
