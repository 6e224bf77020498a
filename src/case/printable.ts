/**
 * Text with its control characters (ESC, BEL, NUL, DEL and the C1 range) shown as `\u001b`, so
 * that a file name, an id or a field name printed in a message can neither hide part of itself
 * nor drive the terminal (set its title, move the cursor). `keep` lists characters left as they
 * are, such as the newlines of a multi-line output.
 * @example printable('a\u001b]0;x\u0007.json') // 'a\\u001b]0;x\\u0007.json'
 * @example printable('one\ntwo', '\n')         // 'one\ntwo'
 */
export function printable(s: string, keep = ''): string {
  // eslint-disable-next-line no-control-regex
  return s.replace(/[\u0000-\u001f\u007f-\u009f]/g, (ch) =>
    keep.includes(ch) ? ch : `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`,
  );
}
