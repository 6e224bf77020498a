import React from 'react';
import { Box, Text } from 'ink';
import { TONE } from './theme.js';
import { wrap } from '../report/wrap.js';

/** The running chain, reduced to what fits beside a question: each step's name and result. */
export interface DraftView {
  steps: { name: string; result: string }[];
  /** "41.6 mph (38.9 to 44.0), at least 38 mph" once a start speed can be computed. */
  result?: string | undefined;
  /** Why no figure yet (missing answers, or a reason the engine gave). */
  note?: string | undefined;
}

/** Side or lower panel: the formula chain so far and the running result. */
function DraftPanelView({
  view,
  width,
  maxLines,
}: {
  view: DraftView;
  width: number;
  maxLines: number;
}) {
  // Keep the latest steps when space is short: they are the ones the current answer moves.
  const inner = width - 4;
  // A step whose name and result do not fit on one line: the name wraps (never cut, it says
  // which segment), the result goes on a line of its own.
  const nameLines = (st: DraftView['steps'][number]) => wrap(`${st.name}:`, Math.max(10, inner));
  const rowsOf = (st: DraftView['steps'][number]) =>
    st.name.length + st.result.length + 2 <= inner ? 1 : nameLines(st).length + 1;
  let room = Math.max(0, maxLines - 3 - (view.result && view.result.length > inner ? 1 : 0));
  const steps: DraftView['steps'] = [];
  for (let i = view.steps.length - 1; i >= 0 && rowsOf(view.steps[i]!) <= room; i--) {
    room -= rowsOf(view.steps[i]!);
    steps.unshift(view.steps[i]!);
  }
  const hidden = view.steps.length - steps.length;
  return (
    <Box
      flexDirection="column"
      borderStyle="single"
      borderColor={TONE.muted}
      paddingX={1}
      width={width}
    >
      <Text bold>Chain so far</Text>
      {/* Short enough for one line of the narrowest panel, so the row budget holds. */}
      {hidden ? <Text color={TONE.muted}>({hidden} earlier in the review)</Text> : null}
      {steps.map((s, i) =>
        rowsOf(s) === 1 ? (
          <Text key={i}>
            {s.name}: {s.result}
          </Text>
        ) : (
          <Box key={i} flexDirection="column">
            {nameLines(s).map((l, k) => (
              <Text key={k}>{l}</Text>
            ))}
            <Text wrap="truncate">{`  ${s.result}`}</Text>
          </Box>
        ),
      )}
      {/* Wrapped here as the step names are: Ink's own wrap keeps a space at a line's start. */}
      {view.result
        ? wrap(view.result, Math.max(10, inner)).map((l, k) => (
            <Text key={`r${k}`} color={TONE.result} bold>
              {l}
            </Text>
          ))
        : null}
      {view.note
        ? wrap(view.note, Math.max(10, inner)).map((l, k) => (
            <Text key={`n${k}`} color={TONE.muted}>
              {l}
            </Text>
          ))
        : null}
    </Box>
  );
}

/** Drawn again only when its props change (not on every key typed elsewhere). */
export const DraftPanel = React.memo(DraftPanelView);
