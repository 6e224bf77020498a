import fs from 'node:fs/promises';
import path from 'node:path';
import { describeIssue } from '../case/issues.js';
import { loadCaseText, type Case } from '../case/load.js';
import { caseFilePath } from './case-path.js';
import { backupPath, brokenPath } from './side-files.js';
import { getKnown, hashOf, serial, sigOf } from './known-files.js';
import { writeVerifiedSync } from './verified-write.js';
import { describeWriteError } from '../io/write-error.js';
import { acquireLock } from './lock.js';
import { moveToFreeName } from './keep-aside.js';
import { withNote } from './revisions.js';
import { caseFileBytes } from './save.js';

export type RestoreResult =
  | {
      ok: true;
      path: string;
      case: Case;
      /** where the broken file was kept */ keptBroken?: string;
    }
  | { ok: false; message: string };

/**
 * Puts the backup `<id>.json.bak` back as `<id>.json`, its trail of revisions ending with an entry
 * that says so. The file it replaces is kept as `<id>.broken-<time>.json`, never deleted; the
 * backup stays too. Refused when the backup itself
 * does not load, or when another skidcase has the case open. Takes the write lock, like a save.
 *
 * @example
 * const r = await restoreBackup(dir, 'harbor-road-0412'); // then openCase(dir, { id })
 */
export async function restoreBackup(dir: string, id: string): Promise<RestoreResult> {
  const where = caseFilePath(dir, id);
  if (!where.ok) return { ok: false, message: where.message };
  const file = where.path;
  const bak = backupPath(file);
  return serial(file, async () => {
    let text: string;
    try {
      text = await fs.readFile(bak, 'utf8');
    } catch {
      return { ok: false, message: `${file} has no backup (${bak} not found)` };
    }
    const loaded = loadCaseText(text);
    if (!loaded.ok) {
      const first = loaded.issues[0];
      return {
        ok: false,
        message: `the backup ${bak} is broken too: ${first ? describeIssue(first) : loaded.kind}`,
      };
    }
    const lock = await acquireLock(file);
    if (lock.kind === 'held')
      return { ok: false, message: `not restored: ${file} is ${lock.reason}` };
    if (lock.kind === 'error') return { ok: false, message: `not restored: ${lock.message}` };
    try {
      const result: RestoreResult = { ok: true, path: file, case: loaded.case };
      try {
        result.keptBroken = await moveToFreeName(file, (n) =>
          brokenPath(file).replace(/\.json$/, n > 1 ? `-${n}.json` : '.json'),
        );
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code !== 'ENOENT') throw e;
      }
      // The trail says the backup was put back, and where the file it replaced went.
      const restored = withNote(
        loaded.case,
        new Date().toISOString(),
        `restored from the backup copy ${path.basename(bak)}` +
          (result.keptBroken
            ? `; the file it replaced was kept as ${path.basename(result.keptBroken)}`
            : ''),
      );
      result.case = restored;
      const bytes = caseFileBytes(restored);
      writeVerifiedSync(file, bytes);
      const known = getKnown(file);
      known.sig = sigOf(await fs.stat(file));
      known.hash = hashOf(bytes);
      known.case = restored;
      delete known.readOnly;
      return result;
    } catch (e) {
      return {
        ok: false,
        message: `not restored: ${describeWriteError(e).text}`,
      };
    }
  });
}
