import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { build, type BuildOptions } from 'esbuild';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demo, escapeRe, flat, ROOT, shownAs } from './helpers.js';

const run = promisify(execFile);

/**
 * The command as a user runs it: src/cli.ts bundled with the shipped build's options (into a
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
    const { bundleOptions, BUNDLE_PACKAGE_JSON } = (await import(
      pathToFileURL(path.join(ROOT, 'scripts/build-options.mjs')).href
    )) as {
      bundleOptions: (o: { outdir: string; version: string; buildId: string }) => BuildOptions;
      BUNDLE_PACKAGE_JSON: string;
    };
    await build({
      ...bundleOptions({ outdir: dir, version: pkg.version, buildId: 'test' }),
      absWorkingDir: ROOT,
      logLevel: 'silent',
    });
    writeFileSync(path.join(dir, 'package.json'), BUNDLE_PACKAGE_JSON);
    bin = path.join(dir, 'main.js');
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
