import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { DEFAULT_REACTION_TIME } from '../../src/engine/constants.js';
import { codeOnly } from '../engine/formula-scan.js';

// The default perception-reaction time has one definition (engine/constants.ts); the verdict
// "would a vehicle at the posted limit have stopped" and "is the low end above the posted limit"
// have one wording (format/verdict.ts) and one comparison (engine/solution.ts). This scans src/
// for second copies, the way one-formula.test.ts does for the formulas.

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));
const HOMES = {
  reaction: 'engine/constants.ts',
  words: 'format/verdict.ts',
  comparison: 'engine/solution.ts',
};

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory()
      ? sources(join(dir, e.name))
      : /\.tsx?$/.test(e.name)
        ? [join(dir, e.name)]
        : [],
  );
}

/** The published reaction times and the default, s: a second copy would be one of these numbers. */
const PUBLISHED = ['0.7', '0.75', '1.25', '1.5', '2.5'];

/** A reaction time written as a number in code: a line naming a reaction time beside one of them. */
export function reactionTimeCopies(text: string): string[] {
  const literal = new RegExp(
    `(?<![\\w.])(${PUBLISHED.map((n) => n.replace('.', '\\.')).join('|')})(?![\\w.])`,
  );
  return codeOnly(text)
    .split('\n')
    .filter((l) => /react|perception/i.test(l) && literal.test(l))
    .map((l) => l.trim());
}

/** The verdict's words written out: the headline, the detail, or the above/not above choice. */
export function verdictWordingCopies(text: string): string[] {
  const patterns = [
    /Would have stopped before|would (not )?have come to rest/,
    /stops short of it|does not stop before it/i,
    /(short|beyond) of it\b|\bbeyond it\b|\bshort of it\b/i,
    /'above'\s*:\s*'not above'|'not above'\s*:\s*'above'/,
  ];
  // Comments are not wording the user sees.
  const noComments = text.replace(/\/\*[\s\S]*?\*\//g, '').replace(/^\s*\/\/.*$/gm, '');
  return noComments
    .split('\n')
    .filter((l) => patterns.some((p) => p.test(l)))
    .map((l) => l.trim());
}

/** A low end compared with a limit by hand instead of through isAboveLimit. */
export function limitComparisonCopies(text: string): string[] {
  return codeOnly(text)
    .split('\n')
    .filter((l) =>
      /\blow\s*>=?\s*[\w.]*(limit|lim)\b|(limit|lim)[\w.]*\s*<=?\s*[\w.]*\blow\b/i.test(l),
    )
    .map((l) => l.trim());
}

describe('one default reaction time, one verdict', () => {
  const files = sources(SRC).map((f) => ({
    path: relative(SRC, f).split('\\').join('/'),
    text: readFileSync(f, 'utf8'),
  }));
  const at = (p: string) => files.find((f) => f.path === p)!.text;
  const elsewhere = (home: string, scan: (t: string) => string[]) =>
    files.filter((f) => f.path !== home).flatMap((f) => scan(f.text).map((c) => `${f.path}: ${c}`));

  it('the scans see each definition in its home', () => {
    expect(codeOnly(at(HOMES.reaction))).toMatch(/surprise: 1\.5,/);
    expect(codeOnly(at(HOMES.reaction))).toMatch(
      /DEFAULT_REACTION_TIME: number = REACTION_TIMES\.surprise/,
    );
    expect(verdictWordingCopies(at(HOMES.words)).join('\n')).toMatch(/Would have stopped/);
    expect(verdictWordingCopies(at(HOMES.words)).join('\n')).toMatch(/'above' : 'not above'/);
    expect(limitComparisonCopies(at(HOMES.comparison))).not.toEqual([]);
    expect(DEFAULT_REACTION_TIME).toBe(1.5);
  });

  it('no other file writes a reaction time as a number', () => {
    expect(elsewhere(HOMES.reaction, reactionTimeCopies)).toEqual([]);
  });

  it('no other file words the stop verdict or the above/not above choice', () => {
    expect(elsewhere(HOMES.words, verdictWordingCopies)).toEqual([]);
  });

  it('no other file compares a low end with the limit by hand', () => {
    expect(elsewhere(HOMES.comparison, limitComparisonCopies)).toEqual([]);
  });

  it('catches the copies the code used to hold', () => {
    for (const line of [
      'export const SOLVE_REACTION_TIME = 1.5;',
      '  reactionTime: 1.5,',
      'const t = own ?? opts.reactionTime ?? 1.5;',
    ])
      expect(reactionTimeCopies(line), line).not.toEqual([]);
    for (const line of [
      "      ? 'stops short of it'",
      '        ? `does not stop before it, passing at ${x}`',
      '    return `A vehicle at the posted limit of ${limit} would not have come to rest before ${v.what}`;',
      "const w = above ? 'above' : 'not above';",
    ])
      expect(verdictWordingCopies(line), line).not.toEqual([]);
    expect(
      limitComparisonCopies("is ${low > lim.value ? 'above' : 'not above'} the posted limit"),
    ).not.toEqual([]);
    // Not a reaction time: a picture's stretch, a reaction time read from a field.
    expect(reactionTimeCopies('if (stretch > 1.5) scale = 2;')).toEqual([]);
    expect(reactionTimeCopies('const t = td?.reactionTime;')).toEqual([]);
    expect(
      reactionTimeCopies('export const REACTION_TIME = { min: 0.5, max: 5 } as const;'),
    ).toEqual([]);
  });
});
