import React from 'react';
import { Box, Text } from 'ink';
import type { Progress } from '../interview/types.js';
import { TONE } from './theme.js';

export interface HeaderProps {
  caseId: string;
  reference?: string | undefined;
  section: string;
  progress: Progress;
  mode: string;
  savedAt?: Date | undefined;
  /** When the case file was last written, before this session (ISO time), for a case reopened. */
  lastSaved?: string | undefined;
  saveError?: string | undefined;
  /** What the last save did beside writing (a file moved aside, a copy made); wraps. */
  saveNote?: string | undefined;
  readOnly: boolean;
}

/** "saved 21:52:03": local wall-clock time, seconds shown so a fresh save is visible. */
export function savedText(at: Date): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `saved ${p(at.getHours())}:${p(at.getMinutes())}:${p(at.getSeconds())}`;
}

/** "2026-12-01 23:03": an ISO time shown in local time to the minute; text that is no time as is. */
export function localTime(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  const p = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())} ${p(d.getHours())}:${p(d.getMinutes())}`;
}

/** Top line of a case screen: which case, where in it, how far, and the save status. */
function HeaderView(p: HeaderProps) {
  const status = p.saveError
    ? p.saveError
    : p.readOnly
      ? 'not saved (read-only)'
      : p.savedAt
        ? savedText(p.savedAt)
        : p.lastSaved
          ? `last saved ${localTime(p.lastSaved)}`
          : 'no changes yet';
  return (
    <Box flexDirection="column">
      <Box justifyContent="space-between" flexWrap="wrap" columnGap={2}>
        <Text bold color={TONE.heading} wrap="truncate">
          {p.caseId}
          {p.reference ? ` · ${p.reference}` : ''}
        </Text>
        <Text color={p.saveError ? TONE.error : TONE.muted}>{status}</Text>
      </Box>
      <Text wrap="truncate">
        {p.section} · {p.progress.answered} of {p.progress.applicable} answered · {p.mode} mode
      </Text>
      {p.saveNote ? (
        <Text color={TONE.warning} wrap="wrap">
          {p.saveNote}
        </Text>
      ) : null}
    </Box>
  );
}

/** Drawn again only when its props change (not on every key typed elsewhere). */
export const Header = React.memo(HeaderView);
