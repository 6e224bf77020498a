import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadCaseText } from '../../src/case/load.js';
import { measurementTables } from '../../src/report/measurements.js';
import { fixture } from './helpers.js';

const tables = (file: string) => {
  const r = loadCaseText(readFileSync(file, 'utf8'));
  if (!r.ok) throw new Error('fixture invalid');
  return measurementTables(
    r.case,
    r.case.units === 'imperial' ? { length: 'ft', speed: 'mph' } : { length: 'm', speed: 'km/h' },
  );
};
const row = (ts: ReturnType<typeof tables>, item: string) =>
  ts.flatMap((t) => t.rows).find((r) => r[0] === item);

// The expected rows are read off the fixture files by eye: numbers exactly as written there.
describe('measurements as entered', () => {
  it('imperial slide: marks, segments, grades, test skids and brakes with range, unit and note', () => {
    const ts = tables(fixture('quarry-lane-skid.json'));
    expect(ts.map((t) => t.caption)).toEqual([
      'Case and vehicle',
      'Analysis 1, skid-1; segments: 1 asphalt, 2 gravel shoulder',
    ]);
    expect(row(ts, 'Posted limit')).toEqual(['Posted limit', '40', 'none', 'mph', '']);
    expect(row(ts, 'Front axle share')).toEqual([
      'Front axle share',
      '0.6',
      '0.58 to 0.62',
      '',
      "typical front-engine share, from the owner's manual weights",
    ]);
    expect(row(ts, 'Brake, rear right (0-1)')).toEqual([
      'Brake, rear right (0-1)',
      '0.5',
      '0.3 to 0.7',
      '',
      'caliper partly seized',
    ]);
    expect(row(ts, 'Mark 1')).toEqual(['Mark 1', '71.5', '71 to 72', 'ft', 'left front']);
    expect(row(ts, 'Mark 3')).toEqual(['Mark 3', '69.9', 'none', 'ft', '']);
    expect(row(ts, 'Distance rule')?.[1]).toBe('average');
    expect(row(ts, 'Segment 1 length')).toEqual([
      'Segment 1 length',
      '46',
      '45.5 to 46.5',
      'ft',
      '',
    ]);
    expect(row(ts, 'Segment 1 drag factor (table)')).toEqual([
      'Segment 1 drag factor (table)',
      '0.62',
      '0.55 to 0.7',
      '',
      'table surface "asphalt-dry-travelled", band over-30mph',
    ]);
    expect(row(ts, 'Segment 1 grade (+ up)')).toEqual([
      'Segment 1 grade (+ up)',
      '-3',
      '-3.5 to -2.5',
      '%',
      'digital level, 2 readings',
    ]);
    expect(row(ts, 'Segment 2 test skid 3 distance')).toEqual([
      'Segment 2 test skid 3 distance',
      '42.2',
      'none',
      'ft',
      '',
    ]);
    expect(row(ts, 'Segment 2 test skid 1 speed')?.[4]).toBe('same model test car, 10:30');
    expect(row(ts, 'End of marks')?.[1]).toBe('came to rest');
  });

  it('metric yaw: chord, ordinate, bank, sled pulls and the path adjustment', () => {
    const ts = tables(fixture('birchfield-yaw.json'));
    expect(row(ts, 'Track width')).toEqual(['Track width', '1.55', '1.53 to 1.57', 'm', '']);
    expect(row(ts, 'Chord')).toEqual([
      'Chord',
      '18',
      '17.95 to 18.05',
      'm',
      'tape from where the rear mark crosses the front',
    ]);
    expect(row(ts, 'Middle ordinate')).toEqual([
      'Middle ordinate',
      '0.62',
      '0.6 to 0.64',
      'm',
      'read to the nearest cm',
    ]);
    expect(row(ts, 'Superelevation')).toEqual(['Superelevation', '3', '2.5 to 3.5', '%', '']);
    expect(row(ts, 'Sled weight')?.[4]).toBe('three pulls in the lane');
    expect(['Sled pull 1', 'Sled pull 2', 'Sled pull 3'].map((k) => row(ts, k)?.[1])).toEqual([
      '29.6',
      '30.4',
      '28.8',
    ]);
    expect(row(ts, 'Path adjustment')?.[1]).toBe('half-track');
  });
});
