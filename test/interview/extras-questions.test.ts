import { defaultTextOf } from '../../src/interview/answer-values.js';
import { describe, expect, it } from 'vitest';
import {
  buildCase,
  currentQuestion,
  firstOpenQuestion,
  REVIEW,
  stateFromCase,
} from '../../src/interview/index.js';
import { loadCase, type Case } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { act, fill, fillUntil, ids, start, type } from './drive.js';

// Invented scenario figures throughout.
const loaded = (c: Case): Case => {
  const r = loadCase(JSON.parse(JSON.stringify(c)));
  if (!r.ok) throw new Error(r.issues.map((i) => `${i.path}: ${i.message}`).join('; '));
  return r.case;
};

// An exact circular arc of radius 101 ft on a 40 ft chord (pure circle geometry): the middle
// ordinate is 101 - sqrt(101² - 20²) = 2.000 ft, and the offset at 10 ft (and 30 ft) from the
// chord's start is sqrt(101² - 10²) - sqrt(101² - 20²) = 100.504 - 99.000 = 1.504 ft.
const ARC = {
  units: 'f',
  'a0.look': 'y',
  'a0.measure': 'o',
  'a0.offsets.chord': '40',
  'a0.offsets.stations': '10 1.504, 20 2.000, 30:1.504',
  'a0.drag.source': 'e',
  'a0.drag.value': '0.7',
  'a0.bank.dir': 'n',
};

describe('a yaw radius measured by offsets', () => {
  it('offers one chord and its middle ordinate by default, or offsets, or surveyed points', () => {
    const s = fillUntil(start(), { units: 'f', 'a0.look': 'y' }, 'a0.measure');
    const q = currentQuestion(s)!;
    expect(q.choices!.map((c) => c.label)).toEqual([
      'one chord and its middle ordinate',
      'offsets at stations along one chord',
      'surveyed points (total station, scanner or drone export)',
    ]);
    expect(defaultTextOf(q, s.answers)).toBe('ordinate');
    expect(ids(type(s, ''))).toContain('a0.ordinate');
    const o = ids(type(s, 'o'));
    expect(o).toEqual(expect.arrayContaining(['a0.offsets.chord', 'a0.offsets.stations']));
    expect(o).not.toContain('a0.chord');
    expect(o).not.toContain('a0.ordinate');
  });

  it('writes `offsets` (no chord and ordinate), and the engine fits the arc: R about 101 ft', () => {
    const c = loaded(buildCase(fill(start(), ARC), { id: 'arc' }));
    const a = c.analyses[0]!;
    if (a.kind !== 'yaw') throw new Error('expected a yaw');
    expect(a.chord).toBeUndefined();
    expect(a.middleOrdinate).toBeUndefined();
    expect(a.offsets).toEqual({
      chord: 40,
      stations: [
        { at: 10, offset: 1.504 },
        { at: 20, offset: 2 },
        { at: 30, offset: 1.504 },
      ],
    });
    const sol = solveCase(c).analyses[0]!;
    if (!sol.ok) throw new Error(sol.reason);
    // S = sqrt(15 f R) = sqrt(15 × 0.7 × 101) = 32.57 mph (critical speed)
    expect(sol.solution.speed.value).toBeCloseTo(32.57, 1);
  });

  it('reads stations in either syntax and names the station that is wrong', () => {
    const s = fillUntil(start(), ARC, 'a0.offsets.stations');
    const msg = (text: string) => act(s, { type: 'answer', text }).error?.message;
    expect(msg('10 1.5 2')).toBe('station 1 ("10 1.5 2"): write it as along offset, e.g. 10 0.36');
    expect(msg('10 1.5, 45 1')).toContain(
      'station 2 ("45 1"): a station must lie inside the chord (less than 40)',
    );
    expect(msg('10 1.5, 20 -2')).toContain('station 2');
    expect(msg('')).toContain('5 0.21, 10 0.36');
    // A unit glued to a number is converted to the case's feet: 3.048 m = 10 ft (international foot, 1959).
    const t = act(s, { type: 'answer', text: '3.048m:1.504, 20 2' });
    expect(t.error).toBeUndefined();
    expect(t.answers['a0.offsets.stations']!.value).toEqual([
      { at: 10, offset: 1.504 },
      { at: 20, offset: 2 },
    ]);
  });

  it('a hand-written case with offsets resumes with the same figures', () => {
    const c = loaded(buildCase(fill(start(), ARC), { id: 'arc' }));
    const { interview: _i, ...bare } = c;
    const s = stateFromCase(bare as Case);
    expect(firstOpenQuestion(s)).toBe(REVIEW);
    expect(s.answers['a0.measure']!.value).toBe('offsets');
    expect(buildCase(s, { id: 'arc' }).analyses).toEqual(c.analyses);
  });
});

const SLIDE = {
  units: 'f',
  'a0.look': 'd',
  'vehicle.brakes': 'a',
  'a0.surfaces': 'o',
  'a0.count': '1',
  'a0.marks': '100',
  'a0.seg0.drag.source': 'e',
  'a0.seg0.drag.value': '0.7',
  'a0.seg0.grade.dir': 'l',
};

describe('time and distance for a slide', () => {
  it('is not asked without a posted limit', () => {
    const s = fill(start(), SLIDE);
    expect(ids(s)).not.toContain('a0.conflict');
    expect(ids(s)).not.toContain('a0.reaction');
  });

  it('asks a conflict point and a reaction time after the end of the slide, both optional', () => {
    let s = fillUntil(start(), { ...SLIDE, limit: '40' }, 'a0.conflict');
    expect(ids(s).indexOf('a0.conflict')).toBe(ids(s).indexOf('a0.end') + 1);
    s = type(s, '');
    const q = currentQuestion(s)!;
    expect(q.id).toBe('a0.reaction');
    expect(q.usesPreference).toBe('reactionTime');
    // 1.5 s for a surprise (M. Green 2000) and AASHTO's 2.5 s design value
    expect(q.help.why).toContain('1.5 s');
    expect(q.help.why).toContain('Green');
    expect(q.help.why).toContain('2.5 s');
    expect(q.help.why).toContain('AASHTO');
    s = type(s, '');
    expect(buildCase(fill(s, {}), { id: 't' }).analyses[0]).not.toHaveProperty('timeDistance');
  });

  it('does not hold back the slide figure while they are open', () => {
    const s = fillUntil(start(), { ...SLIDE, limit: '40' }, 'a0.conflict');
    const c = buildCase(s, { id: 't' });
    expect(c.analyses).toHaveLength(1);
    expect(c.analyses[0]).not.toHaveProperty('timeDistance');
  });

  it('writes `timeDistance` with what was given', () => {
    const s = fill(start(), { ...SLIDE, limit: '40', 'a0.conflict': '70', 'a0.reaction': '2.5' });
    const c = loaded(buildCase(s, { id: 't' }));
    expect(c.analyses[0]).toMatchObject({ timeDistance: { conflictAt: 70, reactionTime: 2.5 } });
    const only = fill(start(), { ...SLIDE, limit: '40', 'a0.reaction': '1' });
    expect(buildCase(only, { id: 't' }).analyses[0]).toMatchObject({
      timeDistance: { reactionTime: 1 },
    });
  });

  it('refuses a reaction time outside the preference bounds (0.5 to 5 s)', () => {
    const s = fillUntil(start(), { ...SLIDE, limit: '40' }, 'a0.reaction');
    expect(act(s, { type: 'answer', text: '12' }).error?.message).toContain('at most 5');
    expect(act(s, { type: 'answer', text: '0.2' }).error?.message).toContain('at least 0.5');
    expect(act(s, { type: 'answer', text: '2.5' }).error).toBeUndefined();
  });
});

describe('a distribution at the end of the case', () => {
  it('is asked last, after the last analysis, and defaults to none', () => {
    const s = fillUntil(start(), SLIDE, 'sampling.shape');
    const all = ids(s);
    expect(all[all.length - 1]).toBe('sampling.shape');
    expect(defaultTextOf(currentQuestion(s)!, s.answers)).toBe('none');
    expect(buildCase(fill(s, {}), { id: 't' })).not.toHaveProperty('sampling');
  });

  it('writes `sampling` with the shape, the draws and the seed', () => {
    const s = fill(start(), {
      ...SLIDE,
      'sampling.shape': 'o',
      'sampling.samples': '5000',
      'sampling.seed': '42',
    });
    const c = loaded(buildCase(s, { id: 't' }));
    expect(c.sampling).toEqual({ shape: 'normal', samples: 5000, seed: 42 });
  });

  it('refuses fewer than 1000 draws, as the case file does', () => {
    const s = fillUntil(start(), { ...SLIDE, 'sampling.shape': 'u' }, 'sampling.samples');
    expect(act(s, { type: 'answer', text: '50' }).error?.message).toContain('from 1000 to 1000000');
  });
});
