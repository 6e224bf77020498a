import { open, stat } from 'node:fs/promises';
import { decodeCaseBytes } from '../case/decode-bytes.js';
import { MAX_CASE_BYTES, tooLargeMessage } from '../case/limits.js';
import { printable } from '../case/printable.js';
import { sha256Of } from '../io/sha256.js';

/** Why a path cannot be read as a case file, in words the user can act on. */
function readError(file: string, e: unknown): string {
  const code = (e as { code?: string }).code;
  const name = printable(file);
  if (code === 'ENOENT') return `${name}: no such file`;
  if (code === 'ENOTDIR') return `${name}: no such file (a part of the path is not a folder)`;
  if (code === 'EISDIR') return `${name}: is a folder, not a case file`;
  if (code === 'EACCES' || code === 'EPERM') return `${name}: permission denied`;
  return `${name}: cannot be read (${code ?? 'read error'})`;
}

/**
 * The text of a case file for `solve` and `report`, with the SHA-256 of its bytes, or the message saying why there is none: no
 * such file, a folder, no permission, or larger than a case file may be (checked before reading).
 * @example await readCaseFile('/etc') // { message: '/etc: is a folder, not a case file' }
 */
export async function readCaseFile(
  file: string,
): Promise<{ text: string; sha256: string } | { message: string }> {
  try {
    const st = await stat(file);
    if (st.isDirectory()) return { message: readError(file, { code: 'EISDIR' }) };
    if (st.size > MAX_CASE_BYTES)
      return { message: `${printable(file)}: ${tooLargeMessage(st.size)}` };
    const handle = await open(file, 'r');
    try {
      const bytes = await handle.readFile();
      return { text: decodeCaseBytes(bytes), sha256: sha256Of(bytes) };
    } finally {
      await handle.close();
    }
  } catch (e) {
    return { message: readError(file, e) };
  }
}
