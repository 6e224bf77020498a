import { build } from 'esbuild';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT } from './helpers.js';

describe('the report path', () => {
  it('bundles without ink or react (it runs in the main chunk, without the interview)', async () => {
    const r = await build({
      entryPoints: [path.join(ROOT, 'src/commands/report.ts')],
      bundle: true,
      platform: 'node',
      format: 'esm',
      write: false,
      metafile: true,
      logLevel: 'silent',
    });
    const inputs = Object.keys(r.metafile.inputs);
    expect(inputs.some((p) => p.includes('src/report/build.ts'))).toBe(true);
    expect(inputs.filter((p) => /node_modules\/(ink|react|ink-[\w-]+)\//.test(p))).toEqual([]);
    expect(inputs.filter((p) => p.includes('src/ui/'))).toEqual([]);
  });
});
