import { describe, expect, it } from 'vitest';
import { dropPoints, pointNumbers, readPoints } from '../../src/interview/read-points.js';
import { fitCircleToPoints } from '../../src/engine/radius-points.js';

// Invented points on a circle of radius 150 ft centred at (0, 150), every 10 ft of x.
const onCircle = [0, 10, 20, 30, 40].map(
  (x) => [x, 150 - Math.sqrt(150 * 150 - x * x)] as [number, number],
);

describe('surveyed points pasted as lines', () => {
  it.each([
    ['spaces', onCircle.map(([x, y]) => `${x} ${y}`).join('\n')],
    ['commas', onCircle.map(([x, y]) => `${x},${y}`).join('\r\n')],
    ['semicolons', onCircle.map(([x, y]) => `${x};${y}`).join('\n')],
    ['tabs', onCircle.map(([x, y]) => `${x}\t${y}`).join('\n')],
  ])('reads %s; the engine fit of what is read gives the circle', (_name, text) => {
    const r = readPoints(text, 'imperial');
    if (!r.ok) throw new Error(r.message);
    expect(r.value).toEqual(onCircle);
    expect(r.notice).toContain('5 points read');
    const fit = fitCircleToPoints(r.value);
    if (!fit.ok) throw new Error(fit.reason);
    expect(fit.value.radius).toBeCloseTo(150, 6);
  });

  it('skips a header line and blank lines, and says so', () => {
    const r = readPoints('x,y\n\n0,0\n8,0.2\n\n16,0.81\n', 'imperial');
    expect(r).toEqual({
      ok: true,
      value: [
        [0, 0],
        [8, 0.2],
        [16, 0.81],
      ],
      notice: 'line 1 ("x,y") taken as a header; 3 points read',
    });
  });

  it('converts a glued unit to the case unit', () => {
    const r = readPoints('0m 0\n3m 1\n6m 0', 'imperial');
    if (!r.ok) throw new Error(r.message);
    expect(r.value[1]![0]).toBeCloseTo(9.84, 1);
    expect(r.notice).toContain('line 2');
  });

  it('names the line of a bad point', () => {
    expect(readPoints('0 0\n8 0.2\n16 abc\n24 1.8', 'imperial')).toMatchObject({
      ok: false,
      message: expect.stringMatching(/^line 3 \("16 abc"\): .*abc/),
    });
    expect(readPoints('0 0\n8 0.2 5\n16 1', 'imperial')).toMatchObject({
      ok: false,
      message: expect.stringContaining('line 2 ("8 0.2 5"): write one point as x y'),
    });
  });

  it('refuses fewer than three points', () => {
    const r = readPoints('0 0\n1 1', 'imperial');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('only 2 points read: at least 3 are needed');
  });
});

describe('dropping points by number', () => {
  it('leaves out the numbered points', () => {
    expect(dropPoints(onCircle, '2, 4')).toEqual({
      ok: true,
      value: [onCircle[0], onCircle[2], onCircle[4]],
    });
  });

  it('refuses a number that is no point, and leaving fewer than three', () => {
    expect(dropPoints(onCircle, '6')).toMatchObject({
      ok: false,
      message: expect.stringContaining('"6" is not a point number: give numbers from 1 to 5'),
    });
    expect(dropPoints(onCircle, '1 2 3')).toMatchObject({
      ok: false,
      message: expect.stringContaining('leaves 2 of 5 points'),
    });
  });
});

describe('points typed on one line, and ranges of point numbers', () => {
  it('reads `;` between points on one line, and still reads `x;y` as one point a line', () => {
    const typed = onCircle.map(([x, y]) => `${x} ${y}`).join('; ');
    expect(readPoints(typed, 'imperial')).toMatchObject({ ok: true, value: onCircle });
    expect(readPoints('0,0; 8,0.2; 16,0.81', 'imperial')).toMatchObject({
      ok: true,
      value: [
        [0, 0],
        [8, 0.2],
        [16, 0.81],
      ],
    });
    expect(readPoints('0;0\n8;0.2\n16;0.81', 'imperial')).toMatchObject({
      ok: true,
      value: [
        [0, 0],
        [8, 0.2],
        [16, 0.81],
      ],
    });
  });

  it('takes ranges like 12-14 among the point numbers', () => {
    expect(pointNumbers('1, 3-4', 5)).toEqual({ ok: true, value: [1, 3, 4] });
    expect(pointNumbers('4 - 5 1', 5)).toEqual({ ok: true, value: [1, 4, 5] });
    expect(pointNumbers('4-6', 5)).toMatchObject({
      ok: false,
      message: expect.stringContaining('"4-6" is not a point number'),
    });
    expect(dropPoints(onCircle, '2-3')).toEqual({
      ok: true,
      value: [onCircle[0], onCircle[3], onCircle[4]],
    });
  });
});
