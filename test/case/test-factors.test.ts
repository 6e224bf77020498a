import { describe, expect, it } from 'vitest';
import { describeIssue } from '../../src/case/issues.js';
import { loadCase } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';

// Test skids given as the drag factors worked out from them (docs/case-file.md, "Drag factor").
const caseWith = (drag: Record<string, unknown>) => ({
  format: 'skidcase-case',
  version: 1,
  id: 'test-factors',
  units: 'imperial',
  vehicle: { brakes: { mode: 'all' } },
  analyses: [{ id: 's', kind: 'skid', marks: [60], segments: [{ drag }] }],
});
const issues = (drag: Record<string, unknown>) => {
  const r = loadCase(caseWith(drag));
  return r.ok ? [] : r.issues.map(describeIssue);
};

describe('test skids as factors in the case file', () => {
  it('are read with no unknown field and solve from their mean', () => {
    const r = loadCase(
      caseWith({
        source: 'test-skids',
        factors: [0.68, 0.71, 0.7],
        testGrade: 0,
        gradeTakenOut: false,
      }),
    );
    if (!r.ok) throw new Error(r.issues.map(describeIssue).join('; '));
    expect(r.unknownFields).toEqual([]);
    const a = solveCase(r.case).analyses[0];
    if (!a?.ok) throw new Error('not solved');
    // S = sqrt(30 × 60 × mean(0.68, 0.71, 0.70)), slide to stop.
    expect(a.solution.speed.value).toBeCloseTo(Math.sqrt(30 * 60 * ((0.68 + 0.71 + 0.7) / 3)), 9);
    expect(a.solution.speed.low).toBeCloseTo(Math.sqrt(30 * 60 * 0.68), 9);
  });

  it('take tests or factors, one of the two, and a drag factor each', () => {
    expect(
      issues({ source: 'test-skids', factors: [0.7], tests: [{ speed: 30, distance: 40 }] }),
    ).toEqual(['analyses[0].segments[0].drag.factors: give either tests or factors, not both']);
    expect(issues({ source: 'test-skids' })).toEqual([
      'analyses[0].segments[0].drag.tests: give tests (speed and distance) or factors (drag factors worked out from them)',
    ]);
    expect(issues({ source: 'test-skids', factors: [0.7, 3] }).join('\n')).toMatch(
      /^analyses\[0\]\.segments\[0\]\.drag\.factors\[1\]: test drag factor must be at most 2/,
    );
    expect(
      issues({ source: 'test-skids', tests: [{ speed: 30, distance: 40 }], gradeTakenOut: true }),
    ).toEqual([
      'analyses[0].segments[0].drag.gradeTakenOut: gradeTakenOut goes with factors only (tests always have their grade taken off)',
    ]);
  });
});
