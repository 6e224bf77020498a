import { execFile } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';

// What scripts/build.mjs and the package tree do for start-up speed, checked on the built program
// (`npm test` builds dist/ first).
const run = promisify(execFile);
const ROOT = path.resolve(import.meta.dirname, '../..');

/** Runs `code` in a fresh node where each `new Intl.Segmenter` is counted. */
async function countingSegmenters(code: string): Promise<string> {
  const prelude = `
    let made = 0;
    const Real = Intl.Segmenter;
    Intl.Segmenter = class extends Real { constructor(...a) { super(...a); made++; } };
    globalThis.__made = () => made;`;
  const r = await run(process.execPath, ['--input-type=module', '-e', prelude + code], {
    cwd: ROOT,
  });
  return r.stdout.trim();
}

describe('the built interface', () => {
  const uiChunk = () => {
    const f = readdirSync(path.join(ROOT, 'dist/chunks')).find((n) => /^run-.*\.js$/.test(n));
    if (!f) throw new Error('dist/chunks/run-*.js missing: run `npm run build` first');
    return path.join(ROOT, 'dist/chunks', f);
  };

  it('makes no Intl.Segmenter when it is loaded', async () => {
    const out = await countingSegmenters(`
      const ui = await import(${JSON.stringify(uiChunk())});
      console.log(JSON.stringify({ loaded: Object.keys(ui).length > 0, made: __made() }));`);
    expect(JSON.parse(out)).toEqual({ loaded: true, made: 0 });
  });

  it('has one string-width: wrap-ansi measures with the same copy as Ink', () => {
    const fromInk = createRequire(createRequire(import.meta.url).resolve('ink', { paths: [ROOT] }));
    const inkWidth = fromInk.resolve('string-width');
    const wrap = createRequire(fromInk.resolve('wrap-ansi')).resolve('string-width');
    expect(wrap).toBe(inkWidth);
  });
});
