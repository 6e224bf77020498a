import React from 'react';
import { Box, Text } from 'ink';
import type { QuestionState } from '../interview/types.js';
import type { Line } from './line-edit.js';
import { STATUS_WORD } from './jump-filter.js';
import { windowOf } from './scroll.js';
import { TextField } from './text-field.js';
import { TONE } from './theme.js';

const TONE_OF = {
  answered: TONE.result,
  open: undefined,
  invalid: TONE.error,
  unused: TONE.muted,
} as const;

export interface JumpProps {
  matches: QuestionState[];
  filter: Line;
  selected: number;
  width: number;
  height: number;
  color: boolean;
}

/** The go-to list: a filter line, then matching questions with their state; Enter goes there. */
export function JumpList(p: JumpProps) {
  const room = Math.max(1, p.height - 5);
  const top = Math.max(0, p.selected - room + 1);
  const w = windowOf(p.matches, top, room);
  const wordW = 13;
  return (
    <Box
      flexDirection="column"
      borderStyle="round"
      borderColor={TONE.heading}
      paddingX={1}
      width={p.width}
    >
      <Box>
        <Text bold>Go to: </Text>
        <TextField line={p.filter} color={p.color} placeholder="type part of a question's name" />
      </Box>
      {p.matches.length === 0 ? (
        <Text color={TONE.warning}>No question matches "{p.filter.value}".</Text>
      ) : null}
      {w.shown.map((q, i) => {
        const at = w.start + i === p.selected;
        return (
          <Text key={q.id} wrap="truncate" bold={at}>
            {at ? '> ' : '  '}
            <Text color={TONE_OF[q.status]}>{STATUS_WORD[q.status].padEnd(wordW)}</Text>
            {q.title}
            {q.answer !== undefined ? <Text color={TONE.muted}>: {q.answer}</Text> : null}
            <Text color={TONE.muted}> · {q.section}</Text>
          </Text>
        );
      })}
      {w.below ? <Text color={TONE.muted}>↓ {w.below} more</Text> : null}
    </Box>
  );
}
