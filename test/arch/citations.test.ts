import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

// Every source the code, tests, scripts and docs cite must be one a reader can consult: a
// published work, or a file in this repository (docs/physics.md, docs/case-file.md,
// DEVELOPERS.md). Notes kept outside the repository must never be cited. The forbidden names are
// built from pieces so that this file does not name them itself.

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const FORBIDDEN = [
  ['DOMAIN', '.md'],
  ['STYLE', '.md'],
  ['CASE-', 'FORMAT'],
  ['/work/', 'shared'],
].map((parts) => parts.join(''));

/** Every file under `dir` (recursively), as absolute paths. */
function filesUnder(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? filesUnder(join(dir, e.name)) : [join(dir, e.name)],
  );
}

/** Places in the given files and folders that name a forbidden source, as "path:line: name". */
export function outsideCitations(root: string, entries: string[]): string[] {
  const files = entries
    .map((e) => join(root, e))
    .flatMap((p) => (statSync(p).isDirectory() ? filesUnder(p) : [p]));
  const hits: string[] = [];
  for (const file of files) {
    const lines = readFileSync(file, 'utf8').split('\n');
    lines.forEach((line, i) => {
      for (const name of FORBIDDEN)
        if (line.toLowerCase().includes(name.toLowerCase()))
          hits.push(`${relative(root, file)}:${i + 1}: ${name}`);
    });
  }
  return hits;
}

const SCANNED = ['src', 'test', 'scripts', 'docs', 'README.md', 'DEVELOPERS.md'];

describe('citations point at sources a reader can consult', () => {
  it('no file in src, test, scripts, docs, README.md or DEVELOPERS.md cites notes kept outside the repository', () => {
    expect(outsideCitations(ROOT, SCANNED)).toEqual([]);
  });

  it('every section of docs/physics.md a file cites by name exists', () => {
    const headings = new Set(
      readFileSync(join(ROOT, 'docs/physics.md'), 'utf8')
        .split('\n')
        .filter((l) => l.startsWith('#'))
        .map((l) => l.replace(/^#+\s*/, '')),
    );
    const cited = SCANNED.flatMap((e) => {
      const p = join(ROOT, e);
      return statSync(p).isDirectory() ? filesUnder(p) : [p];
    }).flatMap((f) =>
      [...readFileSync(f, 'utf8').matchAll(/docs\/physics\.md, "([^"\n]+)"/g)].map((m) => ({
        file: relative(ROOT, f),
        section: m[1]!,
      })),
    );
    expect(cited.length).toBeGreaterThan(5);
    expect(cited.filter((c) => !headings.has(c.section))).toEqual([]);
  });

  it('tests and code name the behaviour, not a tracker issue number', () => {
    const named = SCANNED.flatMap((e) => {
      const p = join(ROOT, e);
      return statSync(p).isDirectory() ? filesUnder(p) : [p];
    }).flatMap((f) =>
      readFileSync(f, 'utf8')
        .split('\n')
        .flatMap((l, i) => (/\bissues? #?\d+/i.test(l) ? [`${relative(ROOT, f)}:${i + 1}`] : [])),
    );
    expect(named).toEqual([]);
  });

  describe('the scanner itself', () => {
    const dir = mkdtempSync(join(tmpdir(), 'skidcase-citations-'));
    afterAll(() => rmSync(dir, { recursive: true, force: true }));

    it('finds a planted citation of each forbidden name, in a nested folder, in any letter case', () => {
      writeFileSync(join(dir, 'clean.ts'), '// S = sqrt(30 d f n) (docs/physics.md)\n');
      expect(outsideCitations(dir, ['clean.ts'])).toEqual([]);
      FORBIDDEN.forEach((name, i) =>
        writeFileSync(join(dir, `planted-${i}.ts`), `const a = 1;\n// see ${name.toLowerCase()}\n`),
      );
      const hits = outsideCitations(dir, ['.']).sort();
      expect(hits).toEqual(FORBIDDEN.map((name, i) => `planted-${i}.ts:2: ${name}`));
    });
  });
});
