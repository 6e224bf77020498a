import fs from 'node:fs/promises';
import path from 'node:path';
import { describeIssue, type FieldIssue } from '../case/issues.js';
import { loadCaseText, type Case, type LoadResult } from '../case/load.js';
import { caseFilePath } from './case-path.js';
import { backupPath } from './side-files.js';
import type { Stats } from 'node:fs';
import { getKnown, hashOf, sameSig, sigOf, type FileSig } from './known-files.js';
import { acquireLock, releaseLock } from './lock.js';
import { sweepLeftovers } from './leftovers.js';
import { errCode } from './errno.js';
import { MAX_CASE_BYTES, tooLargeMessage } from '../case/limits.js';

export type OpenFailureKind =
  'missing' | 'unreadable' | 'json' | 'invalid' | 'newer' | 'format' | 'locked-error';

export type OpenResult =
  | {
      ok: true;
      case: Case;
      path: string;
      /** True when another skidcase has the case open (or the lock cannot be written): do not save. */
      readOnly: boolean;
      readOnlyReason?: string;
      /** The version the file was in, when it was migrated in memory; it is rewritten on first save. */
      migratedFrom?: number;
      /** Fields the schema does not know (kept on save), as paths, for a warning. */
      unknownFields: string[];
      /** Keys the file gives twice in one object (the last one is used), as paths, for a warning. */
      duplicateKeys: string[];
      /** Releases the write lock (nothing when read-only). Safe to call twice. */
      release(): Promise<void>;
    }
  | {
      ok: false;
      kind: OpenFailureKind;
      /** Names the file and the field path: `/s/x.json: analyses[0].marks[2]: length must be ...`. */
      message: string;
      path: string;
      issues: FieldIssue[];
      /** The backup beside a broken file, and whether it loads; the file itself is left as it is. */
      backup?: { path: string; loadable: boolean };
    };

export interface OpenOptions {
  /** Open the case `<dir>/<id>.json`; without it, the first argument is the file's path. */
  id?: string;
  /** Do not take the write lock (viewing, `solve`). */
  readOnly?: boolean;
  /** Reads text into a case; defaults to loadCaseText. Tests inject a migration table through it. */
  load?: (text: string) => LoadResult;
}

/** Lock errors that only mean "you cannot write here": the case opens read-only, with the reason. */
const CANNOT_WRITE = new Set(['EACCES', 'EPERM', 'EROFS']);

/**
 * Opens a case: reads it, migrates an older version in memory, validates it, and takes the write
 * lock. A broken file is left untouched and the result offers the backup beside it.
 *
 * @example
 * const r = await openCase('/cases/sessions', { id: 'harbor-road-0412' });
 * if (r.ok && r.readOnly) show(r.readOnlyReason);
 */
export async function openCase(dirOrPath: string, opts: OpenOptions = {}): Promise<OpenResult> {
  let file: string;
  if (opts.id !== undefined) {
    const where = caseFilePath(dirOrPath, opts.id);
    if (!where.ok)
      return fail('missing', path.resolve(dirOrPath), [{ path: 'id', message: where.message }]);
    file = where.path;
  } else file = path.resolve(dirOrPath);
  const load = opts.load ?? loadCaseText;

  const read = await readWithSig(file);
  if ('kind' in read) return read;
  let sig = read.sig;
  let hash = read.hash;
  let loaded = load(read.text);
  if (!loaded.ok) {
    const r = fail(loaded.kind, file, loaded.issues);
    if (loaded.kind !== 'newer') {
      const backup = await checkBackup(file, load);
      if (backup) {
        r.backup = backup;
        r.message += backup.loadable
          ? `; a backup is available: ${backup.path}`
          : `; the backup ${backup.path} is broken too`;
      }
    }
    return r;
  }

  const known = getKnown(file);
  let readOnlyReason: string | undefined;
  let locked = false;
  if (opts.readOnly) readOnlyReason = 'opened for viewing only';
  else {
    const lock = await acquireLock(file);
    if (lock.kind === 'acquired') {
      locked = true;
      // Another skidcase may have saved between our read and our lock: read its version then.
      const again = await readWithSig(file);
      if ('kind' in again) {
        await releaseLock(file);
        return again;
      }
      if (!sameSig(sig, again.stat)) {
        const fresh = load(again.text);
        // Broken meanwhile: open again from the start, which reports it and offers the backup.
        if (!fresh.ok) {
          await releaseLock(file);
          return openCase(dirOrPath, opts);
        }
        sig = again.sig;
        hash = again.hash;
        loaded = fresh;
      }
      await sweepLeftovers(file);
    } else if (lock.kind === 'held') readOnlyReason = lock.reason;
    else if (lock.code && CANNOT_WRITE.has(lock.code))
      readOnlyReason = `the folder cannot be written (${lock.code})`;
    else return fail('locked-error', file, [{ path: '(file)', message: lock.message }]);
  }
  known.sig = sig;
  known.hash = hash;
  known.readOnly = readOnlyReason;
  known.created = loaded.case.created;
  known.case = loaded.case;
  if (loaded.migratedFrom !== undefined) known.migratedFrom = loaded.migratedFrom;
  else delete known.migratedFrom;

  let released = false;
  const result: OpenResult = {
    ok: true,
    case: loaded.case,
    path: file,
    readOnly: readOnlyReason !== undefined,
    unknownFields: loaded.unknownFields,
    duplicateKeys: loaded.duplicateKeys,
    release: async () => {
      if (released || !locked) return;
      released = true;
      await releaseLock(file);
    },
  };
  if (readOnlyReason !== undefined) result.readOnlyReason = readOnlyReason;
  if (loaded.migratedFrom !== undefined) result.migratedFrom = loaded.migratedFrom;
  return result;
}

/** Reads a file with the identity of what was read (from the same open handle). */
async function readWithSig(
  file: string,
): Promise<
  { text: string; hash: string; sig: FileSig; stat: Stats } | (OpenResult & { ok: false })
> {
  try {
    const handle = await fs.open(file, 'r');
    try {
      const stat = await handle.stat();
      if (stat.size > MAX_CASE_BYTES)
        return fail('json', file, [{ path: '(file)', message: tooLargeMessage(stat.size) }]);
      const bytes = await handle.readFile();
      return { text: bytes.toString('utf8'), hash: hashOf(bytes), sig: sigOf(stat), stat };
    } finally {
      await handle.close();
    }
  } catch (e) {
    const code = errCode(e);
    if (code === 'ENOENT' || code === 'ENOTDIR')
      return fail('missing', file, [{ path: '(file)', message: 'no such case file' }]);
    return fail('unreadable', file, [
      { path: '(file)', message: `cannot be read (${code ?? String(e)})` },
    ]);
  }
}

function fail(
  kind: OpenFailureKind,
  file: string,
  issues: FieldIssue[],
): OpenResult & { ok: false } {
  const first = issues[0];
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : '';
  const message = `${file}: ${first ? describeIssue(first) : kind}${more}`;
  return { ok: false, kind, message, path: file, issues };
}

/** The backup beside a case, if any, and whether it loads. */
export async function checkBackup(file: string, load: (text: string) => LoadResult = loadCaseText) {
  const bak = backupPath(file);
  try {
    return { path: bak, loadable: load(await fs.readFile(bak, 'utf8')).ok };
  } catch {
    return undefined;
  }
}
