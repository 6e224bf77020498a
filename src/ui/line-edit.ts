/**
 * A one-line text field as a pure value: what is typed and where the cursor is. The app's one
 * input hook feeds it the keys that are not bindings, so global keys fall through to the table.
 */
import type { Key } from 'ink';

export interface Line {
  value: string;
  /** Cursor position, 0..value.length (in UTF-16 units; answers are plain text). */
  cursor: number;
}

export const EMPTY_LINE: Line = { value: '', cursor: 0 };

/** A line holding `text` with the cursor at its end. */
export function lineOf(text: string): Line {
  return { value: text, cursor: text.length };
}

/** The line after one of the key table's editing commands (Ctrl+A/Home, End, Ctrl+U: keys.ts). */
export function lineCommand(line: Line, command: 'line-start' | 'line-end' | 'line-clear'): Line {
  if (command === 'line-clear') return EMPTY_LINE;
  return { value: line.value, cursor: command === 'line-start' ? 0 : line.value.length };
}

/**
 * Applies one key that is not a binding to a line: printable text is inserted at the cursor (a
 * paste arrives as one chunk), Backspace/Delete remove, the arrows move. Anything else leaves it
 * unchanged; the editing keys of the key table go through `lineCommand`.
 * @example editLine(lineOf('8'), '0', key) // { value: '80', cursor: 2 }
 */
export function editLine(line: Line, input: string, key: Key): Line {
  const { value, cursor } = line;
  if (key.leftArrow) return { value, cursor: Math.max(0, cursor - 1) };
  if (key.rightArrow) return { value, cursor: Math.min(value.length, cursor + 1) };
  // Terminals send 0x7f for Backspace, which Ink reports as `delete`; both erase to the left.
  if (key.backspace || key.delete) {
    if (cursor === 0) return line;
    return { value: value.slice(0, cursor - 1) + value.slice(cursor), cursor: cursor - 1 };
  }
  if (key.ctrl || key.meta || key.return || key.escape || key.tab) return line;
  if (key.upArrow || key.downArrow || key.pageUp || key.pageDown || key.home || key.end)
    return line;
  // Strip control characters a paste may carry (a newline would end the answer early).
  // eslint-disable-next-line no-control-regex -- these are the control characters to strip
  const text = input.replace(/[\u0000-\u001f\u007f]/g, '');
  if (!text) return line;
  return {
    value: value.slice(0, cursor) + text + value.slice(cursor),
    cursor: cursor + text.length,
  };
}

/**
 * Inserts a pasted block at the cursor. On a question that takes lines (`keepLines`: surveyed
 * points) its line breaks stay, as `\n`, without the blank ones at either end; elsewhere each
 * break becomes a space, so a paste never ends an answer half-way. Other control characters go.
 * @example pasteText(EMPTY_LINE, '0 0\r8 0.2\r', true) // { value: '0 0\n8 0.2', cursor: 9 }
 */
export function pasteText(line: Line, pasted: string, keepLines: boolean): Line {
  // A tab between columns (a spreadsheet's copy) reads as the space it stands for.
  const lines = pasted.replace(/\r\n|\r/g, '\n').replace(/\t/g, ' ');
  const kept = keepLines ? lines.replace(/^\n+|\n+$/g, '') : lines.replace(/\n+/g, ' ');
  // eslint-disable-next-line no-control-regex -- these are the control characters to strip
  const text = kept.replace(/[\u0000-\u0009\u000b-\u001f\u007f]/g, '');
  if (!text) return line;
  const { value, cursor } = line;
  // A block of lines pasted after text already there starts a line of its own.
  const join =
    keepLines && text.includes('\n') && cursor > 0 && !/[\n;]\s*$/.test(value.slice(0, cursor))
      ? '\n'
      : '';
  return {
    value: value.slice(0, cursor) + join + text + value.slice(cursor),
    cursor: cursor + join.length + text.length,
  };
}
