import { describe, expect, it } from 'vitest';
import { sensitivity } from '../../src/extras/sensitivity.js';
import { sensitivityBars } from '../../src/pictures/sensitivity-bars.js';
import { textWidth } from '../../src/pictures/text-fit.js';
import { caseOf, clean, slideToStopModel, solved } from './helpers.js';

// Reference formula: slide to stop S = sqrt(30 d f n) (docs/physics.md, "Slide to stop"), evaluated here by hand.
const S = (d: number, f: number, n: number) => Math.sqrt(30 * d * f * n);

describe('sensitivity of a slide to stop (model written from the physics, not the engine)', () => {
  const model = slideToStopModel([100, 99, 101], [0.7, 0.6, 0.8], [1, 1, 1]);
  const rows = sensitivity({ model });

  it('leaves out inputs without a spread and sorts by swing, largest first', () => {
    expect(rows.map((r) => r.key)).toEqual(['f[0]', 'd']);
    expect(rows[0]!.swing).toBeGreaterThan(rows[1]!.swing);
  });

  it('gives the speed at each end with the others at value', () => {
    const f = rows[0]!;
    expect(f.base).toBeCloseTo(S(100, 0.7, 1), 12); // sqrt(2100) = 45.83 mph
    expect(f.atLow).toBeCloseTo(S(100, 0.6, 1), 12); // sqrt(1800) = 42.43
    expect(f.atHigh).toBeCloseTo(S(100, 0.8, 1), 12); // sqrt(2400) = 48.99
    expect(f.down).toBeCloseTo(S(100, 0.6, 1) - S(100, 0.7, 1), 12);
    expect(f.up).toBeCloseTo(S(100, 0.8, 1) - S(100, 0.7, 1), 12);
    const d = rows[1]!;
    expect(d.atLow).toBeCloseTo(S(99, 0.7, 1), 12);
    expect(d.atHigh).toBeCloseTo(S(101, 0.7, 1), 12);
  });

  it('an end the model cannot compute is undefined and adds nothing to the swing', () => {
    const m = slideToStopModel([100, 100, 100], [0.7, 0.6, 0.8], [0.5, 0, 1]);
    const n = sensitivity({ model: m }).find((r) => r.key === 'n')!;
    expect(n.atLow).toBeUndefined();
    expect(n.down).toBe(0);
    expect(n.up).toBeCloseTo(S(100, 0.7, 1) - S(100, 0.7, 0.5), 12);
  });
});

describe('sensitivity through the engine (yaw: the middle ordinate lowers the speed)', () => {
  // Invented yaw mark: chord 40 ft (39.8-40.2), M 2.5 ft (2.4-2.6), f 0.70 (0.65-0.75), level.
  const c = caseOf({
    analyses: [
      {
        id: 'yaw-a',
        kind: 'yaw',
        chord: { value: 40, low: 39.8, high: 40.2 },
        middleOrdinate: { value: 2.5, low: 2.4, high: 2.6 },
        drag: { source: 'entered', value: 0.7, low: 0.65, high: 0.75 },
      },
    ],
  });
  const rows = sensitivity(solved(c));
  // Independent: R = C²/(8M) + M/2, S = sqrt(15 f R) (circle geometry).
  const yaw = (C: number, M: number, f: number) => Math.sqrt(15 * f * ((C * C) / (8 * M) + M / 2));

  it('matches direct evaluation at each end', () => {
    const M = rows.find((r) => r.key === 'M')!;
    expect(M.atLow).toBeCloseTo(yaw(40, 2.4, 0.7), 9);
    expect(M.atHigh).toBeCloseTo(yaw(40, 2.6, 0.7), 9);
    // A larger ordinate, a tighter circle, a lower speed.
    expect(M.atHigh!).toBeLessThan(M.base);
    expect(M.down).toBeCloseTo(yaw(40, 2.6, 0.7) - yaw(40, 2.5, 0.7), 9);
  });

  it('the drag factor range moves the speed most here, then M, then the chord', () => {
    expect(rows.map((r) => r.key)).toEqual(['f', 'M', 'C']);
  });
});

describe('sensitivityBars', () => {
  const rows = sensitivity({
    model: slideToStopModel([100, 98, 102], [0.7, 0.6, 0.8], [0.9, 0.85, 0.95]),
  });

  it.each([20, 40, 60, 80, 120])('fits %i columns, with no broken numbers', (w) => {
    const lines = sensitivityBars(rows, w, { speedUnit: 'mph' });
    expect(lines.length).toBe(rows.length + 1);
    for (const l of lines) {
      expect(textWidth(l)).toBeLessThanOrEqual(w);
      expect(clean(l)).toBe(true);
    }
  });

  it('shows each change as the user reads it: plain name, bar, -drop / +rise with unit', () => {
    const lines = sensitivityBars(rows, 80, { speedUnit: 'mph' });
    const f = rows[0]!;
    const fLine = lines.find((l) => l.startsWith('drag factor'))!;
    // The model's internal keys are never shown.
    for (const l of lines) expect(l).not.toMatch(/\b[dfG]\[\d\]|^n /);
    // f 0.6 and 0.8 against 0.7 (d 100, n 0.9): sqrt(30*100*0.6*0.9) - sqrt(30*100*0.7*0.9) = -3.22, +3.00
    expect(fLine).toContain(
      `-${Math.abs(S(100, 0.6, 0.9) - S(100, 0.7, 0.9)).toFixed(1)} / +${(S(100, 0.8, 0.9) - S(100, 0.7, 0.9)).toFixed(1)} mph`,
    );
    expect(fLine).toContain('drag factor');
    expect(fLine).toMatch(/█+│█+/);
    // The largest change fills the most cells.
    const cells = (l: string) => (l.match(/[█▌▐]/g) ?? []).length;
    expect(cells(fLine)).toBeGreaterThan(
      cells(lines.find((l) => l.startsWith('braking efficiency'))!),
    );
    expect(f.key).toBe('f[0]');
  });

  it('ascii mode uses no block glyphs', () => {
    for (const l of sensitivityBars(rows, 60, { ascii: true })) expect(l).not.toMatch(/[█▌▐│◀▶]/);
  });

  it('says so when nothing has a range', () => {
    expect(sensitivityBars([], 60)[0]).toMatch(/no input has a range/i);
  });
});

describe('sensitivity through the engine (two segments with a grade)', () => {
  // Invented: 50 ft at f 0.72 (0.66-0.78), then 25 ft at f 0.45 on a -2% grade (-3 to -1), n 1.
  const c = caseOf({
    analyses: [
      {
        id: 'skid-g',
        kind: 'skid',
        segments: [
          { length: 50, drag: { source: 'entered', value: 0.72, low: 0.66, high: 0.78 } },
          {
            length: 25,
            drag: { source: 'entered', value: 0.45 },
            grade: { value: -2, low: -3, high: -1 },
          },
        ],
      },
    ],
  });
  const rows = sensitivity(solved(c));
  // Combined speed (docs/physics.md, "Several surfaces"): S² = 30 Σ d_i (f_i n + G_i/100), written out here.
  const S2 = (f0: number, G1: number) => Math.sqrt(30 * (50 * f0 + 25 * (0.45 + G1 / 100)));
  it('matches the combined-speed formula at each end', () => {
    const G = rows.find((r) => r.key === 'G[1]')!;
    expect(G.atLow).toBeCloseTo(S2(0.72, -3), 9);
    expect(G.atHigh).toBeCloseTo(S2(0.72, -1), 9);
    const f = rows.find((r) => r.key === 'f[0]')!;
    expect(f.atLow).toBeCloseTo(S2(0.66, -2), 9);
    expect(f.atHigh).toBeCloseTo(S2(0.78, -2), 9);
    expect(rows[0]!.key).toBe('f[0]');
  });
});
