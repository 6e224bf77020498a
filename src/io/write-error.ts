/**
 * What a failed write means for the user, for every writer (the case store and the report
 * writer): one wording, never a temp file's name. A leaf: it imports nothing of the project.
 */
const errCode = (e: unknown) => (e as NodeJS.ErrnoException).code;

/** Errors that mean "this place cannot take the case now"; the answers stay in memory. */
export type WriteProblem = 'full' | 'denied' | 'read-only' | 'gone' | 'io' | 'short';

/** A write that was checked and found wrong (fewer bytes on disk than written, or other bytes). */
export class ShortWriteError extends Error {
  constructor(detail: string) {
    super(detail);
    this.name = 'ShortWriteError';
  }
}

/**
 * What a failed save means for the user, in words they can act on: never a temp file's name.
 *
 * @example
 * describeWriteError(Object.assign(new Error(), { code: 'ENOSPC' })).text // "the disk is full"
 */
export function describeWriteError(e: unknown): { problem: WriteProblem; text: string } {
  if (e instanceof ShortWriteError)
    return {
      problem: 'short',
      text: 'the disk did not keep the whole file (it read back shorter or different; the disk may be full)',
    };
  switch (errCode(e)) {
    case 'ENOSPC':
      return { problem: 'full', text: 'the disk is full' };
    case 'EDQUOT':
      return { problem: 'full', text: 'the disk quota is used up' };
    case 'EACCES':
    case 'EPERM':
      return { problem: 'denied', text: 'the folder cannot be written (permission denied)' };
    case 'EROFS':
      return { problem: 'read-only', text: 'the folder is on a read-only file system' };
    case 'ENOENT':
    case 'ENOTDIR':
      return { problem: 'gone', text: 'the folder does not exist any more' };
    default: {
      const code = errCode(e);
      return {
        problem: 'io',
        text: code ? `the disk reported an error (${code})` : 'the file could not be written',
      };
    }
  }
}
