// Bundles the CLI into dist/. The solve/report paths load only dist/skidcase.js and its small
// chunks; Ink and React live in a separate chunk loaded by dynamic import when the interview opens.
import { build } from 'esbuild';
import { rmSync, chmodSync, readFileSync } from 'node:fs';

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
  define: { 'process.env.NODE_ENV': '"production"', __SKIDCASE_VERSION__: JSON.stringify(pkg.version) },
  external: ['react-devtools-core'],
  logLevel: 'warning',
});
chmodSync(new URL('../dist/skidcase.js', import.meta.url), 0o755);
