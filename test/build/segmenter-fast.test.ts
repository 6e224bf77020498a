import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
// @ts-expect-error plain JavaScript build helper, no types
import { createSegmenter } from '../../scripts/segmenter-fast.mjs';

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
