import React from 'react';
import { Box, Text } from 'ink';
import { FOOTER_GAP, footerLine, type Command, type KeyContext } from './keys.js';
import { TONE } from './theme.js';

/**
 * Key hints for the current context on one line, from the key table (so they match the help
 * overlay). Only what fits is shown, the help key always; every other key is in the help.
 */
function FooterView({
  context,
  width,
  omit,
  note,
  readOnly,
}: {
  context: KeyContext;
  width: number;
  omit?: readonly Command[];
  note?: string | undefined;
  /** A read-only window: keys that would save are labelled for what they do there. */
  readOnly?: boolean;
}) {
  const hints = footerLine(context, width, omit, readOnly);
  return (
    <Box flexDirection="column">
      <Text>
        {hints.map((h, i) => {
          const cut = h.indexOf(' ');
          return (
            <Text key={h}>
              {i ? ' '.repeat(FOOTER_GAP) : ''}
              <Text color={TONE.key}>{h.slice(0, cut)}</Text>
              {h.slice(cut)}
            </Text>
          );
        })}
      </Text>
      {note ? <Text color={TONE.muted}>{note}</Text> : null}
    </Box>
  );
}

/** Drawn again only when its props change (not on every key typed elsewhere). */
export const Footer = React.memo(FooterView);
