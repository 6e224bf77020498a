import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// Temporary folders the tests make, remembered so that test/setup/temp-cleanup.ts removes them
// after each test file. Files that share a worker (vitest.config.ts) share this module too; they
// run one after another, so each file's removal takes only what is left, its own folders.

const made = new Set<string>();

/** A fresh folder `<parent>/<prefix>XXXXXX` (parent: the system temp folder), removed after the file's tests. */
export function trackedTempDir(prefix: string, parent: string = tmpdir()): string {
  const dir = mkdtempSync(join(parent, prefix));
  made.add(dir);
  return dir;
}

/** Removes every folder `trackedTempDir` made and not yet removed; returns them. */
export function removeTrackedTempDirs(): string[] {
  const removed = [...made];
  for (const dir of removed) {
    rmSync(dir, { recursive: true, force: true });
    made.delete(dir);
  }
  return removed;
}
