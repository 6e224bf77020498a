import { describe, expect, it } from 'vitest';
import { loadCase } from '../../src/case/load.js';
import { buildCase, stateFromCase } from '../../src/interview/index.js';
import { solveCase } from '../../src/engine/index.js';

// The look of the marks (docs/physics.md, "Look of the marks") travels from the interview into the case file, so the
// chain that solve and the report print carries its common-practice caveat.
const handWritten = (appearance?: string) => ({
  format: 'skidcase-case',
  version: 1,
  id: 'look-trip',
  units: 'imperial',
  vehicle: { brakes: { mode: 'all' } },
  analyses: [
    {
      id: 'skid-1',
      kind: 'skid',
      ...(appearance ? { appearance } : {}),
      // A gap skid is entered as its marked parts, one segment each (the gaps are not braking).
      ...(appearance === 'gap'
        ? {
            segments: [
              { length: 40, drag: { source: 'entered', value: 0.7 } },
              { length: 25, drag: { source: 'entered', value: 0.7 } },
            ],
          }
        : { marks: [72], segments: [{ drag: { source: 'entered', value: 0.7 } }] }),
    },
  ],
});

function roundTrip(appearance?: string) {
  const r = loadCase(handWritten(appearance));
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  const built = buildCase(stateFromCase(r.case), { id: 'look-trip' } as never);
  const again = loadCase(built);
  if (!again.ok) throw new Error(JSON.stringify(again.issues));
  return again.case;
}

describe('the marks look survives opening and saving a case', () => {
  for (const look of ['abs', 'skip', 'gap'] as const)
    it(`${look}: kept, and its caveat is in the chain`, () => {
      const c = roundTrip(look);
      const a = c.analyses[0]!;
      expect(a.kind === 'skid' && a.appearance).toBe(look);
      const s = solveCase(c).analyses[0]!;
      expect(s.ok && s.solution.assumptions.join(' ')).toMatch(/common practice/);
    });
  it('locked-wheel marks (the default) are not written out', () => {
    const a = roundTrip('locked').analyses[0]!;
    expect(a.kind === 'skid' && a.appearance).toBeUndefined();
    const b = roundTrip().analyses[0]!;
    expect(b.kind === 'skid' && b.appearance).toBeUndefined();
  });
});
