/**
 * A small text file named by the investigator (surveyed points exported as CSV), read whole, with
 * what went wrong in the user's words and the file named: missing, a folder, too large, not text.
 */
import fs from 'node:fs';
import path from 'node:path';

/** Largest file read: a survey export of a few thousand points is far below it. */
export const TEXT_FILE_CAP = 1_000_000;

/**
 * Reads `file` (relative to `cwd`) as UTF-8 text.
 * @example readTextFile('points.csv') // { ok: true, text: 'x,y\n0,0\n...' }
 */
export function readTextFile(
  file: string,
  cwd = process.cwd(),
): { ok: true; text: string } | { ok: false; message: string } {
  const full = path.resolve(cwd, file);
  try {
    const st = fs.statSync(full);
    if (st.isDirectory()) return { ok: false, message: `${file} is a folder, not a file` };
    if (st.size > TEXT_FILE_CAP)
      return {
        ok: false,
        message: `${file} is ${Math.round(st.size / 1000)} kB, over the ${TEXT_FILE_CAP / 1_000_000} MB a points file may be`,
      };
    const bytes = fs.readFileSync(full);
    if (bytes.includes(0)) return { ok: false, message: `${file} is not a text (CSV) file` };
    return { ok: true, text: bytes.toString('utf8') };
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return {
      ok: false,
      message:
        code === 'ENOENT'
          ? `${file}: no such file (looked in ${path.dirname(full)})`
          : code === 'EACCES' || code === 'EPERM'
            ? `${file} cannot be read: permission denied`
            : `${file} cannot be read (${code ?? 'error'})`,
    };
  }
}
