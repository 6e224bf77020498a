/**
 * Reading results the way a person does: off the review screen (paging down to its end), and
 * from `skidcase solve FILE --json` on the file the program saved. The tests then compare the two.
 */
import { execFile } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { BINARY, type Term } from './harness.js';
import { childEnv } from './env.js';

/** One analysis as the review screen states it. */
export interface ShownResult {
  /** `41.6`, `38.9`, `44.0`: as printed, so a comparison is with what the person read. */
  value: string;
  low: string;
  high: string;
  atLeast: number;
  unit: string;
}

/**
 * Pages through the review (PgDn) until a page no longer changes the screen, and returns every
 * line seen, in order, each once. The last page is known by waiting `endMs` for a change that
 * does not come.
 */
export async function readReview(t: Term, maxPages = 40, endMs = 1_500): Promise<string[]> {
  const seen: string[] = [];
  let screen = t.screen();
  for (let page = 0; page < maxPages; page++) {
    for (const line of screen.split('\n')) if (!seen.includes(line)) seen.push(line);
    await t.press('pagedown');
    try {
      screen = await t.waitForChange(screen, { timeoutMs: endMs });
    } catch {
      break;
    }
  }
  return seen;
}

const SPEED = /Speed when the marks began: ([\d.]+) (mph|km\/h)(?: \(([\d.]+) to ([\d.]+)\))?/;
const AT_LEAST = /at least (\d+) (mph|km\/h)/;

/** The speed range and "at least" figure of each analysis, in the order shown. */
export function shownResults(lines: string[]): ShownResult[] {
  const out: ShownResult[] = [];
  let pending: Omit<ShownResult, 'atLeast'> | undefined;
  for (const l of lines) {
    const s = SPEED.exec(l);
    if (s) pending = { value: s[1]!, low: s[3] ?? s[1]!, high: s[4] ?? s[1]!, unit: s[2]! };
    const a = AT_LEAST.exec(l);
    if (a && pending && /^\s*Result:/.test(l)) {
      out.push({ ...pending, atLeast: Number(a[1]) });
      pending = undefined;
    }
  }
  return out;
}

/** The case files in a sessions folder (`<id>.json`, not backups or kept originals). */
export function caseFiles(dir: string): string[] {
  return readdirSync(dir)
    .filter((f) => /^[a-z0-9-]+\.json$/.test(f))
    .map((f) => join(dir, f));
}

export interface SolvedJson {
  id: string;
  units: { length: string; speed: string };
  analyses: {
    id: string;
    kind: string;
    speed: { value: number; low: number; high: number };
    minimum: number;
  }[];
  postedLimit?: { value: number; exceededAtMinimum: boolean };
}

/** Runs the built `skidcase solve FILE --json` and parses what it printed (exit 0 expected). */
export function solveJson(file: string): Promise<SolvedJson> {
  return new Promise((resolve, reject) =>
    execFile(
      process.execPath,
      [BINARY, 'solve', file, '--json'],
      { env: childEnv() },
      (e, out, err) => {
        if (e)
          return reject(
            new Error(`solve ${file} failed (${(e as { code?: number }).code}): ${err}`),
          );
        try {
          resolve(JSON.parse(out) as SolvedJson);
        } catch {
          reject(new Error(`solve --json did not print JSON: ${out.slice(0, 200)}`));
        }
      },
    ),
  );
}

/** A solution's figures written the way the review writes speeds (1 decimal). */
export function asShown(sol: SolvedJson): ShownResult[] {
  return sol.analyses.map((a) => ({
    value: a.speed.value.toFixed(1),
    low: a.speed.low.toFixed(1),
    high: a.speed.high.toFixed(1),
    atLeast: a.minimum,
    unit: sol.units.speed,
  }));
}

/** The parsed case file. */
export const readCase = (file: string) =>
  JSON.parse(readFileSync(file, 'utf8')) as Record<string, unknown>;
