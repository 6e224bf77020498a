import fsSync from 'node:fs';
import fs from 'node:fs/promises';
import path from 'node:path';
import writeFileAtomic from 'write-file-atomic';
import { caseV1 } from '../case/v1/schema.js';
import { fromZod, describeIssue, type FieldIssue } from '../case/issues.js';
import { loadCaseText, type Case } from '../case/load.js';
import { caseFilePath } from './case-path.js';
import { backupPath, brokenPath, versionPath } from './side-files.js';
import { getKnown, serial, sigOf, sameSig } from './known-files.js';
import { acquireLock, stillHeldSync } from './lock.js';
import { linkReplacingSync, linkUnderFreeName, moveToFreeName } from './keep-aside.js';
import { errCode } from './errno.js';

export type SaveResult =
  | {
      ok: true;
      path: string;
      /** The case as written (with `updated`, and `created` when it had none). */
      case: Case;
      /** Where the previous good version was kept, when there was one. */
      backup?: string;
      /** Where the original of a migrated case was kept (`<id>.v<N>.json`), on its first save. */
      keptOriginal?: string;
      /** Where a broken file found in the way was moved instead of being overwritten. */
      keptBroken?: string;
    }
  | {
      ok: false;
      kind: 'invalid' | 'path' | 'exists' | 'locked' | 'read-only' | 'io';
      message: string;
      issues?: FieldIssue[];
    };

const madeDirs = new Set<string>();

/**
 * Saves a case as `<dir>/<id>.json`: validates it (an invalid case is never written), sets
 * `updated`, keeps the previous good version as `<id>.json.bak`, and writes the new one atomically
 * (write-file-atomic: temp file, fsync, rename), so a kill at any instant leaves the old or the new
 * file whole. Takes the case's write lock on first save; refuses while another skidcase holds it.
 * The input is not changed; the saved case is returned.
 *
 * @example
 * const r = await saveCase('/cases/sessions', myCase);
 * if (!r.ok) show(r.message);
 */
export async function saveCase(dir: string, c: Case): Promise<SaveResult> {
  const where = caseFilePath(dir, (c as { id: string }).id);
  if (!where.ok) return { ok: false, kind: 'path', message: where.message };
  const file = where.path;
  const next = stamp(c, new Date().toISOString(), getKnown(file).created);
  const parsed = caseV1.safeParse(next);
  if (!parsed.success) {
    const issues = fromZod(parsed.error);
    return {
      ok: false,
      kind: 'invalid',
      issues,
      message: `not saved, the case is not valid: ${issues.map(describeIssue).join('; ')}`,
    };
  }
  const text = JSON.stringify(next, null, 2) + '\n';
  return serial(file, () => write(file, next, text));
}

/*
 * The small metadata calls on the save path (lstat, link, rename, the lock check) are synchronous
 * on purpose: each takes microseconds, less than the thread-pool round trip of its async form,
 * and a save runs after every answer. The data write itself stays asynchronous.
 */
async function write(file: string, c: Case, text: string): Promise<SaveResult> {
  const known = getKnown(file);
  if (known.readOnly)
    return {
      ok: false,
      kind: 'read-only',
      message: `not saved: ${file} was opened read-only (${known.readOnly})`,
    };
  const dir = path.dirname(file);
  try {
    if (!madeDirs.has(dir)) {
      await fs.mkdir(dir, { recursive: true });
      madeDirs.add(dir);
    }
    const lock = await acquireLock(file);
    if (lock.kind === 'held')
      return { ok: false, kind: 'locked', message: `not saved: ${file} is ${lock.reason}` };
    if (lock.kind === 'error')
      return { ok: false, kind: 'io', message: `not saved: ${lock.message}` };
    if (!stillHeldSync(lock.handle))
      return {
        ok: false,
        kind: 'locked',
        message: `not saved: another skidcase took over ${file} while it was idle`,
      };
    const result: SaveResult = { ok: true, path: file, case: c };
    const refused = await keepPrevious(file, known, result);
    if (refused) return refused;
    await writeFileAtomic(file, text, { encoding: 'utf8' });
    known.sig = sigOf(fsSync.statSync(file));
    known.created = c.created;
    return result;
  } catch (e) {
    madeDirs.delete(dir); // the folder may have been removed: make it again next time
    return {
      ok: false,
      kind: 'io',
      message: `not saved: ${file}: ${e instanceof Error ? e.message : String(e)}`,
    };
  }
}

/**
 * Before a write: keep the file now on disk as the backup if it is good; keep a migrated case's
 * original once; move a file broken while open aside rather than overwrite it. A file this
 * process never opened or wrote is not written over at all (an id already taken, or a broken
 * file the user was not shown): the save is refused.
 */
async function keepPrevious(
  file: string,
  known: ReturnType<typeof getKnown>,
  out: SaveResult & { ok: true },
): Promise<(SaveResult & { ok: false }) | undefined> {
  let st;
  try {
    st = fsSync.lstatSync(file);
  } catch (e) {
    if (errCode(e) === 'ENOENT') return undefined;
    throw e;
  }
  if (known.sig === undefined)
    return {
      ok: false,
      kind: 'exists',
      message: `not saved: ${file} already exists and was not opened here; open it first, or use another id`,
    };
  // Known good (we wrote or validated exactly this file): no re-read. Otherwise look at it.
  const good = sameSig(known.sig, st) || loadCaseText(await fs.readFile(file, 'utf8')).ok;
  if (!good) {
    out.keptBroken = await moveToFreeName(file, (n) =>
      brokenPath(file).replace(/\.json$/, n > 1 ? `-${n}.json` : '.json'),
    );
    return undefined;
  }
  if (known.migratedFrom !== undefined) {
    const v = known.migratedFrom;
    out.keptOriginal = await linkUnderFreeName(file, (n) => versionPath(file, v, n));
    delete known.migratedFrom;
  }
  const bak = backupPath(file);
  linkReplacingSync(file, bak);
  out.backup = bak;
  return undefined;
}

/**
 * The case with `updated` set to now and `created` kept (from the case, else from the file this
 * process last read or wrote, else now). New keys go after `id`, where a reader looks for them.
 */
function stamp(c: Case, now: string, knownCreated: string | undefined): Case {
  const created = c.created ?? knownCreated ?? now;
  if ('created' in c && 'updated' in c) return { ...c, created, updated: now };
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(c)) {
    out[k] = v;
    if (k === 'id') Object.assign(out, { created, updated: now });
  }
  return { ...out, created, updated: now } as Case;
}
