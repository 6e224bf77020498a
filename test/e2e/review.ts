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

/** The scroll marker under a long review: `lines 33-65 of 104 · ...` (src/ui's scroll view). */
const MARKER = /^lines (\d+)-(\d+) of (\d+)/;

/**
 * The whole review, line by line in order, as a person paging through it (PgDn) reads it. Each
 * page's lines are placed by the scroll marker under them, so repeated lines (two steps with the
 * same result) are kept, and paging overlap is not counted twice. A review that fits on one
 * screen has no marker: then the screen is the review.
 */
export async function readReview(t: Term, maxPages = 40): Promise<string[]> {
  const lines: string[] = [];
  let screen = t.screen();
  for (let page = 0; page < maxPages; page++) {
    const rows = screen.split('\n');
    const at = rows.findIndex((r) => MARKER.test(r.trim()));
    if (at < 0) return page === 0 ? rows : lines;
    const [, from, to, total] = MARKER.exec(rows[at]!.trim())!.map(Number) as [
      number,
      number,
      number,
      number,
    ];
    const shown = rows.slice(at - (to - from + 1), at);
    shown.forEach((l, i) => (lines[from - 1 + i] = l));
    if (to >= total) return lines;
    await t.press('pagedown');
    screen = await t.waitForChange(screen, { what: 'the next page of the review' });
  }
  throw new Error(`the review did not end within ${maxPages} pages`);
}

/** A number as shown (`−3.0`, `0.64`), with how many decimals it was shown with. */
function shownNumber(s: string): { n: number; dp: number } {
  const t = s.replace('\u2212', '-');
  return { n: Number(t), dp: t.includes('.') ? t.length - t.indexOf('.') - 1 : 0 };
}

export interface ShownStep {
  /** The step's heading as shown (`Slide distance`), from `  1. Slide distance`. */
  name: string;
  value: { n: number; dp: number };
  low: { n: number; dp: number };
  high: { n: number; dp: number };
}

const HEADING = /^\s+\d+\.\s+(.+?)\s*$/;
const RESULT = /^\s+result\s+([−-]?[\d.]+)[^(]*(?:\(([−-]?[\d.]+) to ([−-]?[\d.]+)\))?/;

/**
 * Each analysis's numbered steps as the review prints them: the heading (`  1. Slide distance`)
 * and its result line (`result 0.64 (0.58 to 0.70)`). The engine's steps come first; figures the
 * review adds after them (time and distance, ...) follow in the same shape.
 */
export function shownSteps(lines: string[]): ShownStep[][] {
  const out: ShownStep[][] = [];
  let name: string | undefined;
  for (const l of lines) {
    if (/^Analysis \d+ · /.test(l)) out.push([]);
    const h = HEADING.exec(l);
    if (h) name = h[1]!;
    const m = RESULT.exec(l);
    if (m && out.length && name !== undefined) {
      const value = shownNumber(m[1]!);
      out[out.length - 1]!.push({
        name,
        value,
        low: m[2] ? shownNumber(m[2]) : value,
        high: m[3] ? shownNumber(m[3]) : value,
      });
      name = undefined;
    }
  }
  return out;
}

/** Whether a shown number is the exact one rounded to the decimals shown. */
export const roundsTo = (exact: number, shown: { n: number; dp: number }) =>
  Math.abs(exact - shown.n) <= 0.5 * 10 ** -shown.dp + 1e-9;

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
    steps: { name: string; result: number; low: number; high: number; unit: string }[];
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
