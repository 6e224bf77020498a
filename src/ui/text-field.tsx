import React from 'react';
import { Text } from 'ink';
import type { Line } from './line-edit.js';
import { TONE } from './theme.js';

/**
 * The part of a long line that fits `width` cells with the cursor in view: a pasted line of
 * 2,000 characters scrolls within its one row (`…` marks what is cut) instead of pushing the
 * question off the screen.
 * @example visiblePart({ value: 'abcdefghij', cursor: 10 }, 6) // { value: '…hij', cursor: 4 }
 */
export function visiblePart(line: Line, width: number | undefined): Line {
  const { value, cursor } = line;
  if (width === undefined || value.length + 1 <= width) return line;
  const room = Math.max(4, width - 2); // one cell each for a `…` at either end
  let start = Math.max(0, Math.min(cursor - room + 1, value.length - room + 1));
  if (start === 1) start = 0;
  const end = Math.min(value.length, start + room);
  const head = start > 0 ? '…' : '';
  const tail = end < value.length ? '…' : '';
  return { value: head + value.slice(start, end) + tail, cursor: cursor - start + head.length };
}

/**
 * A line that holds line breaks (a pasted block of points) as one row: each break shown as `; `,
 * the cursor moved with it.
 * @example oneRow({ value: '0 0\n8 0.2', cursor: 9 }) // { value: '0 0; 8 0.2', cursor: 10 }
 */
export function oneRow(line: Line): Line {
  if (!line.value.includes('\n')) return line;
  const before = line.value.slice(0, line.cursor).split('\n').length - 1;
  return { value: line.value.replace(/\n/g, '; '), cursor: line.cursor + before };
}

/**
 * Draws a line being typed with its cursor. With colour the cursor is an inverted cell; without
 * (NO_COLOR) it is a `_` at the end or a `|` inside the text, so it still shows. With `width`, a
 * longer line scrolls within one row.
 */
export function TextField({
  line,
  color,
  placeholder,
  width,
}: {
  line: Line;
  color: boolean;
  placeholder?: string | undefined;
  width?: number | undefined;
}) {
  const { value, cursor } = visiblePart(oneRow(line), width);
  if (!color) {
    const mark = cursor >= value.length ? '_' : '|';
    return (
      <Text>
        {value.slice(0, cursor)}
        {mark}
        {value.slice(cursor)}
        {value === '' && placeholder ? ` ${placeholder}` : ''}
      </Text>
    );
  }
  const at = value[cursor] ?? ' ';
  return (
    <Text>
      {value.slice(0, cursor)}
      <Text inverse>{at}</Text>
      {value.slice(cursor + 1)}
      {value === '' && placeholder ? <Text color={TONE.muted}> {placeholder}</Text> : null}
    </Text>
  );
}
