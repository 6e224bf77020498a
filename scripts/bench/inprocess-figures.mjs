// Figures measured inside this process, on the code in src/ loaded through tsx: autosave and the
// uncertainty sampling. Each is compared with the plainest code doing the same amount of work.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { findExport } from './load-src.mjs';
import { interleaved, median } from './stats.mjs';
import { slideCase } from './cases.mjs';

/**
 * The interview's save (saveCaseSync: validate, check the file on disk is ours, write a temp file,
 * fsync, read it back and compare, keep the backup, rename, fsync the folder) of a typical
 * (3-segment) and of a 500-segment case, vs fs.writeFileSync of the same bytes.
 */
export async function autosave(ctx) {
  const saveCase = await findExport(ctx.root, 'src/store', 'saveCase');
  const saveCaseSync = await findExport(ctx.root, 'src/store', 'saveCaseSync');
  const figures = [
    { figure: 'autosave, typical case (3 segments)', c: slideCase(3, 'bench-typical'), limit: 5 },
    { figure: 'autosave, 500 segments', c: slideCase(500, 'bench-large'), limit: 50 },
  ];
  if (!saveCase)
    return figures.map(({ figure }) => ({
      figure,
      available: false,
      note: 'src/store saveCase does not exist yet',
    }));
  const out = [];
  for (const { figure, c, limit } of figures) {
    const dir = mkdtempSync(join(ctx.tmp, 'save-'));
    const plain = join(dir, 'plain.json');
    const bytes = JSON.stringify(c, null, 2);
    const first = await saveCase(dir, c);
    if (first && first.ok === false) {
      out.push({
        figure,
        available: false,
        note: `saveCase refused the case: ${first.message ?? JSON.stringify(first)}`,
      });
      continue;
    }
    const runs = ctx.inProcessRuns;
    const { subject, baseline } = await interleaved(
      async () => {
        const t0 = performance.now();
        if (saveCaseSync) saveCaseSync(dir, c);
        else await saveCase(dir, c);
        return performance.now() - t0;
      },
      async () => {
        const t0 = performance.now();
        writeFileSync(plain, bytes);
        return performance.now() - t0;
      },
      { runs, warmup: 3 },
    );
    await releaseLocks(ctx);
    rmSync(dir, { recursive: true, force: true });
    const measured = median(subject);
    out.push({
      figure,
      available: true,
      measured,
      baseline: median(baseline),
      goal: { kind: 'ms', limit },
      pass: measured < limit,
      runs,
      method: `in-process ${saveCaseSync ? 'saveCaseSync (checked write, fsync, backup)' : 'saveCase'} into a temp dir; ${Math.round(bytes.length / 1024)} KiB of JSON`,
    });
  }
  return out;
}

/** Lets go of the case locks saveCase took, so the temp folder can go. */
async function releaseLocks(ctx) {
  const release = await findExport(ctx.root, 'src/store', 'releaseAllLocks');
  if (release) await release();
}

/** A slide model from the engine when it exists (the real one), else from docs/physics.md's formula. */
async function benchModel(ctx) {
  const solveCase = await findExport(ctx.root, 'src/engine', 'solveCase');
  if (solveCase) {
    const sol = solveCase(slideCase(3, 'bench-sampling'));
    const a = sol.analyses[0];
    if (a?.ok) return { model: a.solution.model, from: 'engine solveCase' };
  }
  // S = sqrt(30 * sum d_i (f_i n + G_i/100)), three segments, n = 1 (docs/physics.md, "Several
  // surfaces")
  const inputs = [
    ['d[0]', 38.5, 38, 39],
    ['f[0]', 0.72, 0.66, 0.78],
    ['d[1]', 27, 26.5, 27.5],
    ['f[1]', 0.48, 0.4, 0.55],
    ['d[2]', 19.5, 19, 20],
    ['f[2]', 0.35, 0.28, 0.42],
  ].map(([key, value, low, high]) => ({ key, label: key, unit: '', value, low, high }));
  const evaluate = (x) =>
    Math.sqrt(
      30 *
        (x['d[0]'] * (x['f[0]'] + 0.015) + x['d[1]'] * x['f[1]'] + x['d[2]'] * (x['f[2]'] - 0.02)),
    );
  return { model: { inputs, evaluate }, from: 'local formula (engine not there yet)' };
}

/** sampleSpeeds with 100,000 samples vs a plain loop evaluating the model 100,000 times. */
export async function sampling(ctx) {
  const figure = 'uncertainty run, 100,000 samples';
  const sampleSpeeds = await findExport(ctx.root, 'src/extras', 'sampleSpeeds');
  if (!sampleSpeeds)
    return { figure, available: false, note: 'src/extras sampleSpeeds does not exist yet' };
  const { model, from } = await benchModel(ctx);
  const n = 100_000;
  const x = Object.fromEntries(model.inputs.map((i) => [i.key, i.value]));
  const probe = sampleSpeeds(model, { n, seed: 7, shape: 'uniform' });
  if (!probe.ok) return { figure, available: false, note: `sampleSpeeds failed: ${probe.reason}` };
  let sink = 0;
  const runs = ctx.inProcessRuns;
  const { subject, baseline } = await interleaved(
    async () => {
      const t0 = performance.now();
      const r = sampleSpeeds(model, { n, seed: 7, shape: 'uniform' });
      sink += r.ok ? r.value.p50 : 0;
      return performance.now() - t0;
    },
    async () => {
      const t0 = performance.now();
      for (let i = 0; i < n; i++) {
        for (const inp of model.inputs) x[inp.key] = inp.low + Math.random() * (inp.high - inp.low);
        sink += model.evaluate(x) ?? 0;
      }
      return performance.now() - t0;
    },
    { runs: Math.max(5, Math.round(runs / 4)), warmup: 2 },
  );
  const measured = median(subject);
  return {
    figure,
    available: true,
    measured,
    baseline: median(baseline),
    goal: { kind: 'ms', limit: 100 },
    pass: measured < 100,
    runs: Math.max(5, Math.round(runs / 4)),
    method: `in-process, model from ${from}; baseline draws and evaluates the same model in a plain loop`,
    detail: `p5/p50/p95 of the run: ${[probe.value.p5, probe.value.p50, probe.value.p95].map((v) => v.toFixed(1)).join(' / ')} (${probe.value.count} speeds)`,
    sink: Number.isFinite(sink),
  };
}
