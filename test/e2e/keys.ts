/**
 * Bytes a terminal sends for the keys the end-to-end tests press, as an xterm-compatible terminal
 * (and tmux) sends them in normal cursor mode. Names follow the test conventions in DEVELOPERS.md.
 */
export const KEYS = {
  enter: '\r',
  escape: '\u001B',
  tab: '\t',
  'shift-tab': '\u001B[Z',
  backspace: '\u007F',
  delete: '\u001B[3~',
  up: '\u001B[A',
  down: '\u001B[B',
  right: '\u001B[C',
  left: '\u001B[D',
  home: '\u001B[H',
  end: '\u001B[F',
  pageup: '\u001B[5~',
  pagedown: '\u001B[6~',
  space: ' ',
  f1: '\u001BOP',
  f2: '\u001BOQ',
  f3: '\u001BOR',
  f4: '\u001BOS',
} as const;

export type NamedKey = keyof typeof KEYS;

/** A key by name (`enter`, `down`, `f1`), a control chord (`ctrl-c`), or `meta-x` (Esc prefix). */
export type KeyName = NamedKey | `ctrl-${string}` | `meta-${string}`;

/**
 * The bytes for one key. `ctrl-a`..`ctrl-z` map to 0x01..0x1A (so `ctrl-c` is 0x03, `ctrl-j` is
 * a line feed: terminals cannot tell them apart, which is why a test names the chord it means).
 */
export function keyBytes(key: KeyName): string {
  if (key in KEYS) return KEYS[key as NamedKey];
  const ctrl = /^ctrl-([a-z])$/.exec(key);
  if (ctrl) return String.fromCharCode(ctrl[1]!.charCodeAt(0) - 96);
  if (key === 'ctrl-space') return '\u0000';
  const meta = /^meta-(.)$/.exec(key);
  if (meta) return `\u001B${meta[1]}`;
  throw new Error(`unknown key name "${key}"`);
}
