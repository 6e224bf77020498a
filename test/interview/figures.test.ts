import { describe, expect, it } from 'vitest';
import { buildCase, solveDraft } from '../../src/interview/index.js';
import { loadCase, type Case } from '../../src/case/load.js';
import { solveCase, type AnalysisOutcome } from '../../src/engine/index.js';
import { fill, start } from './drive.js';

// An invented case: a two-surface slide down a slope with a partly failed rear brake, then a
// banked yaw. Typed as an investigator would, with a unit on one answer.
const TYPED: Record<string, string> = {
  'details.reference': 'INV-2291',
  units: 'f',
  limit: '40',
  'vehicle.label': 'Unit 2, grey van',
  'vehicle.brakes': 'w',
  'vehicle.share': '0.6',
  'vehicle.wheel.rl': 'n',
  'vehicle.wheel.rr': 'p',
  'vehicle.wheel.rr.fraction': '0.5',
  'a0.look': 'd',
  'a0.surfaces': 's',
  'a0.count': '2',
  'a0.marks': '77 75',
  'a0.segcount': '2',
  'a0.seg0.length': '52',
  'a0.seg0.label': 'asphalt lane',
  'a0.seg0.drag.source': 'e',
  'a0.seg0.drag.value': '0.72 (0.68-0.76)',
  'a0.seg0.grade.dir': 'd',
  'a0.seg0.grade.pct': '3',
  'a0.seg1.length': '24',
  'a0.seg1.label': 'gravel shoulder',
  'a0.seg1.drag.source': 't',
  'a0.seg1.drag.surface': 'gravel-loose',
  'a0.seg1.drag.value': '',
  'a0.seg1.grade.dir': 'd',
  'a0.seg1.grade.pct': '1',
  'a0.end': 'r',
  'a0.more': 'y',
  'a1.look': 'y',
  'a1.chord': '40',
  'a1.ordinate': '2 ft 6 in',
  'a1.drag.source': 'e',
  'a1.drag.value': '0.70 +/- 0.05',
  'a1.bank.dir': 't',
  'a1.bank.pct': '4',
  'a1.path': 'm',
  'a1.more': 'n',
};

// The same case written by hand in the case-file format.
const HAND: Case = {
  format: 'skidcase-case',
  version: 1,
  id: 'inv-2291',
  units: 'imperial',
  postedLimit: 40,
  vehicle: {
    frontAxleShare: 0.6,
    brakes: { mode: 'wheels', frontLeft: 1, frontRight: 1, rearLeft: 0, rearRight: 0.5 },
  },
  analyses: [
    {
      id: 'skid-1',
      kind: 'skid',
      marks: [77, 75],
      segments: [
        { length: 52, drag: { source: 'entered', value: 0.72, low: 0.68, high: 0.76 }, grade: -3 },
        {
          length: 24,
          drag: { source: 'table', surface: 'gravel-loose', value: 0.55, low: 0.4, high: 0.7 },
          grade: -1,
        },
      ],
      end: { mode: 'stop' },
    },
    {
      id: 'yaw-2',
      kind: 'yaw',
      chord: 40,
      middleOrdinate: 2.5,
      drag: { source: 'entered', value: 0.7, low: 0.65, high: 0.75 },
      superelevation: 4,
    },
  ],
};

const speedOf = (a: AnalysisOutcome | undefined) => {
  if (!a?.ok) throw new Error(`not solved: ${a && !a.ok ? a.reason : 'missing'}`);
  return { ...a.solution.speed, minimum: a.solution.minimum };
};

describe('a case typed through the interview gives the figures of the same case written by hand', () => {
  const s = fill(start(), TYPED);
  const built = buildCase(s, { id: 'inv-2291' });
  const loaded = loadCase(JSON.parse(JSON.stringify(built)));

  it('builds a valid case with both analyses', () => {
    expect(loaded.ok).toBe(true);
    expect(built.analyses.map((a) => a.kind)).toEqual(['skid', 'yaw']);
  });

  it('the two-surface downhill slide with a partly failed brake matches solveCase and the formula', () => {
    const typed = speedOf(solveCase(built).analyses[0]);
    const hand = speedOf(solveCase(HAND).analyses[0]);
    expect(typed).toEqual(hand);
    // Independent: n = 0.6/2 (1 + 1) + 0.4/2 (0 + 0.5) = 0.70 (static weight shares);
    // S^2 = 30 sum d_i (f_i n + G_i), C = 30 for mph and ft (the trade constant, 2 g (3600/5280)² = 29.91 rounded).
    const n = 0.7;
    const S = (f1: number, f2: number) =>
      Math.sqrt(30 * (52 * (f1 * n - 0.03) + 24 * (f2 * n - 0.01)));
    expect(typed.value).toBeCloseTo(S(0.72, 0.55), 6);
    expect(typed.low).toBeCloseTo(S(0.68, 0.4), 6);
    expect(typed.high).toBeCloseTo(S(0.76, 0.7), 6);
    expect(typed.minimum).toBe(Math.floor(S(0.68, 0.4)));
  });

  it('the banked yaw matches solveCase and the critical speed formula', () => {
    const typed = speedOf(solveCase(built).analyses[1]);
    const hand = speedOf(solveCase(HAND).analyses[1]);
    expect(typed).toEqual(hand);
    // Independent: R = C^2/(8M) + M/2 = 1600/20 + 1.25 = 81.25 ft (circle geometry);
    // S = sqrt(15 R (f + e) / (1 - f e)) (critical speed on a banked curve).
    const S = (f: number) => Math.sqrt((15 * 81.25 * (f + 0.04)) / (1 - f * 0.04));
    expect(typed.value).toBeCloseTo(S(0.7), 6);
    expect(typed.low).toBeCloseTo(S(0.65), 6);
    expect(typed.high).toBeCloseTo(S(0.75), 6);
  });

  it('the running chain shows the same figures as the final case', () => {
    const draft = solveDraft(s);
    expect(draft.analyses.map(speedOf)).toEqual(solveCase(HAND).analyses.map(speedOf));
    expect(draft.postedLimit).toEqual(solveCase(HAND).postedLimit);
  });
});

describe('a metric yaw, banked away from the centre, with sled pulls and the centre-of-mass path', () => {
  // Invented: chord 15 m, ordinate 0.9 m, sled 34 kg pulled at 25, 24.5 and 26 kg, bank 2% away,
  // track width 1.6 m.
  const s = fill(start(), {
    units: 'm',
    'vehicle.brakes': 'a',
    'a0.look': 'y',
    'a0.chord': '15',
    'a0.ordinate': '90 cm',
    'a0.drag.source': 's',
    'a0.drag.weight': '34',
    'a0.drag.pulls': '25 24.5 26',
    'a0.bank.dir': 'a',
    'a0.bank.pct': '2',
    'a0.path': 'c',
    'vehicle.trackWidth': '1.6',
    'a0.more': 'n',
  });

  it('gives the critical speed of the formula, with each end from the matching end of f', () => {
    const got = speedOf(solveCase(buildCase(s, { id: 'metric-yaw' })).analyses[0]);
    // Independent: R = 15²/(8 × 0.9) + 0.9/2 = 31.7 m; path R - T/2 = 30.9 m (common practice);
    // f_i = pull / weight, mean and extremes (case-file format); e = -0.02 (away from the centre);
    // S = sqrt(127 R (f + e) / (1 - f e)) (banked curve, metric).
    const R = 15 ** 2 / (8 * 0.9) + 0.9 / 2 - 1.6 / 2;
    const S = (f: number) => Math.sqrt((127 * R * (f - 0.02)) / (1 + f * 0.02));
    expect(got.value).toBeCloseTo(S((25 + 24.5 + 26) / 3 / 34), 6);
    expect(got.low).toBeCloseTo(S(24.5 / 34), 6);
    expect(got.high).toBeCloseTo(S(26 / 34), 6);
  });
});
