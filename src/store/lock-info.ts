import fs from 'node:fs/promises';
import os from 'node:os';
import { randomBytes } from 'node:crypto';

/** What a lock file holds: enough to tell the user who has the case open, and to judge staleness. */
export interface LockInfo {
  app: 'skidcase';
  pid: number;
  host: string;
  /** ISO time the lock was taken. */
  since: string;
  /** Random, so that two locks never read the same (inode numbers are reused at once). */
  token?: string;
}

/**
 * A lock not refreshed for this long is stale even when its pid looks alive (pid reuse after a
 * reboot, a holder on another host that died). The values are proper-lockfile's defaults: stale
 * after 10 s, refreshed every 5 s. A holder whose lock was taken over meanwhile notices on its
 * next save, which is then refused instead of overwriting the other's work.
 */
export const LOCK_STALE_MS = 10_000;
export const LOCK_REFRESH_MS = 5_000;

export function ownLockInfo(): LockInfo {
  const token = randomBytes(8).toString('hex');
  return {
    app: 'skidcase',
    pid: process.pid,
    host: os.hostname(),
    since: new Date().toISOString(),
    token,
  };
}

/** Parses a lock file's text; undefined when it is not one of ours (empty, hand-made, cut short). */
export function parseLockInfo(text: string): LockInfo | undefined {
  try {
    const o = JSON.parse(text) as Partial<LockInfo>;
    if (
      typeof o.pid === 'number' &&
      Number.isInteger(o.pid) &&
      o.pid > 0 &&
      typeof o.host === 'string' &&
      typeof o.since === 'string'
    )
      return { app: 'skidcase', pid: o.pid, host: o.host, since: o.since };
  } catch {
    // fall through
  }
  return undefined;
}

/** True when a process with this pid exists on this machine (EPERM: it exists, owned by someone else). */
export function pidAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Whether a lock seen on disk is stale: a dead pid on this host, or no refresh for
 * `LOCK_STALE_MS`, or unreadable content older than that. A lock of our own pid is stale too: it
 * can only be left from an earlier process with the same pid (this process tracks its own locks).
 */
export function isStale(info: LockInfo | undefined, mtimeMs: number, now = Date.now()): boolean {
  if (now - mtimeMs > LOCK_STALE_MS) return true;
  if (!info) return false;
  if (info.host !== os.hostname()) return false;
  return info.pid === process.pid || !pidAlive(info.pid);
}

/** "open in another skidcase, pid 1234, since 21:50" (host named when it is not this one). */
export function describeHolder(info: LockInfo | undefined): string {
  if (!info) return 'open in another skidcase (its lock file could not be read)';
  const d = new Date(info.since);
  const at = Number.isNaN(d.getTime())
    ? info.since
    : `${String(d.getHours()).padStart(2, '0')}:${String(d.getMinutes()).padStart(2, '0')}`;
  const where = info.host === os.hostname() ? '' : ` on ${info.host}`;
  return `open in another skidcase, pid ${info.pid}${where}, since ${at}`;
}

/** Reads a lock file: its parsed content and times, or undefined when it is gone. */
export async function readLock(
  file: string,
): Promise<{ info: LockInfo | undefined; mtimeMs: number; text: string } | undefined> {
  try {
    const [text, st] = await Promise.all([fs.readFile(file, 'utf8'), fs.stat(file)]);
    return { info: parseLockInfo(text), mtimeMs: st.mtimeMs, text };
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
    throw e;
  }
}
