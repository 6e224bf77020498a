import { defineConfig } from 'vitest/config';

/**
 * Tests that start processes: the built program in a pseudo-terminal (test/e2e/), the crash test
 * killing a saving child, and the fuzz test feeding the built binary. They run after the rest, in
 * processes of their own, so that a CPU-bound unit file never delays a screen they wait for.
 */
const PROCESS_TESTS = [
  'test/e2e/**/*.test.ts',
  'test/store/crash.test.ts',
  'test/fuzz/solve-fuzz.test.ts',
];
/** Files that replace modules with vi.mock: each needs a module registry of its own. */
const MOCKING_TESTS = ['test/ui/review-once.test.tsx'];

const shared = {
  // removes the temporary folders each test file's helpers made (test/temp-dirs.ts)
  // and points the user cache folder of the programs they start at a temporary one
  setupFiles: ['test/setup/temp-cleanup.ts', 'test/setup/cache-dir.ts'],
  testTimeout: 30_000,
  env: { NODE_ENV: 'production' },
  hookTimeout: 60_000,
};

export default defineConfig({
  // React as it ships: the bundle is built with NODE_ENV=production (scripts/build-options.mjs),
  // so the tests render with React's production build and the JSX transform that goes with it
  // (the development build re-checks every element and costs about a tenth of a screen test).
  oxc: { jsx: { runtime: 'automatic', development: false } },
  test: {
    // vitest's summary, then one plain line: N passed, N failed, N skipped
    reporters: ['default', './test/setup/count-reporter.ts'],
    // two cores: two workers at a time, in every group
    maxWorkers: 2,
    projects: [
      {
        extends: true,
        // The pure and in-process tests share their workers' module cache (loading Ink, mathjs
        // and fast-check once per worker, not once per file): none of them changes a module.
        test: {
          ...shared,
          name: 'unit',
          include: ['test/**/*.test.{ts,tsx}'],
          exclude: [...PROCESS_TESTS, ...MOCKING_TESTS],
          pool: 'threads',
          isolate: false,
          sequence: { groupOrder: 0 },
        },
      },
      {
        extends: true,
        test: {
          ...shared,
          name: 'mocking',
          include: MOCKING_TESTS,
          pool: 'threads',
          sequence: { groupOrder: 0 },
        },
      },
      {
        extends: true,
        test: {
          ...shared,
          name: 'processes',
          include: PROCESS_TESTS,
          pool: 'forks',
          // Three at a time: these files mostly wait for a child's screen or exit, so two would
          // leave a core idle; a fourth starts to slow the screens they wait for.
          maxWorkers: 3,
          sequence: { groupOrder: 1 },
        },
      },
    ],
  },
});
