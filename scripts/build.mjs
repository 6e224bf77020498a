// Bundles the CLI into dist/. The solve/report paths load only dist/skidcase.js and its small
// chunks; Ink and React live in a separate chunk loaded by dynamic import when the interview opens.
import { build } from 'esbuild';
import { rmSync, chmodSync, readFileSync, readdirSync, writeFileSync, existsSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { join } from 'node:path';
import { readFile } from 'node:fs/promises';

/**
 * zod's `z` namespace re-exports every locale (about 250 languages), which a namespace import keeps
 * in the bundle and every start of `solve` would parse. Our messages are our own English, so the
 * locales namespace is narrowed to English only.
 */
const zodEnglishOnly = {
  name: 'zod-english-only',
  setup(b) {
    b.onResolve({ filter: /^\.\.\/locales\/index\.js$/ }, (args) =>
      /[\\/]zod[\\/]v4[\\/](classic|core)[\\/]/.test(args.importer)
        ? { path: 'zod-locales-en', namespace: 'zod-locales' }
        : undefined,
    );
    b.onLoad({ filter: /.*/, namespace: 'zod-locales' }, () => ({
      contents: "export { default as en } from 'zod/v4/locales/en.js';",
      resolveDir: process.cwd(),
    }));
  },
};

/**
 * In Node 20 the global `fetch` is a lazy getter: evaluating `typeof fetch` loads Node's whole HTTP
 * client (undici) at start-up. yoga-layout's loader asks it, although its wasm is an inline data URI
 * it decodes without fetch either way. Answering "no fetch" at build time spares every start that load.
 */
const yogaWithoutFetch = {
  name: 'yoga-without-fetch',
  setup(b) {
    b.onLoad({ filter: /yoga-layout[\\/]dist[\\/]binaries[\\/].*\.js$/ }, async (args) => {
      const text = await readFile(args.path, 'utf8');
      return { contents: text.replaceAll('typeof fetch', '"undefined"'), loader: 'js' };
    });
  },
};

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
  for (const f of ['scripts/build.mjs', 'package.json', 'package-lock.json'])
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
await build({
  entryPoints: { skidcase: 'src/cli.ts' },
  outdir: 'dist',
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  minify: true,
  sourcemap: 'linked',
  legalComments: 'none',
  chunkNames: 'chunks/[name]-[hash]',
  banner: {
    // CommonJS dependencies bundled into ESM still reach for require, __filename and __dirname
    // (write-file-atomic names its temp files from __filename).
    js: [
      '#!/usr/bin/env node',
      "import { createRequire as __cr } from 'node:module';",
      "import { fileURLToPath as __fu } from 'node:url';",
      "import { dirname as __dn } from 'node:path';",
      'const require = __cr(import.meta.url);',
      'const __filename = __fu(import.meta.url);',
      'const __dirname = __dn(__filename);',
    ].join('\n'),
  },
  define: {
    'process.env.NODE_ENV': '"production"',
    __SKIDCASE_VERSION__: JSON.stringify(pkg.version),
  },
  external: ['react-devtools-core'],
  plugins: [zodEnglishOnly, yogaWithoutFetch],
  logLevel: 'warning',
});
chmodSync(new URL('../dist/skidcase.js', import.meta.url), 0o755);
writeFileSync(STAMP, hash);
