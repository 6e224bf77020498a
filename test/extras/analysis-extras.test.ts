import { describe, expect, it } from 'vitest';
import { analysisExtras } from '../../src/extras/analysis-extras.js';
import { caseOf, solved } from './helpers.js';

const skid = {
  id: 's',
  kind: 'skid',
  marks: [90],
  segments: [{ label: 'asphalt', drag: { source: 'entered', value: 0.75, low: 0.7, high: 0.8 } }],
};

describe('analysisExtras: what applies to an analysis, and only that', () => {
  it('a skid with a posted limit: sensitivity, limit comparison with the preference, segment labels', () => {
    const c = caseOf({ postedLimit: 30, analyses: [skid] });
    const x = analysisExtras(c, solved(c), { reactionTime: 2.5 });
    expect(x.sensitivity.map((r) => r.key)).toEqual(['f[0]']);
    expect(x.sampling).toBeUndefined();
    expect(x.limit?.ok && x.limit.value.reactionTime).toBe(2.5);
    expect(x.limit?.ok && x.limit.value.reactionSource).toMatch(/^from the preferences; AASHTO/);
    expect(x.segmentLabels).toEqual(['asphalt']);
  });

  it("the case's own timeDistance wins over the preference; sampling runs when the case asks", () => {
    const c = caseOf({
      postedLimit: 30,
      sampling: { samples: 2000, seed: 4 },
      analyses: [{ ...skid, timeDistance: { reactionTime: 1.5, conflictAt: 5 } }],
    });
    const x = analysisExtras(c, solved(c), { reactionTime: 2.5 });
    expect(x.limit?.ok && x.limit.value.reactionTime).toBe(1.5);
    expect(x.limit?.ok && x.limit.value.conflict?.at).toBe(5);
    expect(x.sampling?.ok && x.sampling.value.samples).toBe(2000);
  });

  it('a conflict point without a posted limit: the comparison says why it cannot be made', () => {
    const c = caseOf({ analyses: [{ ...skid, timeDistance: { conflictAt: 5 } }] });
    expect(analysisExtras(c, solved(c)).limit).toEqual({
      ok: false,
      reason: 'the case has no posted limit',
      path: 'postedLimit',
    });
  });

  it('the default reaction time is described as the caller says (solve reads no preferences)', () => {
    const c = caseOf({ postedLimit: 30, analyses: [skid] });
    const plain = analysisExtras(c, solved(c));
    expect(plain.limit?.ok && plain.limit.value.reactionSource).toMatch(/^default; usual value/);
    const solve = analysisExtras(c, solved(c), { defaultReactionNote: 'default 1.5 s (no prefs)' });
    expect(solve.limit?.ok && solve.limit.value.reactionSource).toMatch(
      /^default 1\.5 s \(no prefs\)/,
    );
  });

  it('sampling asked for by the caller runs when the case has no sampling field', () => {
    const c = caseOf({ analyses: [skid] });
    expect(analysisExtras(c, solved(c)).sampling).toBeUndefined();
    const x = analysisExtras(c, solved(c), { sampling: { n: 2000, seed: 9 } });
    expect(x.sampling).toMatchObject({ ok: true, value: { seed: 9, samples: 2000 } });
  });

  it('without a posted limit there is no limit comparison', () => {
    const c = caseOf({ analyses: [skid], sampling: { seed: 3, samples: 2000 } });
    const x = analysisExtras(c, solved(c));
    expect(x.limit).toBeUndefined();
    expect(x.sampling).toMatchObject({ ok: true, value: { seed: 3, samples: 2000 } });
  });

  it('a yaw analysis: no limit comparison; the offsets fit is on the solution itself', () => {
    const c = caseOf({
      analyses: [
        {
          id: 'y',
          kind: 'yaw',
          drag: { source: 'entered', value: 0.7 },
          offsets: { chord: 40, stations: [{ at: 20, offset: 2 }] },
        },
      ],
    });
    const s = solved(c);
    const x = analysisExtras(c, s, { reactionTime: 2 });
    expect(x.limit).toBeUndefined();
    // R = 40²/(8 × 2) + 2/2 = 101 ft (circle geometry): one station at the middle is
    // the middle ordinate.
    expect(s.offsetsFit?.radius.value).toBeCloseTo(101, 9);
    expect(s.offsetsFit?.fit.middleOrdinate).toBeCloseTo(2, 9);
  });
});
