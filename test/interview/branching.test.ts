import { defaultTextOf, explainOf } from '../../src/interview/answer-values.js';
import { describe, expect, it } from 'vitest';
import { currentQuestion, questionsFor, buildCase } from '../../src/interview/index.js';
import { fillUntil, ids, start, type } from './drive.js';

// Invented scenario answers: a case started at the roadside, feet and mph, all brakes working.
const BASE = { units: 'f' };
const atLook = () => fillUntil(start(), BASE, 'a0.look');

describe('branching on the look of the marks', () => {
  it('straight dark marks pick the slide chain and say why', () => {
    const s = type(atLook(), 'd');
    expect(s.notice).toContain('locked wheels sliding');
    expect(s.notice).toContain('S = sqrt(30 d f n)');
    // The brakes come right after the look of the first slide's marks.
    expect(currentQuestion(s)?.id).toBe('vehicle.brakes');
    const after = type(s, 'a', '', 'o');
    expect(ids(after)).toEqual(
      expect.arrayContaining(['a0.count', 'a0.seg0.drag.source', 'a0.seg0.grade.dir', 'a0.end']),
    );
    expect(ids(after)).not.toContain('a0.chord');
    expect(ids(after)).not.toContain('a0.seg0.length');
    expect(currentQuestion(after)?.section).toBe('Analysis 1 - slide');
  });

  it('faint evenly dashed marks (ABS) pick the slide chain, to be reported as an estimate', () => {
    const s = type(atLook(), 'a');
    expect(s.notice).toContain('anti-lock');
    expect(s.notice).toContain('estimate');
    expect(ids(s)).toContain('a0.surfaces');
  });

  it('skip skids count the whole length, gaps included', () => {
    const s = type(atLook(), 's');
    expect(s.notice).toContain('gaps included');
    expect(ids(type(s, 'a', '', 'o'))).toContain('a0.count');
  });

  it('gap skids are a slide in parts: no single-surface choice, no mark lengths, gaps left out', () => {
    let s = type(atLook(), 'g');
    expect(s.notice).toContain('gaps were not braking');
    s = type(s, 'a', '');
    const surfaces = currentQuestion(s)!;
    expect(surfaces.id).toBe('a0.surfaces');
    expect(surfaces.choices!.map((c) => c.value)).toEqual(['several', 'quick']);
    expect(defaultTextOf(surfaces, s.answers)).toBe('several');
    s = type(s, 's', '2');
    expect(ids(s)).not.toContain('a0.count');
    expect(ids(s)).not.toContain('a0.marks');
    expect(ids(s)).toEqual(
      expect.arrayContaining(['a0.seg0.length', 'a0.seg1.length', 'a0.seg1.drag.source']),
    );
    expect(currentQuestion(s)?.section).toBe('Analysis 1 - slide in parts');
  });

  it('curved marks with striations pick the critical speed chain (metric constant in a metric case)', () => {
    const s = type(fillUntil(start(), { ...BASE, units: 'm' }, 'a0.look'), 'y');
    expect(s.notice).toContain('critical speed');
    expect(s.notice).toContain('S = sqrt(127 f R)');
    expect(ids(s)).toEqual(
      expect.arrayContaining([
        'a0.chord',
        'a0.ordinate',
        'a0.drag.source',
        'a0.bank.dir',
        'a0.path',
      ]),
    );
    expect(ids(s)).not.toContain('a0.surfaces');
    expect(currentQuestion(type(s, ''))?.section).toBe('Analysis 1 - critical speed');
  });

  it('several surfaces add a length and a label per segment, as many as counted', () => {
    const s = type(atLook(), 'd', 'a', '', 's', '', '3');
    const seg = ids(s).filter((id) => /^a0\.seg\d\.length$/.test(id));
    expect(seg).toEqual(['a0.seg0.length', 'a0.seg1.length', 'a0.seg2.length']);
    expect(ids(s)).toContain('a0.seg2.label');
  });
});

describe('branching on the brakes', () => {
  const atBrakes = () => fillUntil(start(), { units: 'f', 'a0.look': 'd' }, 'vehicle.brakes');
  const vehicleIds = (s: ReturnType<typeof start>) =>
    ids(s).filter((id) => id.startsWith('vehicle.'));

  it('all working asks nothing more and stores mode all', () => {
    const s = type(atBrakes(), 'a');
    expect(vehicleIds(s)).toEqual(['vehicle.label', 'vehicle.brakes']);
    expect(buildCase(s, { id: 't' }).vehicle.brakes).toEqual({ mode: 'all' });
  });

  it('an estimate asks the efficiency and its basis', () => {
    const s = type(atBrakes(), 'e', '0.8', 'brake test at inspection');
    expect(vehicleIds(s)).toEqual([
      'vehicle.label',
      'vehicle.brakes',
      'vehicle.brakes.efficiency',
      'vehicle.brakes.basis',
    ]);
    expect(buildCase(s, { id: 't' }).vehicle.brakes).toEqual({
      mode: 'estimate',
      efficiency: 0.8,
      basis: 'brake test at inspection',
    });
  });

  it('wheel by wheel asks the front-axle share, offering the typical range, and each wheel', () => {
    let s = type(atBrakes(), 'w');
    const share = currentQuestion(s)!;
    expect(share.id).toBe('vehicle.share');
    // Typical front-axle share 0.55-0.65 of front-engine cars (common practice; from memory)
    expect(defaultTextOf(share, s.answers)).toBe('0.55-0.65');
    expect(share.help.how).toContain('common practice; from memory');
    expect(share.help.why).toContain('overstates n');
    s = type(s, '', 'w', 'w', 'n', 'p');
    expect(currentQuestion(s)!.id).toBe('vehicle.wheel.rr.fraction');
    s = type(s, '0.5');
    const fractions = ids(s).filter((id) => id.endsWith('.fraction'));
    expect(fractions).toEqual(['vehicle.wheel.rr.fraction']);
    const v = buildCase(s, { id: 't' }).vehicle;
    expect(v.brakes).toEqual({
      mode: 'wheels',
      frontLeft: 1,
      frontRight: 1,
      rearLeft: 0,
      rearRight: 0.5,
    });
    expect(v.frontAxleShare).toEqual({ value: 0.6, low: 0.55, high: 0.65 });
  });
});

describe('branching inside an analysis', () => {
  const atSource = () => type(atLook(), 'd', 'a', '', 'o', '1', '80', '');

  it.each([
    ['t', ['a0.seg0.drag.surface', 'a0.seg0.drag.value']],
    ['k', ['a0.seg0.drag.tests', 'a0.seg0.drag.testWhere']],
    ['s', ['a0.seg0.drag.weight', 'a0.seg0.drag.pulls']],
    ['d', ['a0.seg0.drag.readings']],
    ['e', ['a0.seg0.drag.value']],
  ])('drag source %s asks %j', (key, expected) => {
    const s = type(atSource(), key);
    const drag = ids(s).filter(
      (id) => id.startsWith('a0.seg0.drag.') && id !== 'a0.seg0.drag.source',
    );
    expect(drag).toEqual(expected);
  });

  it('a table surface shows its range and source, and offers the range as the default', () => {
    let s = type(atSource(), 't');
    const surface = currentQuestion(s)!;
    const row = surface.choices!.find((c) => c.value === 'asphalt-dry-travelled')!;
    // NU Traffic Institute table via Fricke 1990, dry asphalt travelled: 0.60-0.80 under / 0.55-0.70 over 30 mph (seen in the reprint)
    expect(row.hint).toContain('under 30 mph 0.60-0.80, over 30 mph 0.55-0.70');
    expect(row.hint).toContain('Baker');
    s = type(s, row.key);
    const value = currentQuestion(s)!;
    expect(defaultTextOf(value, s.answers)).toBe('0.55-0.70');
    expect(explainOf(value, s.answers)).toContain('Traffic Institute');
  });

  it('another surface asks for its name', () => {
    const s = type(atSource(), 't', 'o');
    expect(currentQuestion(s)!.id).toBe('a0.seg0.drag.surfaceName');
  });

  it('a level road asks no percent; uphill and downhill do', () => {
    const s = type(atSource(), 'e', '0.7');
    expect(currentQuestion(s)!.id).toBe('a0.seg0.grade.dir');
    expect(ids(type(s, 'l'))).not.toContain('a0.seg0.grade.pct');
    expect(ids(type(s, 'd'))).toContain('a0.seg0.grade.pct');
  });

  it('an estimated end speed asks the speed and its basis; no estimate asks nothing more', () => {
    const s = type(atSource(), 'e', '0.7', 'l');
    expect(currentQuestion(s)!.id).toBe('a0.end');
    expect(ids(type(s, 's'))).toEqual(expect.arrayContaining(['a0.end.speed', 'a0.end.basis']));
    expect(ids(type(s, 'n'))).not.toContain('a0.end.speed');
  });

  it('the centre-of-mass path asks the track width; another analysis adds its questions', () => {
    let s = type(atLook(), 'y', '', '', '40', '2.5', 'e', '0.7', 'n');
    expect(currentQuestion(s)!.id).toBe('a0.path');
    expect(ids(type(s, 'm'))).not.toContain('vehicle.trackWidth');
    s = type(s, 'c');
    expect(currentQuestion(s)!.id).toBe('vehicle.trackWidth');
    s = type(s, '5.2');
    expect(currentQuestion(s)!.id).toBe('a0.more');
    expect(ids(s)).not.toContain('a1.look');
    s = type(s, 'y');
    expect(currentQuestion(s)!.id).toBe('a1.look');
    expect(questionsFor(s.answers).find((q) => q.id === 'a1.look')!.section).toBe('Analysis 2');
  });
});
