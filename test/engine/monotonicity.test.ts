import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  arcRadius,
  centreRadius,
  criticalSpeedOf,
  effectiveDrag,
  slideSquaredSpeed,
  slideStartSpeed,
  testSkidDrag,
  wheelsBraking,
  wheelsEfficiency,
  reactionDistance,
  brakingDistance,
} from '../../src/engine/index.js';

// Property-based proof that each formula is monotone in each input over its valid domain, so that
// setting every input at the matching end of its range gives the lowest and highest figure. Each
// property tests the scalar function of src/engine/formulas.ts that the ranges, the analysis
// models, the limit comparison and the interview's checks call (never a copy of it).

const num = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const bump = num(1e-6, 0.5);
const system = fc.constantFrom('imperial' as const, 'metric' as const);

const segment = fc.record({ d: num(0.5, 300), f: num(0.05, 1.5), G: num(-20, 20) });

describe('slide start speed rises with d, f, n, G and the end speed', () => {
  it('nudging any one input up never lowers the speed (where computable)', () => {
    fc.assert(
      fc.property(
        fc.array(segment, { minLength: 1, maxLength: 4 }),
        num(0.05, 1),
        num(0, 80),
        fc.nat(),
        fc.constantFrom('d', 'f', 'G', 'n', 'Send'),
        bump,
        system,
        (segs, n, Send, which, key, h, sys) => {
          const before = slideStartSpeed(segs, n, Send, sys);
          if (before === undefined) return;
          const j = which % segs.length;
          const up = segs.map((s, i) =>
            i === j && (key === 'd' || key === 'f' || key === 'G')
              ? { ...s, [key]: s[key] + h }
              : s,
          );
          const after = slideStartSpeed(
            up,
            key === 'n' ? n + h : n,
            key === 'Send' ? Send + h : Send,
            sys,
          );
          expect(after).toBeDefined();
          expect(after!).toBeGreaterThanOrEqual(before);
        },
      ),
    );
  });
  it('effective drag f n + G/100 rises in each input', () => {
    fc.assert(
      fc.property(num(0.05, 1.5), num(0, 1), num(-50, 50), bump, (f, n, G, h) => {
        const e = effectiveDrag;
        expect(e(f + h, n, G)).toBeGreaterThanOrEqual(e(f, n, G));
        expect(e(f, n + h, G)).toBeGreaterThanOrEqual(e(f, n, G));
        expect(e(f, n, G + h)).toBeGreaterThan(e(f, n, G));
      }),
    );
  });
});

describe('radius rises with the chord and falls with the middle ordinate (M < C/2)', () => {
  it('nudging C up raises R; nudging M up lowers R', () => {
    fc.assert(
      fc.property(num(1, 500), num(0.001, 0.49), bump, (C, ratio, h) => {
        const M = C * ratio;
        const r0 = arcRadius(C, M);
        expect(arcRadius(C + h, M)).toBeGreaterThan(r0);
        if (M + h * M < C / 2) expect(arcRadius(C, M + h * M)).toBeLessThan(r0);
      }),
    );
  });
  it('the path radius rises with the mark’s radius and falls with the track width', () => {
    fc.assert(
      fc.property(num(5, 3000), num(0, 10), bump, (R, T, h) => {
        expect(centreRadius(R + h, T)).toBeGreaterThan(centreRadius(R, T));
        expect(centreRadius(R, T + h)).toBeLessThan(centreRadius(R, T));
      }),
    );
  });
});

describe('the squared speed a slide takes off rises with its distance and its effective drag', () => {
  it('nudging d or the effective drag up raises C d e', () => {
    fc.assert(
      fc.property(num(0.5, 300), num(0.01, 1.5), bump, fc.constantFrom(30, 254), (d, e, h, C) => {
        expect(slideSquaredSpeed(d + h, e, C)).toBeGreaterThan(slideSquaredSpeed(d, e, C));
        expect(slideSquaredSpeed(d, e + h, C)).toBeGreaterThan(slideSquaredSpeed(d, e, C));
      }),
    );
  });
});

describe('test-skid drag rises with the test speed, falls with its distance and its grade', () => {
  it('nudging S up raises f; nudging d or G_t up lowers it', () => {
    fc.assert(
      fc.property(num(5, 80), num(5, 300), num(-15, 15), bump, system, (S, d, G, h, sys) => {
        const f0 = testSkidDrag(S, d, sys, G);
        expect(testSkidDrag(S + h, d, sys, G)).toBeGreaterThan(f0);
        expect(testSkidDrag(S, d + h, sys, G)).toBeLessThan(f0);
        expect(testSkidDrag(S, d, sys, G + h)).toBeLessThan(f0);
      }),
    );
  });
});

describe('critical speed rises with R, f and e wherever 1 − f e > 0', () => {
  it('nudging any one input up never lowers the speed', () => {
    fc.assert(
      fc.property(
        num(5, 3000),
        num(0.05, 1.5),
        num(-0.3, 0.3),
        fc.constantFrom('R', 'f', 'e'),
        bump,
        system,
        (R, f, e, key, h, sys) => {
          const before = criticalSpeedOf(R, f, e, sys);
          if (before === undefined) return;
          const r = key === 'R' ? R + h : R;
          const ff = key === 'f' ? f + h : f;
          const ee = key === 'e' ? e + h / 10 : e;
          if (!(1 - ff * ee > 0)) return; // past the pole the formula no longer applies
          const after = criticalSpeedOf(r, ff, ee, sys);
          expect(after).toBeDefined();
          expect(after!).toBeGreaterThanOrEqual(before);
        },
      ),
    );
  });
});

describe('braking efficiency per wheel rises with each wheel, and its range encloses every share', () => {
  it('nudging any one wheel up never lowers n', () => {
    fc.assert(
      fc.property(
        num(0, 1),
        fc.array(num(0, 1), { minLength: 4, maxLength: 4 }),
        fc.nat(3),
        bump,
        (s, w, k, h) => {
          const [a, b, c, d] = w as [number, number, number, number];
          const up = w.map((x, i) => (i === k ? x + h : x)) as [number, number, number, number];
          expect(wheelsBraking(s, ...up)).toBeGreaterThanOrEqual(wheelsBraking(s, a, b, c, d));
        },
      ),
    );
  });
  it('the low and high ends hold for any share and wheels inside their ranges', () => {
    const q = fc
      .tuple(num(0, 1), num(0, 1), num(0, 1))
      .map(([a, b, c]) => [a, b, c].sort((x, y) => x - y) as [number, number, number])
      .map(([low, value, high]) => ({ low, value, high }));
    fc.assert(
      fc.property(
        q,
        q,
        q,
        q,
        q,
        num(0, 1),
        num(0, 1),
        num(0, 1),
        num(0, 1),
        num(0, 1),
        (s, fl, fr, rl, rr, ...t) => {
          const n = wheelsEfficiency(s, fl, fr, rl, rr);
          const pick = (r: { low: number; high: number }, u: number) =>
            r.low + u * (r.high - r.low);
          const [ts, t1, t2, t3, t4] = t as [number, number, number, number, number];
          const sv = pick(s, ts);
          const inside = wheelsBraking(sv, pick(fl, t1), pick(fr, t2), pick(rl, t3), pick(rr, t4));
          expect(inside).toBeGreaterThanOrEqual(n.low - 1e-12);
          expect(inside).toBeLessThanOrEqual(n.high + 1e-12);
          expect(n.low).toBeLessThanOrEqual(n.value + 1e-12);
          expect(n.value).toBeLessThanOrEqual(n.high + 1e-12);
        },
      ),
    );
  });
});

describe('time and distance helpers', () => {
  it('reaction distance rises with speed and time; braking distance rises with speed, falls with f, n and G', () => {
    fc.assert(
      fc.property(
        num(1, 150),
        num(0.1, 3),
        num(0.1, 1.2),
        num(0.2, 1),
        num(-5, 10),
        bump,
        system,
        (S, t, f, n, G, h, sys) => {
          expect(reactionDistance(S + h, t, sys).distance).toBeGreaterThan(
            reactionDistance(S, t, sys).distance,
          );
          expect(reactionDistance(S, t + h, sys).distance).toBeGreaterThan(
            reactionDistance(S, t, sys).distance,
          );
          const d = (a: number, b: number, c: number, g: number) => {
            const r = brakingDistance(a, b, c, g, sys);
            return r.ok ? r.value.distance : Infinity;
          };
          const d0 = d(S, f, n, G);
          if (d0 === Infinity) return; // the vehicle would not stop: a typed failure, tested elsewhere
          expect(d(S + h, f, n, G)).toBeGreaterThan(d0);
          expect(d(S, f + h, n, G)).toBeLessThanOrEqual(d0);
          expect(d(S, f, n + h, G)).toBeLessThanOrEqual(d0);
          expect(d(S, f, n, G + h)).toBeLessThanOrEqual(d0);
        },
      ),
    );
  });
});
