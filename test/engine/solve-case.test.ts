import { describe, expect, it } from 'vitest';
import { solveAnalysis, solveCase } from '../../src/engine/index.js';
import { caseOf } from './helpers.js';
import { unknownFields } from '../../src/case/unknown-fields.js';

const drag = { source: 'entered', value: 0.7 };

describe('solveCase', () => {
  it('warns about fields the format does not know, naming their paths', () => {
    const c = caseOf({
      analyses: [{ id: 's', kind: 'skid', marks: [50], segments: [{ drag }], middleOrdinat: 3 }],
      extra: { colour: 'blue' },
    });
    const s = solveCase(c, unknownFields(c));
    expect(s.warnings).toEqual([
      'colour: not a field of the case format; kept, but not used (misspelt?)',
      'analyses[0].middleOrdinat: not a field of the case format; kept, but not used (misspelt?)',
    ]);
  });

  it('accepts a draft with no analyses yet', () => {
    const s = solveCase(caseOf({ analyses: [] }));
    expect(s.analyses).toEqual([]);
    expect(s.warnings.join(' ')).toMatch(/no analyses yet/);
  });

  it('posted limit: exceeded only when some low end is above it', () => {
    // d 50, f 0.7: S = sqrt(30 × 50 × 0.7) = sqrt(1050) = 32.40 mph (no spread)
    const at = (limit: number) =>
      solveCase(
        caseOf({
          postedLimit: limit,
          analyses: [{ id: 's', kind: 'skid', marks: [50], segments: [{ drag }] }],
        }),
      ).postedLimit;
    expect(at(32)).toEqual({ value: 32, exceededAtMinimum: true });
    expect(at(33)).toEqual({ value: 33, exceededAtMinimum: false });
    expect(solveCase(caseOf({ analyses: [] })).postedLimit).toBeUndefined();
  });

  it('the minimum is the low end rounded down, and exact whole numbers stay whole', () => {
    // Exactly 30 mph: 30 × d × f = 900 with d 50 ft, f 0.6; floating point must not make it 29.
    const r = solveAnalysis(
      caseOf({
        analyses: [
          {
            id: 's',
            kind: 'skid',
            marks: [50],
            segments: [{ drag: { source: 'entered', value: 0.6 } }],
          },
        ],
      }),
      0,
    );
    if (!r.ok) throw new Error(r.reason);
    expect(r.solution.speed.value).toBeCloseTo(30, 12);
    expect(r.solution.minimum).toBe(30);
  });

  it('the longest-mark rule is used when chosen and recorded in the step', () => {
    // longest 64 ft: sqrt(30 × 64 × 0.7) = sqrt(1344) = 36.661
    const r = solveAnalysis(
      caseOf({
        analyses: [
          {
            id: 's',
            kind: 'skid',
            marks: [60, 64, 62],
            distanceRule: 'longest',
            segments: [{ drag }],
          },
        ],
      }),
      0,
    );
    if (!r.ok) throw new Error(r.reason);
    expect(r.solution.speed.value).toBeCloseTo(36.661, 3);
    expect(r.solution.steps[0]!.formula).toBe('d = longest mark');
  });

  it('several segments: the sum of lengths is used and a 5% mismatch with the marks is a warning', () => {
    const solve = (marks: number[]) =>
      solveAnalysis(
        caseOf({
          analyses: [
            {
              id: 's',
              kind: 'skid',
              marks,
              segments: [
                { length: 40, drag },
                { length: 20, drag: { source: 'entered', value: 0.4 } },
              ],
            },
          ],
        }),
        0,
      );
    const close = solve([58, 59]); // 58.5 vs 60: 2.5% apart
    const far = solve([50, 52]); // 51 vs 60: 15% apart
    if (!close.ok || !far.ok) throw new Error('unsolved');
    expect(close.solution.warnings).toEqual([]);
    expect(far.solution.warnings.join(' ')).toMatch(
      /add up to 60\.0 ft but the marks give 51\.0 ft/,
    );
    // sqrt(30 × (40 × 0.7 + 20 × 0.4)) = sqrt(30 × 36) = sqrt(1080) = 32.863
    expect(far.solution.speed.value).toBeCloseTo(32.863, 3);
    expect(far.solution.distance).toEqual({ value: 60, low: 60, high: 60 });
    expect(far.solution.model.inputs.map((i) => i.key)).toEqual([
      'd[0]',
      'f[0]',
      'd[1]',
      'f[1]',
      'n',
    ]);
  });

  it('a skid that came to rest records the impact assumption; yaw records the full-drag assumption', () => {
    const c = caseOf({
      vehicle: { brakes: { mode: 'all' } },
      analyses: [
        { id: 's', kind: 'skid', marks: [50], segments: [{ drag }] },
        { id: 'y', kind: 'yaw', chord: 40, middleOrdinate: 2, drag },
      ],
    });
    const [s, y] = solveCase(c).analyses;
    if (!s?.ok || !y?.ok) throw new Error('unsolved');
    expect(s.solution.assumptions.join(' ')).toMatch(/impact, the figure is a minimum/);
    expect(y.solution.assumptions.join(' ')).toMatch(/not reduced by braking efficiency/);
    expect(y.solution.model.inputs.map((i) => i.key)).toEqual(['C', 'M', 'f']);
  });

  it('a failure names the analysis and the field path', () => {
    const c = caseOf({
      analyses: [{ id: 'down', kind: 'skid', marks: [50], segments: [{ drag, grade: -80 }] }],
    });
    const r = solveCase(c).analyses[0]!;
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.id).toBe('down');
      expect(r.path).toBe('analyses[0].segments[0]');
    }
  });
});
