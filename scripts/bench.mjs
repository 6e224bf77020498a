// `npm run bench` (after `npm run build`): how fast skidcase feels, each figure beside a baseline
// measured in the same run on the same machine, so that a slow or busy machine does not read as
// a slow program. Not part of `npm test`: timing is never asserted in the test suite.
//
// Environment: BENCH_RUNS (process figures, default 9: the median of that many spawns) and
// BENCH_INPROCESS_RUNS (default 40). Results also go to .bench/last.json.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { cpus, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { markdownTable, table } from './bench/stats.mjs';
import { startScreen, solveJson } from './bench/process-figures.mjs';
import { autosave, sampling } from './bench/inprocess-figures.mjs';
import { keypress } from './bench/keypress.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
// SKIDCASE_BENCH_BINARY measures another build of the same CLI (a debugging aid).
const binary = process.env.SKIDCASE_BENCH_BINARY ?? join(root, 'dist/skidcase.js');
if (!existsSync(binary)) {
  console.error(
    'dist/skidcase.js is missing: run `npm run bench` (it builds first) or `npm run build`.',
  );
  process.exit(1);
}
const tmp = mkdtempSync(join(tmpdir(), 'skidcase-bench-'));
const ctx = {
  root,
  binary,
  tmp,
  sessions: join(tmp, 'sessions'),
  config: join(tmp, 'config'),
  processRuns: Number(process.env.BENCH_RUNS ?? 9),
  inProcessRuns: Number(process.env.BENCH_INPROCESS_RUNS ?? 40),
};
mkdirSync(ctx.sessions);
mkdirSync(ctx.config);

// BENCH_ONLY=keypress,autosave runs only those steps (when working on one figure).
const only = process.env.BENCH_ONLY?.split(',');
const steps = [startScreen, solveJson, keypress, autosave, sampling].filter(
  (s) => !only || only.includes(s.name),
);
const FIGURE_NAMES = {
  startScreen: 'start screen (pty)',
  solveJson: 'solve --json, 3 segments',
  keypress: 'key press to frame (p95)',
  autosave: 'autosave',
  sampling: 'uncertainty run, 100,000 samples',
};
const results = [];
try {
  for (const step of steps) {
    process.stderr.write(`  measuring: ${step.name}\n`);
    let r;
    try {
      r = await step(ctx);
    } catch (e) {
      r = {
        figure: FIGURE_NAMES[step.name] ?? step.name,
        available: false,
        note: `failed: ${e instanceof Error ? e.message : String(e)}`,
      };
    }
    for (const one of [r].flat()) {
      results.push(one);
    }
  }
} finally {
  rmSync(tmp, { recursive: true, force: true });
}

console.log(
  `skidcase benchmark, ${new Date().toISOString()}, node ${process.version}, ${cpus().length} cpus (${cpus()[0]?.model ?? '?'})`,
);
console.log(
  `medians of ${ctx.processRuns} runs per process figure (solve: ${ctx.processRuns * 2}), ${ctx.inProcessRuns} per in-process figure\n`,
);
console.log(table(results));
console.log('');
for (const r of results) {
  const notes = [
    r.method && `method: ${r.method}`,
    r.note,
    r.firstLine && `screen began: "${r.firstLine}"`,
    r.detail,
  ].filter(Boolean);
  if (notes.length) console.log(`- ${r.figure}: ${notes.join('; ')}`);
}
mkdirSync(join(root, '.bench'), { recursive: true });
const json = {
  date: new Date().toISOString(),
  node: process.version,
  cpus: cpus().length,
  cpuModel: cpus()[0]?.model,
  processRuns: ctx.processRuns,
  inProcessRuns: ctx.inProcessRuns,
  results: results.map((r) => ({
    ...r,
    ratio: r.available && r.baseline ? r.measured / r.baseline : undefined,
  })),
};
writeFileSync(join(root, '.bench/last.json'), JSON.stringify(json, null, 2) + '\n');
const runsNote = `node ${process.version}, ${cpus().length} cpus, medians of ${ctx.processRuns} runs per process figure, ${ctx.inProcessRuns} in process`;
writeFileSync(
  join(root, '.bench/last.md'),
  markdownTable(results, json.date.slice(0, 10), runsNote),
);
console.log('\nwritten: .bench/last.json, .bench/last.md');
