/**
 * Text of a case file from its bytes. UTF-8 is the format's encoding; a byte-order mark at the
 * start (common from Windows editors) is dropped, and a UTF-16 file announced by its mark (what
 * some editors write as "Unicode") is read as UTF-16 rather than refused as broken JSON.
 * @example decodeCaseBytes(Buffer.from('\uFEFF{}', 'utf8')) // '{}'
 */
export function decodeCaseBytes(bytes: Uint8Array): string {
  const b = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  if (b[0] === 0xff && b[1] === 0xfe) return b.subarray(2).toString('utf16le');
  if (b[0] === 0xfe && b[1] === 0xff) {
    // Big-endian: swap each pair into a copy, then read as little-endian.
    const le = Buffer.from(b.subarray(2, 2 + ((b.length - 2) & ~1)));
    le.swap16();
    return le.toString('utf16le');
  }
  return b.toString('utf8').replace(/^\uFEFF/, '');
}
