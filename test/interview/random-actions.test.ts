import { defaultTextOf, explainOf } from '../../src/interview/answer-values.js';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { soakCount } from '../soak.js';
import {
  buildCase,
  currentQuestion,
  initialState,
  questionStates,
  reduce,
  solveDraft,
  summaryOfDone,
  type Action,
  type InterviewState,
} from '../../src/interview/index.js';
import { loadCase } from '../../src/case/load.js';
/** Random walks: a small count in `npm test`, the full one in `npm run soak` (test/soak.ts). */
const WALKS = soakCount('SKIDCASE_WALKS', 30, 300);

// Answers an investigator might type anywhere, good and bad, and key presses.
const TYPED = [
  '',
  ' ',
  'f',
  'm',
  'a',
  'e',
  'w',
  'n',
  'p',
  'y',
  'd',
  's',
  'g',
  'o',
  'q',
  't',
  'k',
  'l',
  'u',
  'r',
  'c',
  '1',
  '6',
  '2',
  '4',
  '0',
  '0.5',
  '0.7',
  '0.65-0.80',
  '45',
  '80 ft',
  '24.4 m',
  '12 ft 6 in',
  '40',
  '2.5',
  '3 (2-4)',
  '-3',
  '94 92 95 93',
  '4 x 80.5',
  '30/42, 35/57.5',
  '48 @0.74 +2%, 31 @0.55, 22 @0.40 -3%',
  '40 @gravel-loose -1%',
  'abc',
  '1e400',
  'NaN',
  'Infinity',
  '0,72',
  '1.5',
  '99',
  '-',
  '@',
  '((',
  'ünïcode',
  '9999999',
];

const action: fc.Arbitrary<Action> = fc.oneof(
  {
    weight: 8,
    arbitrary: fc.constantFrom(...TYPED).map((text) => ({ type: 'answer' as const, text })),
  },
  {
    weight: 1,
    arbitrary: fc.string({ maxLength: 12 }).map((text) => ({ type: 'answer' as const, text })),
  },
  { weight: 4, arbitrary: fc.constant({ type: 'accept-default' as const }) },
  {
    weight: 2,
    arbitrary: fc
      .constantFrom('y', 'n', 'zz', 'yaw', 'all')
      .map((value) => ({ type: 'choose' as const, value })),
  },
  {
    weight: 1,
    arbitrary: fc.constantFrom<Action>(
      { type: 'back' },
      { type: 'forward' },
      { type: 'undo' },
      { type: 'open-review' },
    ),
  },
  {
    weight: 1,
    arbitrary: fc.constantFrom<Action>(
      { type: 'toggle-explain' },
      { type: 'clear-error' },
      { type: 'set-mode', mode: 'brisk' },
    ),
  },
  { weight: 1, arbitrary: fc.nat(60).map((n) => ({ type: 'jump' as const, id: `#${n}` })) },
  // A plausible answer to whatever is asked: the n-th choice, or the question's own example.
  { weight: 24, arbitrary: fc.nat(9).map((n) => ({ type: 'answer' as const, text: `#${n}` })) },
);

/** A jump's `#n` picks the n-th listed question, as the jump list would. */
function resolve(s: InterviewState, a: Action): Action {
  if (a.type === 'answer' && /^#\d$/.test(a.text)) {
    const q = currentQuestion(s);
    const n = Number(a.text.slice(1));
    const c = q?.choices?.length ? q.choices[n % q.choices.length]!.key : undefined;
    // One mark length stands for all the marks counted, whatever the count.
    const marks = q?.id.endsWith('.marks') ? '80.5' : undefined;
    return {
      type: 'answer',
      text: c ?? marks ?? q?.example ?? (q && defaultTextOf(q, s.answers)) ?? String(n + 1),
    };
  }
  if (a.type !== 'jump' || !a.id.startsWith('#')) return a;
  const list = questionStates(s);
  const n = Number(a.id.slice(1));
  return { type: 'jump', id: list.length ? list[n % list.length]!.id : 'review' };
}

/** Every text a screen would show for this state. */
function screenTexts(s: InterviewState): string[] {
  const q = currentQuestion(s);
  const out: string[] = [
    ...summaryOfDone(s),
    ...questionStates(s).flatMap((x) => [x.title, x.section]),
  ];
  if (s.notice !== undefined) out.push(s.notice);
  if (s.error) out.push(s.error.message);
  if (q) {
    out.push(
      q.prompt,
      q.title,
      q.section,
      q.help.why,
      q.help.how ?? '',
      q.unitHint ?? '',
      q.example ?? '',
    );
    out.push(defaultTextOf(q, s.answers) ?? '', explainOf(q, s.answers) ?? '');
    for (const c of q.choices ?? []) out.push(c.label, c.hint ?? '', c.key);
  }
  const sol = solveDraft(s);
  out.push(...sol.warnings);
  for (const a of sol.analyses) {
    if (!a.ok) out.push(a.reason);
    else {
      out.push(...a.solution.warnings, ...a.solution.assumptions, String(a.solution.minimum));
      out.push(
        ...[a.solution.speed.value, a.solution.speed.low, a.solution.speed.high].map(String),
      );
      for (const st of a.solution.steps)
        out.push(st.name, st.formula, st.substituted, st.why, String(st.result));
    }
  }
  return out;
}

describe('random action sequences', () => {
  it('never throw, always give a valid case, never show NaN, Infinity or undefined, and every rejection has a message', () => {
    let withAnalyses = 0;
    fc.assert(
      fc.property(
        fc.constantFrom<'guided' | 'brisk'>('guided', 'brisk'),
        fc.array(action, { minLength: 20, maxLength: 160 }),
        (mode, actions) => {
          let s = initialState(mode);
          for (const [k, raw] of actions.entries()) {
            const a = resolve(s, raw);
            const before = s;
            s = reduce(s, a);
            if (s.error) {
              expect(s.error.message.trim().length).toBeGreaterThan(3);
              // A rejected answer keeps every answer as it was.
              expect(s.answers).toBe(before.answers);
            }
            // The case as built after each change of the answers is one `solve` accepts.
            if (s.answers !== before.answers || k === actions.length - 1) {
              const c = buildCase(s, { id: 'random-case' });
              const loaded = loadCase(JSON.parse(JSON.stringify(c)));
              expect(loaded.ok ? [] : loaded.issues).toEqual([]);
              if (k === actions.length - 1 && c.analyses.length > 0) withAnalyses++;
            }
          }
          // What the user typed may be echoed back as typed ("Case NaN"); everything else must be clean.
          const typed = [
            ...Object.values(s.answers).map((x) => x.text),
            s.error?.text ?? '',
          ].filter((x) => x.trim() !== '');
          const ours = (t: string) => typed.reduce((acc, x) => acc.split(x).join(''), t);
          for (const t of screenTexts(s)) expect(ours(t)).not.toMatch(/NaN|Infinity|undefined/);
        },
      ),
      { numRuns: WALKS },
    );
    // The walks must reach whole analyses often enough for the checks above to mean something.
    expect(withAnalyses).toBeGreaterThan(WALKS / 10);
  }, 120_000);
});
