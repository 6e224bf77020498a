// A slide that went on into the next set of marks, answered through the pure interview: the end
// question names the analysis, the case links the two, and a loop is refused, naming it.
import { describe, expect, it } from 'vitest';
import { buildCase, reduce } from '../../src/interview/index.js';
import { loadCase } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { act, fill, start } from './drive.js';

// Invented: two slides; the first (40 ft at 0.72) runs on into the second (25 ft at 0.70).
const TWO_SLIDES: Record<string, string> = {
  'details.reference': 'CHAIN-T1',
  units: 'f',
  'vehicle.brakes': 'a',
  'a0.look': 'd',
  'a0.surfaces': 'o',
  'a0.count': '1',
  'a0.marks': '40',
  'a0.seg0.drag.source': 'e',
  'a0.seg0.drag.value': '0.72',
  'a0.end': 'o',
  'a0.more': 'y',
  'a1.look': 'd',
  'a1.surfaces': 'o',
  'a1.count': '1',
  'a1.marks': '25',
  'a1.seg0.drag.source': 'e',
  'a1.seg0.drag.value': '0.70',
  'a1.end': 'r',
  'a1.more': 'n',
  'sampling.shape': 'n',
};

describe('a slide that went on into the next set of marks', () => {
  it('is linked to the next analysis, and its figure is the engine chain of the built case', () => {
    const s = fill(start(), TWO_SLIDES);
    const c = buildCase(s, { id: 'chain-t1' });
    const loaded = loadCase(JSON.parse(JSON.stringify(c)));
    expect(loaded.ok).toBe(true);
    expect(c.analyses.map((a) => a.id)).toEqual(['skid-1', 'skid-2']);
    expect((c.analyses[0] as { end?: unknown }).end).toEqual({
      mode: 'analysis',
      analysis: 'skid-2',
    });
    const solved = solveCase(c).analyses;
    const first = solved[0]!;
    const second = solved[1]!;
    if (!first.ok || !second.ok) throw new Error('not solved');
    // The first starts faster than the second alone: its end speed is the second's start.
    expect(first.solution.speed.value).toBeGreaterThan(second.solution.speed.value);
  });

  it('the next analysis is offered by default, and its questions follow without "Another analysis?"', () => {
    let s = start();
    const upTo = { ...TWO_SLIDES };
    delete (upTo as Record<string, string | undefined>)['a0.more'];
    for (let n = 0; n < 60 && s.cursor !== 'a0.end.into'; n++) {
      const t = upTo[s.cursor];
      s = reduce(s, t === undefined ? { type: 'accept-default' } : { type: 'answer', text: t });
    }
    expect(s.cursor).toBe('a0.end.into');
    s = reduce(s, { type: 'accept-default' });
    expect(s.answers['a0.end.into']?.value).toBe('2');
    expect(s.cursor).toBe('a1.look');
  });

  it('a "no" to "Another analysis?" kept from before cannot drop the slide that runs on', () => {
    // Answered "no more analyses" first, then changed the end to "went on into the next marks":
    // the next analysis is asked for, and the slide is in the case once those marks are in.
    const before = { ...TWO_SLIDES, 'a0.end': 'r', 'a0.more': 'n' };
    let s = fill(start(), before);
    expect(s.cursor).toBe('review');
    expect(buildCase(s, { id: 'chain-t1' }).analyses).toHaveLength(1);
    s = act(s, { type: 'jump', id: 'a0.end' }, { type: 'answer', text: 'o' });
    expect(s.cursor).toBe('a0.end.into');
    s = reduce(s, { type: 'accept-default' });
    expect(s.cursor).toBe('a1.look');
    s = fill(s, TWO_SLIDES);
    const c = buildCase(s, { id: 'chain-t1' });
    expect(c.analyses.map((a) => a.id)).toEqual(['skid-1', 'skid-2']);
    expect((c.analyses[0] as { end?: unknown }).end).toEqual({
      mode: 'analysis',
      analysis: 'skid-2',
    });
  });

  it('a loop is refused with a message naming it, and the earlier answer stays', () => {
    const s = fill(start(), TWO_SLIDES);
    // Make the second slide run on into the first: analysis 2 → analysis 1 → analysis 2.
    let t = act(s, { type: 'jump', id: 'a1.end' }, { type: 'answer', text: 'o' });
    expect(t.cursor).toBe('a1.end.into');
    t = reduce(t, { type: 'answer', text: '1' });
    expect(t.error?.message).toContain(
      'the phases would loop back on themselves (analysis 2 → analysis 1 → analysis 2)',
    );
    expect(t.answers['a1.end.into']).toBeUndefined();
    // The built case still loads: the unanswered link leaves the second slide out for now.
    const c = buildCase(t, { id: 'chain-t1' });
    expect(loadCase(JSON.parse(JSON.stringify(c))).ok).toBe(true);
  });
});
