import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { trackedTempDir } from '../temp-dirs.js';

// Ink's frame writer is patched (patches/ink+6.8.0.patch, applied by patch-package at install)
// to keep its line caches from frame to frame, to skip the ANSI tokenizer for plain lines and to
// write a row's escape codes only where its style changes.
// A frame must come out exactly as the unpatched writer makes it: the same characters, styles
// and escape codes, whatever was drawn in the frames before.

const PATCH = path.resolve('patches/ink+6.8.0.patch');
const patchedFile = path.resolve('node_modules/ink/build/output.js');

type Op =
  | { type: 'write'; x: number; y: number; text: string }
  | { type: 'clip'; x1?: number; x2?: number; y1?: number; y2?: number }
  | { type: 'unclip' };
interface OutputLike {
  write(x: number, y: number, text: string, o: { transformers: unknown[] }): void;
  clip(c: object): void;
  unclip(): void;
  get(): { output: string; height: number };
}
type OutputClass = new (o: { width: number; height: number }) => OutputLike;

/** The writer as Ink ships it: the patch taken back out of a copy, its imports resolved from Ink. */
async function unpatchedOutput(): Promise<OutputClass> {
  const dir = trackedTempDir('skidcase-ink-');
  const copy = path.join(dir, 'node_modules', 'ink', 'build', 'output.js');
  fs.mkdirSync(path.dirname(copy), { recursive: true });
  fs.copyFileSync(patchedFile, copy);
  const r = spawnSync('git', ['apply', '-R', PATCH], { cwd: dir, encoding: 'utf8' });
  expect(r.status, `git apply -R: ${r.stderr}`).toBe(0);
  // the packages Ink's writer imports, found as Node finds them from Ink's folder
  const packageDir = (spec: string) =>
    [path.resolve('node_modules/ink/node_modules', spec), path.resolve('node_modules', spec)].find(
      (d) => fs.existsSync(path.join(d, 'package.json')),
    )!;
  const text = fs
    .readFileSync(copy, 'utf8')
    .replace(/^\/\/# sourceMappingURL=.*$/m, '')
    .replace(/from '([^'.][^']*)'/g, (_m, spec: string) => {
      const dir = packageDir(spec);
      const pkg = JSON.parse(fs.readFileSync(path.join(dir, 'package.json'), 'utf8')) as {
        exports?: unknown;
        main?: string;
      };
      // each is an ES module package whose entry is its exports' "." (a string or import/default)
      const dot = (
        typeof pkg.exports === 'object' && pkg.exports !== null && '.' in pkg.exports
          ? (pkg.exports as Record<string, unknown>)['.']
          : pkg.exports
      ) as string | Record<string, string> | undefined;
      const entry =
        typeof dot === 'string' ? dot : (dot?.import ?? dot?.default ?? pkg.main ?? 'index.js');
      return `from ${JSON.stringify(pathToFileURL(path.join(dir, entry)).href)}`;
    });
  expect(text).not.toContain('skidcase patch');
  const file = path.join(dir, 'output-unpatched.mjs');
  fs.writeFileSync(file, text);
  return ((await import(pathToFileURL(file).href)) as { default: OutputClass }).default;
}

const draw = (Output: OutputClass, width: number, height: number, ops: Op[]) => {
  const o = new Output({ width, height });
  for (const op of ops)
    if (op.type === 'write') o.write(op.x, op.y, op.text, { transformers: [] });
    else if (op.type === 'clip') o.clip(op);
    else o.unclip();
  return o.get();
};

// Text like our screens': plain words, box lines, `·…↑`, wide and joined characters, styles.
const word = fc.constantFrom(
  'Drag factor',
  '0.72 (0.68-0.76)',
  '  ',
  '│',
  '─┬─',
  '·',
  '…',
  '↑↓',
  'é',
  '界',
  '\u{1F600}',
  'e\u0301',
  '',
);
// styles that nest, share an end code (bold and dim), or stay open into the next word
const styled = fc
  .tuple(
    fc.constantFrom(
      '\u001B[1m',
      '\u001B[2m',
      '\u001B[1m\u001B[2m',
      '\u001B[31m',
      '\u001B[1m\u001B[31m',
      '\u001B[7m',
      '\u001B[38;5;244m',
    ),
    word,
    fc.constantFrom('\u001B[0m', '\u001B[22m', '\u001B[39m', '\u001B[27m', ''),
  )
  .map(([code, w, end]) => `${code}${w}${end}`);
const line = fc.array(fc.oneof(word, styled), { maxLength: 6 }).map((xs) => xs.join(''));
const text = fc.array(line, { minLength: 1, maxLength: 4 }).map((ls) => ls.join('\n'));
const op: fc.Arbitrary<Op> = fc.oneof(
  {
    weight: 6,
    arbitrary: fc.record({
      type: fc.constant('write' as const),
      x: fc.nat(30),
      y: fc.nat(8),
      text,
    }),
  },
  {
    weight: 1,
    arbitrary: fc.record({
      type: fc.constant('clip' as const),
      x1: fc.nat(10),
      x2: fc.integer({ min: 10, max: 40 }),
      y1: fc.nat(3),
      y2: fc.integer({ min: 3, max: 10 }),
    }),
  },
  { weight: 1, arbitrary: fc.constant({ type: 'unclip' as const }) },
);
const frame = fc.record({
  width: fc.integer({ min: 1, max: 40 }),
  height: fc.integer({ min: 1, max: 10 }),
  ops: fc.array(op, { maxLength: 12 }),
});

describe("Ink's frame writer, as patched", () => {
  it('is the patched file (patch-package applied it at install)', () => {
    expect(fs.readFileSync(patchedFile, 'utf8')).toContain('skidcase patch');
  });

  it('draws every frame of a run exactly as the unpatched writer draws each frame alone', async () => {
    const Unpatched = await unpatchedOutput();
    const { default: Patched } = (await import(pathToFileURL(patchedFile).href)) as {
      default: OutputClass;
    };
    // frames in a row, so that lines cached by earlier frames are met again
    fc.assert(
      fc.property(fc.array(frame, { minLength: 1, maxLength: 6 }), (frames) => {
        for (const f of frames)
          expect(draw(Patched, f.width, f.height, f.ops)).toEqual(
            draw(Unpatched, f.width, f.height, f.ops),
          );
      }),
      { numRuns: 300 },
    );
  });

  it('is in the shipped bundle', () => {
    // esbuild drops the comments and renames the functions; the plain-line test stays as written
    expect(fs.readFileSync('dist/main.js', 'utf8')).toContain(String.raw`/^[\x20-\x7e]*$/`);
  });
});
