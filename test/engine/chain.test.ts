import { describe, expect, it } from 'vitest';
import { solveCase } from '../../src/engine/solve-case.js';
import { sensitivity } from '../../src/extras/sensitivity.js';
import { caseOf, rel } from './helpers.js';

// Phases in sequence: the end speed of a slide is the speed where the next analysis begins. The
// expected figures are worked here from the formulas (combined speed S² = S_end² + C Σ d (f n +
// G/100), C = 30; critical speed S = sqrt(15 R (f + e)/(1 − f e)); R = C²/(8M) + M/2, circle
// geometry), not read from the program.

const slide = (id: string, end: unknown, extra: Record<string, unknown> = {}) => ({
  id,
  kind: 'skid',
  marks: [{ value: 52, low: 51, high: 53 }],
  segments: [
    {
      drag: { source: 'entered', value: 0.72, low: 0.66, high: 0.78 },
      grade: { value: 2, low: 1.5, high: 2.5 },
    },
  ],
  end,
  ...extra,
});
const yaw = {
  id: 'yaw-1',
  kind: 'yaw',
  chord: { value: 42, low: 41.8, high: 42.2 },
  middleOrdinate: { value: 2.6, low: 2.55, high: 2.65 },
  drag: { source: 'entered', value: 0.7, low: 0.65, high: 0.75 },
};

const R = (c: number, m: number) => (c * c) / (8 * m) + m / 2;
const yawS = (c: number, m: number, f: number) => Math.sqrt(15 * f * R(c, m));
const combined = (end: number, d: number, f: number, G: number, n = 1) =>
  Math.sqrt(end * end + 30 * d * (f * n + G / 100));

describe('a slide that runs into a yaw', () => {
  const c = caseOf({ analyses: [slide('skid-1', { mode: 'analysis', analysis: 'yaw-1' }), yaw] });
  const sol = solveCase(c);
  const s = sol.analyses[0]!;
  const y = sol.analyses[1]!;

  it('takes the yaw’s speed as its end speed: value, low from low, high from high', () => {
    expect(s.ok && y.ok).toBe(true);
    if (!s.ok || !y.ok) return;
    const sv = yawS(42, 2.6, 0.7);
    const sl = yawS(41.8, 2.65, 0.65); // R low: chord low, ordinate high
    const sh = yawS(42.2, 2.55, 0.75);
    expect(rel(y.solution.speed.value, sv)).toBeLessThan(1e-12);
    expect(rel(s.solution.speed.value, combined(sv, 52, 0.72, 2))).toBeLessThan(1e-12);
    expect(rel(s.solution.speed.low, combined(sl, 51, 0.66, 1.5))).toBeLessThan(1e-12);
    expect(rel(s.solution.speed.high, combined(sh, 53, 0.78, 2.5))).toBeLessThan(1e-12);
  });

  it('the steps and the phases say which analysis fed which', () => {
    if (!s.ok) throw new Error('not solved');
    const end = s.solution.steps.find((st) => st.name === 'Speed at the end of the marks')!;
    expect(end.formula).toBe('S_end = S of analysis "yaw-1"');
    expect(end.why).toMatch(/analysis "yaw-1"/);
    expect(s.solution.assumptions.join(' ')).toMatch(
      /ran straight on into the next phase, analysis "yaw-1"/,
    );
    expect(s.solution.phases?.map((p) => p.id)).toEqual(['skid-1', 'yaw-1']);
    expect(s.solution.phases?.[1]!.speed).toEqual(y.ok ? y.solution.speed : undefined);
  });

  it('its model is the chain: the yaw’s inputs are inputs of the slide, and every corner agrees', () => {
    if (!s.ok) throw new Error('not solved');
    const m = s.solution.model;
    const keys = m.inputs.map((i) => i.key);
    expect(keys).toEqual(['d', 'f[0]', 'G[0]', 'n', 'yaw-1:C', 'yaw-1:M', 'yaw-1:f']);
    expect(keys).not.toContain('Send');
    expect(m.evaluate({})).toBeCloseTo(s.solution.speed.value, 9);
    const low = Object.fromEntries(
      m.inputs.map((i) => [i.key, i.key === 'yaw-1:M' ? i.high : i.low]),
    );
    expect(m.evaluate(low)).toBeCloseTo(s.solution.speed.low, 9);
    // The yaw's drag factor moves the slide's start speed: sensitivity sees through the chain.
    const row = sensitivity(s.solution).find((r) => r.key === 'yaw-1:f')!;
    expect(row.label).toBe('drag factor (yaw-1)');
    expect(row.atLow).toBeCloseTo(combined(yawS(42, 2.6, 0.65), 52, 0.72, 2), 9);
  });
});

describe('longer chains and failures', () => {
  it('slide → slide → airborne: each junction takes the next phase’s speed', () => {
    const c = caseOf({
      analyses: [
        slide('skid-1', { mode: 'analysis', analysis: 'skid-2' }),
        slide('skid-2', { mode: 'analysis', analysis: 'fall-1' }),
        { id: 'fall-1', kind: 'airborne', distance: 60, drop: 9 },
      ],
    });
    const [a, b, f] = solveCase(c).analyses;
    if (!a?.ok || !b?.ok || !f?.ok) throw new Error('not solved');
    // Level take-off, d = 60 ft, h = 9 ft: 54.7 mph (first principles: v = d / sqrt(2h/g)).
    expect(f.solution.speed.value).toBeCloseTo(54.69, 2);
    const s2 = combined(f.solution.speed.value, 52, 0.72, 2);
    expect(b.solution.speed.value).toBeCloseTo(s2, 9);
    expect(a.solution.speed.value).toBeCloseTo(combined(s2, 52, 0.72, 2), 9);
    expect(a.solution.phases?.map((p) => p.id)).toEqual(['skid-1', 'skid-2', 'fall-1']);
    expect(a.solution.model.inputs.map((i) => i.key)).toContain('skid-2:fall-1:d');
  });

  it('a target that cannot be computed leaves the slide uncomputed, naming the link', () => {
    const c = caseOf({
      analyses: [
        slide('skid-1', { mode: 'analysis', analysis: 'fall-1' }),
        { id: 'fall-1', kind: 'airborne', distance: 60, drop: -2 },
      ],
    });
    const [a, f] = solveCase(c).analyses;
    expect(f?.ok).toBe(false);
    expect(a?.ok).toBe(false);
    if (a?.ok !== false) return;
    expect(a.path).toBe('analyses[0].end.analysis');
    expect(a.reason).toMatch(/runs? into analysis "fall-1", which cannot be computed/);
  });

  it('the target’s warnings travel with the chain’s figure', () => {
    const c = caseOf({
      analyses: [
        slide('skid-1', { mode: 'analysis', analysis: 'fall-1' }),
        { id: 'fall-1', kind: 'airborne', distance: 60, drop: -2, takeoffGrade: 10 },
      ],
    });
    const [a] = solveCase(c).analyses;
    if (!a?.ok) throw new Error('not solved');
    expect(a.solution.warnings.join(' ')).toMatch(
      /From "fall-1": The vehicle landed 2.00 ft higher/,
    );
  });
});
