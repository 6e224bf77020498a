import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveCase } from '../../src/engine/index.js';
import { factorKind } from '../../src/engine/number-text.js';
import { caseResult } from '../../src/extras/analysis-extras.js';
import { formatChainText } from '../../src/format/chain-text.js';
import { caseOf } from './helpers.js';

// One rule for the factors of a step (README, "How figures are written"): every drag factor,
// braking efficiency, grade as a decimal and effective drag in one line is written with the same
// decimals: 2, or 3 when a grade or bank in it has a fraction of a percent.

const slide = (f: number, grade: number) =>
  caseOf({
    analyses: [
      {
        id: 's',
        kind: 'skid',
        marks: [80],
        segments: [{ drag: { source: 'entered', value: f }, grade }],
      },
    ],
  });

/** The chain text of a one-segment slide, and its effective drag step's numbers line. */
function effectiveLine(f: number, grade: number) {
  const c = slide(f, grade);
  const text = formatChainText(caseResult(c, solveCase(c)));
  const lines = text.split('\n');
  const at = lines.findIndex((l) => /Effective drag/.test(l));
  return { text, numbers: lines[at + 2]!.trim(), result: lines[at + 3]!.trim() };
}

const decimals = (line: string) => [...line.matchAll(/\d+\.(\d+)/g)].map((m) => m[1]!.length);

describe('the decimals of a factor line', () => {
  it('a whole-percent grade: 2 decimals throughout, result included (0.71 − 0.03 = 0.68)', () => {
    const l = effectiveLine(0.71, -3);
    expect(l.numbers).toBe('0.71 × 1.00 − 0.03 = 0.68');
    expect(l.result).toBe('result: 0.68');
    // The speed step writes the effective drag as its own step did: sqrt(30 × 80 × 0.68) = 40.4.
    expect(l.text).toContain('S = sqrt(30 × 80.0 ft × 0.68) = 40.4 mph');
  });

  it('a grade with a fraction of a percent: 3 decimals throughout (0.710 − 0.025 = 0.685)', () => {
    const l = effectiveLine(0.71, -2.5);
    expect(l.numbers).toBe('0.710 × 1.000 − 0.025 = 0.685');
    expect(l.result).toBe('result: 0.685');
    expect(l.text).toContain('S = sqrt(30 × 80.0 ft × 0.685) = 40.5 mph');
  });

  it('factorKind: whole percents give 2, tenths give 3, float noise does not count', () => {
    expect(factorKind(-3, 0, 4)).toBe('drag');
    expect(factorKind(3, -2.5)).toBe('fine-factor');
    expect(factorKind(0.03 * 100)).toBe('drag');
  });

  it('every number in the line has the same decimals (property, 200 runs)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 20, max: 95 }),
        fc.integer({ min: -80, max: 80 }),
        (f100, g10) => {
          const l = effectiveLine(f100 / 100, g10 / 10);
          expect(new Set(decimals(l.numbers)).size).toBe(1);
        },
      ),
      { numRuns: 200 },
    );
  });
});
