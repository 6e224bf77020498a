/**
 * What `skidcase solve` must do with any file at all, as checks shared by the in-process and the
 * binary fuzz runs: exit 0, 2 or 3 only; never a stack trace; on 2, each problem as `path: message`
 * with a path that exists in the file; on 3, the analysis named; on 0, finite figures only.
 */
import { pathIsReal, type MutatedCase } from './mutations.js';

export interface SolveRun {
  code: number;
  out: string;
  err: string;
}

const STACK = /\n\s+at\s|\b(TypeError|ReferenceError|RangeError|SyntaxError|Error):/;
const NOT_A_NUMBER = ['NaN', 'undefined', 'Infinity'];

/** A word that signals a broken number, unless the file itself holds it as text (an id, a note). */
const brokenNumbers = (out: string, input: string) =>
  NOT_A_NUMBER.filter((w) => !input.includes(w) && new RegExp(`\\b${w}\\b`).test(out));

/** Problems with one run, as sentences (empty when the run behaved). */
export function solveProblems(input: MutatedCase, r: SolveRun, json: boolean): string[] {
  const p: string[] = [];
  if (![0, 2, 3].includes(r.code)) p.push(`exit ${r.code}, expected 0, 2 or 3`);
  if (STACK.test(r.out) || STACK.test(r.err)) p.push('a stack trace or raw error was printed');
  if (r.code === 2) {
    const issues = r.err
      .split('\n')
      .map((l) => /^([A-Za-z(][\w.()[\]-]*): (.+)$/.exec(l))
      .filter((m): m is RegExpExecArray => m !== null && m[1] !== 'skidcase');
    if (issues.length === 0) p.push(`exit 2 without a "path: message" line on stderr:\n${r.err}`);
    if (
      input.doc !== undefined &&
      issues.length > 0 &&
      !issues.some((m) => pathIsReal(input.doc, m[1]!))
    )
      p.push(`exit 2 but no named path exists in the file: ${issues.map((m) => m[1]).join(', ')}`);
    if (r.out !== '') p.push('exit 2 printed a solution');
  }
  if (r.code === 3 && !/analyses\[\d+\]/.test(r.err))
    p.push(`exit 3 without naming the analysis:\n${r.err}`);
  if (r.code === 0 || (r.code === 3 && !json)) {
    const words = brokenNumbers(r.out, input.text);
    if (words.length) p.push(`${words.join(', ')} in the output:\n${r.out.slice(0, 400)}`);
  }
  if (r.code === 0 && json) p.push(...jsonProblems(r.out));
  return p;
}

/** The JSON contract's figures: finite, low <= value <= high, minimum a whole number <= low. */
function jsonProblems(out: string): string[] {
  let sol: {
    analyses?: {
      id?: string;
      speed?: { value: number; low: number; high: number };
      minimum?: number;
    }[];
  };
  try {
    sol = JSON.parse(out);
  } catch {
    return ['exit 0 with --json but stdout is not JSON'];
  }
  const p: string[] = [];
  for (const a of sol.analyses ?? []) {
    const s = a.speed;
    if (!s || ![s.value, s.low, s.high].every(Number.isFinite)) p.push(`${a.id}: speed not finite`);
    else if (!(s.low <= s.value + 1e-9 && s.value <= s.high + 1e-9))
      p.push(`${a.id}: low/value/high out of order`);
    else if (!(
      Number.isInteger(a.minimum) &&
      a.minimum! <= s.low + 1e-9 &&
      a.minimum! > s.low - 1 - 1e-9
    ))
      p.push(`${a.id}: minimum ${a.minimum} is not the low end ${s.low} rounded down`);
  }
  return p;
}
