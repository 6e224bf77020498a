import type { Key } from 'ink';

/**
 * Ink hands a handler everything that arrived in one read: typing ahead, a paste, or a scripted
 * terminal can deliver `80\r\r0.72\r` at once, and Ink only separates escape sequences, so the
 * Enters inside would be lost. This splits such a chunk into the keys a person pressed, each with
 * the Key flags Ink gives that key alone. Escape sequences never reach here mixed with text.
 */
/** A Key with no flag set: what Ink reports for plain text. */
export const NO_KEY: Key = {
  upArrow: false,
  downArrow: false,
  leftArrow: false,
  rightArrow: false,
  pageDown: false,
  pageUp: false,
  home: false,
  end: false,
  return: false,
  escape: false,
  ctrl: false,
  shift: false,
  tab: false,
  backspace: false,
  delete: false,
  meta: false,
  super: false,
  hyper: false,
  capsLock: false,
  numLock: false,
};

/** The Key for one control character, as Ink reports it when pressed alone. */
function controlKey(ch: string): [string, Key] {
  const code = ch.charCodeAt(0);
  if (ch === '\r' || ch === '\n') return ['', { ...NO_KEY, return: true }];
  if (ch === '\t') return ['', { ...NO_KEY, tab: true }];
  if (code === 0x7f) return ['', { ...NO_KEY, delete: true }];
  if (code === 0x08) return ['', { ...NO_KEY, backspace: true }];
  // Ctrl+letter arrives as 0x01..0x1a; Ink reports the letter with ctrl set.
  return [String.fromCharCode(code + 96), { ...NO_KEY, ctrl: true }];
}

// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001a\u007f]/;

/**
 * Splits one input chunk into keys. A chunk with no control character is one key (or a paste of
 * plain text) and is returned as it came, with Ink's own Key.
 *
 * @example
 * splitKeys('80\r0.7\r', key) // [['80', none], ['', return], ['0.7', none], ['', return]]
 */
export function splitKeys(input: string, key: Key): [string, Key][] {
  if (input.length <= 1 || !CONTROL.test(input) || input.startsWith('\u001b'))
    return [[input, key]];
  const out: [string, Key][] = [];
  let text = '';
  for (const ch of input) {
    if (CONTROL.test(ch)) {
      if (text) out.push([text, { ...NO_KEY }]);
      text = '';
      out.push(controlKey(ch));
    } else text += ch;
  }
  if (text) out.push([text, { ...NO_KEY }]);
  return out;
}
