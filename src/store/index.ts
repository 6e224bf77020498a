/**
 * The sessions store: where cases live, and how they are saved (atomically, with a backup),
 * opened (migrated, validated, locked), listed and restored. No UI here.
 */
export { resolveSessionsDir } from './sessions-dir.js';
export { caseFilePath, slugifyId, uniqueId } from './case-path.js';
export { saveCase, saveCaseSync } from './save.js';
export { openCase, checkBackup, type OpenResult } from './open.js';
export { listCases, caseFiles, newestFirst, readCaseEntry } from './list.js';
export { openListIndex, listIndexFile, stampOf } from './list-index.js';
export { restoreBackup } from './restore.js';
export { releaseAllLocks, releaseAllLocksSync } from './lock.js';
export { lockPath } from './side-files.js';
export { LOCK_STALE_MS } from './lock-info.js';
export { userCacheDir } from './cache-dir.js';
