import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';

const here = path.dirname(fileURLToPath(import.meta.url));

const root = path.resolve(here, '../..');

/**
 * Bundles src/store, with its packages, into one ESM file under test/.tmp for child processes to
 * import with plain node: no TypeScript loader in the children, and one file loads about three
 * times faster than zod's many modules, which matters when hundreds of children start.
 */
export async function buildStoreBundle(tag: string): Promise<string> {
  const out = path.join(root, 'test', '.tmp', `store-${tag}-${process.pid}.mjs`);
  await build({
    entryPoints: [path.join(root, 'src', 'store', 'index.ts')],
    outfile: out,
    bundle: true,
    format: 'esm',
    platform: 'node',
    target: 'node20',
    // Bundled CommonJS packages (write-file-atomic) use require() and __filename.
    banner: {
      js: [
        "import { createRequire as __cr } from 'node:module';",
        "import { fileURLToPath as __fu } from 'node:url';",
        'const require = __cr(import.meta.url);',
        'const __filename = __fu(import.meta.url);',
      ].join(' '),
    },
    logLevel: 'warning',
  });
  return out;
}

export const fixture = (name: string) => path.join(here, 'fixtures', name);
