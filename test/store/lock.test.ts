import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import {
  LOCK_STALE_MS,
  lockPath,
  openCase,
  releaseAllLocks,
  saveCase,
} from '../../src/store/index.js';
import { refreshAll } from '../../src/store/lock.js';
import { buildStoreBundle, fixture } from './bundle.js';
import { sampleCase, tempDir } from './helpers.js';

let bundle: string;
beforeAll(async () => {
  bundle = await buildStoreBundle('lock');
});
afterAll(() => fs.rmSync(bundle, { force: true }));
afterEach(() => releaseAllLocks());

/** A case on disk that nobody holds. */
async function freshCase(id: string) {
  const dir = tempDir('lock');
  await saveCase(dir, sampleCase(id));
  await releaseAllLocks();
  const file = path.join(dir, `${id}.json`);
  return { dir, file, lock: lockPath(file) };
}

/** Starts another skidcase process that opens the case and holds it; resolves once it holds. */
function holder(
  dir: string,
  id: string,
): Promise<{ child: ChildProcessWithoutNullStreams; line: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [fixture('hold-lock.mjs'), bundle, dir, id]);
    let out = '';
    child.stdout.on('data', (d) => {
      out += String(d);
      if (out.includes('\n')) resolve({ child, line: out.trim() });
    });
    child.stderr.on('data', (d) => (out += String(d)));
    child.on('error', reject);
    child.on('exit', () => reject(new Error(`holder ended early: ${out}`)));
  });
}

const ended = (child: ChildProcessWithoutNullStreams) =>
  new Promise<void>((resolve) =>
    child.exitCode !== null || child.signalCode !== null
      ? resolve()
      : child.once('close', () => resolve()),
  );

function writeLock(lock: string, info: object, ageMs = 0) {
  fs.writeFileSync(lock, JSON.stringify(info));
  const t = new Date(Date.now() - ageMs);
  fs.utimesSync(lock, t, t);
}

describe('a case held by another live skidcase', () => {
  it('opens read-only with the reason; saves are refused; free again once it quits', async () => {
    const { dir, file } = await freshCase('held-1');
    const { child, line } = await holder(dir, 'held-1');
    expect(line).toBe(`HOLDING ${child.pid}`);
    const before = fs.readFileSync(file, 'utf8');

    const r = await openCase(dir, { id: 'held-1' });
    if (!r.ok) throw new Error(r.message);
    expect(r.readOnly).toBe(true);
    expect(r.readOnlyReason).toMatch(
      new RegExp(`^open in another skidcase, pid ${child.pid}, since \\d\\d:\\d\\d$`),
    );
    const s = await saveCase(dir, sampleCase('held-1', [1, 2, 3]));
    expect(s.ok).toBe(false);
    expect(!s.ok && s.kind).toBe('read-only');
    expect(fs.readFileSync(file, 'utf8')).toBe(before);

    child.stdin.write('quit\n');
    await ended(child);
    const again = await openCase(dir, { id: 'held-1' });
    expect(again.ok && again.readOnly).toBe(false);
  });

  it('a save without opening is refused too, naming who holds it', async () => {
    const { dir } = await freshCase('held-2');
    const { child } = await holder(dir, 'held-2');
    const s = await saveCase(dir, sampleCase('held-2'));
    expect(s.ok).toBe(false);
    if (!s.ok) {
      expect(s.kind).toBe('locked');
      expect(s.message).toContain(`pid ${child.pid}`);
    }
    child.kill('SIGKILL');
    await ended(child);
  });

  it('names the host when the lock comes from another machine', async () => {
    const { dir, lock } = await freshCase('held-3');
    writeLock(lock, {
      app: 'skidcase',
      pid: 4242,
      host: 'field-laptop-7',
      since: new Date().toISOString(),
    });
    const r = await openCase(dir, { id: 'held-3' });
    expect(r.ok && r.readOnlyReason).toMatch(
      /^open in another skidcase, pid 4242 on field-laptop-7, since \d\d:\d\d$/,
    );
  });
});

describe('stale locks', () => {
  it('a lock left by a killed process (dead pid) is cleared and taken', async () => {
    const { dir, lock } = await freshCase('stale-1');
    const { child } = await holder(dir, 'stale-1');
    child.kill('SIGKILL');
    await ended(child);
    expect(JSON.parse(fs.readFileSync(lock, 'utf8')).pid).toBe(child.pid); // left behind
    const r = await openCase(dir, { id: 'stale-1' });
    expect(r.ok && r.readOnly).toBe(false);
    expect(JSON.parse(fs.readFileSync(lock, 'utf8'))).toMatchObject({
      pid: process.pid,
      host: os.hostname(),
    });
  });

  it('a live pid that has not refreshed its lock for longer than the stale time is cleared', async () => {
    const { dir, lock } = await freshCase('stale-2');
    // pid 1 always exists; a lock this old cannot be a live skidcase (it refreshes every few seconds)
    writeLock(
      lock,
      { app: 'skidcase', pid: 1, host: os.hostname(), since: '2026-11-30T08:00:00Z' },
      LOCK_STALE_MS + 5_000,
    );
    const r = await openCase(dir, { id: 'stale-2' });
    expect(r.ok && r.readOnly).toBe(false);
  });

  it('a fresh lock of a live pid is respected (the same pid 1, refreshed now)', async () => {
    const { dir, lock } = await freshCase('stale-3');
    writeLock(lock, {
      app: 'skidcase',
      pid: 1,
      host: os.hostname(),
      since: new Date().toISOString(),
    });
    const r = await openCase(dir, { id: 'stale-3' });
    expect(r.ok && r.readOnly).toBe(true);
  });

  it('an unreadable lock is respected while fresh and cleared once old', async () => {
    const { dir, lock } = await freshCase('stale-4');
    writeLock(lock, {});
    fs.writeFileSync(lock, '');
    const r = await openCase(dir, { id: 'stale-4' });
    expect(r.ok && r.readOnlyReason).toBe(
      'open in another skidcase (its lock file could not be read)',
    );
    const old = new Date(Date.now() - LOCK_STALE_MS - 5_000);
    fs.utimesSync(lock, old, old);
    const again = await openCase(dir, { id: 'stale-4' });
    expect(again.ok && again.readOnly).toBe(false);
  });
});

describe('refreshing', () => {
  it('a holder touches its lock, so a long session never looks stale', async () => {
    const { dir, lock } = await freshCase('refresh-1');
    const r = await openCase(dir, { id: 'refresh-1' });
    expect(r.ok && r.readOnly).toBe(false);
    const old = new Date(Date.now() - LOCK_STALE_MS - 5_000);
    fs.utimesSync(lock, old, old); // as if the session had been open a while
    await refreshAll(); // what the holder's timer runs every LOCK_REFRESH_MS
    expect(Date.now() - fs.statSync(lock).mtimeMs).toBeLessThan(LOCK_STALE_MS);
    expect(JSON.parse(fs.readFileSync(lock, 'utf8')).pid).toBe(process.pid); // still our lock
  });
});

describe('releasing', () => {
  it.each(['SIGTERM', 'SIGINT'] as const)('a holder ended by %s removes its lock', async (sig) => {
    const { dir, lock } = await freshCase(`signal-${sig.toLowerCase()}`);
    const { child } = await holder(dir, `signal-${sig.toLowerCase()}`);
    expect(fs.existsSync(lock)).toBe(true);
    child.kill(sig);
    await ended(child);
    expect(child.signalCode).toBe(sig); // it still died of the signal, as a program without locks would
    expect(fs.existsSync(lock)).toBe(false);
  });

  it('release() and releaseAllLocks() remove the lock; a second release is harmless', async () => {
    const { dir, lock } = await freshCase('release-1');
    const r = await openCase(dir, { id: 'release-1' });
    if (!r.ok) throw new Error(r.message);
    expect(fs.existsSync(lock)).toBe(true);
    await r.release();
    await r.release();
    expect(fs.existsSync(lock)).toBe(false);
    await saveCase(dir, sampleCase('release-1'));
    expect(fs.existsSync(lock)).toBe(true);
    await releaseAllLocks();
    expect(fs.existsSync(lock)).toBe(false);
  });

  it('a lock taken over while we were idle stops our saves instead of overwriting', async () => {
    const { dir, lock } = await freshCase('taken-1');
    await saveCase(dir, sampleCase('taken-1'));
    fs.unlinkSync(lock); // as another process would after judging us stale
    writeLock(lock, {
      app: 'skidcase',
      pid: 1,
      host: os.hostname(),
      since: new Date().toISOString(),
    });
    const s = await saveCase(dir, sampleCase('taken-1', [9]));
    expect(s.ok).toBe(false);
    expect(!s.ok && s.kind).toBe('locked');
  });

  it('a case opened for viewing only takes no lock and refuses saves', async () => {
    const { dir, lock } = await freshCase('view-1');
    const r = await openCase(dir, { id: 'view-1', readOnly: true });
    expect(r.ok && r.readOnly).toBe(true);
    expect(fs.existsSync(lock)).toBe(false);
    const s = await saveCase(dir, sampleCase('view-1'));
    expect(!s.ok && s.kind).toBe('read-only');
  });
});

describe('a lock that cannot be made', () => {
  it('in a folder that does not exist: says so, names the case, and no temp file name', async () => {
    const { acquireLock } = await import('../../src/store/lock.js');
    const file = path.join(tempDir('lock-gone'), 'no-such-folder', 'x.json');
    const r = await acquireLock(file);
    expect(r.kind).toBe('error');
    const message = r.kind === 'error' ? r.message : '';
    expect(message).toBe(`cannot lock ${file}: the folder does not exist any more`);
    expect(message).not.toMatch(/\.lock\.new|\.tmp|ENOENT/);
    expect(fs.existsSync(path.dirname(file))).toBe(false);
  });
});
