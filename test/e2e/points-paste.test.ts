// A yaw mark's surveyed points pasted into the built program in a real terminal, the paste
// bracketed as a terminal brackets it once the program turns bracketed paste on: the block's line
// breaks must not end the answer, and the review must equal `solve --json` of the saved file.
// The scenario and its points are invented: seven points on a 160 ft arc.
import { afterAll, afterEach, expect, it } from 'vitest';
import { disposeAll, ptySupport, startTerm } from './harness.js';
import { makeWorkspace } from './env.js';
import { describeInTerminal } from './pty-gate.js';
import { squash, typeInterview, type Script } from './interview-driver.js';
import { asShown, caseFiles, readCase, readReview, shownResults, solveJson } from './review.js';
import { reduce } from '../../src/interview/reducer.js';

const pty = await ptySupport();
const ws = makeWorkspace();
afterAll(() => ws.cleanup());

const SCRIPT: Script = {
  'details.reference': 'E2E-ARC-160',
  'details.occurred': '',
  'details.location': '',
  'details.investigator': '',
  'details.notes': '',
  units: 'imperial',
  limit: '35',
  'vehicle.label': '',
  'a0.look': 'yaw',
  'a0.label': '',
  'a0.measure': 'points',
  'a0.points.drop': '',
  'a0.drag.source': 'entered',
  'a0.drag.value': '0.72',
  'a0.bank.dir': 'none',
  'a0.path': 'none',
  'a0.more': 'no',
  'sampling.shape': 'none',
};

// Circle geometry: x along the chord from the mark's start, y = R − sqrt(R² − x²) for R = 160.
const POINTS = [0, 10, 20, 30, 40, 50, 60].map((x) => [
  x,
  Number((160 - Math.sqrt(160 * 160 - x * x)).toFixed(4)),
]);

describeInTerminal('pasting surveyed points', 'points paste end-to-end tests', pty, () => {
  afterEach(disposeAll);

  it('turns bracketed paste on, takes a bracketed block of 7 lines as one answer, and the review equals solve --json', async () => {
    const t = await startTerm({ cwd: ws.root, env: ws.env, cols: 110, rows: 40 });
    await t.waitFor(ws.sessions.slice(-20), { what: 'the home screen' });
    expect(t.raw).toContain('\u001b[?2004h');
    await t.type('n');
    await t.waitFor(/Case or report reference/, { what: 'the first question' });
    let state = await typeInterview(t, SCRIPT, { stopAt: 'a0.points' });
    await t.waitFor(/Points surveyed along the mark/, { what: 'the points question' });
    // The block as a terminal sends a bracketed paste: the lines end in CR, all in one write.
    const block = POINTS.map(([x, y]) => `${x} ${y}`).join('\r');
    t.write(`\u001b[200~${block}\r\u001b[201~`);
    const pasted = await t.waitFor(/7 lines pasted/, { what: 'the pasted block, not yet read' });
    expect(squash(pasted)).not.toContain('Points to leave out');
    await t.press('enter');
    const read = await t.waitFor(/Points to leave out/, { what: 'the question after the points' });
    expect(squash(read)).toContain('7 points read');
    expect(squash(read)).toContain('R = 160.0 ft from 7 points');
    state = reduce(state, { type: 'answer', text: block.replace(/\r/g, '\n') });
    await typeInterview(t, SCRIPT, {}, state);
    await t.waitFor(/^Analysis 1 · /m, { what: 'the review' });
    const lines = await readReview(t);
    const [file] = caseFiles(ws.sessions);
    const saved = readCase(file!) as { analyses: { points?: number[][] }[] };
    expect(saved.analyses[0]!.points).toEqual(POINTS);
    const solved = await solveJson(file!);
    expect(solved.analyses[0]!.steps[0]!.result).toBeCloseTo(160, 1);
    expect(shownResults(lines)).toEqual(asShown(solved));
  });
});
