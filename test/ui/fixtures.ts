/** Invented cases for the screen tests: every name and number is made up for these tests. */

/** A finished slide: 100 ft to rest, f 0.70 (0.60-0.80), all brakes, posted 40 mph. */
export const finishedSlide = {
  format: 'skidcase-case',
  version: 1,
  id: 'finished-slide',
  updated: '2026-11-30T10:00:00Z',
  units: 'imperial',
  details: { reference: 'UI-TEST-FINISHED' },
  postedLimit: 40,
  vehicle: { label: 'test car', brakes: { mode: 'all' } },
  analyses: [
    {
      id: 'skid-1',
      kind: 'skid',
      marks: [100],
      segments: [{ drag: { source: 'entered', value: 0.7, low: 0.6, high: 0.8 }, grade: 0 }],
      end: { mode: 'stop' },
    },
  ],
};

/** A case with only its details answered, saved by the interview, older than the finished one. */
export const halfDone = {
  format: 'skidcase-case',
  version: 1,
  id: 'half-done',
  updated: '2026-11-29T09:00:00Z',
  units: 'imperial',
  details: { reference: 'UI-TEST-HALF', investigator: 'T. Tester' },
  vehicle: {},
  analyses: [],
  interview: {
    version: 1,
    answers: {
      'details.reference': { text: 'UI-TEST-HALF', value: 'UI-TEST-HALF' },
      'details.occurred': { text: '', value: '' },
      'details.location': { text: '', value: '' },
      'details.investigator': { text: 'T. Tester', value: 'T. Tester' },
      'details.notes': { text: '', value: '' },
    },
    cursor: 'units',
    mode: 'guided',
  },
};

/** Not JSON at all: cut off in the middle, as a crash of some other editor might leave it. */
export const truncated =
  '{ "format": "skidcase-case", "version": 1, "id": "cut-off", "units": "imp';
