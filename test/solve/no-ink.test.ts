import { describe, expect, it } from 'vitest';
import { build } from 'esbuild';

// `solve` is bundled into the main chunk, which must start fast: its import graph must not reach
// Ink or React (scripts/build.mjs keeps those in a lazily imported chunk).
describe('the solve path', () => {
  it('does not import ink or react', async () => {
    const r = await build({
      entryPoints: ['src/commands/solve.ts'],
      bundle: true,
      write: false,
      metafile: true,
      platform: 'node',
      format: 'esm',
      logLevel: 'silent',
    });
    const inputs = Object.keys(r.metafile.inputs);
    expect(inputs.some((p) => p.includes('src/engine/solve-case.ts'))).toBe(true);
    expect(inputs.filter((p) => /node_modules\/(ink|react|ink-[a-z-]+)\//.test(p))).toEqual([]);
  });
});
