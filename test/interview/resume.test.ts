import { describe, expect, it } from 'vitest';
import {
  buildCase,
  firstOpenQuestion,
  questionStates,
  REVIEW,
  stateFromCase,
  summaryOfDone,
} from '../../src/interview/index.js';
import { EDITED_NOTICE } from '../../src/interview/from-case.js';
import { loadCase, type Case } from '../../src/case/load.js';
import { solveCase, type CaseSolution } from '../../src/engine/index.js';
import { fillUntil, start, step } from './drive.js';

// Invented answers of a yaw case in metric units, on a road banked away from the curve.
const YAW: Record<string, string> = {
  'details.reference': 'HW-77',
  units: 'm',
  limit: '80',
  'vehicle.brakes': 'a',
  'a0.look': 'y',
  'a0.chord': '15',
  'a0.ordinate': '0.9',
  'a0.drag.source': 's',
  'a0.drag.weight': '34',
  'a0.drag.pulls': '25 24.5 26',
  'a0.bank.dir': 'a',
  'a0.bank.pct': '2',
  'a0.path': 'c',
  'vehicle.trackWidth': '1.6',
};

const issues = (c: Case) => {
  const r = loadCase(JSON.parse(JSON.stringify(c)));
  return r.ok ? [] : r.issues.map((i) => `${i.path}: ${i.message}`);
};

const figures = (sol: CaseSolution) =>
  sol.analyses.map((a) =>
    a.ok ? { id: a.solution.id, speed: a.solution.speed, minimum: a.solution.minimum } : a.reason,
  );

describe('buildCase', () => {
  it('passes loadCase after every answer of a full interview; the analysis enters once complete', () => {
    let s = start();
    const withAnalysis: string[] = [];
    for (let n = 0; s.cursor !== REVIEW && n < 100; n++) {
      const c = buildCase(s, { id: 'hw-77', created: '2026-11-30T10:00:00Z' });
      expect(issues(c)).toEqual([]);
      if (c.analyses.length > 0) withAnalysis.push(s.cursor);
      s = step(s, YAW);
    }
    const last = buildCase(s, { id: 'hw-77' });
    expect(last.analyses).toHaveLength(1);
    // Complete once the track width the path needs is given: only "another analysis?" and the
    // distribution at the end of the case are then left.
    expect(withAnalysis).toEqual(['a0.more', 'sampling.shape']);
    expect(last.analyses[0]).toEqual({
      id: 'yaw-1',
      kind: 'yaw',
      chord: 15,
      middleOrdinate: 0.9,
      drag: { source: 'sled', weight: 34, pulls: [25, 24.5, 26] },
      pathAdjustment: 'half-track',
      superelevation: -2,
    });
    expect(last.vehicle.trackWidth).toBe(1.6);
    expect(last.details).toEqual({ reference: 'HW-77' });
    expect(last.postedLimit).toBe(80);
  });

  it('saves the interview so a half-finished case resumes where it stopped', () => {
    const half = fillUntil(start('brisk'), YAW, 'a0.drag.source');
    const c = buildCase(half, { id: 'hw-77' });
    expect(c.analyses).toEqual([]);
    expect(c.interview).toEqual({
      version: 1,
      answers: half.answers,
      cursor: 'a0.drag.source',
      mode: 'brisk',
    });
    const back = stateFromCase(JSON.parse(JSON.stringify(c)));
    expect(back.answers).toEqual(half.answers);
    expect(back.mode).toBe('brisk');
    expect(firstOpenQuestion(back)).toBe('a0.drag.source');
    expect(summaryOfDone(back)).toEqual([
      'Case HW-77: metres and km/h, posted limit 80 km/h',
      // A yaw-only case is never asked about the brakes.
      'Vehicle: brakes not needed (no slide)',
      // Open in the analysis: drag source, bank, path (the source's and bank's follow-ups not yet
      // applicable; "another analysis?" not counted). Applicable: 7 case + 1 vehicle + 9 yaw
      // (look, label, measure, chord, ordinate, drag, bank, path, more) + 1 distribution = 18.
      'Analysis 1 - critical speed: yaw marks; 3 questions left',
      '13 of 18 questions answered',
    ]);
  });
});

describe('resuming a saved case', () => {
  const done = (() => {
    let s = start();
    while (s.cursor !== REVIEW) s = step(s, YAW);
    return s;
  })();
  const saved = () => {
    const r = loadCase(
      JSON.parse(JSON.stringify(buildCase(done, { id: 'hw-77', created: '2026-11-30T10:00:00Z' }))),
    );
    if (!r.ok) throw new Error('not a valid case');
    return r.case;
  };

  it('uses the saved answers when the file still says what they make', () => {
    const back = stateFromCase(saved());
    expect(back.answers).toEqual(done.answers);
    expect(back.notice).toBeUndefined();
  });

  it('reads the fields again when the file was edited by hand after saving', () => {
    const c = saved();
    const yaw = c.analyses[0]!;
    if (yaw.kind !== 'yaw') throw new Error('expected the yaw analysis');
    yaw.chord = 16.5;
    const back = stateFromCase(c);
    expect(back.notice).toBe(EDITED_NOTICE);
    expect(back.answers['a0.chord']!.text).toBe('16.5');
    expect(figures(solveCase(buildCase(back, { id: c.id })))).toEqual(figures(solveCase(c)));
  });
});

// A hand-written case (no interview) with most of the format's branches: invented figures.
const HAND: Case = {
  format: 'skidcase-case',
  version: 1,
  id: 'canal-st-14',
  units: 'imperial',
  details: { reference: 'C-14', investigator: 'Ofc. Ruiz' },
  postedLimit: 35,
  vehicle: {
    label: 'Unit 1',
    frontAxleShare: { value: 0.58, low: 0.55, high: 0.61 },
    trackWidth: 5.1,
    brakes: {
      mode: 'wheels',
      frontLeft: 1,
      frontRight: { value: 0.6, low: 0.5, high: 0.7 },
      rearLeft: 1,
      rearRight: 0,
    },
  },
  analyses: [
    {
      id: 'slide-east',
      kind: 'skid',
      label: 'eastbound',
      marks: [{ value: 70.5, low: 70, high: 71 }, 69],
      distanceRule: 'longest',
      segments: [
        {
          length: 50,
          drag: {
            source: 'test-skids',
            tests: [
              { speed: 30, distance: 40 },
              { speed: 30, distance: 43 },
            ],
          },
          grade: { value: -2, low: -2.5, high: -1.5 },
        },
        {
          label: 'dirt',
          length: 21,
          drag: { source: 'table', surface: 'noon-gravel-dirt', value: 0.35, low: 0.3, high: 0.4 },
          grade: 1,
        },
      ],
      end: { mode: 'speed', speed: { value: 15, low: 12, high: 18 }, basis: 'momentum analysis' },
    },
    {
      id: 'yaw-b',
      kind: 'yaw',
      chord: 42,
      middleOrdinate: 3.1,
      drag: { source: 'table', surface: 'wet chip seal', value: 0.6, low: 0.5, high: 0.65 },
      superelevation: 3,
      pathAdjustment: 'half-track',
    },
    {
      id: 'slide-one',
      kind: 'skid',
      marks: [33, 35],
      segments: [{ drag: { source: 'decelerometer', readings: [0.68, 0.72] } }],
    },
  ],
};

describe('stateFromCase for a hand-written case', () => {
  const s = stateFromCase(HAND);

  it('derives answers for every field, with nothing open and nothing unused but the meta ids', () => {
    expect(s.cursor).toBe(REVIEW);
    expect(questionStates(s).filter((q) => q.status !== 'answered')).toEqual([]);
    expect(s.answers['a0.seg0.grade.dir']!.text).toBe('downhill');
    expect(s.answers['a0.seg0.grade.pct']!.text).toBe('2 (1.5-2.5)');
    expect(s.answers['a1.drag.surface']!.text).toBe('other');
    expect(s.answers['a1.drag.surfaceName']!.text).toBe('wet chip seal');
  });

  it('rebuilds a case with the same figures and ids', () => {
    const rebuilt = buildCase(s, { id: HAND.id });
    expect(issues(rebuilt)).toEqual([]);
    expect(figures(solveCase(rebuilt))).toEqual(figures(solveCase(HAND)));
    expect(rebuilt.analyses.map((a) => a.id)).toEqual(['slide-east', 'yaw-b', 'slide-one']);
    // The same case, with the format's defaults for the last slide written out.
    const explicit = structuredClone(HAND);
    Object.assign(explicit.analyses[2]!, { distanceRule: 'average', end: { mode: 'stop' } });
    // Test skids without a recorded grade are read as run elsewhere, on level ground: 0 written out.
    const first = explicit.analyses[0]!;
    if (first.kind === 'skid' && first.segments[0]!.drag.source === 'test-skids')
      first.segments[0]!.drag.testGrade = 0;
    expect({ ...rebuilt, interview: undefined }).toEqual({ ...explicit, interview: undefined });
  });
});

describe('fields the interview does not ask about', () => {
  // Invented: a yaw measured by offsets, a time-distance block, sampling settings, a field the
  // format does not know, and a front-axle share that no answer uses (brakes all working).
  const EXTRA: Case = {
    format: 'skidcase-case',
    version: 1,
    id: 'kept-fields',
    units: 'imperial',
    sampling: { shape: 'uniform', samples: 5000, seed: 7 },
    vehicle: { frontAxleShare: 0.57, brakes: { mode: 'all' } },
    analyses: [
      {
        id: 'skid-a',
        kind: 'skid',
        marks: [60],
        segments: [{ drag: { source: 'entered', value: 0.7 } }],
        timeDistance: { reactionTime: 1.5, conflictAt: 40 },
      },
      {
        id: 'yaw-a',
        kind: 'yaw',
        offsets: {
          chord: 40,
          stations: [
            { at: 10, offset: 1.9 },
            { at: 20, offset: 2.5 },
            { at: 30, offset: 1.9 },
          ],
        },
        drag: { source: 'entered', value: 0.7 },
      },
    ],
  } as Case;
  (EXTRA as Record<string, unknown>).witness = 'kept as written';

  it('are kept through resume and rebuild, with the same figures', () => {
    const s = stateFromCase(EXTRA);
    expect(s.cursor).toBe(REVIEW);
    const rebuilt = buildCase(s, { id: EXTRA.id });
    expect(issues(rebuilt)).toEqual([]);
    const explicit = structuredClone(EXTRA);
    Object.assign(explicit.analyses[0]!, { end: { mode: 'stop' } });
    Object.assign(explicit.analyses[1]!, { pathAdjustment: 'none' });
    expect({ ...rebuilt, interview: undefined }).toEqual({ ...explicit, interview: undefined });
    expect(figures(solveCase(rebuilt))).toEqual(figures(solveCase(EXTRA)));
  });

  it('a yaw measured by offsets is not asked for a chord and ordinate, and hidden answers are not listed', () => {
    const listed = questionStates(stateFromCase(EXTRA)).map((q) => q.id);
    expect(listed).toContain('a1.drag.value');
    expect(listed).not.toContain('a1.chord');
    expect(listed.some((id) => id.endsWith('.keep') || id.endsWith('.id'))).toBe(false);
  });
});
