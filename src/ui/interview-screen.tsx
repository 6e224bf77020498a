import React from 'react';
import { Box, Text } from 'ink';
import type { Question } from '../interview/types.js';
import { DraftPanel, type DraftView } from './draft-panel.js';
import { QuestionView } from './question-view.js';
import type { Session } from './session.js';
import { WhyPanel } from './why-panel.js';
import { TONE } from './theme.js';
import { keysFor } from './keys.js';

export interface InterviewScreenProps {
  session: Session;
  question: Question;
  defaultText?: string | undefined;
  explain?: string | undefined;
  draft: DraftView;
  width: number;
  /** Rows left for the question, the panels and the why text. */
  height: number;
  color: boolean;
}

/** Side-by-side panels need room for a question and a readable chain beside it. */
export const SIDE_BY_SIDE_MIN = 78;

/**
 * A question with the chain so far beside it (80 columns and wider) or under it (narrower), and
 * the why/how text under both when open.
 */
export function InterviewScreen(p: InterviewScreenProps) {
  const { session, question } = p;
  const side = p.width >= SIDE_BY_SIDE_MIN;
  const draftW = side ? Math.max(28, Math.floor(p.width * 0.38)) : p.width;
  const questionW = side ? p.width - draftW - 1 : p.width;
  const err = session.state.error;
  const q = (
    <QuestionView
      question={question}
      line={session.line}
      highlight={session.highlight}
      defaultText={p.defaultText}
      error={err && err.id === question.id ? err.message : undefined}
      notice={session.state.notice}
      explain={p.explain}
      color={p.color}
      width={questionW}
      choiceRows={Math.max(3, p.height - 12)}
    />
  );
  const choiceRows = Math.min(question.choices?.length ?? 1, Math.max(3, p.height - 12));
  const draftRows = side
    ? Math.max(4, Math.min(10, p.height - 4))
    : Math.max(3, Math.min(6, p.height - choiceRows - 10));
  const whyRows = Math.max(
    2,
    p.height - (side ? Math.max(choiceRows + 5, draftRows) : choiceRows + 5 + draftRows),
  );
  return (
    <Box flexDirection="column">
      <Text color={TONE.muted}>{question.title}</Text>
      {side ? (
        <Box columnGap={1}>
          {q}
          <DraftPanel view={p.draft} width={draftW} maxLines={draftRows} />
        </Box>
      ) : (
        <Box flexDirection="column">
          {q}
          <DraftPanel view={p.draft} width={draftW} maxLines={draftRows} />
        </Box>
      )}
      {session.summary ? (
        <Box flexDirection="column">
          <Text bold>Resumed. Already done:</Text>
          {session.summary.slice(0, Math.max(1, whyRows - 1)).map((l, i) => (
            <Text key={i} color={TONE.muted} wrap="wrap">
              {l}
            </Text>
          ))}
        </Box>
      ) : session.state.explain ? (
        <WhyPanel help={question.help} width={p.width} maxLines={whyRows} />
      ) : (
        <Text color={TONE.muted}>
          {keysFor('explain')} shows why this is asked and how to measure it.
        </Text>
      )}
    </Box>
  );
}
