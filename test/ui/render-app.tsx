/**
 * renderApp: the whole app in ink-testing-library, with the real store, interview and engine on
 * a temporary sessions folder and preferences folder. Frames are stripped of colour; every wait
 * polls the frame until the expected change, with a timeout (never a fixed sleep alone).
 */
import fs from 'node:fs';
import path from 'node:path';
import { trackedTempDir } from '../temp-dirs.js';
import React from 'react';
import { render } from 'ink-testing-library';
import { App } from '../../src/ui/app.js';
import { liveInterview } from '../../src/ui/interview-live.js';
import { liveServices } from '../../src/ui/services-live.js';
import type { Services } from '../../src/ui/services.js';
import type { Start } from '../../src/ui/use-app-model.js';
import { QUICK_ENTRY_HELP } from '../../src/input/index.js';

export const ENTER = '\r';
export const ESC = '\u001B';
export const UP = '\u001B[A';
export const DOWN = '\u001B[B';
export const PAGE_DOWN = '\u001B[6~';
export const BACKSPACE = '\u007F';
/** Ctrl+letter: the control byte a terminal sends (Ctrl+A = 0x01 ... Ctrl+Z = 0x1a). */
export const ctrl = (letter: string) =>
  String.fromCharCode(letter.toLowerCase().charCodeAt(0) - 96);

// eslint-disable-next-line no-control-regex
export const strip = (s: string | undefined) => (s ?? '').replace(/\u001B\[[0-9;?]*[A-Za-z]/g, '');

export interface RenderOptions {
  start?: Start;
  columns?: number;
  rows?: number;
  /** Files to put in the sessions folder first: name -> JSON value or raw text. */
  files?: Record<string, unknown>;
  services?: (s: Services) => Services;
  color?: boolean;
}

export function tempDir(prefix: string): string {
  return trackedTempDir(prefix);
}

export function renderApp(o: RenderOptions = {}) {
  const dir = tempDir('skidcase-ui-');
  const cfg = tempDir('skidcase-cfg-');
  for (const [name, body] of Object.entries(o.files ?? {}))
    fs.writeFileSync(
      path.join(dir, name),
      typeof body === 'string' ? body : JSON.stringify(body, null, 2),
    );
  let services = liveServices({
    sessionsDir: dir,
    sessionsFrom: 'flag',
    port: liveInterview,
    prefs: { cwd: cfg },
    demoFile: path.resolve(
      'sessions',
      fs.readdirSync('sessions').find((n) => n.startsWith('demo'))!,
    ),
  });
  if (o.services) services = o.services(services);
  const exits: number[] = [];
  const app = (columns: number, rows: number) => (
    <App
      services={services}
      port={liveInterview}
      start={o.start ?? { kind: 'home' }}
      color={o.color ?? false}
      quickEntry={QUICK_ENTRY_HELP}
      columns={columns}
      rows={rows}
      onExit={(c) => exits.push(c)}
    />
  );
  const r = render(app(o.columns ?? 100, o.rows ?? 30));
  /** The terminal resized: the same app rendered again at the new size. */
  const resize = (columns: number, rows = o.rows ?? 30) => r.rerender(app(columns, rows));
  const frame = () => strip(r.lastFrame());

  /** Polls until `test` holds for the current frame; fails with the last frame shown. */
  async function waitFor(
    test: (f: string) => boolean,
    what = 'the expected screen',
    ms = 4000,
  ): Promise<string> {
    const until = Date.now() + ms;
    for (;;) {
      const f = frame();
      if (test(f)) return f;
      if (Date.now() > until) throw new Error(`timed out waiting for ${what}; last frame:\n${f}`);
      await new Promise((res) => setTimeout(res, 10));
    }
  }
  const waitText = (text: string | RegExp, ms?: number) =>
    waitFor(
      (f) => (typeof text === 'string' ? f.includes(text) : text.test(f)),
      `"${String(text)}"`,
      ms,
    );

  /** Writes keys and waits for the frame to change (or for `text`, when given). */
  async function press(keys: string, text?: string | RegExp): Promise<string> {
    const before = frame();
    r.stdin.write(keys);
    if (text !== undefined) return waitText(text);
    return waitFor((f) => f !== before, `a change after ${JSON.stringify(keys)}`);
  }

  /** Types an answer and presses Enter, waiting for the next frame. */
  async function answer(text: string, expect?: string | RegExp): Promise<string> {
    r.stdin.write(text);
    await waitText(text.slice(-Math.min(text.length, 10)));
    return press(ENTER, expect);
  }

  return { ...r, dir, cfg, services, frame, waitFor, waitText, press, answer, exits, resize };
}
