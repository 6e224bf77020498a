// Random text typed at every numeric question (the interview's own fuzz test drives random action
// sequences; this one hammers the number readers with arbitrary text, numbers in odd spellings
// and units, at each question in turn).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { contextOf, reduce } from '../../src/interview/index.js';
import { numericQuestions } from './question-states.js';
import { soakCount } from '../soak.js';

const RUNS = soakCount('SKIDCASE_TYPED_RUNS', 1000, 3000);
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
/** Well-formed answers in the accepted spellings, so that acceptance is exercised as much as refusal. */
const plausible = fc.oneof(
  fc.constantFrom(
    '1',
    '2',
    '3',
    '4',
    '0.5',
    '0.72',
    '0.65-0.80',
    '0.72 (0.65-0.80)',
    '45',
    '80 ft',
    "80'",
  ),
  fc.constantFrom(
    '24.4 m',
    '12 ft 6 in',
    '80 +/- 1',
    '80 ± 1',
    '3%',
    '2.5-3.5',
    '94 92 95 93',
    '4 x 80.5',
  ),
  fc.constantFrom(
    '30/42, 35/57.5',
    '48 @0.74 +2%, 31 @0.55',
    '0.71 0.69',
    '52 54 51',
    '150',
    '15-20 mph',
  ),
);
const typed = fc.oneof(
  {
    weight: 3,
    arbitrary: fc.array(piece, { minLength: 0, maxLength: 8 }).map((xs) => xs.join('')),
  },
  { weight: 2, arbitrary: plausible },
);

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
    console.log(
      `typed-answer fuzz: ${RUNS} answers, ${refused} refused with a message, ${RUNS - refused} accepted`,
    );
    // Both outcomes must be common, or the generator is not exercising the readers.
    expect(refused).toBeGreaterThan(RUNS / 4);
    expect(RUNS - refused).toBeGreaterThan(RUNS / 10);
  }, 60_000);
});
