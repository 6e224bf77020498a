import React from 'react';
import { Box, Text } from 'ink';
import type { Question } from '../interview/types.js';
import type { Line } from './line-edit.js';
import { TextField } from './text-field.js';
import { TONE } from './theme.js';

export interface QuestionViewProps {
  question: Question;
  line: Line;
  /** Highlighted choice index, for choice and confirm questions. */
  highlight: number;
  defaultText?: string | undefined;
  error?: string | undefined;
  notice?: string | undefined;
  explain?: string | undefined;
  color: boolean;
  width: number;
}

/** True when the question is answered by picking, not typing. */
export const isChoice = (q: Question): boolean => (q.kind === 'choice' || q.kind === 'confirm') && !!q.choices?.length;

/** The question: prompt, the input (or the choices), the default, and the message in place. */
export function QuestionView(p: QuestionViewProps) {
  const q = p.question;
  const hint = [q.unitHint ? `in ${q.unitHint}` : '', q.example ? `e.g. ${q.example}` : '', q.optional ? 'may be left empty' : '']
    .filter(Boolean)
    .join(' · ');
  return (
    <Box flexDirection="column" width={p.width}>
      <Text bold wrap="wrap">
        {q.prompt}
      </Text>
      {hint ? <Text color={TONE.muted}>({hint})</Text> : null}
      {isChoice(q) ? (
        q.choices!.map((c, i) => (
          <Text key={c.value} wrap="truncate" bold={i === p.highlight}>
            {i === p.highlight ? '> ' : '  '}
            <Text color={TONE.key}>[{c.key}]</Text> {c.label}
            {c.hint ? <Text color={TONE.muted}> · {c.hint}</Text> : null}
          </Text>
        ))
      ) : (
        <Box>
          <Text color={TONE.key}>{'> '}</Text>
          <TextField line={p.line} color={p.color} />
        </Box>
      )}
      {p.defaultText !== undefined && p.defaultText !== '' ? (
        <Text color={TONE.muted} wrap="truncate">
          Enter accepts: {p.defaultText}
        </Text>
      ) : null}
      {p.error ? (
        <Text color={TONE.error} wrap="wrap">
          ✗ {p.error}
        </Text>
      ) : null}
      {p.notice ? (
        <Text color={TONE.result} wrap="wrap">
          → {p.notice}
        </Text>
      ) : null}
      {p.explain ? (
        <Text color={TONE.muted} wrap="wrap">
          {p.explain}
        </Text>
      ) : null}
    </Box>
  );
}
