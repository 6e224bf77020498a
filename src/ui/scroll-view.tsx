import React from 'react';
import { Box, Text } from 'ink';
import type { ShownLine } from './review-step.js';
import { windowOf } from './scroll.js';
import { TONE } from './theme.js';

/** A window onto pre-wrapped lines, with "more above/below" markers so nothing seems missing. */
export function ScrollView({
  lines,
  top,
  height,
}: {
  lines: ShownLine[];
  top: number;
  height: number;
}) {
  const w = windowOf(lines, top, Math.max(1, height - 1));
  const more =
    w.above || w.below
      ? `lines ${w.start + 1}-${w.start + w.shown.length} of ${lines.length}` +
        (w.below ? ' · ↓/PgDn for more' : '') +
        (w.above ? ' · ↑/PgUp back' : '')
      : '';
  return (
    <Box flexDirection="column">
      {w.shown.map((l, i) => (
        <Text
          key={w.start + i}
          color={l.tone ? TONE[l.tone] : undefined}
          bold={l.bold ?? false}
          wrap="truncate"
        >
          {l.text || ' '}
        </Text>
      ))}
      {more ? <Text color={TONE.muted}>{more}</Text> : null}
    </Box>
  );
}
