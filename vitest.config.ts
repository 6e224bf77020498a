import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.{ts,tsx}'],
    // removes the temporary folders each test file's helpers made (test/temp-dirs.ts)
    // and points the user cache folder of the programs they start at a temporary one
    setupFiles: ['test/setup/temp-cleanup.ts', 'test/setup/cache-dir.ts'],
    // vitest's summary, then one plain line: N passed, N failed, N skipped
    reporters: ['default', './test/setup/count-reporter.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    // pseudo-terminal and crash tests spawn processes; two cores only
    pool: 'forks',
    maxWorkers: 2,
  },
});
