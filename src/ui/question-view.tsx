import React from 'react';
import { Box, Text } from 'ink';
import type { Question } from '../interview/types.js';
import type { Line } from './line-edit.js';
import { TextField } from './text-field.js';
import { TONE } from './theme.js';
import { windowOf } from './scroll.js';
import { wrap } from '../report/wrap.js';

/**
 * Text word-wrapped by us rather than by Ink, whose wrapping keeps the space at the break and
 * starts the next line with it. `indent` starts every line after the first (a hanging indent).
 */
function Para({
  text,
  width,
  indent = '',
  ...style
}: {
  text: string;
  width: number;
  indent?: string;
  color?: string | undefined;
  bold?: boolean;
}) {
  const lines = wrap(text, Math.max(10, width));
  const rest =
    lines.length > 1 ? wrap(lines.slice(1).join(' '), Math.max(10, width - indent.length)) : [];
  return (
    <Box flexDirection="column">
      {[lines[0]!, ...rest.map((l) => indent + l)].map((l, i) => (
        <Text key={i} {...style}>
          {l}
        </Text>
      ))}
    </Box>
  );
}

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
  width,
}: {
  question: Question;
  highlight: number;
  rows: number;
  width: number;
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
        // A long label wraps under itself (a cut one could hide what the choice means).
        const head = `${i === highlight ? '> ' : '  '}[${c.key}] `;
        const [first, ...more] = wrap(c.label, Math.max(10, width - head.length));
        return (
          <Box key={c.value} flexDirection="column">
            <Text bold={i === highlight}>
              {head.slice(0, 2)}
              <Text color={TONE.key}>{head.slice(2, -1)}</Text> {first}
            </Text>
            {more.map((l, k) => (
              <Text key={k} bold={i === highlight}>
                {' '.repeat(head.length)}
                {l}
              </Text>
            ))}
          </Box>
        );
      })}
      {w.below ? <Text color={TONE.muted}> ↓ {w.below} more</Text> : null}
      {hint ? <Para text={hint} width={width} color={TONE.muted} /> : null}
    </Box>
  );
}

/** The question: prompt, the input (or the choices), the default, and the message in place. */
export function QuestionView(p: QuestionViewProps) {
  const q = p.question;
  // What Enter would give now: the highlighted choice, or the default while nothing is typed
  // (a line filled with an earlier answer submits that answer, not the default).
  const typedAtChoice = isChoice(q) && p.line.value !== '';
  const enterGives = typedAtChoice
    ? undefined
    : isChoice(q)
      ? q.choices![p.highlight]?.label
      : p.line.value.trim() === ''
        ? p.defaultText
        : undefined;
  const hint = [
    // A drag factor or share has no unit: say what form it takes instead.
    q.unitHint ? (q.unitHint === 'decimal' ? 'a decimal' : `in ${q.unitHint}`) : '',
    q.example ? `e.g. ${q.example}` : '',
    // One meaning per key: when Enter gives something (a preference, a default) it does not skip.
    q.optional && !p.defaultText ? 'Enter skips' : '',
  ]
    .filter(Boolean)
    .join(' · ');
  return (
    <Box flexDirection="column" width={p.width}>
      <Para text={q.prompt} width={p.width} bold />
      {hint ? <Para text={`(${hint})`} width={p.width} color={TONE.muted} /> : null}
      {isChoice(q) ? (
        <ChoiceList question={q} highlight={p.highlight} rows={p.choiceRows} width={p.width} />
      ) : null}
      {typedAtChoice ? (
        <Box flexDirection="column">
          <Box>
            <Text color={TONE.key}>{'> '}</Text>
            <TextField line={p.line} color={p.color} width={p.width - 2} />
          </Box>
          <Para
            text="Enter reads what is typed; Esc clears it"
            width={p.width}
            color={TONE.muted}
            indent="  "
          />
        </Box>
      ) : isChoice(q) ? null : (
        <Box>
          <Text color={TONE.key}>{'> '}</Text>
          <TextField line={p.line} color={p.color} width={p.width - 2} />
        </Box>
      )}
      {p.line.value.includes('\n') ? (
        <Para
          text={`${p.line.value.split('\n').filter((l) => l.trim() !== '').length} lines pasted (shown with ; between them): Enter reads them; Ctrl+U clears`}
          width={p.width}
          color={TONE.muted}
          indent="  "
        />
      ) : null}
      {enterGives ? (
        <Para
          text={`Enter accepts: ${enterGives}`}
          width={p.width}
          color={TONE.muted}
          indent="  "
        />
      ) : null}
      {p.error ? (
        <Para text={`✗ ${p.error}`} width={p.width} color={TONE.error} indent="  " />
      ) : null}
      {p.notice ? (
        <Para text={`→ ${p.notice}`} width={p.width} color={TONE.result} indent="  " />
      ) : null}
      {p.explain ? <Para text={p.explain} width={p.width} color={TONE.muted} /> : null}
    </Box>
  );
}
