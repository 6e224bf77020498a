import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { codeOnly, formulaCopies } from './formula-scan.js';

// Each formula of the trade is computed by one scalar function in src/engine/formulas.ts; the
// ranges, the analysis models, the limit comparison and the interview's checks call it. This
// scans every source file for the arithmetic of those formulas written out again.

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));
const HOME = 'engine/formulas.ts';

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory()
      ? sources(join(dir, e.name))
      : /\.tsx?$/.test(e.name)
        ? [join(dir, e.name)]
        : [],
  );
}

describe('one implementation of each formula', () => {
  const files = sources(SRC).map((f) => ({
    path: relative(SRC, f).split('\\').join('/'),
    text: readFileSync(f, 'utf8'),
  }));

  it('finds the formulas in their one home (the scan can see them)', () => {
    const home = files.find((f) => f.path === HOME)!;
    const kinds = formulaCopies(home.text).map((c) => c.kind);
    for (const k of ['effective drag', 'radius', 'slide energy', 'critical speed'])
      expect(kinds, k).toContain(k);
  });

  it('no other file in src/ writes the effective drag, the radius, the slide energy or the critical speed', () => {
    const copies = files
      .filter((f) => f.path !== HOME)
      .flatMap((f) => formulaCopies(f.text).map((c) => `${f.path}: ${c.kind}: ${c.code}`));
    expect(copies).toEqual([]);
  });

  it('catches the copies the code used to hold', () => {
    const old = [
      'const eff = f * n + G / 100;',
      'const eff = (x[fKeys[j]!] ?? f0[j]!) * nn + (x[gKeys[j]!] ?? g0[j]!) / 100;',
      'const e = (a: number, b: number, g: number) => a * b + g / 100;',
      'const R = (c * c) / (8 * m) + m / 2 - t / 2;',
      'const r = ch ** 2 / (8 * m) + m / 2;',
      'sq = sq + C * s.d.value * e.value;',
      'const drop = v2 / (C * s.eff);',
      'const S = Math.sqrt((K * R * (f + e)) / (1 - f * e));',
    ];
    for (const line of old) expect(formulaCopies(line), line).not.toEqual([]);
  });

  it('ignores the formulas written in comments and in the text of steps', () => {
    const text = [
      '// S² = C d (f n + G/100) and R = C²/(8 × M) + M/2',
      "const formula = 'f * n + G / 100';",
      'const sub = `v = ${C} × d × (f × n + G/100)`;',
    ].join('\n');
    expect(codeOnly(text)).not.toMatch(/100|8/);
    expect(formulaCopies(text)).toEqual([]);
  });
});
