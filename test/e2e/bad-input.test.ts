// Bad input that used to crash or mislead, run through the built binary: each gets a
// clear message, an exit code of the contract (0, 2 or 3; report's 1 for an output in the way),
// and leaves the files on disk as they were. Invented cases.
import { afterAll, afterEach, describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { chmodSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { BINARY, disposeAll, ptySupport, startTerm } from './harness.js';
import { describeInTerminal } from './pty-gate.js';
import { NOBODY, assertPassableForNobody, runsAsRoot } from '../as-nobody.js';
import { childEnv, makeWorkspace } from './env.js';

const ws = makeWorkspace('skidcase-bad-input-');
afterAll(() => ws.cleanup());

/** Runs the binary without a terminal and collects what it printed. */
function run(args: string[], cwd = ws.root, as?: { uid: number; gid: number }) {
  return new Promise<{ code: number | null; out: string; err: string }>((resolve) => {
    const p = spawn(process.execPath, [BINARY, ...args], {
      cwd,
      env: childEnv(ws.env),
      stdio: ['ignore', 'pipe', 'pipe'],
      ...(as ?? {}),
    });
    let out = '';
    let err = '';
    p.stdout!.on('data', (d) => (out += d));
    p.stderr!.on('data', (d) => (err += d));
    const timer = setTimeout(() => p.kill('SIGKILL'), 30_000);
    p.on('close', (code) => {
      clearTimeout(timer);
      resolve({ code, out, err });
    });
  });
}

/** A valid one-skid case (two marks, one surface, to a stop). */
function skidCase(id: string, extra: Record<string, unknown> = {}) {
  return {
    format: 'skidcase-case',
    version: 1,
    id,
    units: 'imperial',
    vehicle: { brakes: { mode: 'all' } },
    analyses: [
      {
        id: 'skid-1',
        kind: 'skid',
        marks: [52, 55],
        segments: [{ drag: { source: 'entered', value: 0.72 } }],
        end: { mode: 'stop' },
      },
    ],
    ...extra,
  };
}

/** The text of a valid case with `levels` nested objects under an extra field. */
function deepCaseText(id: string, levels: number) {
  const text = JSON.stringify(skidCase(id));
  return `${text.slice(0, -1)},"extra":${'{"a":'.repeat(levels)}1${'}'.repeat(levels)}}`;
}

/** Every file in a folder, with its content, to compare before and after a command. */
function snapshot(dir: string) {
  return Object.fromEntries(
    readdirSync(dir, { recursive: true, withFileTypes: true })
      .filter((e) => e.isFile())
      .map((e) => {
        const p = join(e.parentPath, e.name);
        return [p, readFileSync(p, 'utf8')];
      }),
  );
}

const NO_CRASH = /RangeError|Maximum call stack|internal error|\n\s+at\s/;

describe('a case file nested thousands of levels deep', () => {
  it('solve refuses it with exit 2 naming the file and the limit, and writes nothing', async () => {
    const file = join(ws.root, 'deep-solve.json');
    writeFileSync(file, deepCaseText('deep-solve', 3500));
    const before = snapshot(ws.root);
    const r = await run(['solve', file]);
    expect(r.code).toBe(2);
    expect(r.err).toContain('nested too deeply: more than 64 levels');
    expect(r.err).toContain(`${file} is not a valid case file`);
    expect(r.err).not.toMatch(NO_CRASH);
    expect(r.out).toBe('');
    expect(snapshot(ws.root)).toEqual(before);
  });

  it('report refuses it the same way, by path and by id', async () => {
    writeFileSync(join(ws.sessions, 'deep-report.json'), deepCaseText('deep-report', 3500));
    for (const target of [join(ws.sessions, 'deep-report.json'), 'deep-report']) {
      const r = await run(['report', target]);
      expect(r.code).toBe(2);
      expect(r.err).toContain('nested too deeply: more than 64 levels');
      expect(r.err).toContain('deep-report.json is not a valid case file');
      expect(r.err).not.toMatch(NO_CRASH);
    }
  });

  it('at 65 levels is refused and at 64 is read (the limit is exact)', async () => {
    // The case itself is one object (level 1); `extra` adds the rest.
    const at = (levels: number) => {
      const f = join(ws.root, `levels-${levels}.json`);
      writeFileSync(f, deepCaseText('levels', levels));
      return f;
    };
    const ok = await run(['solve', at(63)]);
    expect(ok.code).toBe(0);
    expect(ok.out).toContain('extra: not a field of the case format');
    const over = await run(['solve', at(64)]);
    expect(over.code).toBe(2);
    expect(over.err).toContain('nested too deeply: more than 64 levels');
  });
});

describe("a case beyond the format's caps", () => {
  const write = (name: string, c: unknown) => {
    const f = join(ws.root, name);
    writeFileSync(f, typeof c === 'string' ? c : JSON.stringify(c));
    return f;
  };
  const many = (n: number) => Array.from({ length: n }, (_, i) => 40 + (i % 7));

  it('two million marks: exit 2 naming the list and the cap, at once and with no output', async () => {
    const c = skidCase('huge');
    c.analyses[0]!.marks = many(2_000_000);
    const r = await run(['solve', write('huge.json', c)]);
    expect(r.code).toBe(2);
    expect(r.err.split('\n')[0]).toBe('analyses[0].marks: marks must have at most 1000 items');
    expect(r.out).toBe('');
  });

  it('each list of the format has the cap, named in the message', async () => {
    const seg = { drag: { source: 'entered', value: 0.7 }, length: 1 };
    // eslint-disable-next-line @typescript-eslint/no-explicit-any -- edits a parsed JSON case at any depth
    const cases: [string, (c: any) => void, string][] = [
      [
        'segments',
        (c) => (c.analyses[0].segments = Array(1001).fill(seg)),
        'analyses[0].segments: segments must have at most 1000 items',
      ],
      [
        'analyses',
        (c) =>
          (c.analyses = Array.from({ length: 1001 }, (_, i) => ({
            ...c.analyses[0],
            id: `s${i}`,
          }))),
        'analyses: analyses must have at most 1000 items',
      ],
      [
        'tests',
        (c) =>
          (c.analyses[0].segments[0].drag = {
            source: 'test-skids',
            tests: Array(1001).fill({ speed: 30, distance: 40 }),
          }),
        'analyses[0].segments[0].drag.tests: tests must have at most 1000 items',
      ],
      [
        'pulls',
        (c) =>
          (c.analyses[0].segments[0].drag = {
            source: 'sled',
            weight: 30,
            pulls: many(1001).map((n) => n / 2),
          }),
        'analyses[0].segments[0].drag.pulls: pulls must have at most 1000 items',
      ],
    ];
    for (const [name, edit, message] of cases) {
      const c = skidCase(`cap-${name}`);
      edit(c);
      const r = await run(['solve', write(`cap-${name}.json`, c)]);
      expect(r.code, name).toBe(2);
      expect(r.err.split('\n')[0], name).toBe(message);
    }
  });

  it('1000 marks solve, and the step lists the first 8 and the count of the rest', async () => {
    const c = skidCase('thousand');
    c.analyses[0]!.marks = many(1000);
    const r = await run(['solve', write('thousand.json', c)]);
    expect(r.code).toBe(0);
    // The average of 40..46 repeated: (142 × (40 + ... + 46) + 40 + ... + 45) / 1000 = 42.997.
    expect(r.out).toContain(
      'd = (40.0 + 41.0 + 42.0 + 43.0 + 44.0 + 45.0 + 46.0 + 40.0 + … 992 more) / 1000 = 43.0 ft',
    );
    expect(r.out.length).toBeLessThan(20_000);
  });

  it('a file over 32 MB is refused before it is read, by solve and report', async () => {
    const text = JSON.stringify(skidCase('too-big'));
    const f = write(
      'too-big.json',
      `${text.slice(0, -1)},"notes":"${'x'.repeat(33 * 1024 * 1024)}"}`,
    );
    for (const cmd of ['solve', 'report']) {
      const r = await run([cmd, f]);
      expect(r.code, cmd).toBe(2);
      expect(r.err, cmd).toContain(
        `${f}: the file is too large: 33 MB, more than the 32 MB a case file may have`,
      );
      expect(r.out, cmd).toBe('');
    }
  });
});

describe('report onto a folder, into a missing or read-only folder, and of a folder', () => {
  const TEMP_NAMES = /\.part\b|\.lock\.new|\.tmp/;
  const caseFile = () => {
    const f = join(ws.root, 'out-case.json');
    writeFileSync(f, JSON.stringify(skidCase('out-case')));
    return f;
  };

  it('--out onto an existing folder, with or without --force: exit 1, the folder named, nothing written', async () => {
    const out = join(ws.root, 'reports.md');
    mkdirSync(out);
    const f = caseFile();
    for (const force of [[], ['--force']]) {
      const before = snapshot(ws.root);
      const r = await run(['report', f, '--out', out, ...force]);
      expect(r.code).toBe(1);
      expect(r.err).toContain(`${out} is a folder; give the report a file name`);
      expect(r.err).toContain('no report written');
      expect(r.err).not.toMatch(TEMP_NAMES);
      expect(r.err).not.toContain('EISDIR');
      expect(snapshot(ws.root)).toEqual(before);
      expect(readdirSync(ws.root).filter((n) => n.endsWith('.svg'))).toEqual([]);
    }
  });

  it('--out into a folder that does not exist: says so, nothing written', async () => {
    const before = snapshot(ws.root);
    const out = join(ws.root, 'no-such-folder', 'r.md');
    const r = await run(['report', caseFile(), '--out', out, '--force']);
    expect(r.code).toBe(1);
    expect(r.err).toContain(`${join(ws.root, 'no-such-folder')}: the folder does not exist`);
    expect(r.err).not.toMatch(TEMP_NAMES);
    expect(snapshot(ws.root)).toEqual(before);
  });

  it('--out into a read-only folder: says it cannot be written, no temp file named, nothing written', async () => {
    // Root may write anywhere: as root (CI), the program runs as the unprivileged user nobody,
    // with the workspace opened up for reading so that it can read the case.
    const asRoot = runsAsRoot();
    const dir = join(ws.root, 'read-only');
    mkdirSync(dir);
    chmodSync(dir, 0o555);
    if (asRoot) {
      chmodSync(ws.root, 0o755);
      chmodSync(caseFile(), 0o644);
      assertPassableForNobody(ws.root);
    }
    try {
      const r = await run(
        ['report', caseFile(), '--out', join(dir, 'r.md')],
        asRoot ? tmpdir() : ws.root,
        asRoot ? NOBODY : undefined,
      );
      expect(r.code).toBe(1);
      expect(r.err).toContain(
        `${dir}: cannot be written: the folder cannot be written (permission denied)`,
      );
      expect(r.err).not.toMatch(TEMP_NAMES);
      expect(readdirSync(dir)).toEqual([]);
    } finally {
      chmodSync(dir, 0o755);
    }
  });

  it('report of a folder says it is a folder, as solve does', async () => {
    for (const cmd of ['solve', 'report']) {
      const r = await run([cmd, '/etc']);
      expect(r.code, cmd).toBe(2);
      expect(r.err, cmd).toBe('skidcase: /etc: is a folder, not a case file\n');
    }
  });
});

describe('control characters in file names, ids, field names and labels', () => {
  // A name that would set the terminal's title if printed raw.
  const TITLE = '\u001b]0;owned\u0007';
  const ESCAPED = '\\u001b]0;owned\\u0007';
  // eslint-disable-next-line no-control-regex -- the control characters that must never reach the terminal raw
  const RAW = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/;

  it('solve and report print them escaped, in messages and in the chain', async () => {
    const missing = join(ws.root, `gone${TITLE}.json`);
    const invalid = join(ws.root, `bad${TITLE}.json`);
    writeFileSync(invalid, JSON.stringify({ ...skidCase('bad'), units: 'furlongs' }));
    const labelled = join(ws.root, `label${TITLE}.json`);
    // eslint-disable-next-line @typescript-eslint/no-explicit-any -- a parsed JSON case, given a label
    const c = skidCase('labelled', { [`odd${TITLE}`]: 1 }) as any;
    c.analyses[0].label = `front left${TITLE}`;
    writeFileSync(labelled, JSON.stringify(c));
    const runs = [
      [['solve', missing], `gone${ESCAPED}.json: no such file`],
      [['report', missing], `gone${ESCAPED}.json: no such file`],
      [['report', `case${TITLE}`], `case${ESCAPED}: no such file`],
      [['solve', invalid], `bad${ESCAPED}.json is not a valid case file`],
      [['report', invalid], `bad${ESCAPED}.json is not a valid case file`],
      [['solve', labelled], `front left${ESCAPED}`],
      [['solve', labelled], `odd${ESCAPED}: not a field of the case format`],
      [['report', labelled, '--format', 'md'], 'front left\\u001b'],
    ] as const;
    for (const [args, text] of runs) {
      const r = await run([...args]);
      expect(r.out + r.err, args.join(' ')).toContain(text);
      expect(r.out + r.err, args.join(' ')).not.toMatch(RAW);
    }
  });
});

describe('duplicate keys and infinite numbers', () => {
  it('solve warns naming each key given twice, with its path, and uses the last', async () => {
    const text = JSON.stringify(skidCase('twice'))
      .replace('"units":"imperial"', '"units":"imperial","units":"metric"')
      .replace('"value":0.72', '"value":0.5,"value":0.72');
    const f = join(ws.root, 'twice.json');
    writeFileSync(f, text);
    const r = await run(['solve', f]);
    expect(r.code).toBe(0);
    expect(r.out).toContain('units: given twice in one object; the last one is used');
    expect(r.out).toContain(
      'analyses[0].segments[0].drag.value: given twice in one object; the last one is used',
    );
    expect(r.out).toContain('Case twice (metric: m, km/h)');
    const json = await run(['solve', f, '--json']);
    expect(JSON.parse(json.out).warnings).toContain(
      'units: given twice in one object; the last one is used',
    );
  });

  it('infinity gets one wording, "must be a finite number", for marks and drag factors alike', async () => {
    const text = JSON.stringify(skidCase('infinite'))
      .replace('"marks":[52,55]', '"marks":[52,1e999]')
      .replace('"value":0.72', '"value":1e999');
    const f = join(ws.root, 'infinite.json');
    writeFileSync(f, text);
    const r = await run(['solve', f]);
    expect(r.code).toBe(2);
    expect(r.err).toContain('analyses[0].marks[1]: length must be a finite number');
    expect(r.err).toContain(
      'analyses[0].segments[0].drag.value: drag factor must be a finite number',
    );
    expect(r.err).not.toMatch(/must be a number\b/);
  });
});

const pty = await ptySupport();

// Under CI a missing pseudo-terminal fails these tests (pty-gate.ts); elsewhere they skip, saying why.
describeInTerminal('bad input in a terminal', 'bad-input terminal tests', pty, () => {
  afterEach(disposeAll);

  it('the case list shows the other cases and marks the over-deep one; resume names the problem', async () => {
    const local = makeWorkspace('skidcase-deep-list-');
    try {
      writeFileSync(join(local.sessions, 'good-one.json'), JSON.stringify(skidCase('good-one')));
      writeFileSync(join(local.sessions, 'good-two.json'), JSON.stringify(skidCase('good-two')));
      writeFileSync(join(local.sessions, 'too-deep.json'), deepCaseText('too-deep', 3500));
      const before = snapshot(local.sessions);
      const home = await startTerm({ cwd: local.root, env: local.env });
      const screen = await home.waitFor(/nested too deeply/, {
        what: 'the over-deep case marked',
      });
      expect(screen).toContain('good-one');
      expect(screen).toContain('good-two');
      expect(screen).toContain('too-deep');
      expect(screen).not.toMatch(NO_CRASH);
      await home.dispose();

      const resume = await startTerm({
        args: ['resume', 'too-deep'],
        cwd: local.root,
        env: local.env,
      });
      const shown = await resume.waitFor(/nested too deeply: more than 64 levels/, {
        what: 'why the case cannot be opened',
      });
      expect(shown).not.toMatch(NO_CRASH);
      await resume.dispose();
      expect(snapshot(local.sessions)).toEqual(before);
    } finally {
      local.cleanup();
    }
  });

  it('a version-99 file is said to come from a newer skidcase, not to be damaged, on the list and by solve', async () => {
    const local = makeWorkspace('skidcase-v99-');
    try {
      const file = join(local.sessions, 'from-future.json');
      writeFileSync(file, JSON.stringify({ ...skidCase('from-future'), version: 99 }));
      const before = snapshot(local.sessions);
      const home = await startTerm({ cwd: local.root, env: local.env });
      const screen = await home.waitFor(/written by a newer skidcase: update skidcase/, {
        what: 'the newer-version line for the selected row',
      });
      expect(screen).toContain('file version 99');
      expect(screen).not.toMatch(/damaged|no backup/);
      await home.dispose();
      const r = await run(['solve', file]);
      expect(r.code).toBe(2);
      expect(r.err.split('\n')[0]).toBe(
        'version: written by a newer skidcase (file version 99; this one reads up to version 1): update skidcase to open it',
      );
      expect(snapshot(local.sessions)).toEqual(before);
    } finally {
      local.cleanup();
    }
  });
});
