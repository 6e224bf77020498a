import React from 'react';
import { Box, Text } from 'ink';
import type { Question } from '../interview/types.js';
import type { Line } from './line-edit.js';
import { TextField } from './text-field.js';
import { TONE } from './theme.js';
import { windowOf } from './scroll.js';

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
  /** Rows the list of choices may take; a longer list scrolls with the highlight. */
  choiceRows: number;
}

/** True when the question is answered by picking, not typing. */
export const isChoice = (q: Question): boolean =>
  (q.kind === 'choice' || q.kind === 'confirm') && !!q.choices?.length;

/**
 * The choices, each with its key; a window around the highlight when the list is long. The
 * highlighted choice's hint is shown in full under the list, the others' only as fits.
 */
function ChoiceList({
  question,
  highlight,
  rows,
}: {
  question: Question;
  highlight: number;
  rows: number;
}) {
  const choices = question.choices!;
  const room = Math.max(2, choices.length > rows ? rows - 2 : rows);
  const w = windowOf(choices, Math.max(0, highlight - room + 1), room);
  const hint = choices[highlight]?.hint;
  return (
    <Box flexDirection="column">
      {w.above ? <Text color={TONE.muted}> ↑ {w.above} more</Text> : null}
      {w.shown.map((c, j) => {
        const i = w.start + j;
        return (
          <Text key={c.value} wrap="truncate" bold={i === highlight}>
            {i === highlight ? '> ' : '  '}
            <Text color={TONE.key}>[{c.key}]</Text> {c.label}
          </Text>
        );
      })}
      {w.below ? <Text color={TONE.muted}> ↓ {w.below} more</Text> : null}
      {hint ? (
        <Text color={TONE.muted} wrap="wrap">
          {hint}
        </Text>
      ) : null}
    </Box>
  );
}

/** The question: prompt, the input (or the choices), the default, and the message in place. */
export function QuestionView(p: QuestionViewProps) {
  const q = p.question;
  const hint = [
    q.unitHint ? `in ${q.unitHint}` : '',
    q.example ? `e.g. ${q.example}` : '',
    q.optional ? 'may be left empty' : '',
  ]
    .filter(Boolean)
    .join(' · ');
  return (
    <Box flexDirection="column" width={p.width}>
      <Text bold wrap="wrap">
        {q.prompt}
      </Text>
      {hint ? <Text color={TONE.muted}>({hint})</Text> : null}
      {isChoice(q) ? (
        <ChoiceList question={q} highlight={p.highlight} rows={p.choiceRows} />
      ) : (
        <Box>
          <Text color={TONE.key}>{'> '}</Text>
          <TextField line={p.line} color={p.color} />
        </Box>
      )}
      {p.defaultText !== undefined && p.defaultText !== '' ? (
        <Text color={TONE.muted} wrap={p.question.usesPreference ? 'wrap' : 'truncate'}>
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
