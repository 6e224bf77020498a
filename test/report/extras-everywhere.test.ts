import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadCaseText } from '../../src/case/load.js';
import { formatNumber } from '../../src/engine/number-text.js';
import { solveCase } from '../../src/engine/solve-case.js';
import { reviewLines } from '../../src/ui/review-lines.js';
import { demo, flat, runReport, runSolve, tempDir } from './helpers.js';

// The figures beyond the chain come from one result document: the review, solve's text, solve's
// JSON and the text report must show the same sampled percentiles, the same reaction distance
// (the same reaction time: neither the case nor a preference sets one, so all use the default)
// and the same fitted circle. The JSON's unrounded figures are the reference; each output must
// show them written the way every output writes a figure.

/** A case written to a temp file, and every output of it as flat text. */
async function outputs(raw: unknown) {
  const t = tempDir();
  try {
    const file = path.join(t.dir, 'case.json');
    writeFileSync(file, JSON.stringify(raw, null, 2));
    const loaded = loadCaseText(JSON.stringify(raw));
    if (!loaded.ok) throw new Error('invalid test case');
    const review = flat(
      reviewLines(solveCase(loaded.case), 200, { case: loaded.case })
        .map((l) => l.text)
        .join(' '),
    );
    const json = JSON.parse((await runSolve(file, true)).out);
    const text = flat((await runSolve(file, false)).out);
    const report = flat((await runReport(file, { format: 'txt' })).out);
    return { review, json, text, report };
  } finally {
    t.done();
  }
}

describe('the extras read the same in every output', () => {
  it('a slide with a posted limit and sampling: percentiles and reaction distance agree', async () => {
    const raw = JSON.parse(readFileSync(demo('demo-orchard-hill.json'), 'utf8'));
    raw.sampling = { samples: 4000, seed: 11 };
    const o = await outputs(raw);
    const a = o.json.analyses[0];
    const d = a.distribution;
    expect(d.samples).toBe(4000);
    const pct = [d.p5, d.p50, d.p95].map((n: number) => formatNumber(n, 'speed'));
    const reaction = formatNumber(a.timeDistance.reactionDistance.value, 'length');
    for (const [name, shown] of Object.entries({
      review: o.review,
      text: o.text,
      report: o.report,
    })) {
      for (const p of pct) expect(shown, `${name} shows ${p}`).toContain(` ${p}`);
      expect(shown, `${name} shows the reaction distance ${reaction}`).toContain(` ${reaction} `);
    }
  });

  it('a yaw measured by offsets: the fitted radius and scatter agree', async () => {
    // Invented mark on a 101 ft circle over a 40 ft chord (offsets from Pythagoras), one offset
    // read 0.05 ft long so the fit has scatter to report.
    const off10 = Math.sqrt(101 ** 2 - 10 ** 2) - 99;
    const raw = {
      format: 'skidcase-case',
      version: 1,
      id: 'offsets-everywhere',
      units: 'imperial',
      vehicle: { brakes: { mode: 'all' } },
      analyses: [
        {
          id: 'yaw-1',
          kind: 'yaw',
          drag: { source: 'entered', value: 0.72, low: 0.68, high: 0.76 },
          offsets: {
            chord: 40,
            stations: [
              { at: 10, offset: off10 },
              { at: 20, offset: 2.05 },
              { at: 30, offset: off10 },
            ],
          },
        },
      ],
    };
    const o = await outputs(raw);
    const fit = o.json.analyses[0].offsetsFit;
    expect(fit.fittedRadius).toBeGreaterThan(95);
    expect(fit.fittedRadius).toBeLessThan(101);
    const radius = formatNumber(fit.fittedRadius, 'length');
    const rms = formatNumber(fit.rms, 'length');
    expect(o.review).toContain(`radius ${radius} ft`);
    expect(o.review).toContain(`RMS scatter ${rms} ft`);
    expect(o.report).toContain(`radius ${radius} ft`);
    expect(o.report).toContain(`residuals RMS ${rms} ft`);
    // The chain's radius step is the same fit.
    expect(o.json.analyses[0].steps[0].result).toBeCloseTo(fit.fittedRadius, 9);
  });
});
