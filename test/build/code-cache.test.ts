import { execFile } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { trackedTempDir } from '../temp-dirs.js';

// The shipped launcher (dist/skidcase.js) runs dist/main.js through a V8 code cache in the user
// cache folder. A cache must only ever change the speed: these run a copy of the built program
// (`npm test` builds dist/ first), so that editing the copy leaves dist/ alone.
const run = promisify(execFile);
const ROOT = path.resolve(import.meta.dirname, '../..');
const CASE = path.join(ROOT, 'test/fixtures/cases/skid-imperial-two-marks.json');

function copyOfProgram() {
  const dir = trackedTempDir('skidcase-code-cache-');
  for (const f of ['skidcase.js', 'main.js', 'package.json'])
    fs.copyFileSync(path.join(ROOT, 'dist', f), path.join(dir, f));
  const cache = path.join(dir, 'cache');
  const skidcase = async (args: string[]) => {
    try {
      const r = await run(process.execPath, [path.join(dir, 'skidcase.js'), ...args], {
        env: { ...process.env, SKIDCASE_CACHE_DIR: cache, NO_COLOR: '1' },
      });
      return { code: 0, out: r.stdout, err: r.stderr };
    } catch (e) {
      const x = e as { code: number; stdout: string; stderr: string };
      return { code: x.code, out: x.stdout, err: x.stderr };
    }
  };
  const cacheFiles = () => {
    const v8 = path.join(cache, 'v8');
    return fs.existsSync(v8) ? fs.readdirSync(v8).map((n) => path.join(v8, n)) : [];
  };
  return { dir, skidcase, cacheFiles };
}

describe('the V8 code cache', () => {
  it('is made on the first run and kept on the next, with the same output as without it', async () => {
    const p = copyOfProgram();
    const plain = await run(process.execPath, [
      path.join(p.dir, 'main.js'),
      'solve',
      CASE,
      '--json',
    ]);
    const first = await p.skidcase(['solve', CASE, '--json']);
    expect(first).toEqual({ code: 0, out: plain.stdout, err: plain.stderr });
    expect(JSON.parse(first.out).analyses[0].speed.value).toBeCloseTo(40.249, 3);
    const [file] = p.cacheFiles();
    expect(p.cacheFiles()).toHaveLength(1);
    const made = fs.readFileSync(file!);
    expect(made.length).toBeGreaterThan(1000);
    expect(await p.skidcase(['solve', CASE, '--json'])).toEqual(first);
    // accepted, so not made again
    expect(fs.readFileSync(file!).equals(made)).toBe(true);
  });

  it.each([
    ['garbage of the same length', (b: Buffer) => Buffer.alloc(b.length, 0x5a)],
    ['cut short', (b: Buffer) => b.subarray(0, Math.floor(b.length / 3))],
    ['empty', () => Buffer.alloc(0)],
    [
      'with flipped bytes',
      (b: Buffer) => Buffer.from(b.map((x, i) => (i % 97 === 0 ? x ^ 0xff : x))),
    ],
  ])('a damaged cache (%s) still runs the right code, and is replaced', async (_n, damage) => {
    const p = copyOfProgram();
    const first = await p.skidcase(['solve', CASE, '--json']);
    const [file] = p.cacheFiles();
    const damaged = damage(fs.readFileSync(file!));
    fs.writeFileSync(file!, damaged);
    expect(await p.skidcase(['solve', CASE, '--json'])).toEqual(first);
    expect(fs.readFileSync(file!).equals(damaged)).toBe(false);
    expect(await p.skidcase(['solve', CASE, '--json'])).toEqual(first);
  });

  it('an edit of the bundle that keeps its length runs the edited code, not the cached one', async () => {
    const p = copyOfProgram();
    const before = await p.skidcase(['frobnicate']);
    expect(before.err).toContain("skidcase: unknown command 'frobnicate'");
    expect(p.cacheFiles()).toHaveLength(1);
    const main = path.join(p.dir, 'main.js');
    const text = fs.readFileSync(main, 'utf8');
    expect(text).toContain('. The commands are:');
    const edited = text.replaceAll('. The commands are:', '. THE COMMANDS ARE:');
    expect(Buffer.byteLength(edited)).toBe(Buffer.byteLength(text));
    fs.writeFileSync(main, edited);
    const after = await p.skidcase(['frobnicate']);
    expect(after.code).toBe(1);
    expect(after.err).toContain("skidcase: unknown command 'frobnicate'. THE COMMANDS ARE:");
    // the old build's cache is gone, the edited one's made
    expect(p.cacheFiles()).toHaveLength(1);
  });

  it('a cache folder that cannot be made only means no cache', async () => {
    const p = copyOfProgram();
    fs.writeFileSync(path.join(p.dir, 'cache'), 'a file where the folder would be');
    const r = await p.skidcase(['solve', CASE, '--json']);
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    expect(JSON.parse(r.out).analyses[0].speed.value).toBeCloseTo(40.249, 3);
  });
});
