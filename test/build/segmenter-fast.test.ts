import fc from 'fast-check';
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
// @ts-expect-error plain JavaScript build helper, no types
import { createRgiEmojiTest, createSegmenter } from '../../scripts/segmenter-fast.mjs';

// The bundle's segmenter (scripts/segmenter-fast.mjs) must split text exactly as ICU does: it
// only skips ICU for characters that are always a grapheme of their own.
type Seg = { segment: string; index: number; input: string };
type Segments = Iterable<Seg> & { containing(i?: number): Seg | undefined };
const ours = createSegmenter(undefined, { granularity: 'grapheme' }) as {
  segment(s: string): Segments;
};
const icu = new Intl.Segmenter(undefined, { granularity: 'grapheme' });
const plain = (it: Iterable<Seg>) =>
  [...it].map(({ segment, index, input }) => ({ segment, index, input }));

const RANGES: [number, number][] = [
  [0x0a, 0x0a],
  [0x1b, 0x1b],
  [0x20, 0x7e],
  [0xa0, 0x2ff],
  [0x2010, 0x2027],
  [0x2030, 0x205e],
  [0x2190, 0x21ff],
  [0x2200, 0x22ff],
  [0x2500, 0x25ff],
];
const simpleChar = fc
  .constantFrom(...RANGES)
  .chain(([lo, hi]) => fc.integer({ min: lo, max: hi }))
  .map((c) => String.fromCharCode(c));
// and characters that do join their neighbours: combining marks, joiners, variation selectors,
// CR LF, emoji, flags, Hangul jamo
const joining = fc.constantFrom(
  '\u0301',
  '\u200d',
  '\ufe0f',
  '\r',
  '\u{1F600}',
  '\u{1F1EB}\u{1F1F7}',
  '\u1100',
  '\u1161',
  '\u0915\u094d',
  '\u{1F469}\u200d\u{1F4BB}',
);

describe('the bundle grapheme segmenter', () => {
  it('splits text of simple characters exactly as Intl.Segmenter does', () => {
    fc.assert(
      fc.property(fc.array(simpleChar, { maxLength: 60 }), (chars) => {
        const s = chars.join('');
        expect(plain(ours.segment(s))).toEqual(plain(icu.segment(s)));
        for (const i of [-1, 0, Math.floor(s.length / 2), s.length - 1, s.length]) {
          const a = ours.segment(s).containing(i);
          const b = icu.segment(s).containing(i);
          expect(a && { ...a }).toEqual(
            b && { segment: b.segment, index: b.index, input: b.input },
          );
        }
      }),
      { numRuns: 400 },
    );
  });

  it('and any text with joining characters as well (through ICU)', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(simpleChar, joining), { maxLength: 40 }), (parts) => {
        const s = parts.join('');
        expect(plain(ours.segment(s))).toEqual(plain(icu.segment(s)));
      }),
      { numRuns: 400 },
    );
  });

  it('keeps what the screens use together: the middle dot, an ellipsis, arrows, a é made of two', () => {
    const s = 'skidcase · speed … ↑ 3 more e\u0301';
    expect(plain(ours.segment(s)).map((x) => x.segment)).toEqual(
      plain(icu.segment(s)).map((x) => x.segment),
    );
    expect(plain(ours.segment(s)).at(-1)?.segment).toBe('e\u0301');
  });
});

// The bundle's RGI emoji test (string-width's `/^\p{RGI_Emoji}$/v`, built on first use) must
// answer as that expression does. Its shortcut, "no pictographic character, regional indicator,
// keycap mark or skin tone, no RGI emoji", follows the sequence kinds of Unicode Technical
// Standard #51; checked here against V8's own RGI set.
describe('the bundle RGI emoji test', () => {
  const lazy = createRgiEmojiTest() as { test(s: string): boolean };
  const rgi = new RegExp('^\\p{RGI_Emoji}$', 'v');
  const same = (list: string[]) => {
    const differ = list.filter((x) => lazy.test(x) !== rgi.test(x));
    expect(differ.map((x) => [...x].map((c) => c.codePointAt(0)!.toString(16)).join(' '))).toEqual(
      [],
    );
  };
  const cp = (lo: number, hi: number) =>
    Array.from({ length: hi - lo + 1 }, (_, i) => String.fromCodePoint(lo + i)).filter(
      (c) => !/\p{Surrogate}/u.test(c),
    );
  const ALL = [...cp(0, 0x1ffff), ...cp(0xe0000, 0xe007f)];

  it('answers as the RGI expression for every single character of planes 0 and 1 and the tags', () => {
    same(ALL);
    // the set is not empty: the check above compared real emoji too
    expect(ALL.filter((c) => rgi.test(c)).length).toBeGreaterThan(1000);
  });

  it('and for keycaps, flags, skin tones, presentation selectors, tag and ZWJ sequences', () => {
    const emoji = ALL.filter((c) => /\p{Emoji}/u.test(c));
    const tones = cp(0x1f3fb, 0x1f3ff);
    const regional = cp(0x1f1e6, 0x1f1ff);
    same([
      ...'0123456789#*'.split('').flatMap((k) => [`${k}\u20e3`, `${k}\ufe0f\u20e3`]),
      ...regional.flatMap((a) => regional.map((b) => a + b)),
      ...emoji.flatMap((e) => [e + '\ufe0f', e + '\ufe0e', ...tones.map((t) => e + t)]),
      // England, Scotland, Wales: black flag, tag letters, cancel tag
      ...['gbeng', 'gbsct', 'gbwls'].map(
        (t) =>
          '\u{1F3F4}' +
          [...t].map((ch) => String.fromCodePoint(0xe0000 + ch.charCodeAt(0))).join('') +
          '\u{E007F}',
      ),
      '\u{1F469}\u200d\u{1F4BB}',
      '\u{1F468}\u200d\u{1F469}\u200d\u{1F467}\u200d\u{1F466}',
      '\u{1F3F3}\ufe0f\u200d\u{1F308}',
      '\u{1F9D1}\u{1F3FD}\u200d\u{1F692}',
      '\u2764\ufe0f\u200d\u{1F525}',
      // text that is no emoji: the screens' signs, and digits and letters
      'skidcase · 45.8 mph (42.4 to 49.0) → ×',
      '12',
      'ab',
    ]);
  });

  it('builds the RGI set only for a segment that may be an emoji: never for figures and signs', async () => {
    const helper = new URL('../../scripts/segmenter-fast.mjs', import.meta.url).href;
    const code = `
      let built = 0;
      globalThis.RegExp = new Proxy(RegExp, {
        construct(t, a, n) { if (String(a[0]).includes('RGI_Emoji')) built++; return Reflect.construct(t, a, n); },
      });
      const { createRgiEmojiTest } = await import(${JSON.stringify(helper)});
      const t = createRgiEmojiTest();
      const plain = ['1', '4', '#', '*', '·', '→', '↑', '×', '…', 'é'].map((s) => t.test(s));
      const before = built;
      const smile = t.test('\u{1F600}');
      console.log(JSON.stringify({ plain, before, smile, after: built }));`;
    const { stdout } = await promisify(execFile)(process.execPath, [
      '--input-type=module',
      '-e',
      code,
    ]);
    expect(JSON.parse(stdout)).toEqual({
      plain: Array(10).fill(false),
      before: 0,
      smile: true,
      after: 1,
    });
  });
});
