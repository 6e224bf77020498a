import { describe, expect, it } from 'vitest';
import {
  decimalsOf,
  escapeRe,
  flat,
  runReport,
  shownAs,
  solveJson,
  REPORT_CASES,
  NUM,
} from './helpers.js';

/**
 * Every figure the report prints is read back out of the report text and checked against
 * `skidcase solve --json` for the same file, so the test fails if either side drifts.
 * Cases: the shipped demo cases (imperial two-surface downhill slide, metric banked yaw) and two
 * invented fixtures of our own (an imperial two-surface slide, a metric yaw with half-track).
 */
const CASES = REPORT_CASES;

describe.each(CASES)('report figures equal solve --json: %s', (_name, file) => {
  for (const format of ['md', 'txt', 'html'] as const) {
    it(`${format}: the "at least" statement of every analysis`, async () => {
      const json = await solveJson(file);
      const r = await runReport(file, { format });
      expect(r.code).toBe(0);
      const u = escapeRe(json.units.speed);
      const re = new RegExp(
        `At least ${NUM} ${u} at the start of the marks \\(computed ${NUM} ${u}, range ${NUM} to ${NUM} ${u}\\)`,
        'g',
      );
      const found = [...flat(r.out).matchAll(re)];
      expect(found).toHaveLength(json.analyses.length);
      found.forEach((m, i) => {
        const a = json.analyses[i]!;
        expect(Number(m[1])).toBe(a.minimum);
        expect(m[2]).toBe(shownAs(a.speed.value, 1));
        expect(m[3]).toBe(shownAs(a.speed.low, 1));
        expect(m[4]).toBe(shownAs(a.speed.high, 1));
        // The "at least" figure is the low end rounded down (common practice).
        expect(a.minimum).toBe(Math.floor(a.speed.low + 1e-9));
      });
    });
  }

  it('md: the results table row of every analysis', async () => {
    const json = await solveJson(file);
    const r = await runReport(file, { format: 'md' });
    const u = escapeRe(json.units.speed);
    json.analyses.forEach((a, i) => {
      const row = new RegExp(
        `\\| ${i + 1}\\. ${escapeRe(a.id)} \\| ${a.kind} \\| at least ${NUM} ${u} \\| ${NUM} ${u} \\| ${NUM} to ${NUM} ${u} \\|`,
      ).exec(r.out);
      expect(row, `results row for ${a.id}`).not.toBeNull();
      expect(Number(row![1])).toBe(a.minimum);
      expect([row![2], row![3], row![4]]).toEqual([
        shownAs(a.speed.value, 1),
        shownAs(a.speed.low, 1),
        shownAs(a.speed.high, 1),
      ]);
    });
  });

  it('txt and md: every step result, in order, equals the JSON step', async () => {
    const json = await solveJson(file);
    for (const format of ['txt', 'md'] as const) {
      const r = await runReport(file, { format });
      const re = new RegExp(`Result: ${NUM}(?:%| [a-z/]+)?(?: \\(${NUM} to ${NUM}\\))?`, 'g');
      // The engine's chain only: each analysis's "The chain, step by step" up to the next part.
      const chains = [
        ...flat(r.out).matchAll(/The chain, step by step(.*?)Where the drag factor comes from/g),
      ];
      expect(chains).toHaveLength(json.analyses.length);
      const shown = chains.flatMap((c) => [...c[1]!.matchAll(re)]);
      const steps = json.analyses.flatMap((a) => a.steps);
      expect(shown).toHaveLength(steps.length);
      shown.forEach((m, k) => {
        const st = steps[k]!;
        const dp = decimalsOf(m[1]!);
        expect(m[1], `${format} step ${k + 1} ${st.name}`).toBe(shownAs(st.result, dp));
        if (m[2] !== undefined) {
          expect(m[2]).toBe(shownAs(st.low, dp));
          expect(m[3]).toBe(shownAs(st.high, dp));
        } else {
          // No range shown: the ends round to the same figure as the value.
          expect(shownAs(st.low, dp)).toBe(m[1]);
          expect(shownAs(st.high, dp)).toBe(m[1]);
        }
      });
    }
  });

  it('md: the speed along the slide equals the JSON boundaries', async () => {
    const json = await solveJson(file);
    const r = await runReport(file, { format: 'md' });
    for (const a of json.analyses) {
      if (!a.boundaries) continue;
      for (const b of a.boundaries) {
        const row = new RegExp(
          `\\| ${escapeRe(b.label)} \\| ${NUM} \\| ${NUM} \\| ${NUM} to ${NUM} \\|`,
        ).exec(r.out);
        expect(row, `boundary ${b.label}`).not.toBeNull();
        const dp = decimalsOf(row![1]!);
        expect(row![1]).toBe(shownAs(b.at, dp));
        expect([row![2], row![3], row![4]]).toEqual([
          shownAs(b.speed.value, 1),
          shownAs(b.speed.low, 1),
          shownAs(b.speed.high, 1),
        ]);
      }
    }
  });

  it('the posted-limit comparison states the numbers and matches exceededAtMinimum', async () => {
    const json = await solveJson(file);
    const r = await runReport(file, { format: 'txt' });
    const text = flat(r.out);
    const lim = json.postedLimit!;
    const u = escapeRe(json.units.speed);
    expect(text).toMatch(
      new RegExp(
        `Posted limit: ${lim.value} ${u}\\. Exceeded at the minimum: ${lim.exceededAtMinimum ? 'yes' : 'no'}`,
      ),
    );
    json.analyses.forEach((a, i) => {
      const m = new RegExp(
        `${i + 1}\\. ${escapeRe(a.id)}: the low end of the range, ${NUM} ${u}, is (above|not above) the posted limit of ${lim.value} ${u}`,
      ).exec(text);
      expect(m).not.toBeNull();
      expect(m![1]).toBe(shownAs(a.speed.low, 1));
      expect(m![2]).toBe(a.speed.low > lim.value ? 'above' : 'not above');
    });
  });
});
