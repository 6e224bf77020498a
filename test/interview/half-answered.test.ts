import { describe, expect, it } from 'vitest';
import { explainOf, readAnswers } from '../../src/interview/answer-values.js';
import { wheelsLine } from '../../src/interview/brakes-line.js';
import { buildCase, questionsFor, type InterviewState } from '../../src/interview/index.js';
import { liveInterview } from '../../src/ui/interview-live.js';
import { fill, start } from './drive.js';

// An invented slide on a level road, braked wheel by wheel: the rear right brake at half.
const TYPED: Record<string, string> = {
  units: 'f',
  limit: '35',
  'vehicle.brakes': 'w',
  'vehicle.share': '0.6',
  'vehicle.wheel.rr': 'p',
  'vehicle.wheel.rr.fraction': '0.5',
  'a0.look': 'd',
  'a0.surfaces': 'o',
  'a0.count': '1',
  'a0.marks': '60',
  'a0.seg0.drag.source': 'e',
  'a0.seg0.drag.value': '0.70',
  'a0.more': 'n',
};

const base = { format: 'skidcase-case', version: 1, id: 'half' } as const;
const without = (s: InterviewState, id: string): InterviewState => {
  const { [id]: _gone, ...answers } = s.answers;
  return { ...s, answers };
};
const withText = (s: InterviewState, id: string, text: string): InterviewState => ({
  ...s,
  answers: { ...s.answers, [id]: { text, value: text } },
});
const panel = (s: InterviewState) =>
  liveInterview.draft(s, { ...base, units: 'imperial', vehicle: {}, analyses: [] });

describe('a half-answered interview gives a clear message, never a throw or a wrong figure', () => {
  const full = fill(start('brisk'), TYPED);

  it('answered in full: n from the wheels, and the slide figure', () => {
    // n = 0.6/2 × (1 + 1) + 0.4/2 × (1 + 0.5) = 0.6 + 0.3 = 0.90
    expect(wheelsLine(readAnswers(full.answers))).toBe(
      'Braking efficiency n = 0.90, from the four wheels and the front axle share.',
    );
    // S = sqrt(30 × 60 × 0.70 × 0.90) = sqrt(1134) = 33.7 mph
    expect(panel(full).result).toMatch(/^33\.7 mph/);
  });

  it('a wheel left unanswered: no efficiency line, no brakes, no slide figure, and the panel names the wheel', () => {
    const s = without(full, 'vehicle.wheel.rr.fraction');
    const wheel = questionsFor(s.answers).find((q) => q.id === 'vehicle.wheel.rr')!;
    expect(() => explainOf(wheel, s.answers)).not.toThrow();
    expect(explainOf(wheel, s.answers)).toBeUndefined();
    const c = buildCase(s, { id: 'half' });
    expect(c.vehicle.brakes).toBeUndefined();
    // Not solved as if every brake worked (which would give 35.5 mph): no figure at all.
    expect(c.analyses).toEqual([]);
    const view = panel(s);
    expect(view.result).toBeUndefined();
    expect(view.note).toBe('The speed follows: still to answer: Braking share, rear right.');
    // The drag factor's own inputs are in, so it shows; nothing that needs the brakes does.
    expect(view.steps.map((x) => x.name)).toEqual([expect.stringMatching(/^Drag factor/)]);
  });

  it('a share that no longer reads: named as such, and no share or figure goes to the engine', () => {
    const s = withText(full, 'vehicle.share', 'sixty');
    expect(wheelsLine(readAnswers(s.answers))).toBeUndefined();
    const c = buildCase(s, { id: 'half' });
    expect(c.vehicle.frontAxleShare).toBeUndefined();
    expect(c.analyses).toEqual([]);
    expect(panel(s).note).toBe(
      'The speed follows: still to answer: Front axle share (does not read).',
    );
    expect(panel(s).steps.map((x) => x.name)).toEqual([expect.stringMatching(/^Drag factor/)]);
  });

  it('a posted limit that does not read is left out of the case, not passed on as typed', () => {
    const s = withText(full, 'limit', 'fast');
    expect(buildCase(full, { id: 'half' }).postedLimit).toBe(35);
    expect(buildCase(s, { id: 'half' }).postedLimit).toBeUndefined();
  });
});
