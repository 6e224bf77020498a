// Save timing, by hand: `npx tsx test/store/bench-save.ts`. Not a test (timing is never asserted
// in tests); it prints the median and 90th percentile of saveCase for a typical and a 500-segment
// case, so the figures in the report can be checked on any machine.
import { releaseAllLocks, saveCase } from '../../src/store/index.js';
import { manySegmentCase, sampleCase, tempDir } from './helpers.js';

async function bench(name: string, make: (i: number) => Parameters<typeof saveCase>[1], runs = 60) {
  const dir = tempDir('bench');
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c = make(i);
    const t = performance.now();
    const r = await saveCase(dir, c);
    times.push(performance.now() - t);
    if (!r.ok) throw new Error(r.message);
  }
  times.sort((a, b) => a - b);
  const at = (q: number) =>
    times[Math.min(times.length - 1, Math.floor(q * times.length))]!.toFixed(2);
  console.log(`${name}: median ${at(0.5)} ms, p90 ${at(0.9)} ms (${runs} saves)`);
}

await bench('typical case', (i) => sampleCase('bench-typical', [50, 51 + (i % 3)]));
await bench('500 segments', () => manySegmentCase('bench-large', 500), 30);
await releaseAllLocks();
