import React from 'react';
import { Box, Text } from 'ink';
import { bindingKeys, footerBindings, type KeyContext } from './keys.js';
import { TONE } from './theme.js';

/**
 * Key hints for the current context, from the key table (so they match the help overlay).
 * Wraps onto a second line in narrow terminals rather than cutting a hint.
 */
export function Footer({ context, note }: { context: KeyContext; note?: string | undefined }) {
  const hints = footerBindings(context);
  return (
    <Box flexDirection="column">
      <Box flexWrap="wrap" columnGap={2}>
        {hints.map((b) => (
          <Text key={b.command}>
            <Text color={TONE.key}>{bindingKeys(b)}</Text> {b.label}
          </Text>
        ))}
      </Box>
      {note ? <Text color={TONE.muted}>{note}</Text> : null}
    </Box>
  );
}
