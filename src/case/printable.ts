// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/;
// eslint-disable-next-line no-control-regex
const CONTROLS = /[\u0000-\u001f\u007f-\u009f]/g;

/**
 * What a command prints, escaped as `printable` does but keeping newlines and tabs: whatever a
 * case file holds (labels, notes, field names) or a user typed (file names, ids) reaches the
 * terminal as text, never as a control sequence.
 */
export function printableIo<T extends { out(s: string): void; err(s: string): void }>(io: T): T {
  return {
    ...io,
    out: (s: string) => io.out(printable(s, '\n\t')),
    err: (s: string) => io.err(printable(s, '\n\t')),
  };
}

/**
 * Text with its control characters (ESC, BEL, NUL, DEL and the C1 range) shown as `\u001b`, so
 * that a file name, an id or a field name printed in a message can neither hide part of itself
 * nor drive the terminal (set its title, move the cursor). `keep` lists characters left as they
 * are, such as the newlines of a multi-line output.
 * @example printable('a\u001b]0;x\u0007.json') // 'a\\u001b]0;x\\u0007.json'
 * @example printable('one\ntwo', '\n')         // 'one\ntwo'
 */
export function printable(s: string, keep = ''): string {
  if (!CONTROL.test(s)) return s;
  return s.replace(CONTROLS, (ch) =>
    keep.includes(ch) ? ch : `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`,
  );
}
