import React from 'react';
import { Box, Text } from 'ink';
import type { ShownLine } from './review-step.js';
import { ScrollView } from './scroll-view.js';
import { TONE } from './theme.js';
import { wrap } from '../report/wrap.js';

/** The report status under the review, wrapped to the screen's width (a long path takes two rows). */
export function reviewMessageLines(message: string | undefined, width: number): string[] {
  return message ? wrap(message, Math.max(20, width)) : [];
}

/**
 * The review: the lines built by reviewLines, scrolled, with the report status under them. The
 * header above it already says "Review".
 */
export function ReviewScreen(p: {
  lines: ShownLine[];
  top: number;
  height: number;
  width: number;
  message?: string | undefined;
}) {
  const message = reviewMessageLines(p.message, p.width);
  return (
    <Box flexDirection="column">
      <ScrollView lines={p.lines} top={p.top} height={p.height - message.length} />
      {message.map((l, i) => (
        <Text key={i} color={TONE.result}>
          {l}
        </Text>
      ))}
    </Box>
  );
}
