import fs from 'node:fs';
import path from 'node:path';
import { printable } from '../case/printable.js';

/** The case id rule of the case schema: the id is also the file name, so it must be safe as one. */
export const CASE_ID = /^[a-z0-9-]{1,64}$/;

export type PathResult = { ok: true; path: string } | { ok: false; message: string };

/** Why an id cannot be a file name, or undefined when it can. */
export function checkId(id: string): string | undefined {
  if (typeof id !== 'string' || id.length === 0) return 'a case id is needed';
  if (id.length > 64)
    return `case id "${printable(id.slice(0, 20))}…" is longer than 64 characters`;
  if (!CASE_ID.test(id))
    return `case id "${printable(id)}" may hold only lower-case letters, digits and dashes`;
  return undefined;
}

/** True when `file` is `dir` itself or lies beneath it (both already resolved). */
export function isInside(dir: string, file: string): boolean {
  const rel = path.relative(dir, file);
  return rel !== '' && !rel.startsWith('..') && !path.isAbsolute(rel);
}

/**
 * The file `<dir>/<id>.json` for a case id, or a message when the id could lead outside the
 * sessions folder. The id must match the schema's rule (`../x`, `a/b`, `/etc/x`, `.`, NUL, upper
 * case and ids over 64 characters are refused). When the file already exists as a symbolic link it
 * is refused too: skidcase writes only regular files it owns inside the folder.
 *
 * @example
 * caseFilePath('/s', 'harbor-road-0412') // => { ok: true, path: '/s/harbor-road-0412.json' }
 * caseFilePath('/s', '../etc')           // => { ok: false, message: 'case id "../etc" may hold only ...' }
 */
export function caseFilePath(dir: string, id: string): PathResult {
  const bad = checkId(id);
  if (bad) return { ok: false, message: bad };
  const root = path.resolve(dir);
  const file = path.resolve(root, `${id}.json`);
  // The id rule already makes this impossible; kept so the guarantee does not rest on a regex alone.
  if (!isInside(root, file) || path.dirname(file) !== root)
    return { ok: false, message: `case id "${id}" would lead outside the sessions folder ${root}` };
  try {
    if (fs.lstatSync(file).isSymbolicLink())
      return {
        ok: false,
        message: `${file} is a symbolic link; skidcase keeps cases only as plain files`,
      };
  } catch {
    // Not there yet: fine, the first save creates it.
  }
  return { ok: true, path: file };
}

/**
 * Turns a typed reference into a valid case id: lower case, accents dropped, every run of other
 * characters becomes one dash, at most 64 characters. Empty input gives `case`.
 *
 * @example
 * slugifyId('Harbor Rd 04/12') // => 'harbor-rd-04-12'
 */
export function slugifyId(text: string): string {
  const slug = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 64)
    .replace(/-+$/g, '');
  return slug === '' ? 'case' : slug;
}

/**
 * `base` when `<dir>/<base>.json` is free, else `base-2`, `base-3`, ... (trimmed so the id stays
 * within 64 characters). `base` is slugified first, so any text may be passed.
 *
 * @example
 * uniqueId('/s', 'harbor-rd') // => 'harbor-rd-2' when harbor-rd.json exists
 */
export function uniqueId(dir: string, base: string): string {
  const slug = slugifyId(base);
  const taken = (id: string) =>
    fs.existsSync(path.join(dir, `${id}.json`)) || fs.existsSync(path.join(dir, `${id}.json.bak`));
  if (!taken(slug)) return slug;
  for (let n = 2; ; n++) {
    const suffix = `-${n}`;
    const id = `${slug.slice(0, 64 - suffix.length).replace(/-+$/, '')}${suffix}`;
    if (!taken(id)) return id;
  }
}
