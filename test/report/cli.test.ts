import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { build } from 'esbuild';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, escapeRe, flat, ROOT, shownAs } from './helpers.js';

const run = promisify(execFile);

/**
 * The banner scripts/build.mjs puts on top of the bundle (minus the shebang), read from that
 * file so this test runs the code exactly as the shipped build does: the `banner: { ... }` object
 * (from its line to the closing brace at the same indent) is evaluated as the JavaScript it is.
 */
function buildBanner(): string {
  const src = readFileSync(path.join(ROOT, 'scripts/build.mjs'), 'utf8');
  const m = /^([ \t]*)banner:\s*\{([\s\S]*?)^\1\},?[ \t]*$/m.exec(src);
  if (!m) throw new Error('scripts/build.mjs: no banner found');
  const banner = new Function(`return {${m[2]}};`)() as { js?: unknown };
  if (typeof banner.js !== 'string') throw new Error('scripts/build.mjs: banner.js is not text');
  return banner.js.replace(/^#!.*\n/, '');
}

/**
 * The command as a user runs it: src/cli.ts bundled the way scripts/build.mjs does (into a
 * temporary folder, so the shared dist/ is left alone), then `node skidcase.js report ...`.
 */
describe('skidcase report through the command line', () => {
  let dir: string;
  let bin: string;
  beforeAll(async () => {
    dir = mkdtempSync(path.join(tmpdir(), 'skidcase-report-cli-'));
    const pkg = JSON.parse(readFileSync(path.join(ROOT, 'package.json'), 'utf8')) as {
      version: string;
    };
    await build({
      entryPoints: { skidcase: path.join(ROOT, 'src/cli.ts') },
      outdir: dir,
      bundle: true,
      splitting: true,
      format: 'esm',
      platform: 'node',
      target: 'node20',
      banner: { js: buildBanner() },
      define: {
        'process.env.NODE_ENV': '"production"',
        __SKIDCASE_VERSION__: JSON.stringify(pkg.version),
      },
      external: ['react-devtools-core'],
      logLevel: 'silent',
    });
    bin = path.join(dir, 'skidcase.js');
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  const skidcase = async (...args: string[]) => {
    try {
      const r = await run(process.execPath, [bin, ...args], {
        cwd: dir,
        env: { ...process.env, SKIDCASE_CONFIG_DIR: path.join(dir, 'config'), NO_COLOR: '1' },
      });
      return { code: 0, out: r.stdout, err: r.stderr };
    } catch (e) {
      const x = e as { code: number; stdout: string; stderr: string };
      return { code: x.code, out: x.stdout, err: x.stderr };
    }
  };

  it('prints the report whose "at least" figure and range equal solve --json', async () => {
    const file = demo('demo-orchard-hill.json');
    const solved = await skidcase('solve', file, '--json');
    expect(solved.code).toBe(0);
    const a = (
      JSON.parse(solved.out) as { analyses: { minimum: number; speed: Record<string, number> }[] }
    ).analyses[0]!;
    const r = await skidcase('report', file, '--format', 'txt');
    expect(r.code).toBe(0);
    const m = new RegExp(
      `At least (\\d+) mph at the start of the marks \\(computed ([\\d.]+) mph, range ([\\d.]+) to ([\\d.]+) mph\\)`,
    ).exec(flat(r.out));
    expect(m).not.toBeNull();
    expect(m!.slice(1)).toEqual([
      String(a.minimum),
      shownAs(a.speed.value!, 1),
      shownAs(a.speed.low!, 1),
      shownAs(a.speed.high!, 1),
    ]);
    expect(r.out).toContain(
      `by skidcase ${JSON.parse(readFileSync(path.join(ROOT, 'package.json'), 'utf8')).version}`,
    );
  });

  it('--out refuses an existing file (exit 1) and --force replaces it', async () => {
    const out = path.join(dir, 'kept.html');
    writeFileSync(out, 'keep');
    const refused = await skidcase(
      'report',
      demo('demo-kestrel-bend.json'),
      '--format',
      'html',
      '--out',
      out,
    );
    expect(refused.code).toBe(1);
    expect(refused.err).toMatch(new RegExp(escapeRe(out)));
    expect(readFileSync(out, 'utf8')).toBe('keep');
    const forced = await skidcase(
      'report',
      demo('demo-kestrel-bend.json'),
      '--format',
      'html',
      '--out',
      out,
      '--force',
    );
    expect(forced.code).toBe(0);
    expect(readFileSync(out, 'utf8')).toMatch(/^<!DOCTYPE html>[\s\S]*<svg[\s\S]*<\/html>\n$/);
  });

  it('--out writes a new report and its pictures', async () => {
    const out = path.join(dir, 'orchard.md');
    const r = await skidcase('report', demo('demo-orchard-hill.json'), '--out', out);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(readFileSync(out, 'utf8')).toContain('](orchard-speed.svg)');
    expect(readFileSync(path.join(dir, 'orchard-speed.svg'), 'utf8')).toMatch(
      /^<svg[\s\S]*<\/svg>$/,
    );
  });

  it('exit 2 for an invalid file, with the field path', async () => {
    const bad = path.join(dir, 'bad.json');
    writeFileSync(
      bad,
      JSON.stringify({
        format: 'skidcase-case',
        version: 1,
        id: 'x',
        units: 'metric',
        vehicle: {},
        analyses: [
          {
            id: 'y',
            kind: 'yaw',
            chord: 10,
            middleOrdinate: 6,
            drag: { source: 'entered', value: 0.7 },
          },
        ],
      }),
    );
    const r = await skidcase('report', bad);
    expect(r.code).toBe(2);
    expect(r.err).toContain(
      'analyses[0].middleOrdinate: middle ordinate must be less than half the chord',
    );
  });
});
