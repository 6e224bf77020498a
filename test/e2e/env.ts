/**
 * Environment and folders for programs the end-to-end tests start, so that a test never reads or
 * writes the developer's own preferences or sessions, and behaves the same on a laptop and in CI.
 */
import { mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { trackedTempDir } from '../temp-dirs.js';

/**
 * The parent's environment with what would change the program's behaviour removed: Ink renders
 * only the final frame when it sees CI variables, and vitest's FORCE_COLOR would defeat NO_COLOR
 * tests. `extra` values of `undefined` remove a variable.
 */
export function childEnv(extra: Record<string, string | undefined> = {}): Record<string, string> {
  const env: Record<string, string> = {};
  for (const [k, v] of Object.entries(process.env)) {
    if (v === undefined) continue;
    if (k === 'CI' || k === 'CONTINUOUS_INTEGRATION' || k.startsWith('CI_')) continue;
    if (k === 'FORCE_COLOR' || k === 'NO_COLOR' || k === 'COLORTERM') continue;
    if (k.startsWith('VITEST') || k === 'NODE_OPTIONS' || k === 'TMUX' || k === 'TMUX_PANE')
      continue;
    if (k.startsWith('SKIDCASE_')) continue;
    env[k] = v;
  }
  // the temporary cache folder test/setup/cache-dir.ts chose, never the machine's user cache
  if (process.env.SKIDCASE_CACHE_DIR) env.SKIDCASE_CACHE_DIR = process.env.SKIDCASE_CACHE_DIR;
  env.TERM = 'xterm-256color';
  env.LANG = env.LANG && /utf-?8/i.test(env.LANG) ? env.LANG : 'C.UTF-8';
  for (const [k, v] of Object.entries(extra)) {
    if (v === undefined) delete env[k];
    else env[k] = v;
  }
  return env;
}

/** A throw-away working folder with its own sessions and preferences folders. */
export interface Workspace {
  root: string;
  sessions: string;
  config: string;
  /** SKIDCASE_CONFIG_DIR, SKIDCASE_SESSIONS and SKIDCASE_CACHE_DIR pointing into this workspace. */
  env: Record<string, string>;
  cleanup(): void;
}

export function makeWorkspace(prefix = 'skidcase-e2e-'): Workspace {
  const root = trackedTempDir(prefix);
  const sessions = join(root, 'sessions');
  const config = join(root, 'config');
  mkdirSync(sessions);
  mkdirSync(config);
  // Outside root: tests compare root's files before and after, and the cache is not the user's.
  const cache = trackedTempDir(`${prefix}cache-`);
  return {
    root,
    sessions,
    config,
    env: {
      SKIDCASE_CONFIG_DIR: config,
      SKIDCASE_SESSIONS: sessions,
      SKIDCASE_CACHE_DIR: cache,
    },
    cleanup: () => {
      rmSync(root, { recursive: true, force: true });
      rmSync(cache, { recursive: true, force: true });
    },
  };
}
