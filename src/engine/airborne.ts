import { formatNumber } from './number-text.js';
import { gravityOf, speedUnitToLengthPerSecond, unitsOf } from './constants.js';
import { input, makeStep } from './step.js';
import { fail, ok, type Outcome, type Range, type Step, type UnitSystem } from './types.js';

/**
 * The constant of the airborne formula, K_a = sqrt(g/2) in the case's speed unit per square root
 * of its length unit: sqrt(g/2) / k, with g standard gravity in the length unit per s² and k the
 * length per second in one speed unit. Imperial sqrt(32.174/2) × 3600/5280 = 2.7347; metric
 * sqrt(9.80665/2) × 3.6 = 7.9717 (projectile motion; standard gravity, CGPM 1901).
 * @example airborneConstant('imperial') // 2.7347…
 */
export function airborneConstant(system: UnitSystem): number {
  return Math.sqrt(gravityOf(system) / 2) / speedUnitToLengthPerSecond(system);
}

/**
 * Take-off angle from a signed percent grade: θ = atan(G/100), in radians (+ upward).
 * @example takeoffAngle(100) // π/4
 */
export function takeoffAngle(gradePercent: number): number {
  return Math.atan(gradePercent / 100);
}

/**
 * Speed at take-off of a vehicle whose centre of mass travelled a horizontal distance d and fell
 * a height h (negative: it landed higher) from take-off to first landing, leaving at θ =
 * atan(G/100): S = K_a d / (cos θ sqrt(d tan θ + h)) (projectile motion, air drag neglected).
 * In the case's units (mph with ft, km/h with m). Undefined when d is not positive or
 * d tan θ + h is not positive (no path at that angle reaches that landing point).
 * @example airborneSpeedOf(60, 9, 0, 'imperial') // 54.69… (a level take-off: 2.7347 × 60 / 3)
 */
export function airborneSpeedOf(
  d: number,
  h: number,
  gradePercent: number,
  system: UnitSystem,
): number | undefined {
  const theta = takeoffAngle(gradePercent);
  const lift = d * Math.tan(theta) + h;
  if (!(d > 0) || !(lift > 0)) return undefined;
  const S = (airborneConstant(system) * d) / (Math.cos(theta) * Math.sqrt(lift));
  return Number.isFinite(S) ? S : undefined;
}

/** The eight corners of three ranges (each at its low or high end). */
function corners(a: Range, b: Range, c: Range): [number, number, number][] {
  const out: [number, number, number][] = [];
  for (const x of [a.low, a.high])
    for (const y of [b.low, b.high]) for (const z of [c.low, c.high]) out.push([x, y, z]);
  return out;
}

const degrees = (rad: number) => (rad * 180) / Math.PI;

/**
 * Speed at take-off with its range: the value from every input's value, low and high the
 * smallest and largest speed over the corners of the distance's, drop's and grade's ranges (the
 * speed is not monotone in the angle, nor in d when the landing is higher). Fails, naming the
 * corner, when d tan θ + h is not positive at any corner. Steps: the constant, the take-off
 * angle and the speed.
 * @example airborneSpeed(exact(60), exact(9), exact(0), 'imperial').value.speed.value // 54.69…
 */
export function airborneSpeed(
  d: Range,
  h: Range,
  gradePercent: Range,
  system: UnitSystem,
): Outcome<{ speed: Range; steps: Step[] }> {
  const u = unitsOf(system);
  const fl = (n: number) => formatNumber(n, 'length');
  for (const [x, y, g] of corners(d, h, gradePercent)) {
    if (airborneSpeedOf(x, y, g, system) === undefined)
      return fail(
        `with distance ${fl(x)} ${u.length}, drop ${fl(y)} ${u.length} and take-off grade ${formatNumber(g, 'percent')}%, d × tan θ + h = ${fl(x * Math.tan(takeoffAngle(g)) + y)} ${u.length} is not above 0: no path leaving at that angle lands there (check the drop's sign and the take-off grade)`,
        'drop',
      );
  }
  const speeds = corners(d, h, gradePercent).map(([x, y, g]) => airborneSpeedOf(x, y, g, system)!);
  const value = airborneSpeedOf(d.value, h.value, gradePercent.value, system)!;
  const speed: Range = {
    value,
    low: Math.min(value, ...speeds),
    high: Math.max(value, ...speeds),
  };
  const K = airborneConstant(system);
  const gUnit = `${u.length}/s²`;
  const k = system === 'imperial' ? '3600/5280' : '3.6';
  const constant = makeStep({
    name: 'Constant of the fall',
    formula: `K_a = sqrt(g/2) × ${k}`,
    substituted: `K_a = sqrt(${formatNumber(gravityOf(system), 'ratio')}/2) × ${k} = ${formatNumber(K, 'ratio')}`,
    inputs: { g: { value: gravityOf(system), unit: gUnit, source: 'standard gravity' } },
    result: { value: K, low: K, high: K },
    unit: '',
    why: `projectile motion with standard gravity (9.80665 m/s², CGPM 1901), converted to ${u.speed} from ${u.length}`,
  });
  const theta: Range = {
    value: degrees(takeoffAngle(gradePercent.value)),
    low: degrees(takeoffAngle(gradePercent.low)),
    high: degrees(takeoffAngle(gradePercent.high)),
  };
  const angle = makeStep({
    name: 'Take-off angle',
    formula: 'θ = atan(G/100)',
    substituted: `θ = atan(${formatNumber(gradePercent.value, 'percent')}/100) = ${formatNumber(theta.value, 'ratio')}°`,
    inputs: { G: input(gradePercent, '%', 'take-off grade') },
    result: theta,
    unit: '°',
    why: 'the angle of the path at take-off (+ upward), from its percent grade',
  });
  const th = takeoffAngle(gradePercent.value);
  const level = gradePercent.low === 0 && gradePercent.high === 0;
  const step = makeStep({
    name: 'Speed at take-off',
    formula: level ? 'S = K_a × d / sqrt(h)' : 'S = K_a × d / (cos θ × sqrt(d × tan θ + h))',
    substituted: level
      ? `S = ${formatNumber(K, 'ratio')} × ${fl(d.value)} / sqrt(${fl(h.value)}) = ${formatNumber(value, 'speed')} ${u.speed}`
      : `S = ${formatNumber(K, 'ratio')} × ${fl(d.value)} / (cos ${formatNumber(theta.value, 'ratio')}° × sqrt(${fl(d.value)} × ${formatNumber(Math.tan(th), 'ratio')} + ${fl(h.value)})) = ${formatNumber(value, 'speed')} ${u.speed}`,
    inputs: {
      d: input(d, u.length, 'horizontal distance, take-off to first landing'),
      h: input(h, u.length, 'drop, take-off to first landing'),
      θ: input(theta, '°'),
    },
    result: speed,
    unit: u.speed,
    why: 'the centre of mass flew as a projectile: the time to fall h (after rising with the take-off angle) is the time to cover d; the range is the smallest and largest speed over every end of the inputs',
  });
  return ok({ speed, steps: [constant, angle, step] });
}
