import fs from 'node:fs/promises';
import path from 'node:path';
import { describeIssue } from '../case/issues.js';
import { loadCaseText, type Case } from '../case/load.js';
import { MAX_CASE_BYTES, tooLargeMessage } from '../case/limits.js';
import { isSideFile } from './side-files.js';
import { stampOf, type FileStamp } from './list-index.js';

/** One file of the sessions folder, as the case list shows it. */
export interface CaseEntry {
  /** The case's id; for a file that is not a valid case, its name without `.json`. */
  id: string;
  path: string;
  /** The case's `updated` time, or the file's modification time when it has none (ISO). */
  updated: string;
  /** The case, when the file is valid (older versions come migrated). */
  case?: Case;
  /** Why the file cannot be opened, naming the field: `analyses[0].marks[2]: length must be ...`. */
  problem?: string;
  /** A valid case whose id differs from its file name (saving it writes `<id>.json`). */
  warning?: string;
  /** The file's stamp, taken before it was read (for the list index). */
  stamp?: FileStamp;
}

/**
 * Every case file in the sessions folder (`*.json`; backups, kept originals and broken copies
 * excluded), newest `updated` first. Never fails on one file: a broken, unreadable or foreign
 * JSON file is an entry with a `problem`. A folder that does not exist yet holds no cases.
 *
 * @example
 * for (const e of await listCases(dir)) console.log(e.id, e.problem ?? e.case?.details?.reference);
 */
export async function listCases(dir: string): Promise<CaseEntry[]> {
  const entries = await Promise.all((await caseFiles(dir)).map(readCaseEntry));
  return entries.sort(newestFirst);
}

/** Code-unit order: the same on every machine, and no ICU collator to start (13 ms). */
const textOrder = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/**
 * The case list's order: newest `updated` first (ISO times, which sort as text), then by id.
 * Shared by `listCases` and the screen's list.
 */
export const newestFirst = (
  a: { updated?: string | undefined; id: string },
  b: { updated?: string | undefined; id: string },
): number => textOrder(b.updated ?? '', a.updated ?? '') || textOrder(a.id, b.id);

/** The case files of the sessions folder (absolute paths), unread and unsorted. */
export async function caseFiles(dir: string): Promise<string[]> {
  let names: string[];
  try {
    names = await fs.readdir(dir);
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') return [];
    throw e;
  }
  return names
    .filter((n) => n.endsWith('.json') && !isSideFile(n))
    .map((n) => path.join(path.resolve(dir), n));
}

/** One file of the list, read and checked (`listCases` for each of them). */
export async function readCaseEntry(file: string): Promise<CaseEntry> {
  const id = path.basename(file, '.json');
  let mtime = new Date(0).toISOString();
  try {
    const st = await fs.stat(file);
    mtime = st.mtime.toISOString();
    if (!st.isFile()) return { id, path: file, updated: mtime, problem: 'not a file' };
    if (st.size > MAX_CASE_BYTES)
      return { id, path: file, updated: mtime, problem: tooLargeMessage(st.size) };
    const stamp = stampOf(st);
    const loaded = loadCaseText(await fs.readFile(file, 'utf8'));
    if (!loaded.ok) {
      const first = loaded.issues[0];
      return {
        id,
        path: file,
        updated: mtime,
        problem: first ? describeIssue(first) : loaded.kind,
      };
    }
    const c = loaded.case;
    const entry: CaseEntry = {
      id: c.id,
      path: file,
      updated: normalise(c.updated) ?? mtime,
      case: c,
      stamp,
    };
    if (c.id !== id)
      entry.warning = `the case inside has id "${c.id}", the file is named ${id}.json`;
    return entry;
  } catch (e) {
    return {
      id,
      path: file,
      updated: mtime,
      problem: `cannot be read (${(e as NodeJS.ErrnoException).code ?? String(e)})`,
    };
  }
}

/** A hand-written `updated` may be any text; only a real date sorts, as ISO UTC. */
function normalise(t: string | undefined): string | undefined {
  if (t === undefined) return undefined;
  const d = new Date(t);
  return Number.isNaN(d.getTime()) ? undefined : d.toISOString();
}
