import path from 'node:path';
import { randomBytes } from 'node:crypto';
import { disk } from './disk.js';
import { ShortWriteError } from '../io/write-error.js';

/** The temp name a save writes first: `<id>.json.<pid>-<hex>.new` (leftovers.ts sweeps it). */
export const tempNameFor = (file: string) =>
  `${file}.${process.pid}-${randomBytes(4).toString('hex')}.new`;

/**
 * Writes `bytes` to `file` so that the file is replaced only by a complete, checked copy:
 * the bytes go to a temp file beside it (every byte accounted for: a short write is continued,
 * a write that makes no progress is an error), the temp file is flushed to the disk (fsync),
 * read back and compared byte for byte and parsed as JSON, and only then renamed over `file`;
 * the folder is flushed too, so the rename itself survives a power cut. `beforeRename` runs once
 * the new copy is known good (the save makes its backup there, so a failed write keeps the old one). Any failure removes the
 * temp file and throws, leaving `file` exactly as it was. Synchronous: the caller acknowledges an
 * answer only after this returns (the durability rule in DEVELOPERS.md).
 */
export function writeVerifiedSync(file: string, bytes: Buffer, beforeRename?: () => void): void {
  const tmp = tempNameFor(file);
  const fd = disk.openSync(tmp, 'wx', 0o644);
  let open = true;
  try {
    let done = 0;
    while (done < bytes.length) {
      const n = disk.writeSync(fd, bytes, done, bytes.length - done);
      if (!(n > 0)) throw Object.assign(new Error('no progress writing'), { code: 'ENOSPC' });
      done += n;
    }
    disk.fsyncSync(fd);
    disk.closeSync(fd);
    open = false;
    const back = disk.readFileSync(tmp);
    if (!back.equals(bytes))
      throw new ShortWriteError(`${back.length} of ${bytes.length} bytes read back as written`);
    JSON.parse(back.toString('utf8'));
    beforeRename?.();
    disk.renameSync(tmp, file);
  } catch (e) {
    if (open) {
      try {
        disk.closeSync(fd);
      } catch {
        // already failing: the first error is the one to report
      }
    }
    try {
      disk.unlinkSync(tmp);
    } catch {
      // never made, or already gone
    }
    throw e;
  }
  syncFolder(path.dirname(file));
}

/** Flushes a folder's entries (the rename); some systems cannot, and that is not an error. */
function syncFolder(dir: string): void {
  let fd: number | undefined;
  try {
    fd = disk.openSync(dir, 'r');
    disk.fsyncSync(fd);
  } catch {
    // EISDIR/EINVAL/EPERM on systems that do not flush folders: the file itself is flushed
  } finally {
    if (fd !== undefined) {
      try {
        disk.closeSync(fd);
      } catch {
        // nothing more to do
      }
    }
  }
}
