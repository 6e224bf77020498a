import React from 'react';
import { Box, Text } from 'ink';
import type { Help } from '../interview/types.js';
import { wrap } from '../report/wrap.js';
import { TONE } from './theme.js';

/** The "why / how to measure" text as lines of `width`, cut to `maxLines` with a marker. */
export function whyLines(help: Help, width: number, maxLines: number): string[] {
  const all = [
    ...wrap(`Why: ${help.why}`, width),
    ...(help.how ? wrap(`How: ${help.how}`, width) : []),
  ];
  if (all.length <= maxLines) return all;
  const cut = all.slice(0, Math.max(1, maxLines));
  cut[cut.length - 1] = `${cut[cut.length - 1]!.slice(0, Math.max(0, width - 1))}…`;
  return cut;
}

/** Why the question is asked and how to measure it; open by default in guided mode. */
function WhyPanelView({ help, width, maxLines }: { help: Help; width: number; maxLines: number }) {
  return (
    <Box flexDirection="column" width={width}>
      {whyLines(help, width, maxLines).map((l, i) => (
        <Text key={i} color={TONE.muted}>
          {l}
        </Text>
      ))}
    </Box>
  );
}

/** Drawn again only when its props change (not on every key typed elsewhere). */
export const WhyPanel = React.memo(WhyPanelView);
