// The last line of a test run, in plain words: how many tests passed, failed and were skipped,
// and how many files failed to load. vitest's own summary stays above it.
import type { Reporter, TestModule } from 'vitest/node';

export function countLine(modules: ReadonlyArray<TestModule>, unhandled: number): string {
  let passed = 0;
  let failed = 0;
  let skipped = 0;
  let broken = 0;
  for (const m of modules) {
    if (m.state() === 'failed' && [...m.children.allTests()].length === 0) broken++;
    for (const t of m.children.allTests()) {
      const s = t.result().state;
      if (s === 'passed') passed++;
      else if (s === 'failed') failed++;
      else skipped++;
    }
  }
  const parts = [`${passed} passed`, `${failed} failed`, `${skipped} skipped`];
  if (broken) parts.push(`${broken} test files failed to load`);
  if (unhandled) parts.push(`${unhandled} unhandled errors`);
  return `Result: ${parts.join(', ')}.`;
}

export default class CountReporter implements Reporter {
  onTestRunEnd(modules: ReadonlyArray<TestModule>, errors: ReadonlyArray<unknown>): void {
    process.stdout.write(`\n${countLine(modules, errors.length)}\n`);
  }
}
