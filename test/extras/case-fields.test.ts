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

describe('proposed case fields, read from a loaded case', () => {
  it('sampling: the options sampleSpeeds takes, or nothing when absent', () => {
    expect(samplingFromCase(caseOf({ analyses: [skid] }))).toEqual({ ok: true, value: undefined });
    const c = caseOf({ analyses: [skid], sampling: { shape: 'normal', samples: 50_000, seed: 7 } });
    expect(samplingFromCase(c)).toEqual({
      ok: true,
      value: { shape: 'normal', n: 50_000, seed: 7 },
    });
  });
  it('sampling: a bad field names its path', () => {
    expect(samplingFromCase(caseOf({ analyses: [skid], sampling: { seed: -4 } }))).toMatchObject({
      ok: false,
      path: 'sampling.seed',
    });
    expect(
      samplingFromCase(caseOf({ analyses: [skid], sampling: { shape: 'flat' } })),
    ).toMatchObject({ ok: false, path: 'sampling.shape' });
  });
  it('timeDistance per analysis', () => {
    const c = caseOf({
      analyses: [{ ...skid, timeDistance: { reactionTime: 2.5, conflictAt: 40 } }],
    });
    expect(timeDistanceFromCase(c, 's')).toEqual({
      ok: true,
      value: { reactionTime: 2.5, conflictAt: 40 },
    });
    const bad = caseOf({ analyses: [{ ...skid, timeDistance: { conflictAt: -1 } }] });
    expect(timeDistanceFromCase(bad, 's')).toMatchObject({
      ok: false,
      path: 'analyses[0].timeDistance.conflictAt',
    });
  });
  it('offsets per yaw analysis', () => {
    const y = {
      id: 'y',
      kind: 'yaw',
      chord: 40,
      middleOrdinate: 2,
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
    const bad = caseOf({
      analyses: [{ ...y, offsets: { chord: 40, stations: [{ at: 10, offset: 0 }] } }],
    });
    expect(offsetsFromCase(bad, 'y')).toMatchObject({
      ok: false,
      path: 'analyses[0].offsets.stations[0].offset',
    });
  });
});
