import { loadCase, type Case } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import type { AnalysisModel, AnalysisSolution } from '../../src/engine/types.js';

/** A case from the parts a test cares about; throws (a test bug) if it does not load. */
export function caseOf(parts: Record<string, unknown>): Case {
  const r = loadCase({
    format: 'skidcase-case',
    version: 1,
    id: 'extras-test',
    units: 'imperial',
    vehicle: { brakes: { mode: 'all' } },
    analyses: [],
    ...parts,
  });
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.case;
}

/** The first analysis's solution; throws if it does not solve. */
export function solved(c: Case, i = 0): AnalysisSolution {
  const a = solveCase(c).analyses[i];
  if (!a || !a.ok) throw new Error(a ? a.reason : 'no analysis');
  return a.solution;
}

/**
 * A slide-to-stop model written here from the formula S = sqrt(30 d f n) (docs/physics.md), independent of
 * the engine: the reference the extras are checked against.
 */
export function slideToStopModel(
  d: [number, number, number],
  f: [number, number, number],
  n: [number, number, number],
): AnalysisModel {
  const inputs = [
    { key: 'd', label: 'slide distance', unit: 'ft', value: d[0], low: d[1], high: d[2] },
    { key: 'f[0]', label: 'drag factor', unit: '', value: f[0], low: f[1], high: f[2] },
    { key: 'n', label: 'braking efficiency', unit: '', value: n[0], low: n[1], high: n[2] },
  ];
  return {
    inputs,
    evaluate: (x) => {
      const s2 = 30 * (x.d ?? d[0]) * (x['f[0]'] ?? f[0]) * (x.n ?? n[0]);
      return s2 > 0 ? Math.sqrt(s2) : undefined;
    },
  };
}

/** Relative difference. */
export const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** True when a rendered text holds none of the words a broken number leaves on screen. */
export const clean = (s: string) => !/NaN|undefined|Infinity|null/.test(s);
