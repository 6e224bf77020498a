// Cases beyond what the interview asks about (a truck's 18 marks, a slide into a surveyed yaw and
// a fall): opened in the interview and changed elsewhere, every analysis is saved as it was.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { loadCaseText } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { ENTER, ctrl, renderApp } from './render-app.js';
import { halfDone } from './fixtures.js';
import { stateFromCase, summaryOfDone } from '../../src/interview/index.js';

afterEach(() => cleanup());

const fixture = (name: string) =>
  JSON.parse(fs.readFileSync(path.join('test/fixtures/cases', name), 'utf8'));

/** An invented truck: one slide on one surface with 18 marks (more than a car leaves). */
function truck() {
  const c = fixture('skid-imperial-two-marks.json');
  delete c.interview;
  c.id = 'truck-18';
  c.analyses[0].marks = Array.from({ length: 18 }, (_, i) => 70 + (i % 6) * 0.5);
  return c;
}

/** Opens a case, changes its reference through the go-to list, and returns the saved file. */
async function changeReference(name: string, body: object) {
  const id = name.replace(/\.json$/, '');
  const app = renderApp({ files: { [name]: body }, start: { kind: 'resume', id }, rows: 40 });
  const first = await app.waitText(/ of \d+ answered/);
  // On the review the go-to list is g; on a question, Ctrl+G. Pressed until it opens: the
  // first frame of a resumed case can come before the key handler is in place.
  const key = first.includes('Review ·') ? 'g' : ctrl('g');
  await app.waitFor((f) => {
    if (f.includes('Go to:')) return true;
    app.stdin.write(key);
    return false;
  }, 'the go-to list');
  for (const ch of 'reference') app.stdin.write(ch);
  await app.waitText('Go to: reference');
  await app.press(ENTER, 'Case or report reference');
  app.stdin.write(ctrl('u'));
  await app.answer('CHANGED-REF', /saved \d\d:\d\d:\d\d/);
  const text = fs.readFileSync(path.join(app.dir, name), 'utf8');
  const saved = loadCaseText(text);
  if (!saved.ok) throw new Error(`the saved file does not load: ${saved.issues[0]?.message}`);
  return { app, saved: saved.case };
}

const figures = (c: Parameters<typeof solveCase>[0]) =>
  solveCase(c).analyses.map((a) => (a.ok ? a.solution.speed : a.reason));

describe('analyses beyond the interview are kept', () => {
  it('18 marks: all kept, same figures, after a change elsewhere', async () => {
    const before = truck();
    const { saved } = await changeReference('truck-18.json', before);
    expect(saved.details?.reference).toBe('CHANGED-REF');
    expect(saved.analyses).toHaveLength(1);
    expect((saved.analyses[0] as { marks: unknown[] }).marks).toEqual(before.analyses[0].marks);
    expect(figures(saved)).toEqual(figures(loadOk(before)));
  });

  it('a chain of slide, surveyed yaw and fall: all three asked and saved, in order, with the same figures', async () => {
    const before = fixture('chain-slide-yaw-fall.json');
    delete before.interview;
    const { app, saved } = await changeReference('chain-slide-yaw-fall.json', before);
    expect(saved.analyses.map((a) => a.id)).toEqual(
      before.analyses.map((a: { id: string }) => a.id),
    );
    // The surveyed yaw is asked now: built back from its answers, it states the tire-mark path.
    const asBuilt = loadOk(before).analyses.map((a) =>
      a.kind === 'yaw' ? { ...a, pathAdjustment: 'none' } : a,
    );
    expect(saved.analyses).toEqual(asBuilt);
    expect(figures(saved)).toEqual(figures(loadOk(before)));
    // Reopened: every question is answered, so the review opens; nothing is kept as it was.
    cleanup();
    const again = renderApp({
      files: { 'chain-slide-yaw-fall.json': saved },
      start: { kind: 'resume', id: 'chain-slide-yaw-fall' },
      rows: 60,
      columns: 140,
    });
    await again.waitText('Review ·');
    const f = summaryOfDone(stateFromCase(saved)).join(' ');
    expect(f).not.toContain('is kept exactly as in the file');
    expect(f).toContain('Analysis 2 - critical speed');
    expect(f).toContain('Analysis 3 - airborne: take-off to landing; complete');
    void app;
  });
});

function loadOk(c: object) {
  const r = loadCaseText(JSON.stringify(c));
  if (!r.ok) throw new Error('fixture does not load');
  return r.case;
}

describe('a case opened from a file', () => {
  it('is saved back to that file (its name need not be its id), with the backup beside it', async () => {
    const elsewhere = fs.mkdtempSync(path.join(os.tmpdir(), 'skidcase-open-'));
    const file = path.join(elsewhere, 'scene-notes.json');
    fs.writeFileSync(file, JSON.stringify(halfDone, null, 2));
    const app = renderApp({ start: { kind: 'open', path: file } });
    await app.waitText('Which units were the measurements taken in?');
    await app.press('m', /saved \d\d:\d\d:\d\d/);
    const saved = JSON.parse(fs.readFileSync(file, 'utf8'));
    expect(saved.units).toBe('metric');
    expect(JSON.parse(fs.readFileSync(`${file}.bak`, 'utf8')).units).not.toBe('metric');
    // Nothing was written under the case's id, here or in the sessions folder.
    expect(fs.existsSync(path.join(elsewhere, 'half-done.json'))).toBe(false);
    expect(fs.readdirSync(app.dir).filter((n) => n.endsWith('.json'))).toEqual([]);
    fs.rmSync(elsewhere, { recursive: true, force: true });
  });
});

describe('a case file replaced by garbage while open', () => {
  it('is moved aside at the next save, and the screen says where; the answers are written', async () => {
    const app = renderApp({
      files: { 'half-done.json': halfDone },
      start: { kind: 'resume', id: 'half-done' },
    });
    await app.waitText('Which units were the measurements taken in?');
    const file = path.join(app.dir, 'half-done.json');
    fs.writeFileSync(file, '\u0000\u0000 not a case at all');
    const f = (await app.press('m', 'your answers were saved')).replace(/\s+/g, ' ');
    expect(f).toMatch(/it was moved beside it as half-done\.broken-\d{8}T\d{6}Z\.json/);
    expect(JSON.parse(fs.readFileSync(file, 'utf8')).units).toBe('metric');
    const broken = fs.readdirSync(app.dir).find((n) => n.startsWith('half-done.broken-'))!;
    expect(fs.readFileSync(path.join(app.dir, broken), 'utf8')).toBe(
      '\u0000\u0000 not a case at all',
    );
  });
});

describe('a case file with a key given twice', () => {
  it('opens with a warning naming the key', async () => {
    const text = JSON.stringify(halfDone, null, 2).replace(
      '"units": "imperial",',
      '"units": "imperial",\n  "units": "imperial",',
    );
    expect(text).toMatch(/"units": "imperial",\n {2}"units"/);
    const app = renderApp({
      files: { 'half-done.json': text },
      start: { kind: 'resume', id: 'half-done' },
      rows: 40,
    });
    const f = (await app.waitText('given twice')).replace(/\s+/g, ' ');
    expect(f).toContain('Warning: units is given twice in the file; the last one is used.');
  });
});
