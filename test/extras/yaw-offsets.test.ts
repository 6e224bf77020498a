import { describe, expect, it } from 'vitest';
import type { Case } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { caseOf } from './helpers.js';

/** The engine's yaw chain on a case measured by offsets: the one path every output reads. */
function yawFromOffsets(c: Case, id: string) {
  const i = c.analyses.findIndex((a) => a.id === id);
  const o = solveCase(c).analyses[i];
  if (!o) throw new Error(`no analysis ${id}`);
  if (!o.ok) return { ok: false as const, reason: o.reason, path: o.path };
  const s = o.solution;
  return {
    ok: true as const,
    value: s.offsetsFit && {
      radius: s.offsetsFit.radius,
      speed: s.speed,
      steps: s.steps,
      warnings: s.offsetsFit.fit.warnings,
    },
  };
}

// Invented yaw mark on a 101 ft circle, chord 40 ft: middle ordinate 2.0 ft (R = 40²/(8 × 2) + 2/2
// = 101, circle geometry); offsets at 10 and 30 ft from Pythagoras: sqrt(101² − 10²) − 99.
const off10 = Math.sqrt(101 ** 2 - 10 ** 2) - 99;
const yaw = (extra: Record<string, unknown> = {}) => ({
  id: 'yaw-1',
  kind: 'yaw',
  drag: { source: 'entered', value: 0.7, low: 0.65, high: 0.75 },
  offsets: {
    chord: 40,
    stations: [
      { at: 10, offset: off10 },
      { at: 20, offset: 2 },
      { at: 30, offset: off10 },
    ],
  },
  ...extra,
});

describe('critical speed from offsets', () => {
  it('an exact arc gives the chord-and-ordinate figure: S = sqrt(15 × 0.70 × 101) = 32.57 mph (critical speed)', () => {
    const r = yawFromOffsets(caseOf({ analyses: [yaw()] }), 'yaw-1');
    if (!r.ok || !r.value) throw new Error('no result');
    expect(r.value.radius.value).toBeCloseTo(101, 9);
    expect(r.value.speed.value).toBeCloseTo(Math.sqrt(15 * 0.7 * 101), 9);
    expect(r.value.speed.low).toBeCloseTo(Math.sqrt(15 * 0.65 * 101), 6);
    expect(r.value.speed.high).toBeCloseTo(Math.sqrt(15 * 0.75 * 101), 6);
    expect(r.value.steps.map((s) => s.name)[0]).toMatch(/least-squares circle/);
    expect(r.value.warnings).toEqual([]);
  });

  it('with the half-track adjustment: R_path = 101 − 6/2 = 98 ft (common practice)', () => {
    const c = caseOf({
      vehicle: { trackWidth: 6, brakes: { mode: 'all' } },
      analyses: [yaw({ pathAdjustment: 'half-track' })],
    });
    const r = yawFromOffsets(c, 'yaw-1');
    if (!r.ok || !r.value) throw new Error('no result');
    expect(r.value.speed.value).toBeCloseTo(Math.sqrt(15 * 0.7 * 98), 9);
  });

  it('no offsets field: no fit on the solution; a bad station: its full path', () => {
    const none = caseOf({
      analyses: [{ ...yaw(), offsets: undefined, chord: 40, middleOrdinate: 2 }],
    });
    expect(yawFromOffsets(none, 'yaw-1')).toEqual({ ok: true, value: undefined });
    // A station beyond the chord is refused when the case loads (test/case); a hand-built Case
    // that skips loading still gets the full path from the fit.
    const good = caseOf({ analyses: [yaw()] });
    const y = good.analyses[0] as { offsets: { stations: { at: number }[] } };
    y.offsets.stations[0]!.at = 50;
    expect(yawFromOffsets(good, 'yaw-1')).toMatchObject({
      ok: false,
      path: 'analyses[0].offsets.stations[0].at',
    });
  });
});
