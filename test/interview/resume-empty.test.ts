import { describe, expect, it } from 'vitest';
import { buildCase, summaryOfDone, type InterviewState } from '../../src/interview/index.js';
import { liveInterview } from '../../src/ui/interview-live.js';
import { loadCase, type Case } from '../../src/case/load.js';
import { fillUntil, start, type } from './drive.js';

// Invented answers; the case is saved and opened again as the app does (through the loader).
const reopen = (s: InterviewState): InterviewState => {
  const r = loadCase(JSON.parse(JSON.stringify(buildCase(s, { id: 'r-1' }))));
  if (!r.ok) throw new Error('the saved case does not load');
  return liveInterview.fromCase(r.case as Case, 'guided');
};

describe('resume lands on the first open question', () => {
  it('after optional answers saved with an empty text: they count as answered', () => {
    // Reference, date, location, investigator and notes all left empty with Enter.
    let s = fillUntil(start(), {}, 'units');
    s = type(s, 'm', '');
    expect(s.answers['limit']).toEqual({ text: '', value: undefined });
    const back = reopen({ ...s, cursor: 'details.reference' });
    expect(back.cursor).toBe('vehicle.label');
    expect(summaryOfDone(back)).toEqual([
      'Case: metres and km/h',
      'Vehicle: brakes not needed (no slide)',
      // Left in the analysis: its look and label ("another analysis?" not counted).
      'Analysis 1: marks not yet described; 2 questions left',
      // 5 details + units + limit answered, of those 7 + vehicle label + look, label and
      // "another analysis?" + the distribution at the end = 12.
      '7 of 12 questions answered',
    ]);
  });

  it('after a required answer saved with an empty text: it is open again, not skipped', () => {
    let s = fillUntil(
      start(),
      { units: 'f', 'a0.look': 'd', 'vehicle.brakes': 'a', 'a0.surfaces': 'o' },
      'a0.count',
    );
    // As a half-typed answer is kept on save: the text without a parsed value.
    s = { ...s, answers: { ...s.answers, 'a0.count': { text: '', value: undefined } } };
    const back = reopen({ ...s, cursor: 'a0.end' });
    expect(back.cursor).toBe('a0.count');
    expect(summaryOfDone(back)[2]).toMatch(/^Analysis 1 - slide: 1 segment; \d+ questions left$/);
  });
});
