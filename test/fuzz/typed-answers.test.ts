// Random text typed at every numeric question (the interview's own fuzz test drives random action
// sequences; this one hammers the number readers with arbitrary text, numbers in odd spellings
// and units, at each question in turn).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { contextOf, reduce } from '../../src/interview/index.js';
import { numericQuestions } from './question-states.js';

const RUNS = 3000;
const questions = numericQuestions();

/** Pieces people type, glued at random: numbers, signs, units, separators, typos. */
const piece = fc.oneof(
  fc.constantFrom(
    '0',
    '1',
    '7',
    '12',
    '80',
    '0.72',
    '.5',
    '1e3',
    '1e309',
    '-',
    '+',
    '.',
    ',',
    ' ',
    '  ',
    '/',
    '@',
    '%',
    '(',
    ')',
    'x',
    '±',
    '+/-',
    'to',
    '..',
  ),
  fc.constantFrom(
    'ft',
    "'",
    '"',
    'in',
    'm',
    'cm',
    'km/h',
    'mph',
    'kg',
    'lb',
    'ftt',
    'NaN',
    'Infinity',
    'undefined',
    '[gravel]',
    'table:gravel-loose',
  ),
  fc.string({ maxLength: 4 }),
  fc.string({ unit: 'grapheme', maxLength: 3 }),
  fc.double({ noNaN: false }).map(String),
  fc.integer({ min: -1000, max: 100_000 }).map(String),
);
const typed = fc.array(piece, { minLength: 0, maxLength: 8 }).map((xs) => xs.join(''));

/** Every number inside a parsed answer (a Quantity, a list, segments, ...). */
function numbersIn(v: unknown, out: number[] = []): number[] {
  if (typeof v === 'number') out.push(v);
  else if (Array.isArray(v)) v.forEach((x) => numbersIn(x, out));
  else if (v && typeof v === 'object') Object.values(v).forEach((x) => numbersIn(x, out));
  return out;
}

describe('random text at every numeric question', () => {
  it(`${RUNS} answers across ${questions.length} questions: never a throw, a message for every refusal, only finite numbers kept`, () => {
    let refused = 0;
    fc.assert(
      fc.property(fc.nat(questions.length - 1), typed, (i, text) => {
        const { q, state } = questions[i]!;
        const after = reduce(state, { type: 'answer', text });
        const check = q.validate(text, contextOf(state.answers));
        if (after.error) {
          refused++;
          const m = after.error.message;
          expect(m.trim().length).toBeGreaterThan(5);
          // The typed text may be quoted back; the program never writes these words of its own.
          for (const w of m.match(/NaN|Infinity|undefined/g) ?? []) expect(text).toContain(w);
          expect(after.answers).toBe(state.answers);
          if (text.trim() !== '') expect(check).toBe(m);
        } else {
          // Accepted: what is kept for the case file holds finite numbers only.
          for (const n of numbersIn(after.answers[q.id]?.value))
            expect(Number.isFinite(n)).toBe(true);
          if (text.trim() !== '') expect(check).toBeUndefined();
        }
      }),
      { numRuns: RUNS },
    );
    expect(refused).toBeGreaterThan(RUNS / 3);
  }, 60_000);
});
