import { readFileSync } from 'node:fs';

// Set by scripts/build.mjs (esbuild `define`) in the bundle; absent when run from source.
declare const __SKIDCASE_VERSION__: string | undefined;

/**
 * skidcase's version for the report: the bundle's built-in value, or, when running from source
 * (tests, tsx), the version in package.json.
 */
export function toolVersion(): string {
  if (typeof __SKIDCASE_VERSION__ === 'string') return __SKIDCASE_VERSION__;
  try {
    const pkg = JSON.parse(
      readFileSync(new URL('../../package.json', import.meta.url), 'utf8'),
    ) as {
      version?: unknown;
    };
    return typeof pkg.version === 'string' ? pkg.version : 'unknown';
  } catch {
    return 'unknown';
  }
}
