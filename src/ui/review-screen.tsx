import React from 'react';
import { Box, Text } from 'ink';
import type { ShownLine } from './review-step.js';
import { ScrollView } from './scroll-view.js';
import { TONE } from './theme.js';

/**
 * The review: the lines built by reviewLines, scrolled, with the report status under them. The
 * header above it already says "Review".
 */
export function ReviewScreen(p: {
  lines: ShownLine[];
  top: number;
  height: number;
  message?: string | undefined;
}) {
  return (
    <Box flexDirection="column">
      <ScrollView lines={p.lines} top={p.top} height={p.height - (p.message ? 1 : 0)} />
      {p.message ? <Text color={TONE.result}>{p.message}</Text> : null}
    </Box>
  );
}
