import { defaultTextOf } from '../../src/interview/answer-values.js';
import { describe, expect, it } from 'vitest';
import { buildCase, currentQuestion, questionStates } from '../../src/interview/index.js';
import type { SkidV1 } from '../../src/case/v1/schema.js';
import { act, fill, fillUntil, ids, start, type } from './drive.js';

const BASE = { units: 'f', 'vehicle.brakes': 'a', 'a0.look': 'd' };
const skid = (s: ReturnType<typeof start>) => buildCase(s, { id: 'x' }).analyses[0] as SkidV1;

describe('several segments, one at a time', () => {
  it('asks length, label, drag and grade for each, and stores the grade signed', () => {
    const s = fill(start(), {
      ...BASE,
      'a0.surfaces': 's',
      'a0.count': '',
      'a0.segcount': '2',
      'a0.seg0.length': '30.5',
      'a0.seg0.drag.source': 'e',
      'a0.seg0.drag.value': '0.7',
      'a0.seg0.grade.dir': 'u',
      'a0.seg0.grade.pct': '2.5 (2-3)',
      'a0.seg1.length': '12',
      'a0.seg1.label': 'grass verge',
      'a0.seg1.drag.source': 'd',
      'a0.seg1.drag.readings': '0.31 0.29',
      'a0.seg1.grade.dir': 'd',
      'a0.seg1.grade.pct': '4 (3-5)',
    });
    const a = skid(s);
    expect(a.marks).toBeUndefined();
    expect(a.segments).toEqual([
      {
        length: 30.5,
        drag: { source: 'entered', value: 0.7 },
        grade: { value: 2.5, low: 2, high: 3 },
      },
      {
        label: 'grass verge',
        length: 12,
        drag: { source: 'decelerometer', readings: [0.31, 0.29] },
        grade: { value: -4, low: -5, high: -3 },
      },
    ]);
  });

  it('fewer segments afterwards keep the extra segment answers as unused', () => {
    let s = fillUntil(
      start(),
      { ...BASE, 'a0.surfaces': 's', 'a0.count': '', 'a0.segcount': '3' },
      'a0.seg0.length',
    );
    s = type(s, '10', '', 'e', '0.7', 'l', '11', '', 'e', '0.6', 'l', '12', '', 'e', '0.5', 'l');
    s = type(act(s, { type: 'jump', id: 'a0.segcount' }), '2');
    const unused = questionStates(s)
      .filter((q) => q.status === 'unused')
      .map((q) => q.id);
    expect(unused).toEqual([
      'a0.seg2.length',
      'a0.seg2.label',
      'a0.seg2.drag.source',
      'a0.seg2.drag.value',
      'a0.seg2.grade.dir',
    ]);
    expect(ids(s)).not.toContain('a0.seg2.length');
  });
});

describe('quick entry of segments', () => {
  const atQuick = () =>
    fillUntil(start(), { ...BASE, 'a0.surfaces': 'q', 'a0.count': '' }, 'a0.quick');

  it('fills every segment answer at once, each then editable', () => {
    let s = type(atQuick(), '48 @0.74 +2%, 31 @0.55 [gravel], 22 @0.40 -3%');
    expect(s.notice).toBe(
      '3 segments filled in; each can be checked or changed question by question.',
    );
    expect(currentQuestion(s)!.id).toBe('a0.end');
    expect(s.answers['a0.seg1.label']!.text).toBe('gravel');
    expect(s.answers['a0.seg2.grade.dir']!.text).toBe('downhill');
    s = fill(s, {});
    expect(skid(s).segments).toEqual([
      { length: 48, drag: { source: 'entered', value: 0.74 }, grade: 2 },
      { label: 'gravel', length: 31, drag: { source: 'entered', value: 0.55 } },
      // typed as 0.40: its two decimals kept for the record
      { length: 22, drag: { source: 'entered', value: 0.4, decimals: 2 }, grade: -3 },
    ]);
    s = type(act(s, { type: 'jump', id: 'a0.seg1.drag.value' }), '0.50-0.60');
    expect(skid(s).segments[1]!.drag).toEqual({
      source: 'entered',
      value: 0.55,
      low: 0.5,
      high: 0.6,
    });
  });

  it('offers the segments as they now are when the line is asked again', () => {
    let s = fill(type(atQuick(), '48 @0.74 +2%, 31 @0.55'), {});
    s = type(act(s, { type: 'jump', id: 'a0.seg1.grade.dir' }), 'd', '1.5');
    s = act(s, { type: 'jump', id: 'a0.quick' });
    expect(defaultTextOf(currentQuestion(s)!, s.answers)).toBe('48 @0.74 +2%, 31 @0.55 -1.5%');
    s = act(s, { type: 'accept-default' });
    expect(skid(s).segments[1]!.grade).toBe(-1.5);
  });

  it('takes a reference-table row and keeps it as a table drag factor', () => {
    const s = fill(type(atQuick(), '40 @gravel-loose -1%, 20 @0.3'), {});
    // Loose gravel 0.40-0.70 (NU Traffic Institute table, Baker 1975; from memory): value the middle.
    expect(skid(s).segments[0]!.drag).toEqual({
      source: 'table',
      surface: 'gravel-loose',
      value: 0.55,
      low: 0.4,
      high: 0.7,
    });
    expect(skid(s).segments[0]!.grade).toBe(-1);
  });

  it('names the segment it cannot read, and keeps the answers as they were', () => {
    const s = atQuick();
    const t = act(s, { type: 'answer', text: '48 @0.74 +2%, 31 0.55' });
    expect(t.answers).toEqual(s.answers);
    expect(t.error?.message).toContain("segment 2, '31 0.55'");
  });

  it('a gap skid is entered as its marked parts, the gaps not counted', () => {
    let s = fillUntil(start(), { ...BASE, 'a0.look': 'g', 'a0.surfaces': 'q' }, 'a0.quick');
    expect(ids(s)).not.toContain('a0.count');
    s = fill(type(s, '18 @0.7, 25 @0.7'), {});
    const a = skid(s);
    expect(a.segments.map((x) => x.length)).toEqual([18, 25]);
    expect(a.marks).toBeUndefined();
  });
});
