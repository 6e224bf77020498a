import { describe, expect, it } from 'vitest';
import { spread } from '../../src/engine/spread.js';
import {
  brakingEfficiency,
  exact,
  slideDistanceFromMarks,
  wheelsEfficiency,
} from '../../src/engine/index.js';

const ft = { length: 'ft', speed: 'mph' } as const;

describe('slide distance from several marks (common practice)', () => {
  it('common practice: lengths differ, so the average of the measured lengths is used', () => {
    // 61 + 63 + 64 + 60 = 248; / 4 = 62.0 ft
    const d = slideDistanceFromMarks([61, 63, 64, 60].map(spread), 'average', ft);
    expect(d.distance).toEqual({ value: 62, low: 62, high: 62 });
    expect(d.step.substituted).toBe('d = (61.0 + 63.0 + 64.0 + 60.0) / 4 = 62.0 ft');
    expect(d.step.why).toMatch(/common practice/);
  });
  it('common practice: the average takes the mean of the lows and of the highs for the range', () => {
    // lows 59, 62 → 60.5; highs 61, 66 → 63.5; values 60, 64 → 62
    const d = slideDistanceFromMarks(
      [spread({ value: 60, low: 59, high: 61 }), spread({ value: 64, low: 62, high: 66 })],
      'average',
      ft,
    );
    expect(d.distance).toEqual({ value: 62, low: 60.5, high: 63.5 });
  });
  it('the longest-mark option takes the largest value, largest low and largest high', () => {
    const d = slideDistanceFromMarks(
      [spread({ value: 60, low: 59.5, high: 63 }), spread({ value: 64, low: 59, high: 62.5 })],
      'longest',
      ft,
    );
    expect(d.distance).toEqual({ value: 64, low: 59.5, high: 63 });
  });
  it('a single mark is used as it is', () => {
    expect(slideDistanceFromMarks([spread(47.3)], 'average', ft).distance.value).toBe(47.3);
  });
});

describe('braking efficiency as a decimal (common practice)', () => {
  it('common practice: n is stored and shown as a decimal, 1.00 with every wheel braking', () => {
    const e = brakingEfficiency({ brakes: { mode: 'all' } });
    if (!e.ok) throw new Error(e.reason);
    expect(e.value.n.value).toBe(1);
    expect(e.value.step.substituted).toBe('n = 1.00');
  });
  it('an estimate keeps its range', () => {
    const e = brakingEfficiency({
      brakes: {
        mode: 'estimate',
        efficiency: { value: 0.8, low: 0.7, high: 0.9 },
        basis: 'one rear drum seized',
      },
    });
    if (!e.ok) throw new Error(e.reason);
    expect(e.value.n).toEqual({ value: 0.8, low: 0.7, high: 0.9 });
    expect(e.value.step.why).toMatch(/one rear drum seized/);
  });
});

describe('per-wheel sum with the front axle share (common practice)', () => {
  it('common practice: front axle 60%, rear brakes not working: n = 0.60 (static weight shares)', () => {
    const e = brakingEfficiency({
      frontAxleShare: 0.6,
      brakes: { mode: 'wheels', frontLeft: 1, frontRight: 1, rearLeft: 0, rearRight: 0 },
    });
    if (!e.ok) throw new Error(e.reason);
    expect(e.value.n.value).toBeCloseTo(0.6, 12);
  });
  it('common practice: each wheel carries half its axle’s share (share 0.58, one front wheel at half)', () => {
    // 0.29 × (1 + 0.5) + 0.21 × (1 + 1) = 0.435 + 0.42 = 0.855
    const n = wheelsEfficiency(exact(0.58), exact(1), exact(0.5), exact(1), exact(1));
    expect(n.value).toBeCloseTo(0.855, 12);
  });
  it('range over both ends of the share: the slope sign depends on the wheels', () => {
    // Only rear brakes: n = (1 − s). s 0.55..0.65 → low 0.35 (s high), high 0.45 (s low).
    const rearOnly = wheelsEfficiency(
      { value: 0.6, low: 0.55, high: 0.65 },
      exact(0),
      exact(0),
      exact(1),
      exact(1),
    );
    expect(rearOnly.low).toBeCloseTo(0.35, 12);
    expect(rearOnly.high).toBeCloseTo(0.45, 12);
    // Only front brakes: n = s → low 0.55, high 0.65.
    const frontOnly = wheelsEfficiency(
      { value: 0.6, low: 0.55, high: 0.65 },
      exact(1),
      exact(1),
      exact(0),
      exact(0),
    );
    expect(frontOnly.low).toBeCloseTo(0.55, 12);
    expect(frontOnly.high).toBeCloseTo(0.65, 12);
  });
  it('warns that static shares overstate n when only the rear brakes work', () => {
    const e = brakingEfficiency({
      frontAxleShare: 0.6,
      brakes: { mode: 'wheels', frontLeft: 0, frontRight: 0, rearLeft: 1, rearRight: 1 },
    });
    if (!e.ok) throw new Error(e.reason);
    expect(e.value.n.value).toBeCloseTo(0.4, 12);
    expect(e.value.warnings.join(' ')).toMatch(/overstate n/);
  });
  it('fails (a value, not a throw) without brakes or without the share', () => {
    expect(brakingEfficiency({}).ok).toBe(false);
    expect(
      brakingEfficiency({
        brakes: { mode: 'wheels', frontLeft: 1, frontRight: 1, rearLeft: 1, rearRight: 1 },
      }),
    ).toEqual({
      ok: false,
      reason: 'the front axle share is needed for per-wheel brakes',
      path: 'vehicle.frontAxleShare',
    });
  });
});
