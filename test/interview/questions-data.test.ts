import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { allQuestions, questionStates, signed, stateFromCase } from '../../src/interview/index.js';
import { readQuantity, quantityText } from '../../src/interview/read-quantity.js';
import { RULES, type Quantity } from '../../src/case/quantity.js';
import type { Case } from '../../src/case/load.js';

// An invented case touching every branch the format has, so that every question is built.
const WIDE: Case = {
  format: 'skidcase-case',
  version: 1,
  id: 'wide',
  units: 'metric',
  vehicle: {
    frontAxleShare: 0.6,
    trackWidth: 1.5,
    brakes: { mode: 'wheels', frontLeft: 1, frontRight: 0.5, rearLeft: 0, rearRight: 1 },
  },
  analyses: [
    {
      id: 'a',
      kind: 'skid',
      marks: [20, 21],
      segments: [
        {
          length: 12,
          drag: { source: 'table', surface: 'asphalt-dry-new', value: 0.8, low: 0.65, high: 1 },
          grade: 2,
        },
        { length: 9, drag: { source: 'sled', weight: 30, pulls: [20, 21] }, grade: -1 },
      ],
      end: { mode: 'speed', speed: 20, basis: 'crush' },
    },
    {
      id: 'b',
      kind: 'yaw',
      chord: 14,
      middleOrdinate: 0.8,
      drag: { source: 'test-skids', tests: [{ speed: 50, distance: 14 }] },
      superelevation: -2,
      pathAdjustment: 'half-track',
    },
  ],
};

describe('questions as data', () => {
  const s = stateFromCase(WIDE);
  const qs = allQuestions(s.answers);

  it('every choice has a single-key shortcut, unique within its question', () => {
    for (const q of qs.filter((x) => x.choices)) {
      const keys = q.choices!.map((c) => c.key.toLowerCase());
      expect(
        keys.every((k) => k.length === 1),
        q.id,
      ).toBe(true);
      expect(new Set(keys).size, q.id).toBe(keys.length);
    }
  });

  it('every question has a title, a section, a prompt and a reason it is asked', () => {
    for (const q of qs) {
      expect(q.title.length, q.id).toBeGreaterThan(2);
      expect(q.section.length, q.id).toBeGreaterThan(2);
      expect(q.prompt.length, q.id).toBeGreaterThan(5);
      expect(q.help.why.length, q.id).toBeGreaterThan(10);
    }
  });

  it('the jump list names each question once', () => {
    const listed = questionStates(s).map((q) => q.id);
    expect(new Set(listed).size).toBe(listed.length);
  });

  it('unit hints follow the case units', () => {
    const byId = new Map(qs.map((q) => [q.id, q]));
    expect(byId.get('a0.seg0.length')!.unitHint).toBe('m');
    expect(byId.get('a0.end.speed')!.unitHint).toBe('km/h');
    expect(byId.get('a0.seg0.grade.pct')!.unitHint).toBe('%');
    expect(byId.get('a0.seg0.drag.value')!.unitHint).toBe('decimal');
  });
});

describe('quantities written back as text', () => {
  const end = fc
    .double({ min: 0.01, max: 900, noNaN: true })
    .map((n) => Math.round(n * 1000) / 1000);
  const q: fc.Arbitrary<Quantity> = fc.oneof(
    end,
    fc.tuple(end, end, end).map(([a, b, c]) => {
      const [low, value, high] = [a, b, c].sort((x, y) => x - y) as [number, number, number];
      return low === value && value === high ? value : { value, low, high };
    }),
  );

  it('read back to the same quantity', () => {
    fc.assert(
      fc.property(q, (x) => {
        const r = readQuantity(
          quantityText(x),
          { kind: 'length', rule: RULES.length, range: true },
          'imperial',
        );
        expect(r.ok && r.value).toEqual(x);
      }),
    );
  });

  it('signed flips the sign and swaps the ends, twice is the identity', () => {
    expect(signed({ value: 3, low: 2, high: 4 }, true)).toEqual({ value: -3, low: -4, high: -2 });
    fc.assert(
      fc.property(q, (x) => {
        expect(signed(signed(x, true), true)).toEqual(x);
      }),
    );
  });
});
