import React from 'react';
import { Box, Text } from 'ink';
import { TONE } from './theme.js';

/** The running chain, reduced to what fits beside a question: each step's name and result. */
export interface DraftView {
  steps: { name: string; result: string }[];
  /** "41.6 mph (38.9 to 44.0), at least 38 mph" once a start speed can be computed. */
  result?: string | undefined;
  /** Why no figure yet (missing answers, or a reason the engine gave). */
  note?: string | undefined;
}

/** Side or lower panel: the formula chain so far and the running result. */
export function DraftPanel({ view, width, maxLines }: { view: DraftView; width: number; maxLines: number }) {
  // Keep the latest steps when space is short: they are the ones the current answer moves.
  const room = Math.max(0, maxLines - 3);
  const steps = view.steps.slice(Math.max(0, view.steps.length - room));
  const hidden = view.steps.length - steps.length;
  return (
    <Box flexDirection="column" borderStyle="single" borderColor={TONE.muted} paddingX={1} width={width}>
      <Text bold>Chain so far</Text>
      {hidden ? <Text color={TONE.muted}>({hidden} earlier steps in the review)</Text> : null}
      {steps.map((s, i) => (
        <Text key={i} wrap="truncate">
          {s.name}: {s.result}
        </Text>
      ))}
      {view.result ? <Text color={TONE.result} bold>{view.result}</Text> : null}
      {view.note ? <Text color={TONE.muted}>{view.note}</Text> : null}
    </Box>
  );
}
