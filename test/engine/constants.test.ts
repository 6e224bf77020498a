import { describe, expect, it } from 'vitest';
import { unit } from 'mathjs';
import {
  speedUnitToLengthPerSecond,
  STANDARD_GRAVITY_FT,
  tradeConstants,
  unitsOf,
} from '../../src/engine/index.js';
import { rel } from './helpers.js';

// Standard gravity 9.80665 m/s² (CGPM 1901, the conventional value used by NIST); the
// international foot 0.3048 m (1959 international yard and pound agreement); mile = 5280 ft.
const g = unit(9.80665, 'm/s^2');
const g2 = unit(2 * 9.80665, 'm/s^2'); // 2 g, the factor of v² = 2 a d

describe('trade constants from first principles (mathjs units)', () => {
  it('the foot and mile in mathjs are the international ones (1959 agreement)', () => {
    expect(unit(1, 'ft').toNumber('m')).toBeCloseTo(0.3048, 12);
    expect(unit(1, 'mi').toNumber('ft')).toBeCloseTo(5280, 9);
  });

  it('S² = C d f: C = 2g in mph²/ft is 29.91, within 0.3% of 30 in S² and 0.2% in S', () => {
    const C = g2.toNumber('mi^2/(h^2 ft)');
    expect(C).toBeCloseTo(29.91, 2); // 2 × 32.174 × (3600/5280)² = 29.91
    expect(rel(tradeConstants('imperial').slide, C)).toBeLessThan(0.003); // 30 vs 29.91 is 0.29% in S², 0.15% in S
    expect(rel(Math.sqrt(tradeConstants('imperial').slide), Math.sqrt(C))).toBeLessThan(0.002);
  });

  it('S² = C d f: C = 2g in (km/h)²/m is 254.19, within 0.2% of 254 in S²', () => {
    const C = g2.toNumber('km^2/(h^2 m)');
    expect(C).toBeCloseTo(254.19, 2); // 2 × 9.80665 × 3.6² = 254.19
    expect(rel(tradeConstants('metric').slide, C)).toBeLessThan(0.002);
  });

  it('yaw constants: g in mph²/ft and (km/h)²/m, within 0.2% of 15 and 127 in speed', () => {
    const K = g.toNumber('mi^2/(h^2 ft)');
    const Km = g.toNumber('km^2/(h^2 m)');
    expect(K).toBeCloseTo(14.96, 2);
    expect(Km).toBeCloseTo(127.09, 2);
    expect(rel(Math.sqrt(tradeConstants('imperial').yaw), Math.sqrt(K))).toBeLessThan(0.002);
    expect(rel(Math.sqrt(tradeConstants('metric').yaw), Math.sqrt(Km))).toBeLessThan(0.002);
  });

  it('speed-unit factors: 1 mph = 5280/3600 ft/s and 1 km/h = 1/3.6 m/s, as mathjs converts', () => {
    expect(speedUnitToLengthPerSecond('imperial')).toBeCloseTo(
      unit(1, 'mi/h').toNumber('ft/s'),
      12,
    );
    expect(speedUnitToLengthPerSecond('metric')).toBeCloseTo(unit(1, 'km/h').toNumber('m/s'), 12);
    expect(STANDARD_GRAVITY_FT).toBeCloseTo(g.toNumber('ft/s^2'), 9); // 32.174 ft/s²
  });

  it('unit labels follow the case’s system', () => {
    expect(unitsOf('imperial')).toEqual({ length: 'ft', speed: 'mph' });
    expect(unitsOf('metric')).toEqual({ length: 'm', speed: 'km/h' });
  });
});
