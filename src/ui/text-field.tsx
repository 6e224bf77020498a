import React from 'react';
import { Text } from 'ink';
import type { Line } from './line-edit.js';
import { TONE } from './theme.js';

/**
 * Draws a line being typed with its cursor. With colour the cursor is an inverted cell; without
 * (NO_COLOR) it is a `_` at the end or a `|` inside the text, so it still shows.
 */
export function TextField({
  line,
  color,
  placeholder,
}: {
  line: Line;
  color: boolean;
  placeholder?: string | undefined;
}) {
  const { value, cursor } = line;
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
