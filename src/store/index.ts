/**
 * The sessions store: where cases live, and how they are saved (atomically, with a backup),
 * opened (migrated, validated, locked), listed and restored. No UI here.
 */
export {
  resolveSessionsDir,
  SESSIONS_ENV,
  type SessionsDirOptions,
  type SessionsDirSource,
} from './sessions-dir.js';
export {
  caseFilePath,
  checkId,
  slugifyId,
  uniqueId,
  CASE_ID,
  type PathResult,
} from './case-path.js';
export { saveCase, saveCaseSync, type SaveResult, type SaveOptions } from './save.js';
export {
  openCase,
  checkBackup,
  type OpenResult,
  type OpenOptions,
  type OpenFailureKind,
} from './open.js';
export { listCases, caseFiles, readCaseEntry, type CaseEntry } from './list.js';
export {
  openListIndex,
  listIndexFile,
  stampOf,
  type ListIndex,
  type FileStamp,
} from './list-index.js';
export { restoreBackup, type RestoreResult } from './restore.js';
export { releaseAllLocks, releaseAllLocksSync, releaseLock } from './lock.js';
export { backupPath, lockPath } from './side-files.js';
export { LOCK_STALE_MS } from './lock-info.js';
export { userCacheDir, CACHE_DIR_ENV } from './cache-dir.js';
