// `npm test`: every test suite (vitest) and the checks on the code itself (type check, eslint,
// prettier --check, knip), run side by side so the whole takes little more than the tests alone.
// The checks' output is held back and printed after vitest's, so the two never interleave. The
// last line says plainly what passed and what failed; the exit code is 1 if anything failed.
import { spawn } from 'node:child_process';

const bin = (name) => new URL(`../node_modules/.bin/${name}`, import.meta.url).pathname;
const TSC7 = new URL('../node_modules/typescript7/bin/tsc', import.meta.url).pathname;

/** Runs a command, keeping its output, resolving with its exit code and output. */
function run(name, cmd, args, { echo }) {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    const take = (stream, to) =>
      stream.on('data', (d) => {
        if (echo) to.write(d);
        out += d;
      });
    take(child.stdout, process.stdout);
    take(child.stderr, process.stderr);
    child.on('error', (e) => resolve({ name, code: 2, out: `${out}${e.message}\n` }));
    child.on('close', (code, signal) => resolve({ name, code: code ?? (signal ? 1 : 0), out }));
  });
}

/** The code checks, one after another (each is short; together they fit beside the tests). */
async function checks() {
  const steps = [
    // TypeScript 7 (the native compiler) type-checks in a fifth of the time; eslint and knip keep
    // TypeScript 5 for its JavaScript API, which TypeScript 7 does not have.
    ['type check', process.execPath, [TSC7, '--noEmit']],
    ['eslint', bin('eslint'), ['.']],
    [
      'prettier --check',
      bin('prettier'),
      ['--check', 'src', 'test', 'scripts', 'eslint.config.mjs', 'vitest.config.ts', 'knip.json'],
    ],
    ['knip', bin('knip'), []],
  ];
  const results = [];
  for (const [name, cmd, args] of steps) results.push(await run(name, cmd, args, { echo: false }));
  return results;
}

const args = process.argv.slice(2);
const [tests, checked] = await Promise.all([
  run('tests', bin('vitest'), ['run', ...args], { echo: true }),
  // a run of chosen test files (npm test -- FILE) skips the code checks
  args.length ? Promise.resolve([]) : checks(),
]);

for (const c of checked) {
  process.stdout.write(`\n── ${c.name}: ${c.code === 0 ? 'passed' : 'FAILED'}\n`);
  if (c.code !== 0) process.stdout.write(c.out);
}
const failedChecks = checked.filter((c) => c.code !== 0).map((c) => c.name);
// vitest's own last line (test/setup/count-reporter.ts), repeated as the run's closing line
const counts = [...tests.out.matchAll(/^Result: (.*)\.$/gm)].pop()?.[1] ?? 'tests did not finish';
const checkLine = checked.length
  ? `; code checks: ${checked.length - failedChecks.length} passed, ${failedChecks.length} failed` +
    (failedChecks.length ? ` (${failedChecks.join(', ')})` : '')
  : '';
process.stdout.write(`\nResult: ${counts}${checkLine}.\n`);
process.exit(tests.code === 0 && failedChecks.length === 0 ? 0 : 1);
