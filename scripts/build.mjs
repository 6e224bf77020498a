// Bundles the CLI into dist/ (the options are in build-options.mjs): the program as one CommonJS
// file (dist/main.js), in which Ink and React are evaluated only when the interview opens, and the
// launcher dist/skidcase.js, which runs it through a V8 code cache (src/launch.ts).
import { build } from 'esbuild';
import { rmSync, chmodSync, readFileSync, readdirSync, writeFileSync, existsSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { join } from 'node:path';
import { BUNDLE_PACKAGE_JSON, bundleOptions, launcherOptions } from './build-options.mjs';

/**
 * A hash of everything the bundle is made from: the sources, this script, and the package files.
 * `--if-changed` (what `npm start` passes) skips the build when dist/ was made from the same
 * inputs, so the second start opens in a fraction of a second instead of rebuilding.
 */
function inputsHash() {
  const h = createHash('sha256');
  const walk = (dir) => {
    for (const e of readdirSync(dir, { withFileTypes: true }).sort((a, b) =>
      a.name < b.name ? -1 : 1,
    )) {
      const f = join(dir, e.name);
      if (e.isDirectory()) walk(f);
      else h.update(f).update(readFileSync(f));
    }
  };
  walk('src');
  for (const f of [
    'scripts/build.mjs',
    'scripts/build-options.mjs',
    'package.json',
    'package-lock.json',
  ])
    if (existsSync(f)) h.update(f).update(readFileSync(f));
  return h.digest('hex');
}
const STAMP = 'dist/.inputs-sha256';
const hash = inputsHash();
if (
  process.argv.includes('--if-changed') &&
  existsSync('dist/skidcase.js') &&
  existsSync(STAMP) &&
  readFileSync(STAMP, 'utf8') === hash
)
  process.exit(0);

const pkg = JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8'));
rmSync(new URL('../dist', import.meta.url), { recursive: true, force: true });
await build(bundleOptions({ outdir: 'dist', version: pkg.version, buildId: hash }));
await build(launcherOptions({ outdir: 'dist' }));
// The launcher runs main.js in a vm.Script, which has no import(): the bundle must have none left.
if (/(?<![\w$.])import\(/.test(readFileSync('dist/main.js', 'utf8')))
  throw new Error('dist/main.js still holds a dynamic import()');
writeFileSync('dist/package.json', BUNDLE_PACKAGE_JSON);
chmodSync(new URL('../dist/skidcase.js', import.meta.url), 0o755);
writeFileSync(STAMP, hash);
