/** A read position over tokens, with the source text for quoting what was typed. */
import type { Token } from './lexer.js';

export class Cursor {
  pos = 0;
  /** Where the value being read began, so that a message can quote all of it. */
  itemStart = 0;
  constructor(
    readonly tokens: readonly Token[],
    readonly source: string,
    /** One past the last token this cursor may read (a slice of a longer line). */
    readonly stop: number = tokens.length,
  ) {}

  peek(ahead = 0): Token | undefined {
    const i = this.pos + ahead;
    return i < this.stop ? this.tokens[i] : undefined;
  }

  take(): Token | undefined {
    const t = this.peek();
    if (t) this.pos++;
    return t;
  }

  done(): boolean {
    return this.pos >= this.stop;
  }

  /** The text typed from token `from` up to (not including) token `to`. */
  text(from: number, to: number = this.pos): string {
    const a = this.tokens[from];
    const b = this.tokens[Math.min(to, this.stop) - 1];
    if (!a || !b || to <= from) return '';
    return this.source.slice(a.at, b.end);
  }

  /** The rest of the text from the current token on. */
  rest(): string {
    return this.text(this.pos, this.stop);
  }
}

/** A failure to read, with the message shown to the investigator. */
export class ReadError {
  constructor(readonly message: string) {}
}

export type Read<T> = T | ReadError;
