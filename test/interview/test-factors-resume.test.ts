import { describe, expect, it } from 'vitest';
import { buildCase, questionStates, REVIEW, stateFromCase } from '../../src/interview/index.js';
import { loadCase, type Case } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';

// A case file with drag factors from test skids, in each form the interview writes: on a sloped
// segment's own stretch (the grade still in them), elsewhere and level-ground already (a yaw), and
// on a level stretch. Opened in the interview, every answer is derived and the case rebuilt as it
// was. Invented numbers.
const HAND: Case = {
  format: 'skidcase-case',
  version: 1,
  id: 'test-factors-resume',
  units: 'imperial',
  vehicle: { brakes: { mode: 'all' } },
  analyses: [
    {
      id: 'slide-a',
      kind: 'skid',
      marks: [60, 62],
      distanceRule: 'average',
      segments: [
        {
          drag: {
            source: 'test-skids',
            factors: [0.68, 0.71, { value: 0.7, decimals: 2 }],
            testGrade: -2,
            gradeTakenOut: false,
          },
          grade: -2,
        },
      ],
      end: { mode: 'stop' },
    },
    {
      id: 'yaw-a',
      kind: 'yaw',
      chord: 44,
      middleOrdinate: 3.5,
      drag: { source: 'test-skids', factors: [0.74, 0.76], testGrade: 3, gradeTakenOut: true },
      superelevation: 0,
      pathAdjustment: 'none',
    },
  ],
};

describe('test factors in a case file opened in the interview', () => {
  const s = stateFromCase(HAND);

  it('answers every question, the factors and whether their grade is taken out among them', () => {
    expect(s.cursor).toBe(REVIEW);
    expect(questionStates(s).filter((q) => q.status !== 'answered')).toEqual([]);
    expect(s.answers['a0.seg0.drag.tests']!.text).toBe('0.68, 0.71, 0.70');
    expect(s.answers['a0.seg0.drag.testWhere']!.text).toBe('same');
    expect(s.answers['a0.seg0.drag.factorsGrade']!.text).toBe('on-grade');
    expect(s.answers['a1.drag.factorsGrade']!.text).toBe('level');
  });

  it('rebuilds the same drag factors and figures', () => {
    const rebuilt = buildCase(s, { id: HAND.id });
    const loaded = loadCase(JSON.parse(JSON.stringify(rebuilt)));
    expect(loaded.ok).toBe(true);
    const drags = rebuilt.analyses.map((a) =>
      a.kind === 'skid' ? a.segments[0]!.drag : a.kind === 'yaw' ? a.drag : undefined,
    );
    // `gradeTakenOut: false` is the default, written only when true.
    expect(drags).toEqual([
      {
        source: 'test-skids',
        factors: [0.68, 0.71, { value: 0.7, decimals: 2 }],
        testGrade: -2,
      },
      { source: 'test-skids', factors: [0.74, 0.76], gradeTakenOut: true, testGrade: 3 },
    ]);
    const speeds = (c: Case) =>
      solveCase(c).analyses.map((a) => (a.ok ? a.solution.speed : a.reason));
    expect(speeds(rebuilt)).toEqual(speeds(HAND));
  });
});
