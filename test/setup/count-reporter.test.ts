import { describe, expect, it } from 'vitest';
import type { TestModule } from 'vitest/node';
import { countLine } from './count-reporter.js';

/** A stand-in for a finished test file holding tests in the given states. */
const fileWith = (states: string[], state = 'passed') =>
  ({
    state: () => state,
    children: {
      allTests: () => states.map((s) => ({ result: () => ({ state: s }) }))[Symbol.iterator](),
    },
  }) as unknown as TestModule;

describe('the closing line of a test run', () => {
  it('states passed, failed and skipped counts plainly', () => {
    const line = countLine(
      [fileWith(['passed', 'passed', 'failed']), fileWith(['skipped', 'passed'])],
      0,
    );
    expect(line).toBe('Result: 3 passed, 1 failed, 1 skipped.');
  });

  it('names files that failed to load and unhandled errors', () => {
    expect(countLine([fileWith([], 'failed')], 2)).toBe(
      'Result: 0 passed, 0 failed, 0 skipped, 1 test files failed to load, 2 unhandled errors.',
    );
  });
});
