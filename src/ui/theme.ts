/**
 * Colour policy. chalk (which Ink draws with) does not read NO_COLOR, so the app reads it and
 * turns every style off, as https://no-color.org asks: present and not empty means no colour.
 */
import chalk from 'chalk';

/** True when the environment asks for no colour. */
export function noColorRequested(env: NodeJS.ProcessEnv): boolean {
  return typeof env.NO_COLOR === 'string' && env.NO_COLOR !== '';
}

/**
 * Applies NO_COLOR to chalk for the whole process (Ink and this app share chalk), and says
 * whether colour is on. Without NO_COLOR chalk's own terminal detection stands.
 */
export function applyColorPolicy(env: NodeJS.ProcessEnv): boolean {
  if (noColorRequested(env)) chalk.level = 0;
  return chalk.level > 0;
}

/** Colour names used by the screens, one per meaning, so a meaning never changes colour. */
export const TONE = {
  heading: 'cyan',
  result: 'green',
  error: 'red',
  warning: 'yellow',
  muted: 'gray',
  key: 'magenta',
} as const;
