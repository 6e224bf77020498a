/**
 * Splits a typed answer into tokens: numbers, words (unit suffixes and keywords), operators,
 * bracketed labels and table keys. Every token keeps its place in the text so that messages can
 * quote exactly what was typed.
 */

export type Op =
  'minus' | 'plus' | 'pm' | 'to' | 'lparen' | 'rparen' | 'comma' | 'semi' | 'at' | 'times' | 'eq';

export type Token =
  /** A decimal (`80.5`, `.5`, `1e3`) or a fraction (`1/8`, `3 1/8`). */
  | { t: 'num'; text: string; value: number; at: number; end: number }
  /** Digits with a comma inside (`0,72`, `1,234.5`): read as an error with a hint. */
  | { t: 'commaNum'; text: string; at: number; end: number }
  | { t: 'word'; text: string; at: number; end: number }
  | { t: 'op'; op: Op; text: string; at: number; end: number }
  /** `[free text]`: a segment's surface label. */
  | { t: 'label'; text: string; at: number; end: number }
  /** After `@`, a reference table key such as `gravel-loose` or `asphalt-dry-new/over30`. */
  | { t: 'key'; text: string; at: number; end: number }
  | { t: 'bad'; text: string; at: number; end: number; why: string };

/** `3 1/8` and `1/8`: inches and middle ordinates are often read in eighths. */
const FRACTION = /^(?:(\d+)\s+)?(\d+)\/(\d+)(?![\d./])/;
const NUM = /^(?:\d+\.\d+|\d+\.(?![.\d])|\d+|\.\d+)(?:[eE][+-]?\d+)?/;
const COMMA_NUM = /^\d+(?:,\d+)+(?:\.\d+)?/;
const WORD = /^(?:[a-zµ°]+(?:\/[a-z]+)?|''|[%'"’”′″°])/i;
const KEY = /^[a-z][a-z0-9_-]*(?:\/[a-z0-9_-]+)?/i;

const OPS: readonly [string, Op][] = [
  ['+/-', 'pm'],
  ['+-', 'pm'],
  ['±', 'pm'],
  ['...', 'to'],
  ['..', 'to'],
  ['…', 'to'],
  ['-', 'minus'],
  ['−', 'minus'],
  ['–', 'minus'],
  ['—', 'minus'],
  ['+', 'plus'],
  ['(', 'lparen'],
  [')', 'rparen'],
  [',', 'comma'],
  [';', 'semi'],
  ['@', 'at'],
  ['×', 'times'],
  ['*', 'times'],
  ['=', 'eq'],
];

/**
 * Tokens of a text. Never throws: a character it cannot place becomes a `bad` token.
 * @example lex("12' 6\"").map((t) => t.text) // ["12", "'", "6", "\""]
 */
export function lex(text: string): Token[] {
  const out: Token[] = [];
  let i = 0;
  while (i < text.length) {
    const rest = text.slice(i);
    const ws = /^\s+/.exec(rest);
    if (ws) {
      i += ws[0].length;
      continue;
    }
    const tok = next(text, rest, i, out[out.length - 1]);
    out.push(tok);
    i = tok.end;
  }
  return out;
}

function next(text: string, rest: string, at: number, prev: Token | undefined): Token {
  if (rest[0] === '[') {
    const close = rest.indexOf(']');
    if (close < 0)
      return { t: 'bad', text: rest, at, end: text.length, why: 'the [ has no closing ]' };
    return { t: 'label', text: rest.slice(1, close), at, end: at + close + 1 };
  }
  if (prev?.t === 'op' && prev.op === 'at') {
    const k = KEY.exec(rest);
    if (k) return { t: 'key', text: k[0], at, end: at + k[0].length };
  }
  const f = FRACTION.exec(rest);
  if (f) {
    const [text, whole, top, bottom] = f;
    const end = at + text.length;
    if (Number(bottom) === 0) return { t: 'bad', text, at, end, why: `'${text}' divides by zero` };
    return { t: 'num', text, value: Number(whole ?? 0) + Number(top) / Number(bottom), at, end };
  }
  const c = COMMA_NUM.exec(rest);
  if (c) return { t: 'commaNum', text: c[0], at, end: at + c[0].length };
  const n = NUM.exec(rest);
  if (n) return { t: 'num', text: n[0], value: Number(n[0]), at, end: at + n[0].length };
  for (const [s, op] of OPS) {
    if (rest.startsWith(s)) return { t: 'op', op, text: s, at, end: at + s.length };
  }
  const w = WORD.exec(rest);
  if (w) return { t: 'word', text: w[0], at, end: at + w[0].length };
  const ch = String.fromCodePoint(rest.codePointAt(0)!);
  return { t: 'bad', text: ch, at, end: at + ch.length, why: `'${ch}' is not understood here` };
}

/** True for the word `to` (a range separator). */
export const isToWord = (t: Token | undefined): boolean =>
  t?.t === 'word' && t.text.toLowerCase() === 'to';

/** True for an operator token of one of these kinds. */
export function isOp(t: Token | undefined, ...ops: Op[]): boolean {
  return t?.t === 'op' && ops.includes(t.op);
}
