import type { AnalysisSolution, Boundary } from '../engine/types.js';

/**
 * Speed at distance x along a slide, between the solution's boundary speeds. On one segment the
 * deceleration is constant, so S² falls linearly with distance: S(x)² = S_a² + (S_b² − S_a²)
 * (x − a) / (b − a) between boundaries a and b. Reads the engine's numbers; derives no physics.
 */
export function speedAlong(boundaries: readonly Boundary[], x: number): number {
  const last = boundaries[boundaries.length - 1];
  if (!last) return 0;
  if (x >= last.at) return last.speed.value;
  for (let j = 0; j + 1 < boundaries.length; j++) {
    const a = boundaries[j]!;
    const b = boundaries[j + 1]!;
    if (x <= b.at) {
      const span = b.at - a.at;
      const t = span > 0 ? Math.max(0, (x - a.at) / span) : 1;
      const s2 = a.speed.value ** 2 + (b.speed.value ** 2 - a.speed.value ** 2) * t;
      return Math.sqrt(Math.max(0, s2));
    }
  }
  return last.speed.value;
}

/** The boundaries of a skid solution with at least a start and an end, or undefined. */
export function profileOf(solution: AnalysisSolution): Boundary[] | undefined {
  const b = solution.boundaries;
  if (!b || b.length < 2) return undefined;
  const total = b[b.length - 1]!.at;
  const top = b[0]!.speed.value;
  if (
    !(total > 0) ||
    !(top > 0) ||
    !b.every((x) => Number.isFinite(x.at) && Number.isFinite(x.speed.value))
  )
    return undefined;
  return b;
}
