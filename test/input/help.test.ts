/** The help overlay's text: every example it shows is accepted, every unit it lists is read. */
import { describe, expect, it } from 'vitest';
import { RULES } from '../../src/case/quantity.js';
import {
  parseMarksLine,
  parseQuantity,
  parseSegmentLine,
  QUICK_ENTRY_HELP,
  UNIT_SUFFIX_HELP,
  unitSuffixes,
} from '../../src/input/index.js';

const line = (start: string) => QUICK_ENTRY_HELP.find((l) => l.trimStart().startsWith(start))!;

describe('QUICK_ENTRY_HELP', () => {
  it('fits an 80-column terminal', () => {
    for (const l of [...QUICK_ENTRY_HELP, ...UNIT_SUFFIX_HELP])
      expect(l.length, l).toBeLessThanOrEqual(80);
  });

  it('shows mark examples that the marks parser accepts', () => {
    const alternatives = line('Marks:')
      .replace('Marks:', '')
      .split(/\s+or\s+/)
      .map((s) => s.trim());
    expect(alternatives).toEqual(['94 92 95 93', '94, 92, 95', '94 ft 2 in, 92']);
    for (const a of alternatives) expect(parseMarksLine(a, { units: 'imperial' }).ok, a).toBe(true);
    const equal = QUICK_ENTRY_HELP.find((l) => l.includes(' x '))!
      .trim()
      .split(/\s{2,}/)[0]!;
    expect(parseMarksLine(equal, { units: 'imperial' })).toEqual({
      ok: true,
      marks: [80.5, 80.5, 80.5, 80.5],
    });
  });

  it('shows a segment example that the segment parser reads as three segments', () => {
    const example = QUICK_ENTRY_HELP.find((l) => l.includes('[grass, wet]'))!.trim();
    const r = parseSegmentLine(example, { units: 'imperial' });
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.segments.map((s) => s.grade)).toEqual([2, 0, -3]);
    if (r.ok) expect(r.segments.map((s) => s.label)).toEqual([undefined, 'gravel', 'grass, wet']);
  });

  it('shows drag factor forms that are all accepted', () => {
    const drags = QUICK_ENTRY_HELP.filter((l) => l.includes('@'))
      .flatMap((l) => l.match(/@[^\s,;]+(?: \([^)]*\))?/g) ?? [])
      .filter((d) => d !== '@DRAG');
    expect(drags.length).toBeGreaterThanOrEqual(6);
    for (const d of drags)
      expect(parseSegmentLine(`10 ${d}`, { units: 'imperial' }).ok, d).toBe(true);
  });

  it('shows range forms that are all accepted', () => {
    const ranges = line('Ranges')
      .replace(/^Ranges:\s*/, '')
      .replace(/\.$/, '')
      .split(/,\s+/);
    expect(ranges).toHaveLength(5);
    for (const r of ranges) {
      const spec = {
        field: 'x',
        kind: 'length' as const,
        units: 'imperial' as const,
        rule: RULES.length,
        allowRange: true,
      };
      const out = parseQuantity(r, spec);
      expect(out.ok, r).toBe(true);
      if (out.ok) expect(typeof out.value).toBe('object');
    }
  });
});

describe('UNIT_SUFFIX_HELP', () => {
  const kinds = ['length', 'speed', 'percent', 'factor', 'time', 'weight'] as const;

  it('lists every suffix of each kind, and each listed suffix is read for that kind', () => {
    expect(UNIT_SUFFIX_HELP).toHaveLength(kinds.length);
    kinds.forEach((kind, i) => {
      const help = UNIT_SUFFIX_HELP[i]!;
      if (kind !== 'factor') expect(help).toContain(unitSuffixes(kind));
      const suffixes = unitSuffixes(kind)
        .replace(/\(or ([^)]+)\)/g, ', $1')
        .split(/,\s*|\s+or\s+/)
        .map((s) => s.trim())
        .filter(Boolean);
      for (const s of suffixes) {
        const spec = {
          field: 'x',
          kind,
          units: 'metric' as const,
          rule: { what: 'x', gt: -1e9 },
          allowRange: false,
        };
        expect(parseQuantity(`1 ${s}`, spec).ok, `${kind}: 1 ${s}`).toBe(true);
      }
    });
  });
});
