import { sha256Of } from '../io/sha256.js';
import type { Stats } from 'node:fs';
import type { Case } from '../case/load.js';

/**
 * What this process knows about case files it has read or written: the identity of the last
 * version it knows to be good, so that a save can keep that version as the backup without
 * re-reading and re-validating it, and notice when someone changed the file behind its back.
 */
export interface FileSig {
  ino: number;
  size: number;
  mtimeMs: number;
}

interface Known {
  sig?: FileSig;
  /** SHA-256 of the bytes last read or written and checked: what "our" file holds. */
  hash?: string;
  /** Set when the case was migrated on open and its original is not yet kept beside it. */
  migratedFrom?: number;
  /** The case's `created`, so a caller that drops it does not reset it. */
  created?: string;
  /** The case in those bytes: what the next save's revision compares with. */
  case?: Case;
  /** Opened read-only: saves are refused. */
  readOnly?: string;
}

const known = new Map<string, Known>();

export const sigOf = (st: Stats): FileSig => ({ ino: st.ino, size: st.size, mtimeMs: st.mtimeMs });

export function sameSig(a: FileSig | undefined, st: Stats): boolean {
  return a !== undefined && a.ino === st.ino && a.size === st.size && a.mtimeMs === st.mtimeMs;
}

export const hashOf = (bytes: Buffer | string) => sha256Of(bytes);

export function getKnown(file: string): Known {
  let k = known.get(file);
  if (!k) known.set(file, (k = {}));
  return k;
}

/** Runs async tasks on one file one after another, so overlapping autosaves cannot interleave. */
const queues = new Map<string, Promise<unknown>>();
export function serial<T>(file: string, task: () => Promise<T>): Promise<T> {
  const prev = queues.get(file) ?? Promise.resolve();
  const run = prev.then(task, task);
  const tail = run.catch(() => undefined);
  queues.set(file, tail);
  void tail.then(() => {
    if (queues.get(file) === tail) queues.delete(file);
  });
  return run;
}
