import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadCase } from '../../src/case/load.js';
import { unknownFields } from '../../src/case/unknown-fields.js';
import { runSolve } from '../solve/run-solve.js';

// The three optional case fields for the extras (docs/case-file.md, "Offsets", "Sampling",
// "Time and distance"). Expected messages and paths are the ones the contract documents.

type Doc = {
  sampling?: unknown;
  analyses: Record<string, unknown>[];
  [k: string]: unknown;
};

const base = (): Doc => ({
  format: 'skidcase-case',
  version: 1,
  id: 'fields-test',
  units: 'imperial',
  postedLimit: 35,
  sampling: { shape: 'normal', samples: 5000, seed: 42 },
  vehicle: { brakes: { mode: 'all' } },
  analyses: [
    {
      id: 'skid-1',
      kind: 'skid',
      marks: [{ value: 64, low: 63, high: 65 }],
      segments: [{ drag: { source: 'entered', value: 0.68, low: 0.6, high: 0.76 } }],
      timeDistance: { reactionTime: 1.25, conflictAt: 30 },
    },
    {
      id: 'yaw-1',
      kind: 'yaw',
      offsets: {
        chord: { value: 36, low: 35.8, high: 36.2 },
        stations: [
          { at: 9, offset: 1.2 },
          { at: 18, offset: 1.6 },
          { at: 27, offset: 1.2 },
        ],
      },
      drag: { source: 'entered', value: 0.7 },
    },
  ],
});

/** The issues of a document edited by `change`, as `path: message` lines. */
function issuesOf(change: (d: Doc) => void): string[] {
  const d = base();
  change(d);
  const r = loadCase(d);
  return r.ok ? [] : r.issues.map((i) => `${i.path}: ${i.message}`);
}
const yaw = (d: Doc) => d.analyses[1]!;
const offsets = (d: Doc) =>
  yaw(d).offsets as { chord: unknown; stations: Record<string, unknown>[] };

describe('the extras fields in the v1 schema', () => {
  it('a case with all three fields loads, keeps them as entered, and solve does not warn about them', () => {
    const r = loadCase(base());
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    expect(r.case.sampling).toEqual({ shape: 'normal', samples: 5000, seed: 42 });
    const [skid, y] = r.case.analyses;
    expect(skid?.kind === 'skid' && skid.timeDistance).toEqual({
      reactionTime: 1.25,
      conflictAt: 30,
    });
    expect(y?.kind === 'yaw' && y.offsets?.stations.length).toBe(3);
    expect(unknownFields(r.case)).toEqual([]);
  });

  it('every field is optional', () => {
    expect(
      issuesOf((d) => {
        d.sampling = {};
        d.analyses[0]!.timeDistance = {};
      }),
    ).toEqual([]);
  });

  it.each([
    [
      'sampling.shape',
      (d: Doc): unknown => (d.sampling = { shape: 'flat' }),
      'sampling.shape: shape must be uniform or normal',
    ],
    [
      'sampling.samples too few',
      (d: Doc): unknown => (d.sampling = { samples: 999 }),
      'sampling.samples: samples must be at least 1000',
    ],
    [
      'sampling.samples too many',
      (d: Doc): unknown => (d.sampling = { samples: 1_000_001 }),
      'sampling.samples: samples must be at most 1000000',
    ],
    [
      'sampling.samples not whole',
      (d: Doc): unknown => (d.sampling = { samples: 2500.5 }),
      'sampling.samples: samples must be a whole number',
    ],
    [
      'sampling.seed negative',
      (d: Doc): unknown => (d.sampling = { seed: -1 }),
      'sampling.seed: seed must be at least 0',
    ],
    [
      'sampling.seed above 2^32 - 1',
      (d: Doc): unknown => (d.sampling = { seed: 4294967296 }),
      'sampling.seed: seed must be at most 4294967295',
    ],
    [
      'sampling.seed as text',
      (d: Doc): unknown => (d.sampling = { seed: '7' }),
      'sampling.seed: seed must be a number',
    ],
    [
      'timeDistance.reactionTime above 10 s',
      (d: Doc): unknown => (d.analyses[0]!.timeDistance = { reactionTime: 11 }),
      'analyses[0].timeDistance.reactionTime: reactionTime must be at most 10 s',
    ],
    [
      'timeDistance.conflictAt negative',
      (d: Doc): unknown => (d.analyses[0]!.timeDistance = { conflictAt: -2 }),
      'analyses[0].timeDistance.conflictAt: conflictAt must be 0 or more (a distance from the start of the marks)',
    ],
    [
      'offsets.chord 0',
      (d: Doc): unknown => (offsets(d).chord = 0),
      'analyses[1].offsets.chord: chord must be greater than 0',
    ],
    [
      'offsets.chord low above value',
      (d: Doc): unknown => (offsets(d).chord = { value: 36, low: 37 }),
      'analyses[1].offsets.chord.low: chord: low must not be above value',
    ],
    [
      'no stations',
      (d: Doc): unknown => (offsets(d).stations = []),
      'analyses[1].offsets.stations: at least one station is needed',
    ],
    [
      'a station at 0',
      (d: Doc): unknown => (offsets(d).stations[2]!.at = 0),
      'analyses[1].offsets.stations[2].at: at must be greater than 0',
    ],
    [
      'a station beyond the chord’s low end',
      (d: Doc): unknown => (offsets(d).stations[1]!.at = 35.9),
      'analyses[1].offsets.stations[1].at: at must be less than the chord (35.8)',
    ],
    [
      'a negative offset',
      (d: Doc): unknown => (offsets(d).stations[0]!.offset = -1.2),
      'analyses[1].offsets.stations[0].offset: offset must be greater than 0',
    ],
  ] as const)('%s is refused with its path', (_name, change, expected) => {
    expect(issuesOf(change)).toEqual([expected]);
  });

  it('a yaw analysis needs exactly one way of measuring the arc', () => {
    expect(issuesOf((d) => Object.assign(yaw(d), { chord: 36, middleOrdinate: 1.6 }))).toEqual([
      'analyses[1].offsets: give exactly one of: chord and middleOrdinate, offsets, or points',
    ]);
    expect(issuesOf((d) => delete yaw(d).offsets)).toEqual([
      'analyses[1].chord: give exactly one of: chord and middleOrdinate, offsets, or points',
    ]);
    expect(
      issuesOf((d) => {
        delete yaw(d).offsets;
        yaw(d).chord = 36;
      }),
    ).toEqual([
      'analyses[1].middleOrdinate: middle ordinate is required with chord (or give offsets or points instead)',
    ]);
    expect(
      issuesOf((d) => {
        delete yaw(d).offsets;
        yaw(d).middleOrdinate = 1.6;
      }),
    ).toEqual([
      'analyses[1].chord: chord is required with middleOrdinate (or give offsets or points instead)',
    ]);
  });

  it('a misspelt key inside the new fields is kept and named by solve’s warnings', () => {
    const d = base();
    d.sampling = { seed: 3, sample: 2000 };
    offsets(d).stations[0]!.offest = 1.1;
    const r = loadCase(d);
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    expect(unknownFields(r.case)).toEqual([
      'sampling.sample',
      'analyses[1].offsets.stations[0].offest',
    ]);
  });
});

describe('solve on a file with both ways of measuring a yaw mark', () => {
  const dir = mkdtempSync(join(tmpdir(), 'skidcase-fields-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('exits 2 naming the field, and prints nothing on stdout', async () => {
    const d = base();
    Object.assign(yaw(d), { chord: 36, middleOrdinate: 1.6 });
    const file = join(dir, 'both.json');
    writeFileSync(file, JSON.stringify(d));
    for (const json of [false, true]) {
      const r = await runSolve(file, json);
      expect(r.code).toBe(2);
      expect(r.out).toBe('');
      expect(r.err).toContain(
        'analyses[1].offsets: give exactly one of: chord and middleOrdinate, offsets, or points',
      );
    }
  });
});
