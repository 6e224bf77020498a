// Answers typed into the built program, which is then killed at a random moment: right after
// Enter, or a few milliseconds later, or while the next answer is being typed. Afterwards the case
// file must load, hold every answer the screen had moved past (acknowledged), hold no answer
// that was never typed, and resume on a question no earlier than the one after the last
// acknowledged answer. A hang-up (SIGHUP, the terminal closed) right after Enter loses nothing.
//
// `npm test` runs 6 kills and 2 hang-ups; `npm run soak` runs 200 and 20 and prints the figures
// the README quotes (SKIDCASE_KILLS and SKIDCASE_HUPS set other counts). The seed is printed,
// and SKIDCASE_KILL_SEED replays a run.
import { afterAll, describe, expect, it } from 'vitest';
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { disposeAll, ptySupport, startTerm, type Term } from './harness.js';
import { makeWorkspace, type Workspace } from './env.js';
import {
  answerOrder,
  dryRun,
  onInputLine,
  promptMark,
  squash,
  type Script,
} from './interview-driver.js';
import { SLIDE_ONLY_GUIDED } from './scripts.js';
import { soakCount } from '../soak.js';
import { loadCaseText } from '../../src/case/load.js';
import { stateFromCase } from '../../src/interview/from-case.js';
import { currentQuestion } from '../../src/interview/derived.js';
import { initialState } from '../../src/interview/reducer.js';
import type { InterviewState, Question } from '../../src/interview/types.js';

const pty = await ptySupport();
// In CI a missing pseudo-terminal is a failure (a skipped durability test proves nothing).
if (!pty.ok && process.env.CI) throw new Error(`no pseudo-terminal in CI: ${pty.reason}`);
if (!pty.ok) console.warn(`kill tests skipped: ${pty.reason}`);

const KILLS = soakCount('SKIDCASE_KILLS', 6, 200);
const HUPS = soakCount('SKIDCASE_HUPS', 2, 20);
const SEED = Number(process.env.SKIDCASE_KILL_SEED ?? Date.now() % 2 ** 31);

const spaces: Workspace[] = [];
afterAll(async () => {
  await disposeAll();
  spaces.forEach((w) => w.cleanup());
});

const SCRIPT: Script = SLIDE_ONLY_GUIDED;
const ORDER = answerOrder(SCRIPT);
/** How far into the interview a kill may come: the case questions, the vehicle and the slide. */
const REACH = Math.min(ORDER.length - 1, 22);

const isChoice = (q: Question) =>
  (q.kind === 'choice' || q.kind === 'confirm') && (q.choices?.length ?? 0) > 0;
const onScreen = (s: string, q: Question | undefined) =>
  q ? squash(s).includes(promptMark(q)) : /Review · /.test(s);

interface Round {
  /** Answers the screen had moved past when the signal came. */
  acknowledged: number;
  /** Answers whose Enter had been sent. */
  entered: number;
  broken: boolean;
  lost: string[];
  /** Answers whose Enter was sent that the file does not hold (a hang-up must lose none). */
  lostEntered: string[];
  madeUp: string[];
  /** The resumed question came before the one after the last acknowledged answer. */
  resumedEarly: boolean;
  exit: { exitCode: number; signal?: number | undefined };
  lockLeft: boolean;
}

/** Sends the keys of one answer (without Enter for a typed one). */
async function keysOf(t: Term, q: Question, answer: string) {
  if (isChoice(q) && answer !== '') {
    const c =
      q.choices!.find((x) => x.value === answer) ?? q.choices!.find((x) => x.key === answer);
    await t.type(c!.key);
    return;
  }
  if (answer !== '') await t.type(answer);
  await t.press('enter');
}

/**
 * One round: type `upTo` answers, each waited for, then the answer at index `upTo` and the signal
 * `delayMs` after its last key.
 */
async function round(upTo: number, delayMs: number, signal: 'SIGKILL' | 'SIGHUP'): Promise<Round> {
  const ws = makeWorkspace('skidcase-kill-');
  spaces.push(ws);
  const t = await startTerm({ args: ['new'], env: ws.env, cols: 100, rows: 30, typingDelayMs: 0 });
  let state: InterviewState = initialState();
  let acknowledged = 0;
  let entered = 0;
  for (let k = 0; k <= upTo; k++) {
    const q = currentQuestion(state)!;
    await t.waitFor((s) => onScreen(s, q), { what: `question ${q.id}` });
    const answer = SCRIPT[q.id] ?? '';
    if (!isChoice(q) && answer !== '') {
      await t.type(answer);
      await t.waitFor((s) => onInputLine(s, answer), { what: `"${answer}" typed` });
    }
    const next = dryRun(SCRIPT, { maxAnswers: 1 }, state);
    if (k < upTo) {
      await keysOf(t, q, isChoice(q) ? answer : '');
      entered++;
      await t.waitFor((s) => onScreen(s, currentQuestion(next)), {
        what: `the question after ${q.id}`,
      });
      acknowledged++;
      state = next;
      continue;
    }
    await keysOf(t, q, isChoice(q) ? answer : '');
    entered++;
    if (delayMs > 0) await new Promise((r) => setTimeout(r, delayMs));
    // What the screen shows at the moment of the signal decides whether this answer was
    // acknowledged: the program drew the next question, so it must be on disk.
    const shown = t.screen();
    t.kill(signal);
    if (onScreen(shown, currentQuestion(next)) && !onScreen(shown, q)) acknowledged++;
    state = next;
  }
  const exit = await t.exited;
  const cases = readdirSync(ws.sessions).filter((n) => /^case-.*\.json$/.test(n));
  const text = cases.length === 1 ? readFileSync(join(ws.sessions, cases[0]!), 'utf8') : '';
  const loaded = loadCaseText(text);
  const lockLeft = cases.length === 1 && existsSync(join(ws.sessions, `${cases[0]}.lock`));
  if (!loaded.ok)
    return {
      acknowledged,
      entered,
      broken: true,
      lost: [],
      lostEntered: [],
      madeUp: [],
      resumedEarly: false,
      exit,
      lockLeft,
    };
  const saved =
    (loaded.case.interview as { answers?: Record<string, { text: string }> })?.answers ?? {};
  // The mirror after all the answers sent: what the file may hold, and must hold up to `acknowledged`.
  const typed = dryRun(SCRIPT, { maxAnswers: entered });
  const mustHave = dryRun(SCRIPT, { maxAnswers: acknowledged });
  const lost = Object.keys(mustHave.answers).filter(
    (id) => saved[id]?.text !== mustHave.answers[id]!.text,
  );
  const lostEntered = Object.keys(typed.answers).filter(
    (id) => saved[id]?.text !== typed.answers[id]!.text,
  );
  const madeUp = Object.keys(saved).filter(
    (id) => !(id in typed.answers) || saved[id]!.text !== typed.answers[id]!.text,
  );
  const resumed = currentQuestion(stateFromCase(loaded.case));
  const at = resumed ? ORDER.indexOf(resumed.id) : ORDER.length;
  return {
    acknowledged,
    entered,
    broken: false,
    lost,
    lostEntered,
    madeUp,
    resumedEarly: at < acknowledged,
    exit,
    lockLeft,
  };
}

/** Prints the run's figures in one line, as the README quotes them. */
function summary(what: string, rounds: Round[]) {
  const sum = (f: (r: Round) => number) => rounds.reduce((n, r) => n + f(r), 0);
  return `${what}: ${rounds.length} runs (seed ${SEED}), ${sum((r) => r.acknowledged)} acknowledged answers, ${sum((r) => (r.broken ? 1 : 0))} broken files, ${sum((r) => r.lost.length)} lost acknowledged answers, ${sum((r) => (r.resumedEarly ? 1 : 0))} early resumes, ${sum((r) => r.madeUp.length)} made-up answers`;
}

describe.skipIf(!pty.ok)('killed at random moments while answering', () => {
  it(
    `SIGKILL ${KILLS} times: no broken file, no lost or made-up answer, no early resume`,
    async () => {
      const rng = xoroshiro128plus(SEED);
      const int = (lo: number, hi: number) => uniformInt(rng, lo, hi);
      const rounds: Round[] = [];
      for (let i = 0; i < KILLS; i++) {
        // Half of the kills come right after Enter, the rest up to 40 ms later.
        const delay = int(0, 1) === 0 ? 0 : int(1, 40);
        const r = await round(int(0, REACH), delay, 'SIGKILL');
        rounds.push(r);
        expect(r.broken, `run ${i}: the case file does not load`).toBe(false);
        expect(r.lost, `run ${i}: acknowledged answers missing from the file`).toEqual([]);
        expect(r.madeUp, `run ${i}: answers in the file that were never typed`).toEqual([]);
        expect(r.resumedEarly, `run ${i}: resumed before the last acknowledged answer`).toBe(false);
      }
      console.log(summary('kill test', rounds));
      // The test must have seen work to protect: most kills come after acknowledged answers.
      expect(rounds.reduce((n, r) => n + r.acknowledged, 0)).toBeGreaterThan(KILLS);
    },
    60_000 + KILLS * 6_000,
  );

  it(
    `SIGHUP right after Enter ${HUPS} times: the answer just entered is kept, the lock released`,
    async () => {
      const rng = xoroshiro128plus(SEED + 1);
      const rounds: Round[] = [];
      for (let i = 0; i < HUPS; i++) {
        const r = await round(uniformInt(rng, 0, REACH), 0, 'SIGHUP');
        rounds.push(r);
        expect(r.broken, `hang-up ${i}: the case file does not load`).toBe(false);
        // Nothing entered is lost: the answer whose Enter came just before the hang-up is kept too.
        expect(r.lostEntered, `hang-up ${i}: entered answers missing from the file`).toEqual([]);
        expect(r.madeUp, `hang-up ${i}`).toEqual([]);
        expect(r.lockLeft, `hang-up ${i}: the lock was left behind`).toBe(false);
        expect(r.exit.exitCode, `hang-up ${i}: exit code`).toBe(129);
      }
      console.log(summary('hang-up test', rounds));
    },
    60_000 + HUPS * 6_000,
  );
});
