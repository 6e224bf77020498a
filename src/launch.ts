/**
 * The installed `skidcase` (dist/skidcase.js): runs the bundle (dist/main.js) through a V8 code
 * cache, so that a start after the first skips parsing and compiling most of the program.
 *
 * The cache is made on the user's machine on a run that had none (when the process exits or
 * 1.5 s after the start, whichever comes first, so that the functions compiled by then go in), and kept in the user cache folder under a key
 * of the node version, the architecture, the V8 and node flags and a hash of the bundle's bytes:
 * V8 itself accepts a cache for any source of the same length, so without the hash an edited
 * bundle could run old code. A cache V8 rejects (another V8, damaged bytes) is replaced; a cache
 * that cannot be read or written only costs the time of compiling.
 */
import { isAscii } from 'node:buffer';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import Module, { createRequire } from 'node:module';
import path from 'node:path';
import vm from 'node:vm';
import { userCacheDir } from './store/cache-dir.js';

const MAIN = path.join(__dirname, 'main.js');

/** The cache file for this bundle (its bytes) on this node with these flags. */
function codeCacheFile(bytes: Buffer, cacheDir: string): string {
  const key = createHash('sha256')
    .update(`${process.version}\0${process.arch}\0`)
    .update(`${process.execArgv.join(' ')}\0${process.env.NODE_OPTIONS ?? ''}\0`)
    .update(bytes)
    .digest('hex')
    .slice(0, 32);
  return path.join(cacheDir, 'v8', `main-${key}.bin`);
}

function save(script: vm.Script, file: string): void {
  try {
    const data = script.createCachedData();
    fs.mkdirSync(path.dirname(file), { recursive: true });
    const tmp = `${file}.${process.pid}.tmp`;
    fs.writeFileSync(tmp, data);
    fs.renameSync(tmp, file);
    // caches of other builds or nodes are of no further use
    for (const n of fs.readdirSync(path.dirname(file)))
      if (/^main-[0-9a-f]{32}\.bin$/.test(n) && n !== path.basename(file))
        fs.rmSync(path.join(path.dirname(file), n), { force: true });
  } catch {
    // no cache this time: the next start compiles again
  }
}

function launch(): void {
  let source: string;
  let script: vm.Script;
  let file: string | undefined;
  let fresh = true;
  try {
    const bytes = fs.readFileSync(MAIN);
    // an ASCII bundle decodes faster as latin1, to the same text
    source = bytes.toString(isAscii(bytes) ? 'latin1' : 'utf8');
    try {
      file = codeCacheFile(bytes, userCacheDir());
    } catch {
      file = undefined;
    }
    let cachedData: Buffer | undefined;
    try {
      cachedData = file ? fs.readFileSync(file) : undefined;
    } catch {
      cachedData = undefined;
    }
    script = new vm.Script(Module.wrap(source), {
      filename: MAIN,
      ...(cachedData ? { cachedData } : {}),
    });
    fresh = cachedData === undefined || script.cachedDataRejected === true;
  } catch {
    // Anything wrong with the cache machinery: run the bundle the ordinary way.
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- the launcher is CommonJS
    require(MAIN);
    return;
  }
  const run = script.runInThisContext() as (...a: unknown[]) => void;
  const mod = new Module(MAIN);
  mod.filename = MAIN;
  if (fresh && file) {
    // Made once: at exit (a short command), or once the start screen is drawn, since an
    // interactive session may end by a signal that skips 'exit'.
    const f = file;
    let saved = false;
    const once = () => {
      if (saved) return;
      saved = true;
      save(script, f);
    };
    setTimeout(once, 1500).unref();
    process.once('exit', once);
  }
  run.call(mod.exports, mod.exports, createRequire(MAIN), mod, MAIN, path.dirname(MAIN));
}

launch();
