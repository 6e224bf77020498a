import { describe, expect, it } from 'vitest';
import {
  samplingFromCase,
  timeDistanceFromCase,
  offsetsFromCase,
} from '../../src/extras/case-fields.js';
import { caseOf } from './helpers.js';

const skid = {
  id: 's',
  kind: 'skid',
  marks: [80],
  segments: [{ drag: { source: 'entered', value: 0.7 } }],
};

describe('case fields for the extras, read from a loaded case', () => {
  it('sampling: the options sampleSpeeds takes, or nothing when absent', () => {
    expect(samplingFromCase(caseOf({ analyses: [skid] }))).toEqual({ ok: true, value: undefined });
    const c = caseOf({ analyses: [skid], sampling: { shape: 'normal', samples: 50_000, seed: 7 } });
    expect(samplingFromCase(c)).toEqual({
      ok: true,
      value: { shape: 'normal', n: 50_000, seed: 7 },
    });
  });
  it('timeDistance per analysis', () => {
    const c = caseOf({
      analyses: [{ ...skid, timeDistance: { reactionTime: 2.5, conflictAt: 40 } }],
    });
    expect(timeDistanceFromCase(c, 's')).toEqual({
      ok: true,
      value: { reactionTime: 2.5, conflictAt: 40 },
    });
    // Bad values are refused when the case loads, with their paths: test/case/extras-fields.test.ts.
  });
  it('offsets per yaw analysis', () => {
    const y = {
      id: 'y',
      kind: 'yaw',
      drag: { source: 'entered', value: 0.7 },
    };
    const c = caseOf({
      analyses: [
        {
          ...y,
          offsets: {
            chord: 40,
            stations: [
              { at: 10, offset: 1.5 },
              { at: 20, offset: 2 },
            ],
          },
        },
      ],
    });
    expect(offsetsFromCase(c, 'y')).toMatchObject({ ok: true, value: { chord: 40 } });
    // A hand-built Case that skipped loading is still checked, with the field's full path.
    const bad = structuredClone(c) as unknown as {
      analyses: { offsets: { stations: { offset: number }[] } }[];
    };
    bad.analyses[0]!.offsets.stations[0]!.offset = 0;
    expect(offsetsFromCase(bad as unknown as typeof c, 'y')).toMatchObject({
      ok: false,
      path: 'analyses[0].offsets.stations[0].offset',
    });
  });
});
