import { mkdtempSync, rmSync, writeFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runSolve } from './run-solve.js';

// A catalogue of bad case files. Each invalid one must exit 2 with `path: message` naming the
// field on stderr, print nothing on stdout and write nothing; each valid but uncomputable one
// must exit 3 naming the analysis.

const dir = mkdtempSync(join(tmpdir(), 'skidcase-bad-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const base = () => ({
  format: 'skidcase-case',
  version: 1,
  id: 'bad-file',
  units: 'imperial',
  vehicle: { brakes: { mode: 'all' }, trackWidth: 5.5 },
  analyses: [
    {
      id: 'skid-1',
      kind: 'skid',
      marks: [70, 72],
      segments: [{ drag: { source: 'entered', value: 0.7 } }],
    },
    {
      id: 'yaw-1',
      kind: 'yaw',
      chord: 40,
      middleOrdinate: 2,
      drag: { source: 'entered', value: 0.7 },
      pathAdjustment: 'half-track',
    },
  ],
});
type Case = ReturnType<typeof base> & Record<string, unknown>;

let count = 0;
function write(text: string): string {
  const f = join(dir, `case-${++count}.json`);
  writeFileSync(f, text);
  return f;
}
const edit = (fn: (c: Case) => void) => {
  const c = base() as Case;
  fn(c);
  return JSON.stringify(c);
};
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- an analysis of either kind, edited by field name
const a0 = (c: Case) => c.analyses[0] as any;
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- as above
const a1 = (c: Case) => c.analyses[1] as any;

const invalid: [string, string, string][] = [
  [
    'a negative mark',
    edit((c) => (a0(c).marks[0] = -3)),
    'analyses[0].marks[0]: length must be greater than 0',
  ],
  [
    'a zero segment length',
    edit((c) => (a0(c).segments[0].length = 0)),
    'analyses[0].segments[0].length: length must be greater than 0',
  ],
  [
    'NaN as text',
    edit((c) => (a0(c).marks[1] = 'NaN')),
    'analyses[0].marks[1]: length must be a number',
  ],
  [
    'a drag factor as a string',
    edit((c) => (a0(c).segments[0].drag.value = '0.7')),
    'analyses[0].segments[0].drag.value',
  ],
  [
    'a zero drag factor',
    edit((c) => (a1(c).drag.value = 0)),
    'analyses[1].drag.value: drag factor must be greater than 0',
  ],
  [
    'low above value',
    edit((c) => (a0(c).marks[0] = { value: 70, low: 72 })),
    'analyses[0].marks[0].low: length: low must not be above value',
  ],
  [
    'high below value',
    edit((c) => (a1(c).chord = { value: 40, high: 39 })),
    'analyses[1].chord.high',
  ],
  [
    'middle ordinate at half the chord',
    edit((c) => (a1(c).middleOrdinate = 20)),
    'analyses[1].middleOrdinate: middle ordinate must be less than half the chord',
  ],
  [
    'middle ordinate high end past half the chord',
    edit((c) => (a1(c).middleOrdinate = { value: 19, high: 21 })),
    'analyses[1].middleOrdinate.high',
  ],
  [
    'efficiency above 1',
    edit((c) => (c.vehicle.brakes = { mode: 'estimate', efficiency: 1.2 } as never)),
    'vehicle.brakes.efficiency: braking efficiency must be at most 1',
  ],
  [
    'an unknown version',
    edit((c) => (c.version = 'one' as never)),
    'version: version must be a whole number from 1',
  ],
  [
    'a newer version',
    edit((c) => (c.version = 2 as never)),
    'version: written by a newer skidcase (file version 2; this one reads up to version 1): update skidcase to open it',
  ],
  ['truncated JSON', JSON.stringify(base()).slice(0, 80), '(file): not valid JSON'],
  [
    'half-track without track width',
    edit((c) => delete (c.vehicle as { trackWidth?: number }).trackWidth),
    'vehicle.trackWidth: track width is required for the half-track adjustment of analyses[1]',
  ],
  [
    'missing brakes with a skid',
    edit((c) => delete (c.vehicle as { brakes?: unknown }).brakes),
    'vehicle.brakes: brakes are required for a skid analysis',
  ],
  [
    'several segments without lengths',
    edit((c) => a0(c).segments.push({ drag: { source: 'entered', value: 0.5 } })),
    'analyses[0].segments[0].length: length is required when there are several segments',
  ],
  [
    '1e309 (beyond a double)',
    JSON.stringify(base()).replace('[70,72]', '[1e309,72]'),
    'analyses[0].marks[0]: length must be a finite number',
  ],
  ['an unknown kind', edit((c) => (a1(c).kind = 'scuff')), 'analyses[1].kind'],
  [
    'a grade of 100%',
    edit((c) => (a0(c).segments[0].grade = 100)),
    'analyses[0].segments[0].grade: grade must be less than 100',
  ],
  [
    'a wrong format marker',
    edit((c) => (c.format = 'other')),
    'format: format must be "skidcase-case"',
  ],
  ['not an object', '[1, 2, 3]', '(file): a case file is a JSON object'],
  ['an empty file', '', '(file): not valid JSON'],
];

describe('invalid files: exit 2 naming the field', () => {
  for (const [what, text, expected] of invalid)
    it(what, async () => {
      const file = write(text);
      const before = readdirSync(dir).length;
      const r = await runSolve(file, true);
      expect(r.code).toBe(2);
      expect(r.out).toBe('');
      expect(r.err).toContain(expected);
      expect(r.err).not.toMatch(/\n\s+at /); // no stack trace
      expect(readdirSync(dir).length).toBe(before); // nothing written
    });

  it('a byte-order mark before valid JSON (as some editors save) is accepted', async () => {
    const r = await runSolve(write(`\uFEFF${JSON.stringify(base())}`), true);
    expect(r.code).toBe(0);
  });
  it('a missing file is exit 2 naming the file', async () => {
    const f = join(dir, 'no-such-case.json');
    const r = await runSolve(f);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${f}: no such file`);
  });
  it('a folder is exit 2 naming it', async () => {
    const r = await runSolve(dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${dir}: is a folder`);
  });
});

const uncomputable: [string, string, RegExp][] = [
  [
    'a steep downhill segment',
    edit((c) => (a0(c).segments[0].grade = -75)),
    /analyses\[0\] \(skid-1\): cannot be computed: segment 1: a 75% downhill grade is steeper than the drag factor 0\.70 × n 1\.00 can hold/,
  ],
  [
    'n = 0 on level ground',
    edit((c) => (c.vehicle.brakes = { mode: 'estimate', efficiency: 0 } as never)),
    /analyses\[0\] \(skid-1\): cannot be computed: segment 1: the drag factor 0\.70 × n 0\.00 gives no drag/,
  ],
  [
    'a bank falling away more than the drag factor holds',
    edit((c) => (a1(c).superelevation = -80)),
    /analyses\[1\] \(yaw-1\): cannot be computed: the road falls away/,
  ],
  [
    'a track wider than the arc',
    edit((c) => {
      c.vehicle.trackWidth = 90;
      a1(c).chord = 20;
      a1(c).middleOrdinate = 5;
    }),
    /analyses\[1\] \(yaw-1\): cannot be computed: half the track width is not smaller than the radius/,
  ],
];

describe('valid but uncomputable: exit 3 naming the analysis', () => {
  for (const [what, text, expected] of uncomputable)
    it(what, async () => {
      const json = await runSolve(write(text), true);
      expect(json.code).toBe(3);
      expect(json.err).toMatch(expected);
      const human = await runSolve(write(text));
      expect(human.code).toBe(3);
      expect(human.out).toMatch(/cannot be computed/);
      expect(human.out).not.toMatch(/NaN|Infinity/);
    });
});
