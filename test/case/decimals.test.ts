import { describe, expect, it } from 'vitest';
import { describeIssue } from '../../src/case/issues.js';
import { loadCase } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';

// `decimals` records how many decimals a figure was typed with (docs/case-file.md); it never
// changes a figure, and a bad one is refused naming its field.
const caseWith = (drag: Record<string, unknown>, mark: unknown = 100) => ({
  format: 'skidcase-case',
  version: 1,
  id: 'decimals',
  units: 'imperial',
  vehicle: { brakes: { mode: 'all' } },
  analyses: [{ id: 's', kind: 'skid', marks: [mark], segments: [{ drag }] }],
});

describe('decimals as typed', () => {
  it('is accepted on a quantity and an entered drag factor, with no warning, and changes no figure', () => {
    const plain = loadCase(caseWith({ source: 'entered', value: 0.7 }));
    const typed = loadCase(
      caseWith({ source: 'entered', value: 0.7, decimals: 2 }, { value: 100, decimals: 1 }),
    );
    if (!plain.ok || !typed.ok) throw new Error('not loaded');
    expect(typed.unknownFields).toEqual([]);
    const a = solveCase(plain.case).analyses[0];
    const b = solveCase(typed.case).analyses[0];
    // S = sqrt(30 × 100 × 0.70) = 45.8 mph either way (slide to stop).
    expect(b?.ok && b.solution.speed.value).toBeCloseTo(Math.sqrt(30 * 100 * 0.7), 9);
    expect(a?.ok && a.solution.speed).toEqual(b?.ok && b.solution.speed);
  });

  it.each([
    [
      { source: 'entered', value: 0.7, decimals: 1.5 },
      100,
      'analyses[0].segments[0].drag.decimals',
    ],
    [{ source: 'entered', value: 0.7, decimals: -1 }, 100, 'analyses[0].segments[0].drag.decimals'],
    [
      { source: 'entered', value: 0.7 },
      { value: 100, decimals: 12 },
      'analyses[0].marks[0].decimals',
    ],
  ])('a bad decimals is refused naming its field (%j)', (drag, mark, where) => {
    const r = loadCase(caseWith(drag, mark));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const text = r.issues.map(describeIssue).join('\n');
    expect(text).toContain(where);
    expect(text).toContain('decimals must be a whole number from 0 to 9');
  });
});
