import { constants } from 'node:fs';
import { access, link, lstat, rename, stat, unlink } from 'node:fs/promises';
import path from 'node:path';
import writeFileAtomic from 'write-file-atomic';
import { describeWriteError } from '../io/write-error.js';

/** One file to write: where, and its whole content (text, written as UTF-8, or bytes). */
export interface OutFile {
  path: string;
  content: string | Buffer;
}

/** Written (the paths, in order), refused because files exist (their paths), or an I/O failure. */
export type WriteResult =
  | { ok: true; written: string[] }
  | { ok: false; kind: 'exists'; paths: string[] }
  | { ok: false; kind: 'folder'; path: string }
  /** `code` is the system's error code (ENOENT, EACCES, ...); `message` names temp files, for logs only. */
  | { ok: false; kind: 'io'; path: string; message: string; code?: string };

const codeOf = (e: unknown) => (e as { code?: string }).code;

/**
 * Why the files cannot be written, found before anything is: a target that is a folder, or a
 * folder to write in that is missing or not writable. Undefined when the writes may go ahead.
 */
async function cannotWrite(files: OutFile[]): Promise<WriteResult | undefined> {
  for (const f of files) {
    const at = await lstat(f.path).catch(() => undefined);
    if (at?.isDirectory()) return { ok: false, kind: 'folder', path: f.path };
  }
  for (const dir of new Set(files.map((f) => path.dirname(path.resolve(f.path))))) {
    try {
      if (!(await stat(dir)).isDirectory())
        return { ok: false, kind: 'io', path: dir, message: 'not a folder', code: 'ENOTDIR' };
      await access(dir, constants.W_OK);
    } catch (e) {
      return {
        ok: false,
        kind: 'io',
        path: dir,
        message: String(e),
        ...(codeOf(e) ? { code: codeOf(e)! } : {}),
      };
    }
  }
  return undefined;
}

async function exists(p: string): Promise<boolean> {
  try {
    await access(p, constants.F_OK);
    return true;
  } catch {
    return false;
  }
}

/**
 * Puts a complete file at `target` only if nothing is there: the content goes to a temporary
 * file first (written and fsynced by write-file-atomic), then a hard link claims the name, which
 * fails when the name is taken, even when another process takes it in the meantime. Where hard
 * links are not supported, falls back to a rename after a last check.
 */
async function writeNew(
  target: string,
  content: OutFile['content'],
): Promise<'written' | 'exists'> {
  const tmp = path.join(
    path.dirname(target),
    `.${path.basename(target)}.${process.pid}.${Date.now()}.part`,
  );
  await writeFileAtomic(tmp, content, { encoding: 'utf8', fsync: true });
  try {
    await link(tmp, target);
    return 'written';
  } catch (e) {
    const code = (e as { code?: string }).code;
    if (code === 'EEXIST') return 'exists';
    if (code !== 'EPERM' && code !== 'ENOTSUP' && code !== 'EXDEV' && code !== 'ENOSYS') throw e;
    if (await exists(target)) return 'exists';
    await rename(tmp, target);
    return 'written';
  } finally {
    await unlink(tmp).catch(() => undefined);
  }
}

/**
 * Writes every file atomically (a reader never sees half a file). Without `force`, nothing is
 * written when any target already exists, and an existing file is never replaced; with `force`,
 * existing files are replaced atomically. Pictures come first in `files` order and the report
 * last, so the report never links to a picture not yet on disk.
 */
export async function writeFiles(files: OutFile[], force: boolean): Promise<WriteResult> {
  const refused = await cannotWrite(files);
  if (refused) return refused;
  if (!force) {
    const taken: string[] = [];
    for (const f of files) if (await exists(f.path)) taken.push(f.path);
    if (taken.length) return { ok: false, kind: 'exists', paths: taken };
  }
  const written: string[] = [];
  for (const f of files) {
    try {
      if (force) await writeFileAtomic(f.path, f.content, { encoding: 'utf8', fsync: true });
      else if ((await writeNew(f.path, f.content)) === 'exists') {
        // Another process took the name after the check: take back what this call wrote.
        await Promise.all(written.map((p) => unlink(p).catch(() => undefined)));
        return { ok: false, kind: 'exists', paths: [f.path] };
      }
      written.push(f.path);
    } catch (e) {
      // Without --force every file written here was new: remove them, so a failed run leaves nothing.
      if (!force) await Promise.all(written.map((p) => unlink(p).catch(() => undefined)));
      return {
        ok: false,
        kind: 'io',
        path: f.path,
        message: e instanceof Error ? e.message : String(e),
        ...(codeOf(e) ? { code: codeOf(e)! } : {}),
      };
    }
  }
  return { ok: true, written };
}

/**
 * A report that could not be written, in words the user can act on: which file or folder, and
 * why (never the name of a temporary file).
 * @example writeFailureText({ ok: false, kind: 'folder', path: 'out' }) // 'out is a folder; ...'
 */
export function writeFailureText(r: WriteResult & { ok: false }): string {
  if (r.kind === 'exists') return `${r.paths.join(', ')} already exists`;
  // The command's output escapes control characters (printableIo), the screen shows text as text.
  const where = r.path;
  if (r.kind === 'folder')
    return `${where} is a folder; give the report a file name, such as ${path.join(where, 'report.md')}`;
  if (r.code === 'ENOENT') return `${where}: the folder does not exist`;
  if (r.code === 'ENOTDIR') return `${where}: is not a folder`;
  const { text } = describeWriteError(Object.assign(new Error(), { code: r.code }));
  return `${where}: cannot be written: ${text}`;
}
