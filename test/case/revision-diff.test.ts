import { describe, expect, it } from 'vitest';
import type { Case } from '../../src/case/load.js';
import { diffCases } from '../../src/case/revision-diff.js';
import { sampleCase } from '../store/helpers.js';

// What a revision lists between two versions of an invented case.

type Editable = {
  analyses: { marks: unknown[] }[];
  vehicle: Record<string, unknown>;
  [k: string]: unknown;
};
const edited = (edit: (c: Editable) => void): Case => {
  const c = structuredClone(sampleCase('pine-1')) as unknown as Editable;
  edit(c);
  return c as unknown as Case;
};

describe('diffCases', () => {
  it('the same case, in another key order, with another time and interview: no change', () => {
    const a = sampleCase('pine-1');
    const b = Object.fromEntries(Object.entries(a).reverse()) as Case;
    b.updated = '2030-01-01T00:00:00Z';
    b.interview = { cursor: 'review' };
    expect(diffCases(a, b)).toEqual([]);
  });

  it('a plain figure that becomes a quantity with a range is one change with both whole values', () => {
    const b = edited((c) => (c.analyses[0]!.marks[1] = { value: 59.8, low: 59, high: 60.5 }));
    expect(diffCases(sampleCase('pine-1'), b)).toEqual([
      {
        field: 'analyses[0].marks[1]',
        from: 59.8,
        to: { value: 59.8, low: 59, high: 60.5 },
      },
    ]);
  });

  it('an object that changes its fields lists each one down to its plain values', () => {
    const b = edited(
      (c) => (c.vehicle.brakes = { mode: 'estimate', efficiency: 0.8, basis: 'inspection' }),
    );
    expect(diffCases(sampleCase('pine-1'), b)).toEqual([
      { field: 'vehicle.brakes.mode', from: 'all', to: 'estimate' },
      { field: 'vehicle.brakes.efficiency', to: 0.8 },
      { field: 'vehicle.brakes.basis', to: 'inspection' },
    ]);
  });

  it('an analysis removed lists its fields as gone; a key that is not a plain name is quoted', () => {
    const b = edited((c) => {
      c.analyses = [];
      c['odd key'] = 1;
    });
    const changes = diffCases(sampleCase('pine-1'), b);
    expect(changes).toContainEqual({ field: 'analyses[0].id', from: 'skid-1' });
    expect(changes).toContainEqual({ field: 'analyses[0].marks[0]', from: 61.3 });
    expect(changes.every((c) => c.to === undefined || c.field === '["odd key"]')).toBe(true);
    expect(changes.at(-1)).toEqual({ field: '["odd key"]', to: 1 });
  });

  it('an empty object added is a change of its own', () => {
    const b = edited((c) => (c.sampling = {}));
    expect(diffCases(sampleCase('pine-1'), b)).toEqual([{ field: 'sampling', to: {} }]);
  });
});
