import fs from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  buildCase,
  currentQuestion,
  firstOpenQuestion,
  REVIEW,
  stateFromCase,
  summaryOfDone,
} from '../../src/interview/index.js';
import { loadCase, loadCaseText, type Case } from '../../src/case/load.js';
import { fill, fillUntil, ids, start, type } from './drive.js';

// Invented answers: a yaw mark and a slide of one car, feet and mph, no posted limit.
const YAW = {
  units: 'f',
  'a0.chord': '45',
  'a0.ordinate': '3.5',
  'a0.drag.source': 'e',
  'a0.drag.value': '0.7',
  'a0.bank.dir': 'n',
};
const SLIDE_AT = (i: number) => ({
  [`a${i}.surfaces`]: 'o',
  [`a${i}.count`]: '2',
  [`a${i}.marks`]: '60 62',
  [`a${i}.seg0.drag.source`]: 'e',
  [`a${i}.seg0.drag.value`]: '0.7',
  [`a${i}.seg0.grade.dir`]: 'l',
});
const BRAKE_IDS = ['vehicle.brakes', 'vehicle.brakes.efficiency', 'vehicle.share'];
const brakeIds = (s: ReturnType<typeof start>) => ids(s).filter((id) => BRAKE_IDS.includes(id));

const valid = (c: Case) => loadCase(JSON.parse(JSON.stringify(c))).ok;

describe('the brakes are asked only when a slide needs them', () => {
  it('a yaw-only case never asks about the brakes and is complete without them', () => {
    const s = fill(start(), { ...YAW, 'a0.look': 'y' });
    expect(brakeIds(s)).toEqual([]);
    const c = buildCase(s, { id: 'yaw-only' });
    expect(c.vehicle.brakes).toBeUndefined();
    expect(c.analyses.map((a) => a.kind)).toEqual(['yaw']);
    expect(valid(c)).toBe(true);
    expect(summaryOfDone(s)).toContain('Vehicle: brakes not needed (no slide)');
  });

  it('slide first: the brakes come right after the look of its marks, with why they matter', () => {
    let s = fillUntil(start(), { units: 'f' }, 'a0.look');
    s = type(s, 'd');
    const q = currentQuestion(s)!;
    expect(q.id).toBe('vehicle.brakes');
    expect(q.section).toBe('Analysis 1 - slide');
    expect(q.help.why).toContain('scales the friction');
    // Then a yaw as the second analysis: nothing more about the brakes is asked there.
    s = fill(s, {
      ...SLIDE_AT(0),
      'vehicle.brakes': 'e',
      'vehicle.brakes.efficiency': '0.9',
      'a0.more': 'y',
      'a1.look': 'y',
      ...Object.fromEntries(Object.entries(YAW).map(([k, v]) => [k.replace('a0.', 'a1.'), v])),
    });
    const order = ids(s);
    expect(order.indexOf('vehicle.brakes')).toBe(order.indexOf('a0.look') + 1);
    expect(order.filter((id) => id === 'vehicle.brakes')).toHaveLength(1);
    const c = buildCase(s, { id: 'slide-yaw' });
    expect(c.vehicle.brakes).toEqual({ mode: 'estimate', efficiency: 0.9 });
    expect(c.analyses.map((a) => a.kind)).toEqual(['skid', 'yaw']);
    expect(valid(c)).toBe(true);
  });

  it('yaw first, then a slide: the brakes are asked inside the second analysis, after its look', () => {
    let s = fillUntil(start(), { ...YAW, 'a0.look': 'y', 'a0.more': 'y' }, 'a1.look');
    expect(brakeIds(s)).toEqual([]);
    s = type(s, 'g');
    const q = currentQuestion(s)!;
    expect(q.id).toBe('vehicle.brakes');
    expect(q.section).toBe('Analysis 2 - slide in parts');
    s = type(s, 'a');
    expect(currentQuestion(s)!.id).toBe('a1.label');
    const order = ids(s);
    expect(order.indexOf('vehicle.brakes')).toBe(order.indexOf('a1.look') + 1);
    expect(order.indexOf('vehicle.brakes')).toBeGreaterThan(order.indexOf('a0.more'));
  });

  it('turning the only slide into a yaw drops the brakes from the questions but keeps the answer', () => {
    let s = fill(start(), { ...SLIDE_AT(0), units: 'f', 'a0.look': 'd', 'vehicle.brakes': 'a' });
    expect(buildCase(s, { id: 'x' }).vehicle.brakes).toEqual({ mode: 'all' });
    s = fill({ ...s, cursor: 'a0.look' }, { ...YAW, 'a0.look': 'y' });
    expect(brakeIds(s)).toEqual([]);
    expect(s.answers['vehicle.brakes']!.value).toBe('all');
    expect(buildCase(s, { id: 'x' }).vehicle.brakes).toBeUndefined();
  });
});

describe('the yaw demo resumes complete', () => {
  const text = fs.readFileSync('sessions/demo-kestrel-bend.json', 'utf8');
  const loaded = loadCaseText(text);
  if (!loaded.ok) throw new Error('the yaw demo does not load');

  it('has no open question: it opens on the review', () => {
    const s = stateFromCase(loaded.case);
    expect(firstOpenQuestion(s)).toBe(REVIEW);
    expect(summaryOfDone(s)).toContain(
      'Vehicle Unit 1, blue hatchback: brakes not needed (no slide)',
    );
  });

  it('a yaw-only file with brakes given keeps them when saved again', () => {
    const c = {
      ...loaded.case,
      vehicle: { ...loaded.case.vehicle, brakes: { mode: 'all' as const } },
    };
    const s = stateFromCase(c);
    expect(firstOpenQuestion(s)).toBe(REVIEW);
    expect(buildCase(s, { id: c.id }).vehicle.brakes).toEqual({ mode: 'all' });
  });
});

describe('notes written beside figures in a file', () => {
  const text = fs.readFileSync('sessions/demo-kestrel-bend.json', 'utf8');
  const loaded = loadCaseText(text);
  if (!loaded.ok) throw new Error('the yaw demo does not load');
  const demo = loaded.case;

  it('are kept when the case is saved again from the interview', () => {
    const s = stateFromCase(demo);
    const built = buildCase(s, { id: demo.id });
    const yaw = built.analyses[0]!;
    if (yaw.kind !== 'yaw') throw new Error('expected the yaw');
    expect(yaw.chord).toEqual({
      value: 15.0,
      low: 14.98,
      high: 15.02,
      note: 'steel tape from where the rear mark crosses the front mark',
    });
    expect(yaw.drag).toMatchObject({ note: 'drag sled, four pulls along the mark, 22:05' });
    expect(valid(built)).toBe(true);
  });

  it('are dropped from a figure that was changed, and kept on the others', () => {
    const s = stateFromCase(demo);
    const changed = fill({ ...s, cursor: 'a0.chord' }, { 'a0.chord': '16 +/- 0.02' });
    const yaw = buildCase(changed, { id: demo.id }).analyses[0]!;
    if (yaw.kind !== 'yaw') throw new Error('expected the yaw');
    expect(yaw.chord).toEqual({ value: 16, low: 15.98, high: 16.02 });
    expect(yaw.middleOrdinate).toMatchObject({ note: 'read to 5 mm' });
  });
});
