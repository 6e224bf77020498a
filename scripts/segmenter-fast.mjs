// A grapheme segmenter for the terminal-width packages Ink uses (string-width, slice-ansi,
// ansi-tokenize), put in place of their `new Intl.Segmenter(...)` by scripts/build-options.mjs.
// Two things it saves: ICU's break iterator is made on first real use, not when Ink loads; and
// text made only of characters that are always a grapheme of their own (ASCII, Latin letters,
// common punctuation, arrows, math signs, box drawing: no combining mark, joiner, variation
// selector, carriage return, surrogate, Hangul or regional indicator) is split per character
// without ICU, which is what ICU would return for it (test/build/segmenter-fast.test.ts).

/** Characters that never join a neighbour into one grapheme cluster (UAX #29). */
const SIMPLE =
  // eslint-disable-next-line no-control-regex -- ESC is one of the characters that never joins
  /^[\n\u001B\u0020-\u007E\u00A0-\u02FF\u2010-\u2027\u2030-\u205E\u2190-\u21FF\u2200-\u22FF\u2500-\u25FF]*$/;

class SimpleSegments {
  constructor(input) {
    this.input = input;
  }
  containing(index = 0) {
    const i = Math.trunc(Number(index)) || 0;
    if (i < 0 || i >= this.input.length) return undefined;
    return { segment: this.input[i], index: i, input: this.input };
  }
  *[Symbol.iterator]() {
    for (let i = 0; i < this.input.length; i++)
      yield { segment: this.input[i], index: i, input: this.input };
  }
}

/** The same `segment(text)` as `new Intl.Segmenter(locales, options)`. */
export function createSegmenter(locales, options) {
  let real;
  const grapheme = (options?.granularity ?? 'grapheme') === 'grapheme';
  return {
    segment(text) {
      const s = String(text);
      if (grapheme && SIMPLE.test(s)) return new SimpleSegments(s);
      real ??= new Intl.Segmenter(locales, options);
      return real.segment(s);
    },
  };
}

/**
 * A character every RGI emoji holds one of (Unicode Technical Standard #51): a pictographic
 * character (single emoji, and the base of modifier, tag and ZWJ sequences), a regional
 * indicator (flags), the keycap mark (keycaps) or a skin-tone modifier (shown alone). Digits,
 * `#` and `*` have the Emoji property but are no RGI emoji without the keycap mark, so a case
 * list's figures never build the RGI set. Cheap to build, unlike that set.
 */
const MAYBE_EMOJI = /[\p{Extended_Pictographic}\p{Regional_Indicator}\u20E3\p{Emoji_Modifier}]/u;

/**
 * The same `test(segment)` as string-width's `/^\p{RGI_Emoji}$/v`, put in its place by
 * scripts/build-options.mjs. Building that expression (a set of several thousand sequences)
 * takes 20-30 ms, at load; here it is built the first time a segment holds one of those
 * characters, and a segment without one is no RGI emoji (test/build/segmenter-fast.test.ts).
 */
export function createRgiEmojiTest() {
  let real;
  return {
    test(segment) {
      if (!MAYBE_EMOJI.test(segment)) return false;
      real ??= new RegExp('^\\p{RGI_Emoji}$', 'v');
      return real.test(segment);
    },
  };
}
