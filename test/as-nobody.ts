// Root reads and writes anything, so a permission test run as root (as CI is) proves nothing
// in-process: there the code under test runs in a child process as the unprivileged user nobody.
import { statSync } from 'node:fs';
import { dirname } from 'node:path';

/** The user nobody (uid and gid 65534), as spawn options. */
export const NOBODY = { uid: 65534, gid: 65534 } as const;

/** True when the tests run as root. */
export const runsAsRoot = (): boolean => process.getuid?.() === 0;

/**
 * Throws unless nobody may pass through every folder above `path` (others' execute bit), as on a
 * normal system; otherwise a child run as nobody would fail for a reason the test is not about.
 */
export function assertPassableForNobody(path: string): void {
  for (let d = dirname(path); d !== dirname(d); d = dirname(d)) {
    if ((statSync(d).mode & 0o001) === 0) throw new Error(`${d} is not passable for nobody`);
  }
}
