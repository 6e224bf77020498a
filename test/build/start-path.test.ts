import { execFile } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { build, type BuildOptions } from 'esbuild';
import { trackedTempDir } from '../temp-dirs.js';
import { createRequire } from 'node:module';
import path from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';

// What scripts/build.mjs and the package tree do for start-up speed, checked on the built program
// (`npm test` builds dist/ first).
const run = promisify(execFile);
const ROOT = path.resolve(import.meta.dirname, '../..');

/**
 * Runs `code` in a fresh node where each `new Intl.Segmenter` is counted, and each RGI emoji
 * expression built (esbuild writes string-width's `/^\p{RGI_Emoji}$/v` as `new RegExp`).
 */
async function countingSegmenters(code: string): Promise<string> {
  const prelude = `
    let made = 0;
    const Real = Intl.Segmenter;
    Intl.Segmenter = class extends Real { constructor(...a) { super(...a); made++; } };
    globalThis.__made = () => made;
    let rgi = 0;
    globalThis.RegExp = new Proxy(RegExp, {
      construct(t, a, n) { if (String(a[0]).includes('RGI_Emoji')) rgi++; return Reflect.construct(t, a, n); },
    });
    globalThis.__rgi = () => rgi;`;
  const r = await run(process.execPath, ['--input-type=module', '-e', prelude + code], {
    cwd: ROOT,
  });
  return r.stdout.trim();
}

describe('the built interface', () => {
  it('makes no Intl.Segmenter and no RGI emoji expression when it is loaded', async () => {
    // src/ui/run.tsx (Ink, React, the screens) bundled with the shipped build's options.
    const dir = trackedTempDir('skidcase-ui-bundle-');
    const { bundleOptions, BUNDLE_PACKAGE_JSON } = (await import(
      pathToFileURL(path.join(ROOT, 'scripts/build-options.mjs')).href
    )) as {
      bundleOptions: (o: { outdir: string; version: string; buildId: string }) => BuildOptions;
      BUNDLE_PACKAGE_JSON: string;
    };
    await build({
      ...bundleOptions({ outdir: dir, version: '0.0.0', buildId: 'test' }),
      entryPoints: { run: path.join(ROOT, 'src/ui/run.tsx') },
      sourcemap: false,
      absWorkingDir: ROOT,
      logLevel: 'silent',
    });
    writeFileSync(path.join(dir, 'package.json'), BUNDLE_PACKAGE_JSON);
    const out = await countingSegmenters(`
      const { createRequire } = await import('node:module');
      const ui = createRequire(import.meta.url)(${JSON.stringify(path.join(dir, 'run.js'))});
      await globalThis[Symbol.for('skidcase.yoga-ready')];
      console.log(JSON.stringify({ loaded: typeof ui.runInteractive, made: __made(), rgi: __rgi() }));`);
    // nor string-width's RGI emoji expression (20-30 ms to build): made on first use instead
    expect(JSON.parse(out)).toEqual({ loaded: 'function', made: 0, rgi: 0 });
  });

  it('has one string-width: wrap-ansi measures with the same copy as Ink', () => {
    const fromInk = createRequire(createRequire(import.meta.url).resolve('ink', { paths: [ROOT] }));
    const inkWidth = fromInk.resolve('string-width');
    const wrap = createRequire(fromInk.resolve('wrap-ansi')).resolve('string-width');
    expect(wrap).toBe(inkWidth);
  });
});
