import fs from 'node:fs/promises';
import path from 'node:path';

/** Temp files younger than this may belong to a save or lock attempt in progress: left alone. */
const MIN_AGE_MS = 60_000;

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/**
 * Temp names a killed save or lock attempt can leave beside `<id>.json`: an older save's
 * `<id>.json.<number>`, a save's `<id>.json.<pid>-<hex>.new`, the backup's `<id>.json.bak.<pid>.tmp`, the lock's
 * `<id>.json.lock.new|stale.<pid>.<hex>`. Nothing else matches (not the case, backup or lock).
 */
export function leftoverPattern(caseFile: string): RegExp {
  const base = escape(path.basename(caseFile));
  return new RegExp(
    `^${base}\\.(\\d+|\\d+-[0-9a-f]+\\.new|bak\\.\\d+\\.tmp|lock\\.(new|stale)\\.\\d+\\.[0-9a-f]+)$`,
  );
}

/**
 * Removes such leftovers once they are a minute old. Called by openCase after it took the write
 * lock, so no other skidcase is saving this case; failures are ignored (it is housekeeping).
 * Returns the names removed.
 */
export async function sweepLeftovers(caseFile: string, now = Date.now()): Promise<string[]> {
  const dir = path.dirname(caseFile);
  const pattern = leftoverPattern(caseFile);
  const removed: string[] = [];
  const names = await fs.readdir(dir).catch(() => [] as string[]);
  for (const name of names.filter((n) => pattern.test(n))) {
    const file = path.join(dir, name);
    try {
      if (now - (await fs.stat(file)).mtimeMs < MIN_AGE_MS) continue;
      await fs.unlink(file);
      removed.push(name);
    } catch {
      // gone meanwhile, or not ours to remove
    }
  }
  return removed;
}
