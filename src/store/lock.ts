import fsSync from 'node:fs';
import fs from 'node:fs/promises';
import { randomBytes } from 'node:crypto';
import { onExit } from 'signal-exit';
import { lockPath } from './side-files.js';
import { noLinks } from './keep-aside.js';
import {
  describeHolder,
  isStale,
  LOCK_REFRESH_MS,
  ownLockInfo,
  readLock,
  type LockInfo,
} from './lock-info.js';
import { describeWriteError } from '../io/write-error.js';
import { errCode } from './errno.js';

/**
 * Case locks. A lock is a small JSON file `<id>.json.lock` holding pid, host and time, so that a
 * second skidcase can say who has the case open and since when (proper-lockfile's directory locks
 * carry no such content). It is created complete or not at all: written to a private temp file,
 * then hard-linked to the lock name, which fails if the name exists. A holder refreshes the file's
 * time; a stale lock is moved aside by rename (only one process can win that), re-checked, and
 * only then removed.
 */

export interface LockHandle {
  caseFile: string;
  lockFile: string;
  /** What we wrote in the lock file: if it reads otherwise, someone cleared our lock as stale. */
  text: string;
  lost: boolean;
}

export type LockOutcome =
  | { kind: 'acquired'; handle: LockHandle }
  | { kind: 'held'; reason: string; info?: LockInfo }
  | { kind: 'error'; code?: string; message: string };

const held = new Map<string, LockHandle>();
let timer: NodeJS.Timeout | undefined;

const tmpName = (lock: string, tag: string) =>
  `${lock}.${tag}.${process.pid}.${randomBytes(4).toString('hex')}`;

/** Creates the lock file complete, or reports EEXIST; returns the text written. */
async function createLock(lockFile: string): Promise<string> {
  const tmp = tmpName(lockFile, 'new');
  const text = JSON.stringify(ownLockInfo()) + '\n';
  await fs.writeFile(tmp, text, { flag: 'wx' });
  try {
    await fs.link(tmp, lockFile);
  } catch (e) {
    if (!noLinks(e)) throw e;
    // No hard links here: an exclusive create is still atomic, only its content may be seen empty.
    await fs.writeFile(lockFile, text, { flag: 'wx' });
  } finally {
    await fs.unlink(tmp).catch(() => undefined);
  }
  return text;
}

/** Moves a stale lock aside and removes it, unless another process replaced it meanwhile. */
async function clearStale(lockFile: string, seenText: string): Promise<void> {
  const aside = tmpName(lockFile, 'stale');
  try {
    await fs.rename(lockFile, aside);
  } catch (e) {
    if (errCode(e) === 'ENOENT') return; // someone else cleared it
    throw e;
  }
  // A fresh lock slipped in between our look and the rename: put it back where it was.
  if ((await fs.readFile(aside, 'utf8')) !== seenText)
    await fs.link(aside, lockFile).catch(() => undefined);
  await fs.unlink(aside).catch(() => undefined);
}

/**
 * Takes the write lock on a case file (absolute path). Already held by this process: the same
 * handle. Held by a live other skidcase: `held` with the reason to show. Stale: cleared, then taken.
 */
export async function acquireLock(caseFile: string): Promise<LockOutcome> {
  const mine = held.get(caseFile);
  if (mine && !mine.lost) return { kind: 'acquired', handle: mine };
  const lockFile = lockPath(caseFile);
  for (let attempt = 0; attempt < 5; attempt++) {
    try {
      const text = await createLock(lockFile);
      const handle: LockHandle = { caseFile, lockFile, text, lost: false };
      held.set(caseFile, handle);
      startRefresh();
      installExitHooks();
      return { kind: 'acquired', handle };
    } catch (e) {
      if (errCode(e) !== 'EEXIST')
        return {
          kind: 'error',
          code: errCode(e),
          message: `cannot lock ${caseFile}: ${describeWriteError(e).text}`,
        };
    }
    try {
      const seen = await readLock(lockFile);
      if (!seen) continue; // released meanwhile: try again
      if (!isStale(seen.info, seen.mtimeMs))
        return { kind: 'held', reason: describeHolder(seen.info), info: seen.info };
      await clearStale(lockFile, seen.text);
    } catch (e) {
      return {
        kind: 'error',
        code: errCode(e),
        message: `cannot check the lock ${lockFile}: ${describeWriteError(e).text}`,
      };
    }
  }
  return { kind: 'held', reason: 'open in another skidcase (the lock kept changing)' };
}

/** This process's lock on a case file, when it holds one (for the synchronous save). */
export function heldLock(caseFile: string): LockHandle | undefined {
  const mine = held.get(caseFile);
  return mine && !mine.lost ? mine : undefined;
}

/** True while our lock file is still the one we made (nobody cleared it as stale). */
export async function stillHeld(handle: LockHandle): Promise<boolean> {
  if (handle.lost) return false;
  try {
    handle.lost = (await fs.readFile(handle.lockFile, 'utf8')) !== handle.text;
  } catch {
    handle.lost = true;
  }
  return !handle.lost;
}

/** The same check, synchronous, for the save path (one read of a tiny file). */
export function stillHeldSync(handle: LockHandle): boolean {
  if (handle.lost) return false;
  try {
    handle.lost = fsSync.readFileSync(handle.lockFile, 'utf8') !== handle.text;
  } catch {
    handle.lost = true;
  }
  return !handle.lost;
}

/** Releases this process's lock on a case file; never removes a lock that another process took over. */
export async function releaseLock(caseFile: string): Promise<void> {
  const handle = held.get(caseFile);
  if (!handle) return;
  held.delete(caseFile);
  if (await stillHeld(handle)) await fs.unlink(handle.lockFile).catch(() => undefined);
  if (held.size === 0) stopRefresh();
}

/** Releases every lock this process holds; for the CLI's exit path. */
export async function releaseAllLocks(): Promise<void> {
  await Promise.all([...held.keys()].map((f) => releaseLock(f)));
}

/** The same, synchronous, for `process.on('exit')` and signals, where nothing async runs. */
export function releaseAllLocksSync(): void {
  for (const handle of held.values()) {
    try {
      if (!handle.lost && fsSync.readFileSync(handle.lockFile, 'utf8') === handle.text)
        fsSync.unlinkSync(handle.lockFile);
    } catch {
      // already gone
    }
  }
  held.clear();
  stopRefresh();
}

function startRefresh(): void {
  if (timer) return;
  timer = setInterval(() => void refreshAll(), LOCK_REFRESH_MS);
  timer.unref(); // a lock must never keep the process alive
}

function stopRefresh(): void {
  if (timer) clearInterval(timer);
  timer = undefined;
}

/** Touches every held lock so others see it is alive; notices a lock that was taken over. */
export async function refreshAll(): Promise<void> {
  const now = new Date();
  for (const handle of held.values()) {
    if (await stillHeld(handle)) await fs.utimes(handle.lockFile, now, now).catch(() => undefined);
  }
}

let hooked = false;
/**
 * Releases the locks when the process ends, also by SIGINT, SIGTERM or SIGHUP. signal-exit does
 * this the way write-file-atomic (used for every save) does, so the two agree on when a signal
 * should still kill the process; two hand-made signal handlers would each wait for the other.
 */
function installExitHooks(): void {
  if (hooked) return;
  hooked = true;
  onExit(() => releaseAllLocksSync(), { alwaysLast: true });
}
