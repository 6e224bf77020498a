import { trackedTempDir } from '../temp-dirs.js';

// Programs the tests start inherit this: their V8 code cache and list index go to a temporary
// folder (removed with the file's other temporary folders), never the machine's user cache.
process.env.SKIDCASE_CACHE_DIR = trackedTempDir('skidcase-test-cache-');
