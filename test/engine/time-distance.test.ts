import { describe, expect, it } from 'vitest';
import { brakingDistance, reactionDistance, slideDuration } from '../../src/engine/index.js';

describe('time and distance helpers (hand-worked, invented numbers)', () => {
  it('reaction distance: 5280/3600 ft/s per mph, or S t / 3.6 m', () => {
    // 40 mph × 1.5 s × 5280/3600 = 40 × 1.5 × 1.46667 = 88.0 ft; 72 km/h × 1.5 s / 3.6 = 30 m
    expect(reactionDistance(40, 1.5, 'imperial').distance).toBeCloseTo(88, 9);
    expect(reactionDistance(72, 1.5, 'metric').distance).toBeCloseTo(30, 9);
    expect(reactionDistance(40, 1.5, 'imperial').step.substituted).toBe(
      'd = 1.4667 × 40.0 × 1.5 = 88.0 ft',
    );
  });
  it('braking distance on a grade: S²/(C (f n + G/100))', () => {
    // 30²/(30 × 0.75) = 900/22.5 = 40 ft; with a 5% downhill: 900/(30 × 0.70) = 42.857 ft
    const level = brakingDistance(30, 0.75, 1, 0, 'imperial');
    const down = brakingDistance(30, 0.75, 1, -5, 'imperial');
    if (!level.ok || !down.ok) throw new Error('unsolved');
    expect(level.value.distance).toBeCloseTo(40, 9);
    expect(down.value.distance).toBeCloseTo(42.857, 3);
    // metric: 50²/(254 × 0.8 × 0.9) = 2500/182.88 = 13.670 m
    const m = brakingDistance(50, 0.8, 0.9, 0, 'metric');
    if (!m.ok) throw new Error(m.reason);
    expect(m.value.distance).toBeCloseTo(13.67, 2);
  });
  it('slide duration: t = v / ((f n + G/100) g)', () => {
    // 36 km/h = 10 m/s; a = 0.7 × 9.80665 = 6.86466 m/s²; t = 1.4568 s
    const t = slideDuration(36, 0.7, 1, 0, 'metric');
    if (!t.ok) throw new Error(t.reason);
    expect(t.value.seconds).toBeCloseTo(1.4568, 3);
    // 30 mph = 44 ft/s; a = 0.75 × 32.174 = 24.1305 ft/s²; t = 1.8234 s
    const u = slideDuration(30, 0.75, 1, 0, 'imperial');
    if (!u.ok) throw new Error(u.reason);
    expect(u.value.seconds).toBeCloseTo(1.8234, 3);
  });
  it('no deceleration is a typed failure, never NaN or Infinity', () => {
    expect(slideDuration(30, 0.7, 0, 0, 'imperial').ok).toBe(false);
    expect(brakingDistance(30, 0.2, 1, -25, 'metric').ok).toBe(false);
  });
});
