import path from 'node:path';
import fs from 'node:fs/promises';
import { caseV1 } from '../case/v1/schema.js';
import { fromZod, describeIssue, type FieldIssue } from '../case/issues.js';
import { loadCaseText, type Case } from '../case/load.js';
import { caseFilePath } from './case-path.js';
import { backupPath, brokenPath, outsidePath, versionPath } from './side-files.js';
import { getKnown, hashOf, serial, sigOf } from './known-files.js';
import { acquireLock, heldLock, stillHeldSync } from './lock.js';
import { linkReplacingSync, linkUnderFreeNameSync } from './keep-aside.js';
import { errCode } from './errno.js';
import { disk } from './disk.js';
import { writeVerifiedSync } from './verified-write.js';
import { describeWriteError, type WriteProblem } from '../io/write-error.js';
import { withRevision, type Before } from './revisions.js';

export type SaveResult =
  | {
      ok: true;
      path: string;
      /** The case as written (with `updated`, `created` when it had none, and its trail). */
      case: Case;
      /** Where the previous good version was kept, when there was one. */
      backup?: string;
      /** Where the original of a migrated case was kept (`<id>.v<N>.json`), on its first save. */
      keptOriginal?: string;
      /** Where a broken file found in the way was moved instead of being overwritten. */
      keptBroken?: string;
      /** Where a version changed outside skidcase was kept when this save wrote over it. */
      keptOutside?: string;
    }
  | {
      ok: false;
      kind: 'invalid' | 'path' | 'exists' | 'locked' | 'read-only' | 'io' | 'changed';
      message: string;
      issues?: FieldIssue[];
      /** For `io`: what kind of trouble, so the screen can say what to do. */
      problem?: WriteProblem;
      /** For `changed`: the case now on disk, written by someone else since our last save. */
      theirs?: Case;
    };

export interface SaveOptions {
  /**
   * The file to write (absolute): the file the case was opened from, whatever its name. Without
   * it the case is written as `<dir>/<id>.json`.
   */
  file?: string;
  /**
   * Write over a file changed outside skidcase (the user chose "keep mine"): theirs is kept as
   * `<id>.outside-<time>.json` and as the backup.
   */
  overwriteChanged?: boolean;
  /**
   * The case skidcase last wrote, rebuilt by the caller (the interview, from its saved answers):
   * asked for only when the file's fields are not the ones its trail says skidcase wrote, to list
   * what a hand edit changed (docs/case-file.md, "Revisions").
   */
  lastWritten?: () => Case | undefined;
}

/**
 * Saves a case as `<dir>/<id>.json`: validates it (an invalid case is never written), sets
 * `updated`, adds to its trail of revisions what changed since the file on disk (revisions.ts), keeps the previous good version as `<id>.json.bak`, and writes the new one through a
 * checked temp file (see verified-write.ts), so a kill, a full disk or a short write at any instant
 * leaves the old or the new file whole. Takes the case's write lock on first save; refuses while
 * another skidcase holds it. The input is not changed; the saved case is returned.
 *
 * @example
 * const r = await saveCase('/cases/sessions', myCase);
 * if (!r.ok) show(r.message);
 */
export async function saveCase(dir: string, c: Case, opts: SaveOptions = {}): Promise<SaveResult> {
  const prepared = prepare(dir, c, opts.file);
  if ('ok' in prepared) return prepared;
  const { file } = prepared;
  return serial(file, async () => {
    const known = getKnown(file);
    if (known.readOnly) return readOnly(file, known.readOnly);
    try {
      await fs.mkdir(path.dirname(file), { recursive: true });
    } catch (e) {
      return ioFailure(e);
    }
    const lock = await acquireLock(file);
    if (lock.kind === 'held')
      return { ok: false, kind: 'locked', message: `not saved: ${file} is ${lock.reason}` };
    if (lock.kind === 'error') return ioFailure(Object.assign(new Error(), { code: lock.code }));
    return writeLocked(file, prepared, opts);
  });
}

/**
 * The same save, done before it returns: for the interview, which shows the next question only
 * once the answer is on disk. The case must be open here with its write lock (openCase took it).
 */
export function saveCaseSync(dir: string, c: Case, opts: SaveOptions = {}): SaveResult {
  const prepared = prepare(dir, c, opts.file);
  if ('ok' in prepared) return prepared;
  const { file } = prepared;
  const known = getKnown(file);
  if (known.readOnly) return readOnly(file, known.readOnly);
  if (!heldLock(file))
    return {
      ok: false,
      kind: 'locked',
      message: `not saved: ${file} is not open for writing here`,
    };
  return writeLocked(file, prepared, opts);
}

interface Prepared {
  file: string;
  next: Case;
  at: string;
}

function prepare(dir: string, c: Case, exact?: string): Prepared | (SaveResult & { ok: false }) {
  const where = caseFilePath(dir, (c as { id: string }).id);
  if (!where.ok) return { ok: false, kind: 'path', message: where.message };
  const file = exact ? path.resolve(exact) : where.path;
  const at = new Date().toISOString();
  const next = stamp(c, at, getKnown(file).created);
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
  return { file, next, at };
}

const readOnly = (file: string, why: string): SaveResult & { ok: false } => ({
  ok: false,
  kind: 'read-only',
  message: `not saved: ${file} was opened read-only (${why})`,
});

function ioFailure(e: unknown): SaveResult & { ok: false } {
  const { problem, text } = describeWriteError(e);
  return { ok: false, kind: 'io', problem, message: `not saved: ${text}` };
}

/*
 * Every call on this path is synchronous: each takes microseconds to a few milliseconds (the
 * fsync), and the interview waits for the whole save anyway before it shows the next question.
 */
function writeLocked(file: string, p: Prepared, opts: SaveOptions): SaveResult {
  const known = getKnown(file);
  const lock = heldLock(file);
  if (!lock || !stillHeldSync(lock))
    return {
      ok: false,
      kind: 'locked',
      message: `not saved: another skidcase took over ${file} while it was idle`,
    };
  try {
    const result: SaveResult = { ok: true, path: file, case: p.next };
    const onDisk = lookAtPrevious(file, known, result, opts);
    if (onDisk && 'ok' in onDisk) return onDisk;
    // No file (a new case): the case this process last knew, if it vanished while open.
    const before: Before = onDisk?.before ?? (known.case ? { onDisk: known.case } : {});
    const next = withRevision(p.next, before, p.at);
    const bytes = caseFileBytes(next);
    result.case = next;
    writeVerifiedSync(file, bytes, () => onDisk?.keep());
    known.sig = sigOf(disk.lstatSync(file));
    known.hash = hashOf(bytes);
    known.created = next.created;
    known.case = next;
    return result;
  } catch (e) {
    return ioFailure(e);
  }
}

/**
 * Before a write, looks at the file now on disk. The one this process last read or wrote (same
 * bytes, by hash) becomes the backup; a migrated case's original is kept once. A file changed
 * outside skidcase that is a good case is not written over: the save is refused as `changed`,
 * with that case, so the user can choose. A file that does not parse is moved aside, never
 * overwritten and never made the backup. A file this process never opened or wrote is not
 * written over at all (an id already taken).
 */
function lookAtPrevious(
  file: string,
  known: ReturnType<typeof getKnown>,
  out: SaveResult & { ok: true },
  opts: SaveOptions,
): (SaveResult & { ok: false }) | { keep(): void; before: Before } | undefined {
  let bytes: Buffer;
  try {
    bytes = disk.readFileSync(file);
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
  const ours = known.hash !== undefined && hashOf(bytes) === known.hash;
  const lastWritten = opts.lastWritten ? { lastWritten: opts.lastWritten } : {};
  let before: Before;
  if (ours) before = { onDisk: known.case ?? caseIn(bytes), ...lastWritten };
  else {
    const theirs = loadCaseText(bytes.toString('utf8'));
    // Not a case: moved aside, and the trail goes on from the last good version known here.
    if (!theirs.ok)
      return {
        keep: () => void (out.keptBroken = moveAsideSync(file)),
        before: known.case ? { onDisk: known.case } : {},
      };
    before = known.case
      ? { onDisk: theirs.case, ours: known.case }
      : { onDisk: theirs.case, ...lastWritten };
    if (!opts.overwriteChanged)
      return {
        ok: false,
        kind: 'changed',
        theirs: theirs.case,
        message: `not saved: ${path.basename(file)} was changed outside skidcase since it was last saved here`,
      };
  }
  // Run once the new copy is written and checked, just before it replaces this one.
  return {
    before,
    keep() {
      if (!ours)
        out.keptOutside = linkUnderFreeNameSync(file, (n) =>
          outsidePath(file).replace(/\.json$/, n > 1 ? `-${n}.json` : '.json'),
        );
      if (known.migratedFrom !== undefined) {
        const v = known.migratedFrom;
        out.keptOriginal = linkUnderFreeNameSync(file, (n) => versionPath(file, v, n));
        delete known.migratedFrom;
      }
      const bak = backupPath(file);
      linkReplacingSync(file, bak);
      out.backup = bak;
    },
  };
}

/** A case as its file holds it: JSON indented by two spaces, one newline at the end, UTF-8. */
export function caseFileBytes(c: Case): Buffer {
  return Buffer.from(JSON.stringify(c, null, 2) + '\n', 'utf8');
}

/** The case in bytes this process wrote or read as a good case (so they load). */
function caseIn(bytes: Buffer): Case | undefined {
  const r = loadCaseText(bytes.toString('utf8'));
  return r.ok ? r.case : undefined;
}

/** Moves a broken case file to `<id>.broken-<time>.json` (or -2, -3 ...) and returns where. */
function moveAsideSync(file: string): string {
  const target = linkUnderFreeNameSync(file, (n) =>
    brokenPath(file).replace(/\.json$/, n > 1 ? `-${n}.json` : '.json'),
  );
  disk.unlinkSync(file);
  return target;
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
