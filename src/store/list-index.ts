import fs from 'node:fs';
import path from 'node:path';
import { createHash } from 'node:crypto';
import { writeVerifiedSync } from './verified-write.js';

/** What identifies one version of a file without reading it. */
export interface FileStamp {
  size: number;
  mtimeMs: number;
  ino: number;
}

export const stampOf = (st: fs.Stats): FileStamp => ({
  size: st.size,
  mtimeMs: st.mtimeMs,
  ino: st.ino,
});

const sameStamp = (a: FileStamp, b: FileStamp) =>
  a.size === b.size && a.mtimeMs === b.mtimeMs && a.ino === b.ino;

const FORMAT = 'skidcase-list-index';

/**
 * A small index of what the case list showed for each file of one sessions folder, kept in the
 * user's cache folder so that a large folder lists without reading and checking every case again.
 * A value is returned only for the same file with the same size, modification time and inode,
 * written by the same build (`key`); anything else (no index, another build, a damaged or foreign
 * file, a changed case) is a miss, which only costs the time of reading the case. The caller
 * checks each value's shape too.
 */
export interface ListIndex {
  /** The value kept for `file`, when its stamp is the one given. */
  get(file: string, stamp: FileStamp): unknown;
  set(file: string, stamp: FileStamp, value: unknown): void;
  /**
   * Writes the index (only the files got or set since it was opened) when anything changed, as
   * a checked atomic write (`writeVerifiedSync`). A failure is ignored: the next list is slower.
   */
  save(): void;
}

/** `list-<hash of the folder>.json` in `cacheDir`: one index per sessions folder. */
export function listIndexFile(cacheDir: string, sessionsDir: string): string {
  const h = createHash('sha256').update(path.resolve(sessionsDir)).digest('hex').slice(0, 20);
  return path.join(cacheDir, `list-${h}.json`);
}

interface Kept {
  stamp: FileStamp;
  value: unknown;
}

function readKept(file: string, key: string, sessionsDir: string): Map<string, Kept> {
  const kept = new Map<string, Kept>();
  try {
    const j = JSON.parse(fs.readFileSync(file, 'utf8')) as unknown;
    if (typeof j !== 'object' || j === null) return kept;
    const o = j as { format?: unknown; key?: unknown; dir?: unknown; files?: unknown };
    if (o.format !== FORMAT || o.key !== key || o.dir !== path.resolve(sessionsDir)) return kept;
    if (typeof o.files !== 'object' || o.files === null) return kept;
    for (const [name, v] of Object.entries(o.files as Record<string, unknown>)) {
      const s = (v as { stamp?: Partial<FileStamp> } | null)?.stamp;
      if (
        typeof s?.size === 'number' &&
        typeof s.mtimeMs === 'number' &&
        typeof s.ino === 'number' &&
        'value' in (v as object)
      )
        kept.set(name, {
          stamp: { size: s.size, mtimeMs: s.mtimeMs, ino: s.ino },
          value: (v as Kept).value,
        });
    }
  } catch {
    // no index yet, or one that cannot be read: every file is read again
  }
  return kept;
}

export function openListIndex(file: string, key: string, sessionsDir: string): ListIndex {
  const kept = readKept(file, key, sessionsDir);
  const next = new Map<string, Kept>();
  let changed = false;
  return {
    get(f, stamp) {
      const k = kept.get(path.basename(f));
      if (!k || !sameStamp(k.stamp, stamp)) return undefined;
      next.set(path.basename(f), k);
      return k.value;
    },
    set(f, stamp, value) {
      next.set(path.basename(f), { stamp, value });
      changed = true;
    },
    save() {
      if (!changed && next.size === kept.size) return;
      const body = {
        format: FORMAT,
        key,
        dir: path.resolve(sessionsDir),
        files: Object.fromEntries([...next].sort(([a], [b]) => (a < b ? -1 : 1))),
      };
      try {
        fs.mkdirSync(path.dirname(file), { recursive: true });
        writeVerifiedSync(file, Buffer.from(JSON.stringify(body)));
      } catch {
        // a cache that cannot be written only costs speed on the next start
      }
    },
  };
}
