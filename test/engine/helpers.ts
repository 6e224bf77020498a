import { loadCase, type Case } from '../../src/case/load.js';

/** A minimal valid case around the given vehicle and analyses, checked by the real schema. */
export function caseOf(parts: {
  units?: 'imperial' | 'metric';
  vehicle?: Record<string, unknown>;
  analyses: Record<string, unknown>[];
  postedLimit?: unknown;
  extra?: Record<string, unknown>;
}): Case {
  const raw = {
    format: 'skidcase-case',
    version: 1,
    id: 'test-case',
    units: parts.units ?? 'imperial',
    vehicle: parts.vehicle ?? { brakes: { mode: 'all' } },
    analyses: parts.analyses,
    ...(parts.postedLimit !== undefined ? { postedLimit: parts.postedLimit } : {}),
    ...parts.extra,
  };
  const r = loadCase(raw);
  if (!r.ok) throw new Error(`test case invalid: ${JSON.stringify(r.issues)}`);
  return r.case;
}

/** Relative difference |a − b| / |b|. */
export const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
