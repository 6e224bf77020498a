// Surveyed points read from a CSV export's text (the screen reads the file; this is pure), and
// a yaw from surveyed points built to a case and back. Files and points are invented.
import { describe, expect, it } from 'vitest';
import { fileRequest, headerUnit, readPointsCsv } from '../../src/interview/read-points-file.js';
import { buildCase, stateFromCase } from '../../src/interview/index.js';
import { loadCase } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';

describe('the @file answer', () => {
  it('names the file, the columns and the unit', () => {
    expect(fileRequest('0 0; 1 1')).toBeUndefined();
    expect(fileRequest('@yaw.csv')).toEqual({ path: 'yaw.csv' });
    expect(fileRequest('@yaw.csv E N')).toEqual({ path: 'yaw.csv', columns: ['E', 'N'] });
    expect(fileRequest('@yaw.csv 2 3 m')).toEqual({
      path: 'yaw.csv',
      columns: ['2', '3'],
      unit: 'm',
    });
    expect(fileRequest('@"my points.csv" ft')).toEqual({ path: 'my points.csv', unit: 'ft' });
    expect(fileRequest('@yaw.csv E')).toMatchObject({
      message: expect.stringContaining('two columns'),
    });
  });

  it('reads a unit from a header name', () => {
    expect(['x_m', 'E (ft)', 'north [m]', 'y-feet', 'Easting', 'Item'].map(headerUnit)).toEqual([
      'm',
      'ft',
      'm',
      'ft',
      undefined,
      undefined,
    ]);
  });
});

describe('points from a CSV text', () => {
  const csv = 'id,code,x,y\n1,YM,0,0\n2,YM,10,0.31\n3,YM,20,1.25\n4,YM,30,2.83\n';

  it('takes the first two numeric columns by default, in the case unit when the header says none, and says so', () => {
    const r = readPointsCsv('a.csv', csv, {}, 'imperial');
    expect(r).toMatchObject({ ok: true, text: '1 0; 2 10; 3 20; 4 30' });
    if (r.ok) expect(r.notice).toContain("read in ft, the case's unit");
  });

  it('takes the columns named, by header or by number, and converts a unit the header gives', () => {
    expect(readPointsCsv('a.csv', csv, { columns: ['x', 'y'] }, 'imperial')).toMatchObject({
      ok: true,
      value: [
        [0, 0],
        [10, 0.31],
        [20, 1.25],
        [30, 2.83],
      ],
    });
    expect(readPointsCsv('a.csv', csv, { columns: ['3', '4'] }, 'imperial')).toMatchObject({
      ok: true,
      text: '0 0; 10 0.31; 20 1.25; 30 2.83',
    });
    const r = readPointsCsv(
      'm.csv',
      'E_m;N_m\n0;0\n3,5;0\n6;1\n'.replace('3,5', '3'),
      {},
      'imperial',
    );
    if (!r.ok) throw new Error(r.message);
    // 3 m is 9.8425 ft (3 / 0.3048, rounded to 4 decimals).
    expect(r.value[1]).toEqual([Number((3 / 0.3048).toFixed(4)), 0]);
    expect(r.notice).toContain('converted to ft');
  });

  it('refuses, naming the file and the line: a word in a number column, a missing column, no separator, too few points', () => {
    expect(readPointsCsv('a.csv', 'x,y\n0,0\n1,abc\n2,2\n', {}, 'metric')).toEqual({
      ok: false,
      message: 'a.csv line 3: "y" is "abc", not a number',
    });
    expect(readPointsCsv('a.csv', csv, { columns: ['E', 'y'] }, 'metric')).toMatchObject({
      ok: false,
      message: expect.stringContaining('a.csv: no column "E" (its columns: id, code, x, y)'),
    });
    expect(readPointsCsv('b.bin', 'PK\u0003\u0004 garbage', {}, 'metric')).toMatchObject({
      ok: false,
      message: expect.stringContaining('b.bin line 1: no comma, semicolon or tab'),
    });
    expect(readPointsCsv('c.csv', 'x,y\n0,0\n1,1\n', {}, 'metric')).toMatchObject({
      ok: false,
      message: 'c.csv: only 2 points read; at least 3 are needed for a circle',
    });
  });
});

describe('a yaw from surveyed points, built and read back', () => {
  const c = {
    format: 'skidcase-case',
    version: 1,
    id: 'arc-seven',
    units: 'imperial',
    vehicle: {},
    analyses: [
      {
        id: 'yaw-1',
        kind: 'yaw',
        points: [
          [0, 0],
          [10, 0.31],
          [20, 1.25],
          [30, 2.83],
        ],
        pointsLeftOut: [[40, 7.9]],
        drag: { source: 'entered', value: 0.7 },
        pathAdjustment: 'none',
      },
    ],
  };

  it('asks the points with the one left out numbered after them, and builds the same analysis and figure', () => {
    const loaded = loadCase(c);
    if (!loaded.ok) throw new Error(loaded.issues[0]?.message);
    const s = stateFromCase(loaded.case);
    expect(s.answers['a0.measure']?.value).toBe('points');
    expect(s.answers['a0.points']?.text).toBe('0 0; 10 0.31; 20 1.25; 30 2.83; 40 7.9');
    expect(s.answers['a0.points.drop']?.text).toBe('5');
    const built = buildCase(s, { id: c.id });
    expect(built.analyses).toEqual(loaded.case.analyses);
    const speed = (x: typeof built) =>
      solveCase(x).analyses.map((a) => (a.ok ? a.solution.speed : a.reason));
    expect(speed(built)).toEqual(speed(loaded.case));
  });

  it('refuses pointsLeftOut without points, naming the field', () => {
    const { points: _p, ...rest } = c.analyses[0]!;
    const r = loadCase({ ...c, analyses: [{ ...rest, chord: 40, middleOrdinate: 2 }] });
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.issues).toContainEqual(
        expect.objectContaining({ message: 'pointsLeftOut goes with points (the points fitted)' }),
      );
  });
});
