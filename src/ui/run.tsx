/**
 * Entry point of the interactive program for src/cli.ts: renders the app, waits for it to end,
 * releases the case locks, and returns the exit code.
 */
import React from 'react';
import { render } from 'ink';
import { releaseAllLocks } from '../store/index.js';
import { App } from './app.js';
import { liveInterview } from './interview-live.js';
import { liveServices } from './services-live.js';
import { applyColorPolicy } from './theme.js';
import type { Start } from './use-app-model.js';
import { QUICK_ENTRY_HELP, UNIT_SUFFIX_HELP } from '../input/index.js';

export interface RunOptions {
  sessionsDir: string;
  sessionsFrom: string;
  start: Start;
}

/** What is printed when there is no terminal to draw the screens in. */
export const NO_TTY_MESSAGE =
  'skidcase needs an interactive terminal for its questions. Without one, solve a case file with\n' +
  '  skidcase solve FILE [--json]\n';

export async function runInteractive(opts: RunOptions): Promise<number> {
  if (!process.stdin.isTTY || !process.stdout.isTTY) {
    process.stderr.write(NO_TTY_MESSAGE);
    return 1;
  }
  const color = applyColorPolicy(process.env);
  const services = liveServices({
    sessionsDir: opts.sessionsDir,
    sessionsFrom: opts.sessionsFrom,
    port: liveInterview,
  });
  let code = 0;
  const instance = render(
    <App
      services={services}
      port={liveInterview}
      start={opts.start}
      color={color}
      quickEntry={[...QUICK_ENTRY_HELP, '', ...UNIT_SUFFIX_HELP]}
      onExit={(c) => (code = c)}
    />,
    { exitOnCtrlC: false },
  );
  await instance.waitUntilExit();
  await releaseAllLocks();
  return code;
}
