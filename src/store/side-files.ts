import path from 'node:path';

/** `<id>.json.bak`: the previous good version, kept beside the case. */
export function backupPath(file: string): string {
  return `${file}.bak`;
}

/** `<id>.json.lock`: who has the case open for writing. */
export function lockPath(file: string): string {
  return `${file}.lock`;
}

/** A compact UTC stamp safe in file names on every system: `20261130T151000Z`. */
export function fileStamp(d: Date = new Date()): string {
  return d
    .toISOString()
    .replace(/[-:]/g, '')
    .replace(/\.\d+Z$/, 'Z');
}

/** `<id>.broken-<time>.json`: where a broken file is kept instead of being overwritten. */
export function brokenPath(file: string, d: Date = new Date()): string {
  return file.replace(/\.json$/, '') + `.broken-${fileStamp(d)}.json`;
}

/** `<id>.outside-<time>.json`: a version changed outside skidcase, kept when the user kept theirs over it. */
export function outsidePath(file: string, d: Date = new Date()): string {
  return file.replace(/\.json$/, '') + `.outside-${fileStamp(d)}.json`;
}

/** `<id>.v<N>.json` (then `<id>.v<N>-2.json` ...): the original of a case migrated from version N. */
export function versionPath(file: string, version: number, n = 1): string {
  return file.replace(/\.json$/, '') + `.v${version}${n > 1 ? `-${n}` : ''}.json`;
}

/** Files skidcase keeps beside cases, which are not cases of their own for the list. */
const SIDE = /\.(v\d+(-\d+)?|(broken|outside)-\d{8}T\d{6}Z(-\d+)?)\.json$/;

/** True for kept originals, broken copies and versions changed outside skidcase (`x.v0.json`, `x.broken-20261130T151000Z.json`). */
export function isSideFile(name: string): boolean {
  return SIDE.test(path.basename(name));
}
