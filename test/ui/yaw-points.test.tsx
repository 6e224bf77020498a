// A yaw mark's radius from surveyed points, asked in the interview and typed through the app:
// a pasted block, points typed on one line, a CSV file, points left out. The figures on screen
// are compared with the engine's solve of the saved file, and with circle geometry. The
// scenario and its points are invented.
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadCaseText } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { formatNumber } from '../../src/engine/number-text.js';
import { ENTER, tempDir, type renderApp } from './render-app.js';
import { toLook } from './walks.js';

type App = ReturnType<typeof renderApp>;

/** Points on a circle of radius `r` ft centred at (0, r), at the given x: circle geometry. */
const onCircle = (r: number, xs: number[]): [number, number][] =>
  xs.map((x) => [x, Number((r - Math.sqrt(r * r - x * x)).toFixed(4))]);

const ARC = onCircle(160, [0, 10, 20, 30, 40, 50, 60]);
const lines = (pts: [number, number][]) => pts.map(([x, y]) => `${x} ${y}`).join('\n');

/** From a new case to the question asking for the surveyed points. */
async function toPoints(): Promise<App> {
  const app = await toLook({ columns: 400 });
  await app.press('y', 'A short label');
  await app.press(ENTER, 'How was the radius of the mark measured?');
  const f = await app.press('p', 'Points surveyed along the mark');
  expect(f).toContain('surveyed points');
  return app;
}

/** The case file as saved, and its solve. */
function saved(app: App) {
  const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
  const loaded = loadCaseText(fs.readFileSync(path.join(app.dir, file), 'utf8'));
  if (!loaded.ok) throw new Error('saved case does not load');
  return { c: loaded.case, sol: solveCase(loaded.case) };
}

/** The yaw's radius step as solve gives it for the saved case. */
function radiusStep(app: App) {
  const { sol } = saved(app);
  const a = sol.analyses[0];
  if (!a?.ok) throw new Error(a ? a.reason : 'no analysis');
  return a.solution.steps.find((s) => s.name.startsWith('Radius from surveyed points'))!;
}

/** On through drag, bank and path to the review. */
async function toReview(app: App): Promise<string> {
  await app.press('e', 'Drag factor');
  await app.answer('0.75', /bank|superelevation/i);
  await app.press('n', 'Which path should the radius describe?');
  await app.press('m', /Any other marks|another analysis|more marks/i);
  const last = await app.press('n', 'Also show a distribution');
  // The chain panel beside the question: the radius step from the points, with its figure.
  const step = radiusStep(app);
  expect(last).toContain('Chain so far');
  expect(last).toContain(`${step.name}: ${formatNumber(step.result, 'length')} ft`);
  return app.press('n', 'Review');
}

const flat = (s: string) => s.replace(/\s+/g, ' ');

describe('yaw radius from surveyed points', () => {
  it('takes a pasted block of lines in one write, and Enter reads it: the radius of the circle', async () => {
    const app = await toPoints();
    // The whole block arrives in one read, as a paste does: no line of it is an answer alone.
    let f = await app.press(lines(ARC) + '\n', '7 lines pasted');
    expect(f).toContain('Points surveyed along the mark');
    // Shown on one row with ; between the lines, scrolled to the cursor at its end.
    expect(flat(f)).toContain(`${ARC[5]!.join(' ')}; ${ARC[6]!.join(' ')}_`);
    f = await app.press(ENTER, 'Points to leave out');
    expect(f).toContain('7 points read');
    // The fit shown is the engine's, of the circle the points were put on.
    expect(flat(f)).toContain(`R = ${formatNumber(160, 'length')} ft from 7 points`);
    await app.press(ENTER, /Where does the drag factor/);
    f = await toReview(app);
    const after = saved(app);
    expect(after.c.analyses[0]).toMatchObject({ kind: 'yaw', points: ARC });
    const step = radiusStep(app);
    expect(step.result).toBeCloseTo(160, 1);
    expect(flat(f)).toContain(flat(step.substituted));
    expect(flat(f)).toContain('Radius from surveyed points');
    // And as the built program's `solve --json` gives it for the file on disk.
    const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'))!;
    const json = JSON.parse(
      execFileSync(
        process.execPath,
        ['dist/skidcase.js', 'solve', path.join(app.dir, file), '--json'],
        {
          encoding: 'utf8',
        },
      ),
    ) as { analyses: { steps: { name: string; substituted: string; result: number }[] }[] };
    const fromSolve = json.analyses[0]!.steps[0]!;
    expect(fromSolve.name).toBe('Radius from surveyed points (least-squares circle)');
    expect(fromSolve.result).toBe(step.result);
    expect(flat(f)).toContain(flat(fromSolve.substituted));
  });

  it('reads points typed on one line with ; between them, and leaving points out changes the radius', async () => {
    const app = await toPoints();
    // Six points on the 160 ft arc, then one off it where the mark turns into a scuff.
    const typed = [...ARC.slice(0, 6), [60, 14]] as [number, number][];
    let f = await app.answer(typed.map(([x, y]) => `${x} ${y}`).join('; '), 'Points to leave out');
    const before = /R = ([\d.]+) ft from 7 points/.exec(flat(f));
    expect(flat(f)).toContain('The points do not lie on one arc');
    expect(Number(before?.[1])).not.toBeCloseTo(160, 0);
    f = await app.answer('7', 'Where does the drag factor');
    expect(flat(f)).toContain(`R = ${formatNumber(160, 'length')} ft from 6 points`);
    await toReview(app);
    const { c } = saved(app);
    expect(c.analyses[0]).toMatchObject({ points: typed.slice(0, 6), pointsLeftOut: [[60, 14]] });
    const step = radiusStep(app);
    expect(step.result).toBeCloseTo(160, 1);
    // The report: the fit's step as solve gives it, and the point left out listed as such.
    await app.press('w', 'Write the report as');
    await app.press('m', /Writing the report|Report written to/);
    await app.waitText('Report written to', 30_000);
    const md = fs.readFileSync(
      path.join(
        app.dir,
        fs.readdirSync(app.dir).find((n) => n.endsWith('.md'))!,
      ),
      'utf8',
    );
    expect(flat(md)).toContain(flat(step.substituted));
    expect(md).toMatch(/Point 7 \(x, y\), left out of the fit\s*\|\s*60, 14/);
  });

  it('reads a CSV file with a header, in the columns named, and refuses a bad line naming it, keeping the answer', async () => {
    const dir = tempDir('skidcase-points-');
    const good = path.join(dir, 'yaw.csv');
    // Columns: point id, easting, northing in metres (said by the header), a code.
    const metres = onCircle(50, [0, 3, 6, 9, 12, 15]);
    fs.writeFileSync(
      good,
      ['pt,E_m,N_m,code', ...metres.map(([x, y], k) => `${k + 1},${x},${y},YM`)].join('\n'),
    );
    const bad = path.join(dir, 'bad.csv');
    fs.writeFileSync(bad, 'pt,E_m,N_m\n1,0,0\n2,3,0.09\n3,six,0.36\n4,9,0.81\n');
    const app = await toPoints();
    let f = await app.answer(`@${good} E_m N_m`, 'Points to leave out');
    expect(flat(f)).toContain(`6 points read from ${good} (columns "E_m", "N_m", converted to ft)`);
    // Back to the points: a bad file is refused naming its line; the answer stays as it was.
    await app.press('\u0002', 'Points surveyed along the mark');
    for (let k = 0; k < 200; k++) app.stdin.write('\u007f');
    f = await app.answer(`@${bad}`, 'line 4');
    expect(flat(f)).toMatch(/bad\.csv line 4: "E_m" is "six", not a number/);
    // Still on the points question, the file's points as answered before.
    expect(f).toContain('Points surveyed along the mark');
    expect(flat(f)).toMatch(/R = 164\.\d ft from 6 points/);
    // Esc: the message goes and the line holds the answer given before.
    f = await app.press('\u001b');
    expect(f).not.toContain('bad.csv');
    f = await app.press(ENTER, 'Points to leave out');
    // 50 m is 164.04 ft: the circle of the file, in the case's feet.
    expect(flat(f)).toMatch(/R = 164\.\d ft from 6 points/);
    await app.press(ENTER, /Where does the drag factor/);
    f = await toReview(app);
    const { c } = saved(app);
    const pts = (c.analyses[0] as { points: [number, number][] }).points;
    expect(pts.map(([x, y]) => [x / 3.28084, y / 3.28084].map((v) => v.toFixed(3)))).toEqual(
      metres.map(([x, y]) => [x.toFixed(3), y.toFixed(3)]),
    );
    const step = radiusStep(app);
    expect(step.result).toBeCloseTo(50 * 3.28084, 1);
    expect(flat(f)).toContain(flat(step.substituted));
  });

  it('takes a bracketed paste (ESC[200~ ... ESC[201~) with its line breaks as one answer, and a missing file is refused naming it', async () => {
    const app = await toPoints();
    const block = ['E,N', ...ARC.map(([x, y]) => `${x},${y}`)].join('\r');
    let f = await app.press(`\u001b[200~${block}\r\u001b[201~`, '8 lines pasted');
    expect(f).not.toContain('[200~');
    expect(f).not.toContain('Points to leave out');
    f = await app.press(ENTER, 'Points to leave out');
    expect(flat(f)).toContain('line 1 ("E,N") taken as a header; 7 points read');
    // Kept as one line of its points: back at the question, a new block replaces it unedited.
    await app.press('\u0002', 'Points surveyed along the mark');
    const again = ARC.slice(0, 5)
      .map(([x, y]) => `${x}\t${y}`)
      .join('\r');
    f = await app.press(`\u001b[200~${again}\u001b[201~`, '5 lines pasted');
    expect(flat(f)).toContain(
      `> ${ARC.slice(0, 5)
        .map((p) => p.join(' '))
        .join('; ')}_`,
    );
    f = await app.press(ENTER, 'Points to leave out');
    expect(flat(f)).toContain('5 points read');
    // Back, and name a file that is not there: refused, naming it; the points stay answered.
    await app.press('\u0002', 'Points surveyed along the mark');
    app.stdin.write('\u0015');
    f = await app.answer('@no-such-points.csv', 'no such file');
    expect(flat(f)).toContain('no-such-points.csv: no such file');
    f = await app.press('\u001b');
    await app.press(ENTER, 'Points to leave out');
  });
});

describe('a paste whose end marker never comes', () => {
  it('ends after a pause: the points are in the line, and the keys after it work', async () => {
    const app = await toPoints();
    const block = ARC.map(([x, y]) => `${x},${y}`).join('\r');
    // the start marker and the points, but no ESC[201~ (a terminal that dropped it)
    await app.press(`\u001b[200~${block}`, `${ARC.length} lines pasted`);
    const f = await app.press(ENTER, 'Points to leave out');
    expect(flat(f)).toContain(`${ARC.length} points read`);
  });

  it('ends at Ctrl+Q, which then saves and leaves as it always does', async () => {
    const app = await toPoints();
    app.stdin.write(`\u001b[200~0,0\r8,0.2`);
    // the paste ends into the line; leaving then says the lines are typed but not accepted
    const f = await app.press('\u0011', 'is typed but not accepted');
    expect(f).toContain('"0,0; 8,0.2" is typed but not accepted');
    await app.press('\u0011', 'Saving and leaving');
    await app.waitFor(() => app.exits.length > 0, 'the app to exit');
    expect(app.exits).toEqual([0]);
  });
});

describe('the help documents the points syntax', () => {
  it('gives the forms, and the examples it gives are read as written', async () => {
    const { helpLines } = await import('../../src/ui/help-overlay.js');
    const { readPoints } = await import('../../src/interview/read-points.js');
    const { fileRequest } = await import('../../src/interview/read-points-file.js');
    const text = flat(
      helpLines(76, [])
        .map((l) => l.text)
        .join(' '),
    );
    expect(text).toContain('Surveyed points of a yaw mark');
    expect(text).toContain('press p (surveyed points)');
    const typed = /put a semicolon between points \(([^)]+)\)/.exec(text)?.[1];
    expect(readPoints(typed!, 'imperial')).toMatchObject({
      ok: true,
      value: [
        [0, 0],
        [8, 0.2],
        [16, 0.81],
      ],
    });
    expect(text).toContain('(@yaw-1.csv E N)');
    expect(fileRequest('@yaw-1.csv E N')).toEqual({ path: 'yaw-1.csv', columns: ['E', 'N'] });
    expect(text).toContain('Points to leave out');
  });
});
