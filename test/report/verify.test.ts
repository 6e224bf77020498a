import { spawnSync } from 'node:child_process';
import { copyFileSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { sha256Of } from '../../src/io/sha256.js';
import { ROOT, demo, tempDir } from './helpers.js';

// Every report records the SHA-256 of the case file's bytes it was made from; `skidcase verify`
// reads it back from any format. Run through the built program, as a user would.
const BIN = path.join(ROOT, 'dist', 'skidcase.js');
const run = (args: string[], cwd: string) => {
  const r = spawnSync(process.execPath, [BIN, ...args], {
    cwd,
    encoding: 'utf8',
    env: { ...process.env, SKIDCASE_CONFIG_DIR: path.join(cwd, 'conf') },
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
};

describe('a report proves its source', () => {
  it.each(['md', 'txt', 'html', 'json', 'pdf'])(
    '%s: carries the file SHA-256; verify says it matches, and says how it differs after an edit',
    (format) => {
      const t = tempDir();
      try {
        const file = path.join(t.dir, 'case.json');
        copyFileSync(demo('demo-orchard-hill.json'), file);
        const out = path.join(t.dir, `report.${format}`);
        const made = run(['report', file, '--format', format, '--out', out], t.dir);
        expect(made.code, made.err).toBe(0);
        const sha = sha256Of(readFileSync(file));
        expect(readFileSync(out, 'utf8')).toContain(sha);

        const ok = run(['--sessions', t.dir, 'verify', out, file], t.dir);
        expect(ok.code, ok.err).toBe(0);
        expect(ok.out).toContain(`SHA-256 ${sha}`);

        // A hand edit of one figure: the report no longer matches, and verify says so.
        const raw = JSON.parse(readFileSync(file, 'utf8'));
        raw.analyses[0].segments[0].length = 72;
        writeFileSync(file, JSON.stringify(raw, null, 2));
        const bad = run(['--sessions', t.dir, 'verify', out, file], t.dir);
        expect(bad.code).toBe(1);
        expect(bad.out).toContain('was not made from');
        expect(bad.out).toContain(`the report's case file: SHA-256 ${sha}`);
        expect(bad.out).toContain('changed without a save by skidcase');
      } finally {
        t.done();
      }
    },
  );

  it('without a case file, verify finds the case the report names in the sessions folder', () => {
    const t = tempDir();
    try {
      const raw = JSON.parse(readFileSync(demo('demo-kestrel-bend.json'), 'utf8'));
      const file = path.join(t.dir, `${raw.id}.json`);
      writeFileSync(file, JSON.stringify(raw, null, 2));
      const out = path.join(t.dir, 'r.txt');
      expect(
        run(['--sessions', t.dir, 'report', raw.id, '--format', 'txt', '--out', out], t.dir).code,
      ).toBe(0);
      const ok = run(['--sessions', t.dir, 'verify', out], t.dir);
      expect(ok.code, ok.err).toBe(0);
      expect(ok.out).toContain(`case ${raw.id}`);
    } finally {
      t.done();
    }
  });

  it('a file that is no report, or a missing one, is exit 2 naming it', () => {
    const t = tempDir();
    try {
      const notes = path.join(t.dir, 'notes.txt');
      writeFileSync(notes, 'just some notes\n');
      const none = run(['verify', notes, demo('demo-orchard-hill.json')], t.dir);
      expect(none.code).toBe(2);
      expect(none.err).toContain('notes.txt: records no case file');
      const missing = run(['verify', path.join(t.dir, 'gone.md')], t.dir);
      expect(missing.code).toBe(2);
      expect(missing.err).toContain('gone.md: no such file');
    } finally {
      t.done();
    }
  });
});
