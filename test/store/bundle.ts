import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';

const here = path.dirname(fileURLToPath(import.meta.url));

const root = path.resolve(here, '../..');

/**
 * Bundles src/store into one ESM file under test/.tmp for child processes to import with plain
 * node (no TypeScript loader in the children: quick to start, nothing to go wrong in CI). npm
 * packages stay external and resolve from the project's node_modules.
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
    packages: 'external',
    logLevel: 'warning',
  });
  return out;
}

export const fixture = (name: string) => path.join(here, 'fixtures', name);
