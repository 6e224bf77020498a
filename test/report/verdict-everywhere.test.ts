import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { caseResult } from '../../src/extras/analysis-extras.js';
import { loadCaseText } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/solve-case.js';
import { formatChainText } from '../../src/format/chain-text.js';
import { reviewLines } from '../../src/ui/review-lines.js';
import { demo, flat, runReport, tempDir } from './helpers.js';

// The demo slide (posted limit 35 mph) with a conflict point 40 ft into the marks: the review,
// solve's text and the report must give the same answer in the same words for both points.
const VERDICT =
  /Would have stopped before (the end of the marks|the conflict point) \(([\d.]+) ft from the start of the marks\): (yes|no|depends on the inputs)/g;
const verdicts = (text: string) =>
  [...text.matchAll(VERDICT)].map((m) => `${m[1]} at ${m[2]}: ${m[3]}`);

describe('one verdict in every output', () => {
  const raw = JSON.parse(readFileSync(demo('demo-orchard-hill.json'), 'utf8'));
  raw.analyses[0].timeDistance = { conflictAt: 40 };
  const loaded = loadCaseText(JSON.stringify(raw));
  if (!loaded.ok) throw new Error('demo invalid');
  const c = loaded.case;
  const solution = solveCase(c);

  it('review, solve text and report say the same for the end of the marks and the conflict point', async () => {
    const review = flat(
      reviewLines(solution, 200, { case: c })
        .map((l) => l.text)
        .join(' '),
    );
    const text = flat(formatChainText(caseResult(c, solution)));
    const fromReview = verdicts(review);
    expect(fromReview).toHaveLength(2);
    expect(fromReview[0]).toMatch(/^the end of the marks at /);
    expect(fromReview[1]).toMatch(/^the conflict point at 40\.0: /);
    expect(verdicts(text)).toEqual(fromReview);
    const t = tempDir();
    try {
      const file = path.join(t.dir, 'conflict.json');
      writeFileSync(file, JSON.stringify(raw, null, 2));
      const report = flat((await runReport(file, { format: 'txt' })).out);
      expect(verdicts(report)).toEqual(fromReview);
    } finally {
      t.done();
    }
  });
});
