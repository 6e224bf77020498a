/**
 * Frictions a new user and an expert met in the interview, each typed as they typed it. Every
 * scenario and number here is invented.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { BACKSPACE, ENTER, ESC, ctrl, renderApp } from './render-app.js';
import { finishedSlide } from './fixtures.js';
import { toDragSource, toLook, type App, said } from './walks.js';

afterEach(() => cleanup());

/** The interview answers in the saved case file (none before the first save). */
function savedAnswers(app: App): Record<string, { text: string } | undefined> {
  const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json'));
  if (!file) return {};
  const body = JSON.parse(fs.readFileSync(path.join(app.dir, file), 'utf8'));
  return body.interview?.answers ?? {};
}

describe('typing at a choice question', () => {
  it('picks the choice whose words were typed', async () => {
    const app = await toLook();
    // "l" is no key here, so the word goes on the choice's line, read on Enter.
    let f = await app.press('l', '> l');
    expect(f).toContain('Enter reads what is typed');
    for (const ch of 'ocked') app.stdin.write(ch);
    await app.waitText('> locked');
    f = await app.press(ENTER, 'Were all four brakes working?');
    expect(f).toContain('Analysis 1 - slide');
  });

  it('refuses words that are no choice, listing the choices', async () => {
    const app = await toLook();
    for (const ch of 'zebra') app.stdin.write(ch);
    await app.waitText('> zebra');
    const f = await app.press(ENTER, '✗');
    expect(f).toContain('"zebra" is not one of the choices: press d (straight,');
    // The list wraps beside the panel: read as one line.
    expect(said(f)).toContain('y (curved, sideways, striated (yaw)), j (left the ground');
    expect(f).toContain('What do the marks look like?');
    // Esc clears the typed words and the message; typed again, Backspace edits them.
    app.stdin.write(ESC);
    await app.waitFor((t) => !t.includes('zebra') && !t.includes('✗'), 'line and message gone');
    for (const ch of 'zebra') app.stdin.write(ch);
    await app.waitText('> zebra');
    // Backspace edits the typed words; emptied, a letter picks again.
    for (let i = 0; i < 5; i++) app.stdin.write(BACKSPACE);
    await app.waitFor((t) => !t.includes('> zebra') && !t.includes('> z'), 'the line emptied');
    await app.press('d', 'Were all four brakes working?');
  });

  it('takes a signed percent at the grade: -3 is downhill 3%', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('e', 'Drag factor');
    await app.answer('0.70', 'Grade, the slide');
    expect(app.frame()).toContain('e.g. -3 for downhill 3%');
    const f = await app.answer('-3', 'How did the slide end?');
    expect(f).toContain('Read as downhill 3%.');
    // Saved as if typed at each question: the direction, then the percent.
    const answers = () => savedAnswers(app);
    await app.waitFor(() => answers()['a0.seg0.grade.pct'] !== undefined, 'the grade saved');
    expect(answers()['a0.seg0.grade.dir']?.text).toBe('downhill');
    expect(answers()['a0.seg0.grade.pct']?.text).toBe('3');
  });

  it('asks for the sign when a grade is typed without one', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('e', 'Drag factor');
    await app.answer('0.70', 'Grade, the slide');
    const f = await app.answer('3', '✗');
    expect(f).toContain('give the sign with the number (+3 uphill, -3');
    expect(f).toContain('Grade, the slide');
  });
});

describe('choice letters', () => {
  it('f picks feet and mph, m metres and km/h', async () => {
    const app = renderApp({ rows: 40 });
    await app.waitText('No cases here yet');
    await app.press('n', 'Case or report reference');
    for (let i = 0; i < 5; i++) await app.press(ENTER);
    let f = await app.waitText('Which units');
    expect(f).toContain('[f] feet and mph');
    expect(f).toContain('[m] metres and km/h');
    f = await app.press('f', 'Posted speed limit');
    expect(f).toContain('in mph');
    f = await app.press(ctrl('p'), 'Which units');
    f = await app.press('m', 'Posted speed limit');
    expect(f).toContain('in km/h');
  });
});

describe('a negative mark', () => {
  it('says that lengths cannot be negative and how a range is written', async () => {
    const app = await toLook();
    await app.press('d', 'Were all four brakes working?');
    await app.press('a', 'A short label');
    await app.press(ENTER, 'Did the vehicle slide over one surface');
    await app.press('o', 'How many tire marks');
    await app.answer('4', 'Length of each mark');
    const f = said(await app.answer('61 -63 58 60', '✗'));
    expect(f).toContain(
      "✗ mark 1: '61 -63': a length cannot be negative; a range is written 61-63 or 61 to 63",
    );
    expect(f).not.toContain('lengths typed');
    // Written as a range, the same marks are taken.
    for (let i = 0; i < 12; i++) app.stdin.write(BACKSPACE);
    await app.answer('61-63 58 60 59', 'Which slide distance');
  });
});

describe('a drag factor typed as a whole number', () => {
  it('3 is told what a drag factor is, not that it is 0.03', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('e', 'Drag factor');
    let f = said(await app.answer('3', '✗'));
    expect(f).toContain('a drag factor is a decimal, usually near 0.7 (e.g. 0.70)');
    expect(f).not.toContain('0.03');
    // 72 still reads as a percent written without its sign.
    for (let i = 0; i < 2; i++) app.stdin.write(BACKSPACE);
    f = said(await app.answer('72', 'for 72%'));
    expect(f).toContain('write it as a decimal, e.g. 0.72 for 72%');
  });
});

describe('a chord outside the usual lengths', () => {
  it('140 ft is taken with a remark naming the usual 30-50 ft; 45 ft gets none', async () => {
    const app = await toLook();
    await app.press('y', 'A short label');
    await app.press(ENTER, 'How was the radius');
    await app.press('c', 'Chord length');
    let f = said(await app.answer('140', 'chords usually taken'));
    expect(f).toContain(
      'A 140 ft chord is longer than the chords usually taken: check it spans only the first part of the yaw mark (about 30-50 ft).',
    );
    await app.press(ctrl('p'), 'Chord length');
    for (let i = 0; i < 3; i++) app.stdin.write(BACKSPACE);
    f = said(await app.answer('45', "from the chord's midpoint to the mark"));
    expect(f).not.toContain('chords usually taken');
  });
});

describe('a result with no tolerance on any input', () => {
  it('says the range is zero because no tolerance was entered, and how to enter one', async () => {
    const app = await toLook({ rows: 90 });
    await toDragSource(app);
    await app.press('e', 'Drag factor');
    await app.answer('0.70', 'Grade, the slide');
    await app.press('l', 'How did the slide end?');
    await app.press('r', 'Where was the conflict point');
    await app.press(ENTER, 'Perception-reaction time');
    await app.press(ENTER, 'Another analysis?');
    await app.press('n', 'Also show a distribution');
    const f = said(await app.press('n', 'Speed when the marks began'));
    // 60 ft at 0.70, level, all brakes: S = sqrt(30 × 60 × 0.70) = 35.5 mph, one figure.
    expect(f).toContain('Speed when the marks began: 35.5 mph');
    expect(f).toContain(
      'The range is zero because no tolerance was entered: give the measurements one (e.g. 94 ± 1 on a mark, 0.70 ± 0.05 on a drag factor) to see how far the figure could move.',
    );
  });
});

describe('Ctrl+U', () => {
  it('empties the line and takes the message about it away', async () => {
    const app = renderApp({ rows: 40 });
    await app.waitText('No cases here yet');
    await app.press('n', 'Case or report reference');
    for (let i = 0; i < 5; i++) await app.press(ENTER);
    await app.waitText('Which units');
    await app.press('f', 'Posted speed limit');
    let f = await app.answer('fast', '✗');
    expect(f).toMatch(/✗ .*not a number/);
    f = await app.press(ctrl('u'));
    await app.waitFor((t) => !t.includes('✗'), 'the message gone');
    f = app.frame();
    expect(f).not.toContain('fast');
    expect(f).toContain('Posted speed limit');
    // On a choice's typed line too.
    await app.answer('45', 'Which vehicle');
    await app.press(ENTER, 'What do the marks look like?');
    for (const ch of 'zebra') app.stdin.write(ch);
    await app.waitText('> zebra');
    await app.press(ENTER, '✗');
    app.stdin.write(ctrl('u'));
    f = await app.waitFor((t) => !t.includes('✗') && !t.includes('zebra'), 'line and message gone');
    expect(f).toContain('What do the marks look like?');
  });
});

describe('one meaning per key', () => {
  it('the reaction time says what Enter accepts, not also that it skips', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('e', 'Drag factor');
    await app.answer('0.70', 'Grade, the slide');
    await app.press('l', 'How did the slide end?');
    // The conflict point has no default: Enter skips it.
    let f = await app.press('r', 'Where was the conflict point');
    expect(said(f)).toContain('Enter skips');
    f = said(await app.press(ENTER, 'Perception-reaction time'));
    expect(f).toContain('Enter accepts: your preference, 1.5 s');
    expect(f).not.toContain('Enter skips');
  });
});

describe('the comparison at the posted limit', () => {
  /** The slide of 4 marks of 60 ft at 0.70, level, to rest: 35.5 mph; then the review, paged. */
  async function review(limit: string, conflict: string) {
    const app = await toLook({ rows: 200 }, limit);
    await toDragSource(app);
    await app.press('e', 'Drag factor');
    await app.answer('0.70', 'Grade, the slide');
    await app.press('l', 'How did the slide end?');
    await app.press('r', 'Where was the conflict point');
    if (conflict) await app.answer(conflict, 'Perception-reaction time');
    else await app.press(ENTER, 'Perception-reaction time');
    await app.press(ENTER, 'Another analysis?');
    await app.press('n', 'Also show a distribution');
    return said(await app.press('n', 'Time and distance at the posted limit'));
  }

  it('below the limit, says so first, then what is compared, and that no conflict point was given', async () => {
    const f = await review('45', '');
    const below = f.indexOf(
      "This vehicle was below the posted limit: 35.5 mph when the marks began, under 45.0 mph. A vehicle at the limit would have been going faster, so what follows says nothing against this vehicle's speed.",
    );
    const what = f.indexOf(
      'What is compared: where a vehicle at 45.0 mph would have come to rest had it perceived the hazard at the same point as this one and braked on the same road.',
    );
    const none = f.indexOf('No conflict point was given, so only the end of the marks is compared');
    const verdict = f.indexOf('Would have stopped before the end of the marks');
    expect(below).toBeGreaterThan(0);
    expect(what).toBeGreaterThan(below);
    expect(none).toBeGreaterThan(what);
    expect(verdict).toBeGreaterThan(none);
  });

  it('above the limit with a conflict point, says the vehicle was above it and compares at the point', async () => {
    const f = await review('30', '50');
    expect(f).toContain(
      'This vehicle was above the posted limit: 35.5 mph when the marks began, over 30.0 mph even at the low end.',
    );
    expect(f).toContain('would have stopped short of the conflict point.');
    expect(f).not.toContain('No conflict point was given');
    expect(f).not.toContain('was below the posted limit');
  });
});

describe('what the review and the written report say', () => {
  it('names sensitivity inputs plainly, and the report keeps "Tester #412" as typed', async () => {
    const app = renderApp({
      rows: 200,
      files: {
        'finished-slide.json': {
          ...finishedSlide,
          details: { reference: 'UI-TEST-FINISHED', investigator: 'Tester #412' },
        },
      },
    });
    await app.waitText('UI-TEST-FINISHED');
    await app.press(ENTER, 'Review');
    const f = await app.waitText('Change in speed, each input at its ends');
    // f 0.60-0.80 is the only input with a range: its line is named, not keyed f[0].
    expect(f).toMatch(/\n\s*drag factor\s+[▐█]/);
    expect(f).not.toContain('f[0]');
    await app.press('w', 'Write the report as');
    await app.press('m', /Writing the report|Report written to/);
    await app.waitText('Report written to', 30_000);
    const md = fs.readdirSync(app.dir).find((n) => n.endsWith('.md'))!;
    const text = fs.readFileSync(path.join(app.dir, md), 'utf8');
    expect(text).toContain('Tester #412');
    expect(text).not.toContain('\\#');
    expect(text).not.toContain('f[0]');
  });
});

describe('the test skids question', () => {
  it('takes drag factors typed at it, saying they were read as factors', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('k', 'Test skids for the slide');
    const f = said(await app.answer('0.68, 0.71, 0.70', 'Grade, the slide'));
    expect(f).toContain('Read as 3 drag factors: 0.68, 0.71, 0.70.');
    expect(f).not.toContain('✗');
  });

  it('gives the entered value its own "how", not the table’s', async () => {
    const app = await toLook();
    await toDragSource(app);
    let f = said(await app.press('e', 'Drag factor for the slide: a range'));
    expect(f).toContain('How: Type the figure you have with the range it carries');
    expect(f).not.toContain('From the table');
    await app.press(ctrl('p'), 'Where does the drag factor');
    f = said(await app.press('t', 'Which surface'));
    f = said(await app.press(ENTER, 'Drag factor for the slide: a range'));
    expect(f).toContain('How: From the table, choose the band');
  });
});

describe('words that fit more than one choice', () => {
  it('lists only the choices they fit, and more words pick one; a surface name is never taken as a key', async () => {
    const app = await toLook();
    await toDragSource(app);
    await app.press('t', 'Which surface');
    for (const ch of 'gravel') app.stdin.write(ch);
    await app.waitText('> gravel');
    let f = said(await app.press(ENTER, '✗'));
    expect(f).toContain(
      '"gravel" fits more than one choice: 6 (gravel, loose), h (gravel or dirt (single value)); type more of its words, or press its letter',
    );
    for (const ch of ' loose') app.stdin.write(ch);
    await app.waitText('> gravel loose');
    f = said(await app.press(ENTER, 'Drag factor for the slide: a range'));
    expect(f).toContain('Table range for gravel, loose');
  });
});
