/**
 * Entry point of the interactive program for src/cli.ts: renders the app, waits for it to end,
 * releases the case locks, and returns the exit code.
 */
import React from 'react';
import { render } from 'ink';
import {
  listIndexFile,
  releaseAllLocks,
  releaseAllLocksSync,
  userCacheDir,
} from '../store/index.js';
import { App } from './app.js';
import { liveInterview } from './interview-live.js';
import { liveServices } from './services-live.js';
import { applyColorPolicy } from './theme.js';
import type { Start } from './use-app-model.js';
import { QUICK_ENTRY_HELP, UNIT_SUFFIX_HELP } from '../input/index.js';

/** The build's identity (a hash of its inputs, set by scripts/build.mjs); none from the sources. */
declare const __SKIDCASE_BUILD__: string | undefined;
const BUILD = typeof __SKIDCASE_BUILD__ === 'string' ? __SKIDCASE_BUILD__ : undefined;

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
  // The CommonJS build loads yoga's WebAssembly in the background (scripts/build.mjs); Ink
  // needs it from the first render. From the sources this is undefined and there is no wait.
  await (globalThis as Record<symbol, unknown>)[Symbol.for('skidcase.yoga-ready')];
  const color = applyColorPolicy(process.env);
  const services = liveServices({
    sessionsDir: opts.sessionsDir,
    sessionsFrom: opts.sessionsFrom,
    port: liveInterview,
    // Rows kept from the last list are trusted only by the build that wrote them.
    ...(BUILD
      ? {
          listIndex: {
            file: listIndexFile(userCacheDir(), opts.sessionsDir),
            key: `${BUILD} ${process.version}`,
          },
        }
      : {}),
  });
  let code = 0;
  // Bracketed paste: the terminal marks a paste, so a pasted block of lines (surveyed points)
  // arrives as text and not as answers ended by its line breaks (use-app-input.ts).
  const bracket = process.stdout.isTTY && process.stdin.isTTY;
  if (bracket) process.stdout.write(BRACKETED_PASTE_ON);
  const pasteOff = () => {
    if (bracket) process.stdout.write(BRACKETED_PASTE_OFF);
  };
  process.once('exit', pasteOff);
  const instance = render(
    <App
      services={services}
      port={liveInterview}
      start={opts.start}
      color={color}
      quickEntry={[...QUICK_ENTRY_HELP, '', ...UNIT_SUFFIX_HELP]}
      onExit={(c) => (code = c)}
    />,
    // Ink's default 30 frames a second holds a frame that follows another within 33 ms (the case
    // list after its placeholder, a key typed soon after the last); 120 holds it 8 ms at most.
    { exitOnCtrlC: false, maxFps: 120 },
  );
  const stop = onEndSignals(() => instance.unmount());
  await instance.waitUntilExit();
  pasteOff();
  process.off('exit', pasteOff);
  stop();
  await releaseAllLocks();
  return code;
}

const BRACKETED_PASTE_ON = '\u001b[?2004h';
const BRACKETED_PASTE_OFF = '\u001b[?2004l';

/** How long keys already typed may keep arriving after a hang-up before the program ends. */
const DRAIN_MS = 80;

/**
 * SIGHUP (the terminal closed) and SIGTERM: keys already typed (an Enter just pressed) are still
 * read and handled first (each accepted answer is written to disk as it is handled), then the
 * screen is given back, the locks are released and the program ends with 128 + the signal's
 * number. Without this, a hang-up right after Enter could end the program before it read the Enter.
 */
function onEndSignals(unmount: () => void): () => void {
  const numbers: Record<string, number> = { SIGHUP: 1, SIGTERM: 15 };
  let ending = false;
  const handler = (signal: NodeJS.Signals) => {
    if (ending) return;
    ending = true;
    let last = Date.now();
    const seen = () => (last = Date.now());
    process.stdin.on('data', seen);
    const check = () => {
      if (Date.now() - last < DRAIN_MS) return void setTimeout(check, 20);
      try {
        unmount();
      } catch {
        // the screen may be gone with the terminal
      }
      releaseAllLocksSync();
      process.exit(128 + (numbers[signal] ?? 0));
    };
    setTimeout(check, 20);
  };
  process.on('SIGHUP', handler);
  process.on('SIGTERM', handler);
  return () => {
    process.off('SIGHUP', handler);
    process.off('SIGTERM', handler);
  };
}
