import { fileURLToPath } from 'node:url';
import { solveCommand } from '../../src/commands/solve.js';

/** Path of a hand-written fixture case. */
export const fixture = (name: string) =>
  fileURLToPath(new URL(`../fixtures/cases/${name}`, import.meta.url));

/** Runs `solve` in-process and collects what it prints. */
export async function runSolve(file: string, json = false) {
  let out = '';
  let err = '';
  const code = await solveCommand(
    file,
    { json },
    { out: (s) => (out += s), err: (s) => (err += s) },
  );
  return { code, out, err };
}
