import { describe, expect, it } from 'vitest';
import { loadCase } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';

// docs/physics.md, "Look of the marks": the caveats for ABS, skip and gap skids are common practice.
const base = (appearance?: string) => ({
  format: 'skidcase-case',
  version: 1,
  id: 'look',
  units: 'imperial',
  vehicle: { brakes: { mode: 'all' } },
  analyses: [
    {
      id: 's',
      kind: 'skid',
      ...(appearance ? { appearance } : {}),
      marks: [60],
      segments: [{ drag: { source: 'entered', value: 0.7 } }],
    },
  ],
});

function assumptionsFor(appearance?: string): string[] {
  const r = loadCase(base(appearance));
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  const a = solveCase(r.case).analyses[0]!;
  if (!a.ok) throw new Error(a.reason);
  return a.solution.assumptions;
}

describe("the marks' appearance carries its caveat into the chain (common practice)", () => {
  it('anti-lock marks: the figure is an estimate', () => {
    expect(assumptionsFor('abs').join(' ')).toMatch(/anti-lock.*estimate/);
  });
  it('skip skid: gaps count as sliding distance', () => {
    expect(assumptionsFor('skip').join(' ')).toMatch(/gaps included, counts as sliding distance/);
  });
  it('gap skid: gaps are not braking', () => {
    expect(assumptionsFor('gap').join(' ')).toMatch(/gaps are not braking/);
  });
  it('locked-wheel marks, or no appearance given, add no caveat', () => {
    expect(assumptionsFor('locked')).toEqual(assumptionsFor());
    expect(assumptionsFor().join(' ')).not.toMatch(/anti-lock|skip skid|gap skid/i);
  });
  it('the appearance does not change the number: S = sqrt(30 × 60 × 0.7) = 35.5 mph either way', () => {
    for (const look of ['abs', 'skip', 'gap', 'locked']) {
      const r = loadCase(base(look));
      if (!r.ok) throw new Error('invalid');
      const a = solveCase(r.case).analyses[0]!;
      expect(a.ok && a.solution.speed.value).toBeCloseTo(Math.sqrt(30 * 60 * 0.7), 9);
    }
  });
  it('an unknown appearance is an invalid file naming the field', () => {
    const r = loadCase(base('ABS'));
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.issues).toContainEqual({
        path: 'analyses[0].appearance',
        message: 'appearance must be locked, abs, skip or gap',
      });
  });
});
