import fsSync, { constants as fsConstants } from 'node:fs';
import fs from 'node:fs/promises';

const errCode = (e: unknown) => (e as NodeJS.ErrnoException).code;

/** Some file systems (FAT sticks, some shares) have no hard links: copy there instead. */
export const noLinks = (e: unknown) =>
  ['EPERM', 'ENOTSUP', 'EOPNOTSUPP', 'ENOSYS', 'EXDEV'].includes(errCode(e) ?? '');

/** `link`, or an exclusive copy where links do not exist (EEXIST either way when taken). */
async function linkOrCopy(file: string, target: string): Promise<void> {
  try {
    await fs.link(file, target);
  } catch (e) {
    if (!noLinks(e)) throw e;
    await fs.copyFile(file, target, fsConstants.COPYFILE_EXCL);
  }
}

/**
 * Links `file` under the first free name from `names(1)`, `names(2)`, ... and returns it. A hard
 * link never overwrites (EEXIST) and is atomic, so an earlier kept file is never lost and the
 * new name holds either nothing or the whole file.
 */
export async function linkUnderFreeName(
  file: string,
  names: (n: number) => string,
): Promise<string> {
  for (let n = 1; n < 1000; n++) {
    const target = names(n);
    try {
      await linkOrCopy(file, target);
      return target;
    } catch (e) {
      if (errCode(e) !== 'EEXIST') throw e;
    }
  }
  throw new Error(`no free name to keep ${file}`);
}

/** The same, synchronous, for the save path. */
export function linkUnderFreeNameSync(file: string, names: (n: number) => string): string {
  for (let n = 1; n < 1000; n++) {
    const target = names(n);
    try {
      try {
        fsSync.linkSync(file, target);
      } catch (e) {
        if (!noLinks(e)) throw e;
        fsSync.copyFileSync(file, target, fsConstants.COPYFILE_EXCL);
      }
      return target;
    } catch (e) {
      if (errCode(e) !== 'EEXIST') throw e;
    }
  }
  throw new Error(`no free name to keep ${file}`);
}

/** Moves `file` to the first free name (link, then unlink the old name): the content is never copied. */
export async function moveToFreeName(file: string, names: (n: number) => string): Promise<string> {
  const target = await linkUnderFreeName(file, names);
  await fs.unlink(file);
  return target;
}

/**
 * Makes `target` the same file as `file`, replacing whatever `target` was, atomically: a link
 * under a private temp name, then rename over `target`. Used for the backup: it never holds half
 * a file, and no bytes are copied (the case file is replaced by a new inode on save, so the backup
 * keeps the old one). Synchronous: three metadata calls on the save path (see save.ts).
 */
export function linkReplacingSync(file: string, target: string): void {
  const tmp = `${target}.${process.pid}.tmp`;
  try {
    fsSync.linkSync(file, tmp);
  } catch (e) {
    if (errCode(e) === 'EEXIST') {
      fsSync.unlinkSync(tmp); // left by a save that was killed here
      return linkReplacingSync(file, target);
    }
    if (!noLinks(e)) throw e;
    fsSync.copyFileSync(file, tmp);
  }
  fsSync.renameSync(tmp, target);
  // rename() between two names of one inode does nothing and leaves tmp (a save that was killed
  // after making the backup leaves backup and case as one inode): remove it then.
  try {
    fsSync.unlinkSync(tmp);
  } catch {
    // the usual case: rename moved it
  }
}
