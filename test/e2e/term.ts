/**
 * One program running in a pseudo-terminal, with a headless xterm keeping its screen: what the
 * tests read is what a person would see after every cursor move, clear and wrap.
 */
import type { IPty } from '@lydell/node-pty';
import xterm from '@xterm/headless';
import { keyBytes, type KeyName } from './keys.js';

const { Terminal } = xterm;

export interface ExitInfo {
  exitCode: number;
  signal: number | undefined;
}

export interface WaitOptions {
  timeoutMs?: number;
  /** What the test was waiting for, for the failure message. */
  what?: string;
}

export type ScreenTest = RegExp | string | ((screen: string) => boolean);

const matches = (screen: string, test: ScreenTest): boolean =>
  typeof test === 'string'
    ? screen.includes(test)
    : test instanceof RegExp
      ? test.test(screen)
      : test(screen);

const describeTest = (test: ScreenTest) =>
  typeof test === 'function' ? 'a screen condition' : String(test);

const tick = (ms: number) => new Promise<void>((r) => setTimeout(r, ms));

/** One running program in a pseudo-terminal, with its screen. */
export class Term {
  /** Key presses sent so far: each typed character counts one, each pressed key one. */
  keyCount = 0;
  /** Everything the program wrote, escape codes included (for checks such as NO_COLOR). */
  raw = '';
  readonly exited: Promise<ExitInfo>;
  private exitInfo: ExitInfo | undefined;
  private pending = 0;
  private lastOutputAt = Date.now();
  private readonly term: InstanceType<typeof Terminal>;

  constructor(
    private readonly pty: IPty,
    cols: number,
    rows: number,
    private readonly typingDelayMs: number,
  ) {
    this.term = new Terminal({ cols, rows, scrollback: 500, allowProposedApi: true });
    // Answers to terminal queries (cursor position reports, ...) go back as a real terminal's would.
    this.term.onData((d) => this.pty.write(d));
    pty.onData((d) => {
      this.raw += d;
      this.lastOutputAt = Date.now();
      this.pending++;
      this.term.write(d, () => this.pending--);
    });
    this.exited = new Promise((resolve) =>
      pty.onExit(({ exitCode, signal }) => {
        this.exitInfo = { exitCode, signal: signal || undefined };
        resolve(this.exitInfo);
      }),
    );
  }

  get pid(): number {
    return this.pty.pid;
  }

  get cols(): number {
    return this.term.cols;
  }

  /** The visible screen, one line per row, trailing spaces and trailing empty rows removed. */
  screen(): string {
    const buf = this.term.buffer.active;
    const lines: string[] = [];
    for (let i = 0; i < this.term.rows; i++)
      lines.push(buf.getLine(buf.baseY + i)?.translateToString(true) ?? '');
    while (lines.length > 0 && lines[lines.length - 1] === '') lines.pop();
    return lines.join('\n');
  }

  /**
   * Screen rows that are the terminal's own wrap of a line too long for it: a program that lays
   * out for the real width never has any (each is the 0-based row index).
   */
  wrappedRows(): number[] {
    const buf = this.term.buffer.active;
    const rows: number[] = [];
    for (let i = 0; i < this.term.rows; i++)
      if (buf.getLine(buf.baseY + i)?.isWrapped) rows.push(i);
    return rows;
  }

  /** Scrollback and screen together: what a person could scroll back to see. */
  history(): string {
    const buf = this.term.buffer.active;
    const lines: string[] = [];
    for (let i = 0; i < buf.length; i++) lines.push(buf.getLine(i)?.translateToString(true) ?? '');
    return lines.join('\n').replace(/\n+$/, '');
  }

  /** Waits until the screen passes the test, and returns that screen. */
  async waitFor(test: ScreenTest, opts: WaitOptions = {}): Promise<string> {
    const deadline = Date.now() + (opts.timeoutMs ?? 10_000);
    for (;;) {
      const screen = this.screen();
      if (this.pending === 0 && matches(screen, test)) return screen;
      if (this.exitInfo && this.pending === 0) {
        // One last look: output may have landed between the exit and this poll.
        if (matches(this.screen(), test)) return this.screen();
        throw this.failure(
          `the program exited (code ${this.exitInfo.exitCode}) before showing`,
          test,
          opts,
        );
      }
      if (Date.now() > deadline) throw this.failure('timed out waiting for', test, opts);
      await tick(15);
    }
  }

  /** Waits until the screen differs from `before` (default: the screen now). */
  async waitForChange(before = this.screen(), opts: WaitOptions = {}): Promise<string> {
    return this.waitFor((s) => s !== before, { what: 'the screen to change', ...opts });
  }

  /**
   * Waits until the program has written nothing for `quietMs`: used after a resize, where there
   * is no text to wait for, only the end of the repaint.
   */
  async waitForQuiet(quietMs = 150, opts: WaitOptions = {}): Promise<string> {
    const deadline = Date.now() + (opts.timeoutMs ?? 10_000);
    while (Date.now() - this.lastOutputAt < quietMs || this.pending > 0) {
      if (Date.now() > deadline)
        throw this.failure('timed out waiting for', () => false, {
          what: 'output to stop',
          ...opts,
        });
      await tick(Math.max(5, quietMs / 5));
    }
    return this.screen();
  }

  /** Types text character by character, as a person would (see `typingDelayMs`). */
  async type(text: string): Promise<void> {
    const chars = [...text];
    this.keyCount += chars.length;
    if (this.typingDelayMs === 0) {
      this.write(text);
      return;
    }
    for (const ch of chars) {
      this.write(ch);
      await tick(this.typingDelayMs);
    }
  }

  /** Presses a key by name (`enter`, `down`, `ctrl-c`, `f1`), `times` times. */
  async press(key: KeyName, times = 1): Promise<void> {
    const bytes = keyBytes(key);
    for (let i = 0; i < times; i++) {
      this.keyCount++;
      this.write(bytes);
      if (this.typingDelayMs > 0) await tick(this.typingDelayMs);
    }
  }

  /**
   * Types an answer, waits until what was typed shows on screen (so the program has taken every
   * character before Enter arrives, as with a person watching the screen), then presses Enter.
   */
  async answer(text: string, opts: WaitOptions = {}): Promise<void> {
    const squash = (s: string) => s.replace(/\s+/g, ' ');
    const times = (s: string) =>
      text.trim() === '' ? 0 : squash(s).split(squash(text.trim())).length - 1;
    const before = times(this.screen());
    await this.type(text);
    // The text must show once more than before: a prompt or a hint may already hold it.
    if (text.trim() !== '')
      await this.waitFor((s) => times(s) > before, {
        what: `the typed text "${text}" to show`,
        ...opts,
      });
    await this.press('enter');
  }

  /** Sends bytes as they are (no key counting): for escape sequences a test builds itself. */
  write(bytes: string): void {
    if (!this.exitInfo) this.pty.write(bytes);
  }

  /** Changes the terminal size, as a person dragging the window edge would. */
  resize(cols: number, rows: number): void {
    this.term.resize(cols, rows);
    if (!this.exitInfo) this.pty.resize(cols, rows);
  }

  /** Sends a signal (default SIGKILL: the terminal window closed, power lost). */
  kill(signal: NodeJS.Signals = 'SIGKILL'): void {
    if (this.exitInfo) return;
    try {
      process.kill(this.pty.pid, signal);
    } catch {
      // already gone
    }
  }

  /** Waits for the program to end, and returns its exit code and signal. */
  async waitForExit(opts: WaitOptions = {}): Promise<ExitInfo> {
    const ms = opts.timeoutMs ?? 10_000;
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(
        () =>
          reject(
            this.failure('timed out waiting for', () => false, {
              what: 'the program to exit',
              ...opts,
            }),
          ),
        ms,
      );
    });
    try {
      const info = await Promise.race([this.exited, timeout]);
      while (this.pending > 0) await tick(5);
      return info;
    } finally {
      clearTimeout(timer);
    }
  }

  /** Kills the program if it still runs and frees the emulator. */
  async dispose(): Promise<void> {
    this.kill('SIGKILL');
    await Promise.race([this.exited, tick(2_000)]);
    this.term.dispose();
  }

  private failure(prefix: string, test: ScreenTest, opts: WaitOptions): Error {
    const what = opts.what ?? describeTest(test);
    const frame = this.screen()
      .split('\n')
      .map((l) => `  | ${l}`)
      .join('\n');
    return new Error(`${prefix} ${what}\nscreen (${this.term.cols}x${this.term.rows}):\n${frame}`);
  }
}
