// A points file named in an answer, read by the screens' service: what goes wrong is said naming
// the file, never as a stack trace.
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { readTextFile, TEXT_FILE_CAP } from '../../src/io/read-text.js';
import { trackedTempDir } from '../temp-dirs.js';

describe('readTextFile', () => {
  const dir = trackedTempDir('skidcase-read-text-');

  it('reads a text file relative to the folder given', () => {
    fs.writeFileSync(path.join(dir, 'pts.csv'), 'x,y\n0,0\n');
    expect(readTextFile('pts.csv', dir)).toEqual({ ok: true, text: 'x,y\n0,0\n' });
  });

  it('refuses a missing file, a folder, a file over the cap and one that is not text, naming it', () => {
    expect(readTextFile('gone.csv', dir)).toEqual({
      ok: false,
      message: `gone.csv: no such file (looked in ${dir})`,
    });
    fs.mkdirSync(path.join(dir, 'sub'));
    expect(readTextFile('sub', dir)).toEqual({ ok: false, message: 'sub is a folder, not a file' });
    fs.writeFileSync(path.join(dir, 'big.csv'), Buffer.alloc(TEXT_FILE_CAP + 1, 0x31));
    expect(readTextFile('big.csv', dir)).toEqual({
      ok: false,
      message: 'big.csv is 1000 kB, over the 1 MB a points file may be',
    });
    fs.writeFileSync(path.join(dir, 'scan.xlsx'), Buffer.from([0x50, 0x4b, 0x03, 0x04, 0, 0]));
    expect(readTextFile('scan.xlsx', dir)).toEqual({
      ok: false,
      message: 'scan.xlsx is not a text (CSV) file',
    });
  });
});
