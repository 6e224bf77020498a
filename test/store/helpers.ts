import fs from 'node:fs';
import type { Case } from '../../src/case/load.js';
import { trackedTempDir } from '../temp-dirs.js';

/** A fresh temp folder per test, removed after the test file; never the real sessions folder. */
export function tempDir(tag = 'store'): string {
  return trackedTempDir(`skidcase-${tag}-`);
}

/**
 * An invented case: one skid analysis, one surface, marks as given. The numbers are made up for
 * the tests and mean nothing beyond being valid.
 */
export function sampleCase(id: string, marks: number[] = [61.3, 59.8]): Case {
  return {
    format: 'skidcase-case',
    version: 1,
    id,
    units: 'imperial',
    details: { reference: `Test ${id}` },
    vehicle: { label: 'Unit A, grey van', brakes: { mode: 'all' } },
    analyses: [
      {
        id: 'skid-1',
        kind: 'skid',
        marks,
        segments: [{ drag: { source: 'entered', value: 0.68, low: 0.62, high: 0.74 }, grade: 1.5 }],
        end: { mode: 'stop' },
      },
    ],
  } as Case;
}

/** A case with `n` surfaces, each with its own length: the large end of what a user types. */
export function manySegmentCase(id: string, n: number): Case {
  const c = sampleCase(id) as Case & { analyses: { segments: unknown[] }[] };
  c.analyses[0]!.segments = Array.from({ length: n }, (_, i) => ({
    label: `strip ${i + 1}`,
    length: { value: 2 + (i % 7) * 0.25, low: 1.9 + (i % 7) * 0.25, high: 2.1 + (i % 7) * 0.25 },
    drag: { source: 'entered', value: 0.6 + (i % 5) * 0.02 },
    grade: (i % 9) - 4,
  }));
  return c as Case;
}

export const readJson = (file: string): Record<string, unknown> =>
  JSON.parse(fs.readFileSync(file, 'utf8'));
