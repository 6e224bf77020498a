import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { codeOnly } from '../engine/formula-scan.js';

// The figures beyond the chain (sensitivity, sampling, time and distance at the posted limit) are
// computed in one place, caseResult in src/extras/analysis-extras.ts, and every output (the
// review, solve's text and JSON, each report format) renders that one result document. This
// scans src/ for a call to any of those computations outside that file: a second assembly would
// be free to disagree with the first (a different reaction time, a sampling the other skips).

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));
const HOME = 'extras/analysis-extras.ts';
/** The extras' own computations: called only by the result document. */
const COMPUTATIONS = ['sensitivity', 'sampleSpeeds', 'limitComparison', 'analysisExtras'];
/** Who builds the result document: each command or screen that shows figures, once. */
const BUILDERS = [
  'commands/report.ts',
  'commands/solve.ts',
  'ui/review-extras.ts',
  'ui/write-report.ts',
];

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory()
      ? sources(join(dir, e.name))
      : /\.tsx?$/.test(e.name)
        ? [join(dir, e.name)]
        : [],
  );
}

/** Calls of `name(` in code (comments and strings left out), not its own definition. */
export function callsOf(text: string, name: string): number {
  const code = codeOnly(text);
  const calls = code.match(new RegExp(`(?<![\\w.$])${name}\\s*\\(`, 'g'))?.length ?? 0;
  const defs = code.match(new RegExp(`function\\s+${name}\\s*\\(`, 'g'))?.length ?? 0;
  return calls - defs;
}

const files = sources(SRC).map((f) => ({
  name: relative(SRC, f).split('\\').join('/'),
  text: readFileSync(f, 'utf8'),
}));

describe('one result document', () => {
  it('the scan sees a call, and not a definition or a comment', () => {
    expect(callsOf('const x = sensitivity(s);', 'sensitivity')).toBe(1);
    expect(callsOf('export function sensitivity(s) {}', 'sensitivity')).toBe(0);
    expect(callsOf('// sensitivity(s) is run elsewhere', 'sensitivity')).toBe(0);
    expect(callsOf('sensitivityBars(rows)', 'sensitivity')).toBe(0);
  });

  it.each(COMPUTATIONS)('%s is called only by the result document', (name) => {
    const where = files.filter((f) => f.name !== HOME && callsOf(f.text, name) > 0);
    expect(where.map((f) => f.name)).toEqual([]);
    expect(callsOf(files.find((f) => f.name === HOME)!.text, name)).toBeGreaterThan(0);
  });

  it('the result document is built by the commands and screens that show figures, once each', () => {
    const where = files.filter((f) => callsOf(f.text, 'caseResult') > 0 && f.name !== HOME);
    expect(where.map((f) => f.name).sort()).toEqual(BUILDERS);
    for (const f of where) expect(callsOf(f.text, 'caseResult'), f.name).toBe(1);
  });
});
