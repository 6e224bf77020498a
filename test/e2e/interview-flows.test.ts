// Whole cases typed into the built binary in a real pseudo-terminal (a whole case, resume after a
// kill, the fast path): the figures on the review screen must equal `skidcase solve --json` on the
// file the program saved.
import { afterAll, afterEach, expect, it } from 'vitest';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { disposeAll, ptySupport, startTerm, type Term } from './harness.js';
import { makeWorkspace, type Workspace } from './env.js';
import { describeInTerminal } from './pty-gate.js';
import { answerOrder, dryRun, squash, typeInterview, type Script } from './interview-driver.js';
import {
  asShown,
  caseFiles,
  readCase,
  readReview,
  roundsTo,
  shownResults,
  shownSteps,
  solveJson,
  type SolvedJson,
} from './review.js';
import {
  SLIDE_ONLY_FAST,
  SLIDE_ONLY_GUIDED,
  SLIDE_ONLY_QUICK,
  TWO_SURFACES_AND_YAW,
} from './scripts.js';
import { stateFromCase } from '../../src/interview/from-case.js';
import { firstOpenQuestion, currentQuestion } from '../../src/interview/derived.js';
import { loadCaseText } from '../../src/case/load.js';
import type { InterviewMode } from '../../src/interview/types.js';

const pty = await ptySupport();

const spaces: Workspace[] = [];
const workspace = () => {
  const ws = makeWorkspace();
  spaces.push(ws);
  return ws;
};
afterAll(() => spaces.forEach((w) => w.cleanup()));

/** The review's first line names the first analysis and its chain. */
const REVIEW = /^Analysis 1 · /m;

/** From the home screen, a new case: the program must land on the first case question. */
async function openNewCase(t: Term, ws: Workspace) {
  await t.waitFor(ws.sessions.slice(-20), { what: 'the home screen naming the sessions folder' });
  await t.type('n');
  await t.waitFor(/Case or report reference/, { what: 'the first question of a new case' });
}

/**
 * Types a whole script in one go, in its own workspace, and returns what the review showed.
 * `typingDelayMs` 0 sends each answer in one write, as a paste would (the keys counted the same).
 */
async function typeWhole(
  script: Script,
  onAnswer?: (id: string, keys: number) => void,
  typingDelayMs?: number,
  mode: InterviewMode = 'guided',
) {
  const ws = workspace();
  // The interview's mode is the investigator's preference: brisk keeps the explanations closed.
  if (mode !== 'guided') writeFileSync(join(ws.config, 'config.json'), JSON.stringify({ mode }));
  const t = await startTerm({
    cwd: ws.root,
    env: ws.env,
    cols: 110,
    rows: 40,
    ...(typingDelayMs === undefined ? {} : { typingDelayMs }),
  });
  await openNewCase(t, ws);
  await typeInterview(t, script, onAnswer ? { onAnswer } : {}, undefined, mode);
  await t.waitFor(REVIEW, { what: 'the review' });
  const lines = await readReview(t);
  const files = caseFiles(ws.sessions);
  return { ws, t, lines, files, keys: t.keyCount };
}

/** The figures of a solution, for comparing two ways of entering the same case. */
const figures = (s: SolvedJson) =>
  s.analyses.map((a) => ({ kind: a.kind, speed: a.speed, minimum: a.minimum }));

let oneGo: Promise<Awaited<ReturnType<typeof typeWhole>> & { solved: SolvedJson }> | undefined;
/** The two-surface slide and yaw typed in one go; shared by the whole-case and resume tests. */
const typedInOneGo = () =>
  (oneGo ??= typeWhole(TWO_SURFACES_AND_YAW).then(async (r) => ({
    ...r,
    solved: await solveJson(r.files[0]!),
  })));

describeInTerminal(
  'typing whole cases into the terminal',
  'interview end-to-end tests',
  pty,
  () => {
    afterEach(disposeAll);

    it('a two-surface downhill slide with a partly failed brake and a banked yaw; the review equals solve --json of the saved file', async () => {
      const { lines, files, solved } = await typedInOneGo();
      expect(files).toHaveLength(1);
      const shown = shownResults(lines);
      expect(shown).toHaveLength(2);
      expect(shown).toEqual(asShown(solved));
      expect(solved.analyses.map((a) => a.kind)).toEqual(['skid', 'yaw']);
      // Every step of the solution is on the review, in order, with its result rounded as shown.
      const steps = shownSteps(lines);
      solved.analyses.forEach((a, i) => {
        const seen = steps[i]!.slice(0, a.steps.length);
        expect(seen.map((x) => x.name)).toEqual(a.steps.map((st) => st.name));
        a.steps.forEach((st, j) => {
          const what = `${a.id} step ${j + 1} (${st.name})`;
          expect(
            roundsTo(st.result, seen[j]!.value),
            `${what}: ${st.result} shown as ${seen[j]!.value.n}`,
          ).toBe(true);
          expect(roundsTo(st.low, seen[j]!.low), `${what}, low`).toBe(true);
          expect(roundsTo(st.high, seen[j]!.high), `${what}, high`).toBe(true);
        });
      });
      // The review also says what the figure means and its cautions.
      expect(lines.join('\n')).toMatch(/Cautions/);
      expect(lines.join('\n')).toMatch(/Posted limit 40 mph/);
    }, 120_000);

    it('answer half, SIGKILL the terminal, `skidcase resume`, finish: nothing asked twice, result equal to the case typed in one go', async () => {
      const whole = await typedInOneGo();
      const ws = workspace();
      const order = answerOrder(TWO_SURFACES_AND_YAW);
      const half = Math.floor(order.length / 2);
      const first = await startTerm({ cwd: ws.root, env: ws.env, cols: 110, rows: 40 });
      await openNewCase(first, ws);
      await typeInterview(first, TWO_SURFACES_AND_YAW, { maxAnswers: half });
      const lastId = order[half - 1]!;
      // Kill only once the save of the last answer has landed on disk (resuming is promised only
      // for a save that had returned); then the kill is as abrupt as a closed terminal window.
      const file = await waitForSavedAnswer(ws, lastId);
      first.kill('SIGKILL');
      expect((await first.waitForExit()).signal).toBe(9);

      const saved = loadCaseText(readFileSync(file, 'utf8'));
      expect(saved.ok).toBe(true);
      if (!saved.ok) return;
      const resumedState = stateFromCase(saved.case);
      const landing = { ...resumedState, cursor: firstOpenQuestion(resumedState) };
      // Resume lands on the first question not yet answered: the one after the last typed.
      const expectNext = currentQuestion(dryRun(TWO_SURFACES_AND_YAW, { maxAnswers: half }));
      expect(expectNext?.id).toBe(order[half]);
      expect(currentQuestion(landing)?.id).toBe(order[half]);

      const second = await startTerm({
        cwd: ws.root,
        env: ws.env,
        cols: 110,
        rows: 40,
        args: ['resume', saved.case.id],
      });
      await second.waitFor((s) => squash(s).includes(squash(expectNext!.prompt).slice(0, 26)), {
        what: `the resumed case on the first unanswered question, ${expectNext!.id}`,
      });
      await typeInterview(second, TWO_SURFACES_AND_YAW, {}, landing);
      await second.waitFor(REVIEW, { what: 'the review' });
      const shown = shownResults(await readReview(second));
      const solved = await solveJson(file);
      expect(shown).toEqual(asShown(solved));
      expect(figures(solved)).toEqual(figures(whole.solved));
      // The case fields; the trail of revisions records the times of two different sessions.
      const strip = (c: Record<string, unknown>) => {
        const { id: _i, created: _c, updated: _u, interview: _v, revisions: _r, ...rest } = c;
        return rest;
      };
      expect(strip(readCase(file))).toEqual(strip(readCase(whole.files[0]!)));
    }, 180_000);

    it('the same two-surface slide (labels, drag ranges, grades) takes fewer key presses on one line than question by question, with identical solve --json; the fast path takes far fewer; report written from the review', async () => {
      const slideKeys = { guided: 0, quick: 0 };
      const isSlide = (id: string) => /^a0\.(surfaces|segcount|quick|seg\d)/.test(id);
      // Key counts and figures are compared here, not typing, so each answer goes in one write.
      const guided = await typeWhole(
        SLIDE_ONLY_GUIDED,
        (id, k) => (slideKeys.guided += isSlide(id) ? k : 0),
        0,
      );
      // The same content (details, labels, vehicle, marks, segments, grades), in brisk mode, the
      // segments on one line typed at the surfaces question.
      const quick = await typeWhole(
        SLIDE_ONLY_QUICK,
        (id, k) => (slideKeys.quick += isSlide(id) ? k : 0),
        0,
        'brisk',
      );
      await quick.t.waitFor(/brisk mode/, { what: 'brisk mode named in the header' });
      // Enter for every default and optional text (no labels), the segments on one line.
      const fast = await typeWhole(SLIDE_ONLY_FAST, undefined, 0);
      const [g, q, f] = await Promise.all([
        solveJson(guided.files[0]!),
        solveJson(quick.files[0]!),
        solveJson(fast.files[0]!),
      ]);
      console.log(
        `key presses, whole case: question by question ${guided.keys}, on one line ${quick.keys}, fast path ${fast.keys}; ` +
          `the two segments alone: ${slideKeys.guided} question by question, ${slideKeys.quick} on one line (labels typed in both)`,
      );
      const analyses = (file: string) => (readCase(file) as { analyses: unknown }).analyses;
      expect(analyses(quick.files[0]!)).toEqual(analyses(guided.files[0]!));
      // Every figure solve --json gives is the same, steps and all (only the case id differs).
      const { id: _g, ...gRest } = g as SolvedJson & { id: string };
      const { id: _q, ...qRest } = q as SolvedJson & { id: string };
      expect(qRest).toEqual(gRest);
      expect(quick.keys).toBeLessThan(guided.keys);
      expect(slideKeys.quick).toBeLessThan(slideKeys.guided);
      expect(shownResults(quick.lines)).toEqual(asShown(q));
      expect(figures(f)).toEqual(figures(g));
      expect(shownResults(fast.lines)).toEqual(asShown(f));
      expect(fast.keys).toBeLessThan(guided.keys * 0.6);

      // w on the review, then h for HTML, writes the report beside the case file; its "at least"
      // is the solved one.
      await fast.t.type('w');
      await fast.t.waitFor(/Write the report as/, { what: 'the choice of report form' });
      await fast.t.type('h');
      const screen = await fast.t.waitFor(/Report written to (\S+)/, {
        what: 'the report confirmation',
      });
      const path = squash(screen).match(/Report written to (\S+)/)![1]!;
      expect(path.endsWith('.html')).toBe(true);
      expect(existsSync(path)).toBe(true);
      expect(readFileSync(path, 'utf8')).toContain(`at least ${f.analyses[0]!.minimum} mph`);
    }, 240_000);
  },
);

/** Polls the case file until its saved interview holds the answer `id`; returns the file. */
async function waitForSavedAnswer(ws: Workspace, id: string, timeoutMs = 10_000): Promise<string> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const [file] = caseFiles(ws.sessions);
    if (file) {
      try {
        const c = readCase(file) as { interview?: { answers?: Record<string, unknown> } };
        if (c.interview?.answers?.[id]) return file;
      } catch {
        // mid-write is impossible with an atomic save; a parse error would fail the next check
      }
    }
    if (Date.now() > deadline)
      throw new Error(`the answer ${id} was not saved within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 20));
  }
}
