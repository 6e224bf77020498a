import type { Phase, Units } from '../engine/types.js';
import { KIND_NAMES } from './kind-names.js';
import { formatRange } from './numbers.js';

/** Where each kind of phase's speed is taken, for the phase line. */
const AT = { skid: 'marks begin', yaw: 'yaw begins', airborne: 'take-off' } as const;

/**
 * The phases of a chain as one line, in order of travel, with the speed at each junction (the
 * speed where each phase begins):
 * `skid-1 (slide) 52.3 mph (48.0 to 56.1) → yaw-1 (critical speed) at yaw begins 41.0 mph ...`.
 * @example phasesLine(solution.phases, { length: 'ft', speed: 'mph' })
 */
export function phasesLine(phases: readonly Phase[], units: Units): string {
  return phases
    .map(
      (p) =>
        `${p.id} (${KIND_NAMES[p.kind].short}), ${AT[p.kind]}: ${formatRange(p.speed, 'speed', units.speed)}`,
    )
    .join(' → ');
}

/** A heading and one line per phase, for narrow screens and lists. */
export function phasesLines(phases: readonly Phase[], units: Units): string[] {
  return phases.map(
    (p, k) =>
      `${k + 1}. ${p.id} (${KIND_NAMES[p.kind].short}${p.label ? `, ${p.label}` : ''}), speed where it begins (${AT[p.kind]}): ${formatRange(p.speed, 'speed', units.speed)}`,
  );
}
