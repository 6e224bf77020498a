import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { reportCommand, type ReportOptions } from '../../src/commands/report.js';
import { solveCommand } from '../../src/commands/solve.js';

export const HERE = path.dirname(fileURLToPath(import.meta.url));
export const ROOT = path.resolve(HERE, '../..');
export const fixture = (name: string) => path.join(HERE, 'fixtures', name);
export const demo = (name: string) => path.join(ROOT, 'sessions', name);

/**
 * The cases every report form is checked on against `solve --json`: the two shipped demo cases
 * (imperial two-surface downhill slide, metric banked yaw) and two invented fixtures of our own
 * (an imperial two-surface slide, a metric yaw with half-track).
 */
export const REPORT_CASES = [
  ['demo slide, imperial (sessions/demo-orchard-hill.json)', demo('demo-orchard-hill.json')],
  ['demo yaw, metric (sessions/demo-kestrel-bend.json)', demo('demo-kestrel-bend.json')],
  ['imperial two-surface slide fixture', fixture('quarry-lane-skid.json')],
  ['metric yaw fixture', fixture('birchfield-yaw.json')],
] as const;

/** A number as a report prints it, captured (for reading figures back out of a report). */
export const NUM = '(-?\\d+(?:\\.\\d+)?)';

export interface Run {
  code: number;
  out: string;
  err: string;
}

/** Runs `skidcase report` in-process, collecting what it prints. */
export async function runReport(target: string, opts: Partial<ReportOptions> = {}): Promise<Run> {
  let out = '';
  let err = '';
  const code = await reportCommand(
    target,
    { format: 'md', force: false, sessionsDir: path.join(ROOT, 'sessions'), ...opts },
    { out: (s) => void (out += s), err: (s) => void (err += s) },
  );
  return { code, out, err };
}

/** Runs `skidcase solve` in-process. */
export async function runSolve(file: string, json: boolean): Promise<Run> {
  let out = '';
  let err = '';
  const code = await solveCommand(
    file,
    { json },
    { out: (s) => void (out += s), err: (s) => void (err += s) },
  );
  return { code, out, err };
}

/** The shape of `solve --json` the report tests read (docs/case-file.md). */
export interface SolveJson {
  id: string;
  units: { length: string; speed: string };
  analyses: {
    id: string;
    kind: string;
    speed: { value: number; low: number; high: number };
    minimum: number;
    steps: { name: string; result: number; low: number; high: number; unit: string }[];
    boundaries?: {
      label: string;
      at: number;
      speed: { value: number; low: number; high: number };
    }[];
  }[];
  postedLimit?: { value: number; exceededAtMinimum: boolean };
}

export async function solveJson(file: string): Promise<SolveJson> {
  const r = await runSolve(file, true);
  if (r.code !== 0) throw new Error(`solve failed for ${file}: ${r.err}`);
  return JSON.parse(r.out) as SolveJson;
}

/** A fresh temporary folder, removed by the returned function. */
export function tempDir(): { dir: string; done: () => void } {
  const dir = mkdtempSync(path.join(tmpdir(), 'skidcase-report-'));
  return { dir, done: () => rmSync(dir, { recursive: true, force: true }) };
}

/** Text with line breaks, indentation and text-form markers folded to single spaces. */
export function flat(s: string): string {
  return s.replace(/^>> /gm, '').replace(/\s+/g, ' ');
}

export const escapeRe = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');

/**
 * A number as the report displays it, derived independently of the report's formatter: the
 * JSON's unrounded figure rounded half away from zero to the decimals the report shows.
 */
export function shownAs(n: number, decimals: number): string {
  const s = ((Math.sign(n) * Math.round(Math.abs(n) * 10 ** decimals)) / 10 ** decimals).toFixed(
    decimals,
  );
  return s === '-0' || /^-0\.0+$/.test(s) ? s.slice(1) : s;
}

export const decimalsOf = (t: string) => (t.includes('.') ? t.length - t.indexOf('.') - 1 : 0);
