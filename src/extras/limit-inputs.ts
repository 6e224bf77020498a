import type { Case } from '../case/load.js';
import type { AnalysisSolution } from '../engine/types.js';
import { REACTION_TIMES } from '../engine/constants.js';

/** Which end of every input: `low` sets each input at its low end (the engine's low corner). */
export type Corner = 'value' | 'low' | 'high';

/** A slide's figures for one corner, read from the solution (never recomputed). */
export interface SlideCorner {
  /** Start speed, from the solution's range. */
  S: number;
  /** Speed at each boundary, start to end, from the solution's boundaries. */
  speeds: number[];
  lengths: number[];
  f: number[];
  G: number[];
  n: number;
}

/** Reads one corner of a skid solution from its model inputs and boundaries. */
export function slideCorner(solution: AnalysisSolution, corner: Corner): SlideCorner | undefined {
  const b = solution.boundaries;
  if (!b || b.length < 2) return undefined;
  const count = b.length - 1;
  const get = (key: string, fallback: number) => {
    const inp = solution.model.inputs.find((i) => i.key === key);
    return inp ? inp[corner] : fallback;
  };
  const lengths: number[] = [];
  const f: number[] = [];
  const G: number[] = [];
  for (let j = 0; j < count; j++) {
    lengths.push(get(count === 1 ? 'd' : `d[${j}]`, b[j + 1]!.at - b[j]!.at));
    f.push(get(`f[${j}]`, NaN));
    G.push(get(`G[${j}]`, 0));
  }
  if (!f.every(Number.isFinite)) return undefined;
  return {
    S: solution.speed[corner],
    speeds: b.map((x) => x.speed[corner]),
    lengths,
    f,
    G,
    n: get('n', 1),
  };
}

/** The surface of each segment of a skid analysis, as the case names it: label, table surface, or number. */
export function segmentLabels(c: Case, analysisId: string): string[] {
  const a = c.analyses.find((x) => x.id === analysisId);
  if (!a || a.kind !== 'skid') return [];
  return a.segments.map(
    (s, j) =>
      s.label ??
      (s.drag.source === 'table' && s.drag.surface ? s.drag.surface : `segment ${j + 1}`),
  );
}

/**
 * Where a perception-reaction time comes from, for the step that shows it (docs/physics.md,
 * "Perception-reaction and stopping distance"):
 * M. Green, Transportation Human Factors 2(3), 2000, for 0.7-0.75 s (fully expected), 1.25 s
 * (unexpected common event) and 1.5 s (surprise); AASHTO's 2.5 s design value; else the user's.
 */
export function reactionTimeSource(t: number): string {
  const green = 'M. Green, Transportation Human Factors 2(3), 2000';
  const T = REACTION_TIMES;
  if (t === T.surprise) return `usual value for a surprise event (${green})`;
  if (t === T.unexpected) return `about the time for an unexpected but common event (${green})`;
  if (t >= T.expected.low && t <= T.expected.high)
    return `about the time for a fully expected event (${green})`;
  if (t === T.design)
    return 'AASHTO design value covering about 90% of drivers (A Policy on Geometric Design of Highways and Streets)';
  return `chosen by the investigator (for comparison: ${T.surprise} s for a surprise event, ${green}; ${T.design} s AASHTO design value)`;
}
