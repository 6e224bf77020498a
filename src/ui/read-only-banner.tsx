import React from 'react';
import { Text } from 'ink';
import { TONE } from './theme.js';

/** Shown on every case screen while the case is open elsewhere: nothing is saved. */
export function ReadOnlyBanner({ reason }: { reason: string }) {
  return (
    <Text color={TONE.warning} bold wrap="wrap">
      READ-ONLY: {/[.!?]$/.test(reason) ? reason : `${reason}.`} Answers are kept on screen but not
      saved.
    </Text>
  );
}
