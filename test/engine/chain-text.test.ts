import { describe, expect, it } from 'vitest';
import { caseResult } from '../../src/extras/analysis-extras.js';
import fc from 'fast-check';
import { solveCase } from '../../src/engine/index.js';
import { formatChainText } from '../../src/format/chain-text.js';
import { caseOf } from './helpers.js';

const num = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

describe('the printed chain', () => {
  it('never shows NaN, Infinity or undefined, whatever valid numbers a case holds', () => {
    fc.assert(
      fc.property(
        num(0.01, 5000),
        num(0.01, 2),
        num(-99, 99),
        num(0, 1),
        num(1, 500),
        num(0.001, 0.49),
        num(-99, 99),
        fc.constantFrom('imperial' as const, 'metric' as const),
        (d, f, G, n, C, ratio, e, units) => {
          const c = caseOf({
            units,
            postedLimit: 50,
            vehicle: { brakes: { mode: 'estimate', efficiency: n } },
            analyses: [
              {
                id: 's',
                kind: 'skid',
                marks: [d],
                segments: [{ drag: { source: 'entered', value: f }, grade: G }],
              },
              {
                id: 'y',
                kind: 'yaw',
                chord: C,
                middleOrdinate: C * ratio,
                drag: { source: 'entered', value: f },
                superelevation: e,
              },
            ],
          });
          const text = formatChainText(caseResult(c, solveCase(c)));
          expect(text).not.toMatch(/NaN|Infinity|undefined/);
          expect(text).toMatch(/This tool does not state fault\./);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('shows a failed analysis as "cannot be computed" with its reason and path, beside a solved one', () => {
    const c = caseOf({
      analyses: [
        {
          id: 'down',
          kind: 'skid',
          label: 'steep lane',
          marks: [40],
          segments: [{ drag: { source: 'entered', value: 0.4 }, grade: -60 }],
        },
        {
          id: 'ok',
          kind: 'skid',
          marks: [40],
          segments: [{ drag: { source: 'entered', value: 0.6 } }],
        },
      ],
    });
    const text = formatChainText(caseResult(c, solveCase(c)));
    expect(text).toContain('Analysis 1: down (skid marks), steep lane');
    expect(text).toContain(
      'cannot be computed: segment 1: a 60% downhill grade is steeper than the drag factor 0.40 × n 1.00 can hold; the vehicle could not slow by sliding there [analyses[0].segments[0]]',
    );
    // sqrt(30 × 40 × 0.6) = sqrt(720) = 26.833 mph
    expect(text).toContain('Result: at least 26 mph: 26.8 mph');
  });
});
