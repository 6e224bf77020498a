// The loader's migration loop, run through loadCase with a table given in place of MIGRATIONS
// (empty while there is one version). The versions and steps here are invented for the test.
import { describe, expect, it } from 'vitest';
import { LATEST_VERSION, loadCase, loadCaseText } from '../../src/case/load.js';
import { MIGRATIONS, migrate, oldestVersion, type Migration } from '../../src/case/migrate.js';

/** An invented version 0: the marks and the drag factor of one skid at the top level. */
const V0 = {
  format: 'skidcase-case',
  version: 0,
  id: 'v0-case',
  units: 'imperial',
  vehicle: { brakes: { mode: 'all' } },
  marks: [60, 58],
  drag: 0.7,
};
const fromV0: Migration = ({ marks, drag, ...rest }) => ({
  ...rest,
  version: 1,
  analyses: [
    {
      id: 'skid-1',
      kind: 'skid',
      marks,
      segments: [{ drag: { source: 'entered', value: drag } }],
    },
  ],
});

describe('loading an older version', () => {
  it('is refused while the table has no step from it, naming the oldest version read', () => {
    expect(MIGRATIONS).toEqual({});
    const r = loadCase(V0);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.kind).toBe('invalid');
      expect(r.issues).toEqual([
        { path: 'version', message: `version must be a whole number from ${LATEST_VERSION}` },
      ]);
    }
  });

  it('runs the step in loadCase: a valid latest case, the version it came from, the figures kept', () => {
    const r = loadCase(V0, { 0: fromV0 });
    if (!r.ok) throw new Error(JSON.stringify(r.issues));
    expect(r.migratedFrom).toBe(0);
    expect(r.case.version).toBe(LATEST_VERSION);
    expect(r.case.analyses[0]).toMatchObject({ kind: 'skid', marks: [60, 58] });
    // the same through the text reader, and the original object is left as it was
    const t = loadCaseText(JSON.stringify(V0), { 0: fromV0 });
    expect(t.ok && t.migratedFrom).toBe(0);
    expect(V0.version).toBe(0);
  });

  it('a latest-version file is not migrated, whatever the table holds', () => {
    const step = (): Record<string, unknown> => {
      throw new Error('a step ran for a latest-version file');
    };
    const r = loadCase(fromV0(V0), { 0: step });
    expect(r.ok && r.migratedFrom).toBeUndefined();
  });

  it('a step whose result breaks the schema is refused, naming the field', () => {
    const r = loadCase(V0, { 0: (o) => ({ ...fromV0(o), units: 'cubits' }) });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.map((i) => i.path)).toContain('units');
  });

  it('a version older than the table reaches is refused', () => {
    const r = loadCase({ ...V0, version: -1 }, { 0: fromV0 });
    expect(!r.ok && r.issues[0]!.message).toBe('version must be a whole number from 0');
  });
});

describe('the migration chain', () => {
  // Invented versions 1 to 3: each step records itself, so the order is visible.
  const step =
    (v: number): Migration =>
    (o) => ({ ...o, version: v + 1, path: [...((o.path as number[]) ?? []), v] });

  it('runs every step from the file version to the target, in order', () => {
    expect(migrate({ version: 1 }, 1, 3, { 1: step(1), 2: step(2) })).toEqual({
      ok: true,
      value: { version: 3, path: [1, 2] },
    });
    expect(migrate({ version: 2 }, 2, 3, { 1: step(1), 2: step(2) })).toEqual({
      ok: true,
      value: { version: 3, path: [2] },
    });
  });

  it('names the first version with no step', () => {
    expect(migrate({ version: 1 }, 1, 4, { 1: step(1), 3: step(3) })).toEqual({
      ok: false,
      missing: 2,
    });
  });

  it('the oldest version read is the start of the unbroken chain to the latest', () => {
    expect(oldestVersion({}, 1)).toBe(1);
    expect(oldestVersion({ 0: step(0) }, 1)).toBe(0);
    expect(oldestVersion({ 0: step(0), 2: step(2) }, 3)).toBe(2);
  });
});
