import React from 'react';
import { Box, Text } from 'ink';
import type { CaseRow } from './services.js';
import type { Line } from './line-edit.js';
import { TextField } from './text-field.js';
import { windowOf } from './scroll.js';
import { TONE } from './theme.js';
import { localTime } from './header.js';
import { isNewerFileProblem } from '../case/load.js';

const FROM: Record<string, string> = {
  flag: 'set by --sessions',
  env: 'set by SKIDCASE_SESSIONS',
  preference: 'set in your preferences',
  default: 'the default: sessions/ under the working folder',
};

/** Where the sessions folder came from, in words. */
export function sessionsFromText(from: string): string {
  return FROM[from] ?? from;
}

/** The second line of a case row: its progress and where it stopped, or its result. */
export function rowStatus(r: CaseRow): string {
  if (r.problem) {
    return `cannot be read: ${r.problem.message}`;
  }
  const parts: string[] = [];
  if (r.progress) parts.push(`${r.progress.answered} of ${r.progress.applicable} answered`);
  if (r.result) parts.push(r.result);
  else if (r.stoppedAt) parts.push(`stopped at: ${r.stoppedAt}`);
  return parts.join(' · ');
}

export interface HomeProps {
  sessionsDir: string;
  sessionsFrom: string;
  rows: CaseRow[] | undefined;
  selected: number;
  height: number;
  message?: string | undefined;
  error?: string | undefined;
  /** Set while a file path is being typed for "open file". */
  path?: Line | undefined;
  color: boolean;
}

/**
 * One case on the list: its name, reference and save time, then its progress or result. Drawn
 * again only when the row or its selection changes, so an arrow key re-renders two rows.
 */
const CaseRowView = React.memo(function CaseRowView({
  row: r,
  selected: at,
}: {
  row: CaseRow;
  selected: boolean;
}) {
  return (
    <Box flexDirection="column">
      <Text bold={at} color={r.problem ? TONE.error : undefined} wrap="truncate">
        {at ? '> ' : '  '}
        {r.id}
        {r.reference ? ` · ${r.reference}` : ''}
        {/* On the first line, where there is room: a long "stopped at" no longer cuts it. */}
        {r.updated && !r.problem ? (
          <Text color={TONE.muted}> · saved {localTime(r.updated)}</Text>
        ) : null}
      </Text>
      <Text color={r.problem ? TONE.error : r.result ? TONE.result : TONE.muted} wrap="truncate">
        {'    '}
        {rowStatus(r)}
      </Text>
    </Box>
  );
});

/** The start screen: the folder in use, the cases newest first, and what can be done. */
export function HomeScreen(p: HomeProps) {
  const perRow = 2;
  const room = Math.max(1, Math.floor((p.height - 7) / perRow));
  const rows = p.rows ?? [];
  const top = Math.max(0, Math.min(p.selected - room + 1, rows.length - room));
  const w = windowOf(rows, Math.max(0, top), room);
  const sel = rows[p.selected];
  return (
    <Box flexDirection="column">
      <Text bold color={TONE.heading}>
        skidcase · speed from tire marks
      </Text>
      <Text wrap="truncate-middle">Cases in {p.sessionsDir}</Text>
      <Text color={TONE.muted}>({sessionsFromText(p.sessionsFrom)})</Text>
      {p.rows === undefined ? <Text>Reading the cases…</Text> : null}
      {p.rows?.length === 0 ? (
        <Text>No cases here yet. Press n to start one, or d for the demo case.</Text>
      ) : null}
      {w.above ? <Text color={TONE.muted}> ↑ {w.above} more</Text> : null}
      {w.shown.map((r, i) => (
        <CaseRowView key={r.file} row={r} selected={w.start + i === p.selected} />
      ))}
      {w.below ? <Text color={TONE.muted}> ↓ {w.below} more</Text> : null}
      {sel?.problem ? (
        <Text color={TONE.warning}>
          {isNewerFileProblem(sel.problem.message)
            ? 'This file was written by a newer skidcase: update skidcase to open it. It is left as it is.'
            : sel.problem.hasBackup
              ? 'This file is damaged and is never overwritten. Press b to restore its backup copy.'
              : 'This file is damaged and is never overwritten; no backup copy was found.'}
        </Text>
      ) : null}
      {p.path ? (
        <Box>
          <Text>File to open: </Text>
          <TextField line={p.path} color={p.color} />
        </Box>
      ) : null}
      {p.message ? <Text color={TONE.result}>{p.message}</Text> : null}
      {p.error ? <Text color={TONE.error}>{p.error}</Text> : null}
    </Box>
  );
}
