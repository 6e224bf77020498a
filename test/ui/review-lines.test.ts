import { describe, expect, it } from 'vitest';
import { loadCase, type Case } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { CAUTIONS } from '../../src/format/cautions.js';
import { reviewLines } from '../../src/ui/review-lines.js';

function load(raw: unknown): Case {
  const r = loadCase(raw);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.case;
}

// Invented scenario: one 100 ft slide to a stop, f 0.70 (0.60-0.80), all brakes, limit 40 mph.
const simple = load({
  format: 'skidcase-case',
  version: 1,
  id: 'ui-simple',
  units: 'imperial',
  postedLimit: 40,
  vehicle: { brakes: { mode: 'all' } },
  analyses: [
    {
      id: 'skid-1',
      kind: 'skid',
      marks: [100],
      segments: [{ drag: { source: 'entered', value: 0.7, low: 0.6, high: 0.8 } }],
    },
  ],
});

describe('reviewLines', () => {
  const text = reviewLines(solveCase(simple), 80, { case: simple }).map((l) => l.text);
  const all = text.join('\n');

  it('shows the start speed and its range from S = sqrt(30 d f n)', () => {
    // Slide to stop: S = sqrt(30 × 100 × 0.70) = 45.83; low sqrt(30 × 100 × 0.60) = 42.43;
    // high sqrt(30 × 100 × 0.80) = 48.99.
    expect(all).toContain('45.8 mph (42.4 to 49.0)');
    // "at least": the low end rounded down (common practice).
    expect(all).toContain('at least 42 mph');
  });

  it('compares the low end with the posted limit', () => {
    expect(all).toContain('Posted limit 40 mph: the low end is above the limit.');
  });

  it('lists every step with formula, numbers and result', () => {
    const sol = solveCase(simple);
    const a = sol.analyses[0]!;
    if (!a.ok) throw new Error(a.reason);
    for (const s of a.solution.steps) {
      expect(all).toContain(s.name);
      expect(all.replace(/\s+/g, ' ')).toContain(s.formula.replace(/\s+/g, ' '));
    }
  });

  it('opens with the figure itself, before the steps, on the first screen', () => {
    // Same figures as above (sqrt(30 × 100 × 0.70) = 45.83, low 42.43): shown first, in one line.
    expect(text[0]).toBe('At a glance');
    expect(text[1]).toBe('  Analysis 1 (slide): at least 42 mph; 45.8 mph (42.4 to 49.0)');
    expect(text.findIndex((l) => l.startsWith('Analysis 1 · slide'))).toBeLessThan(10);
    // The per-analysis result lines are still the only ones starting "Result:".
    expect(text.filter((l) => /^\s*Result: at least/.test(l))).toHaveLength(1);
  });

  it('ends with every caution', () => {
    for (const c of CAUTIONS) expect(all.replace(/\s+/g, ' ')).toContain(c);
  });

  it('keeps every line within the width', () => {
    for (const w of [60, 80])
      for (const l of reviewLines(solveCase(simple), w, { case: simple }))
        expect([...l.text].length).toBeLessThanOrEqual(w);
  });
});
