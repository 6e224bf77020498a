import { afterAll } from 'vitest';
import { removeTrackedTempDirs } from '../temp-dirs.js';

// Every test file ends by removing the temporary folders its helpers made (test/temp-dirs.ts).
afterAll(() => {
  removeTrackedTempDirs();
});
