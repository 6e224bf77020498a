import { createHash } from 'node:crypto';

/**
 * SHA-256 of bytes (or text, as UTF-8), lower-case hex: the one fingerprint of a case file, used
 * by the store to know its own bytes and by reports to record the file they were made from.
 * @example sha256Of('') // 'e3b0c442…b855'
 */
export function sha256Of(bytes: Uint8Array | string): string {
  return createHash('sha256').update(bytes).digest('hex');
}
