// A quick line of one surface without a length (`@0.74 -1%`, as the help offers) is one surface:
// its distance comes from the marks, no segment length is asked, and it takes fewer keys than
// entering the same surface question by question.
import { describe, expect, it } from 'vitest';
import { dryRun, answerOrder, type Script } from '../e2e/interview-driver.js';
import { buildCase } from '../../src/interview/build-case.js';
import { analysisSection } from '../../src/interview/questions.js';

const BASE: Script = {
  'details.reference': 'QUICK-ONE',
  units: 'imperial',
  limit: '',
  'vehicle.brakes': 'all',
  'a0.look': 'dark',
  'a0.count': '2',
  'a0.marks': '61 63',
  'a0.rule': 'average',
  'a0.end': 'rest',
  'a0.more': 'no',
  'sampling.shape': 'none',
};
const QUICK: Script = { ...BASE, 'a0.surfaces': 'quick', 'a0.quick': '@0.74 -1%' };
const PLAIN: Script = {
  ...BASE,
  'a0.surfaces': 'one',
  'a0.seg0.drag.source': 'entered',
  'a0.seg0.drag.value': '0.74',
  'a0.seg0.grade.dir': 'downhill',
  'a0.seg0.grade.pct': '1',
};

/** Keys a person presses for a script: each character typed, and Enter (a choice is its letter). */
function keys(script: Script): number {
  return answerOrder(script).reduce((n, id) => n + (script[id]?.length ?? 0) + 1, 0);
}

describe('one surface on the quick line', () => {
  it('asks no segment length and builds the same slide as the plain path', () => {
    const order = answerOrder(QUICK);
    expect(order.some((id) => /seg\d+\.length/.test(id))).toBe(false);
    const meta = { id: 'quick-one', units: 'imperial' as const };
    const quick = buildCase(dryRun(QUICK), meta);
    const plain = buildCase(dryRun(PLAIN), meta);
    expect(quick.analyses).toHaveLength(1);
    const strip = (a: unknown) =>
      JSON.parse(JSON.stringify(a, (k, v) => (k === 'label' ? undefined : v)));
    expect(strip(quick.analyses[0])).toEqual(strip(plain.analyses[0]));
    expect(
      (quick.analyses[0] as { segments: { length?: unknown }[] }).segments[0]!.length,
    ).toBeUndefined();
  });

  it('is named a slide on one surface, and takes fewer keys than the plain path', () => {
    expect(analysisSection(dryRun(QUICK, { stopAt: 'a0.end' }).answers, 0)).toBe(
      'Analysis 1 - slide',
    );
    expect(keys(QUICK)).toBeLessThan(keys(PLAIN));
  });
});
