import { describe, expect, it } from 'vitest';
import { DRAG_TABLE, dragFactor, dragTableBand, dragTableRow } from '../../src/engine/index.js';

const ok = <T>(o: { ok: true; value: T } | { ok: false; reason: string }): T => {
  if (!o.ok) throw new Error(o.reason);
  return o.value;
};

describe('drag factor sources', () => {
  it('entered: value, low, high; a missing end is the value', () => {
    expect(ok(dragFactor({ source: 'entered', value: 0.7, low: 0.62 }, 'imperial')).f).toEqual({
      value: 0.7,
      low: 0.62,
      high: 0.7,
    });
  });
  it('table: a guide, with its source named', () => {
    const d = ok(
      dragFactor(
        {
          source: 'table',
          surface: 'asphalt-dry-travelled',
          value: 0.62,
          low: 0.55,
          high: 0.7,
          band: 'over-30mph',
        },
        'imperial',
      ),
    );
    expect(d.f).toEqual({ value: 0.62, low: 0.55, high: 0.7 });
    expect(d.source).toBe('table: asphalt-dry-travelled, over-30mph');
    expect(d.notes.join(' ')).toMatch(/guide .*not a measurement.*Baker/);
  });
  it('test skids: f_i = S²/(30 d), mean with smallest to largest (hand-worked)', () => {
    // 30²/(30 × 40) = 0.75; 30²/(30 × 45) = 0.6667; 32²/(30 × 48) = 1024/1440 = 0.7111
    // mean = (0.75 + 0.6667 + 0.7111)/3 = 0.7093
    const d = ok(
      dragFactor(
        {
          source: 'test-skids',
          tests: [
            { speed: 30, distance: 40 },
            { speed: 30, distance: 45 },
            { speed: 32, distance: { value: 48, low: 47 } },
          ],
        },
        'imperial',
      ),
    );
    expect(d.f.value).toBeCloseTo(0.70926, 4);
    expect(d.f.low).toBeCloseTo(0.66667, 4);
    expect(d.f.high).toBeCloseTo(0.75, 9);
    expect(d.notes.join(' ')).toMatch(
      /lower speed .*slightly higher drag factor \(common practice\)/,
    );
  });
  it('test skids in metric use 254', () => {
    // 50²/(254 × 14) = 2500/3556 = 0.70304
    expect(
      ok(dragFactor({ source: 'test-skids', tests: [{ speed: 50, distance: 14 }] }, 'metric')).f
        .value,
    ).toBeCloseTo(0.70304, 4);
  });
  it('sled: pull / weight, mean and spread', () => {
    // 52/75 = 0.6933, 54/75 = 0.72, 51/75 = 0.68; mean 157/225 = 0.69778
    const d = ok(dragFactor({ source: 'sled', weight: 75, pulls: [52, 54, 51] }, 'imperial'));
    expect(d.f.value).toBeCloseTo(0.69778, 4);
    expect(d.f.low).toBeCloseTo(0.68, 9);
    expect(d.f.high).toBeCloseTo(0.72, 9);
  });
  it('decelerometer: readings in g, mean and spread', () => {
    const d = ok(dragFactor({ source: 'decelerometer', readings: [0.71, 0.69, 0.73] }, 'metric'));
    expect(d.f.value).toBeCloseTo(0.71, 9);
    expect(d.f.low).toBe(0.69);
    expect(d.f.high).toBe(0.73);
  });
});

describe('drag factor reference table: the Baker 1975 rows (via Fricke 1990) and Noon 1994 figures, marked by how well known', () => {
  // Northwestern University Traffic Institute table (J. S. Baker 1975, reprinted in L. B. Fricke 1990):
  // rows seen in a reprint.
  it('dry asphalt rows seen in a reprint', () => {
    const row = (k: string) => dragTableRow(k)!;
    expect(row('asphalt-dry-new')).toMatchObject({
      under30mph: { low: 0.8, high: 1.2 },
      over30mph: { low: 0.65, high: 1.0 },
      known: 'seen-in-reprint',
    });
    expect(row('asphalt-dry-travelled')).toMatchObject({
      under30mph: { low: 0.6, high: 0.8 },
      over30mph: { low: 0.55, high: 0.7 },
      known: 'seen-in-reprint',
    });
    expect(row('asphalt-dry-polished')).toMatchObject({
      under30mph: { low: 0.55, high: 0.75 },
      over30mph: { low: 0.45, high: 0.65 },
      known: 'seen-in-reprint',
    });
  });
  it('rows from memory only (verify before use)', () => {
    expect(dragTableRow('concrete-dry-new')).toMatchObject({
      under30mph: { low: 0.8, high: 1.2 },
      over30mph: { low: 0.7, high: 1.0 },
      known: 'from-memory',
    });
    expect(dragTableRow('concrete-wet-new')).toMatchObject({
      under30mph: { low: 0.5, high: 0.8 },
      over30mph: { low: 0.4, high: 0.75 },
      known: 'from-memory',
    });
    expect(dragTableRow('gravel-loose')).toMatchObject({
      any: { low: 0.4, high: 0.7 },
      known: 'from-memory',
    });
    expect(dragTableRow('snow-packed')).toMatchObject({
      under30mph: { low: 0.3, high: 0.55 },
      over30mph: { low: 0.35, high: 0.55 },
      known: 'from-memory',
    });
    expect(dragTableRow('ice-smooth')).toMatchObject({
      under30mph: { low: 0.1, high: 0.25 },
      over30mph: { low: 0.07, high: 0.2 },
      known: 'from-memory',
    });
  });
  it('single values quoted from R. K. Noon (1994), seen second-hand', () => {
    const noon = DRAG_TABLE.filter((r) => r.known === 'single-value-second-hand');
    expect(noon.map((r) => [r.surface, r.any!.low, r.any!.high])).toEqual([
      ['asphalt, dry', 0.65, 0.65],
      ['asphalt, wet', 0.5, 0.5],
      ['concrete, dry', 0.75, 0.75],
      ['concrete, wet', 0.6, 0.6],
      ['gravel or dirt', 0.35, 0.35],
      ['grass, wet', 0.2, 0.2],
      ['snow', 0.2, 0.25],
      ['ice', 0.1, 0.15],
    ]);
    for (const r of noon) expect(r.source).toMatch(/Noon/);
  });
  it('16 rows in all, unique keys; a band falls back to the single range', () => {
    expect(DRAG_TABLE).toHaveLength(16);
    expect(new Set(DRAG_TABLE.map((r) => r.key)).size).toBe(16);
    expect(dragTableBand(dragTableRow('gravel-loose')!, 'under-30mph')).toEqual({
      low: 0.4,
      high: 0.7,
    });
    expect(dragTableBand(dragTableRow('ice-smooth')!, 'over-30mph')).toEqual({
      low: 0.07,
      high: 0.2,
    });
  });
});
