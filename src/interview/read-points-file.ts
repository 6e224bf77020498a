/**
 * Surveyed points read from a CSV file the investigator names in the answer: `@points.csv`,
 * `@points.csv E N` (the columns, by header name or position) or `@points.csv 2 3 m` (and the
 * unit when the header gives none). Pure: the screens read the file (a service) and hand the
 * text here; what comes back is the points as one typed line, read again by the points question.
 */
import type { UnitSystem } from '../engine/types.js';
import { readQuantity } from './read-quantity.js';
import { POINTS_SYNTAX, type PointValue } from './read-points.js';

/** What an `@file` answer asks for. */
export interface FileRequest {
  path: string;
  columns?: [string, string];
  unit?: 'm' | 'ft';
}

/** How the `@file` answer is written, for the help. */
export const FILE_SYNTAX =
  '@ then the file\'s path (@survey/yaw-1.csv), then the two columns by header name or number if they are not the first two numeric ones (@yaw-1.csv E N), then m or ft if the header does not say the unit (@yaw-1.csv 2 3 m); a path with spaces goes in quotes (@"my points.csv")';

const UNIT_WORD: Record<string, 'm' | 'ft'> = {
  m: 'm',
  metre: 'm',
  metres: 'm',
  meter: 'm',
  meters: 'm',
  ft: 'ft',
  feet: 'ft',
  foot: 'ft',
};

/**
 * The file an answer names, or undefined when it does not start with `@`.
 * @example fileRequest('@yaw.csv E N m') // { path: 'yaw.csv', columns: ['E', 'N'], unit: 'm' }
 */
export function fileRequest(text: string): FileRequest | { message: string } | undefined {
  const t = text.trim();
  if (!t.startsWith('@')) return undefined;
  const rest = t.slice(1).trim();
  const quoted = /^(["'])(.*?)\1(.*)$/.exec(rest);
  const path = quoted ? quoted[2]! : (rest.split(/\s+/)[0] ?? '');
  const words = (quoted ? quoted[3]! : rest.slice(path.length)).trim().split(/\s+/).filter(Boolean);
  if (!path) return { message: `name the file after the @: ${FILE_SYNTAX}` };
  const out: FileRequest = { path };
  const last = words.at(-1)?.toLowerCase();
  if (last !== undefined && UNIT_WORD[last] && (words.length === 1 || words.length === 3)) {
    out.unit = UNIT_WORD[last];
    words.pop();
  }
  if (words.length === 2) out.columns = [words[0]!, words[1]!];
  else if (words.length !== 0)
    return { message: `after the file, give two columns (or none) and a unit: ${FILE_SYNTAX}` };
  return out;
}

/** The unit a header names (`x_m`, `E (ft)`, `north [m]`, `y-feet`), if any. */
export function headerUnit(name: string): 'm' | 'ft' | undefined {
  const m = /(?:^|[\s_\-([])(m|metres?|meters?|ft|feet|foot)[)\]]?\s*$/i.exec(name.trim());
  return m ? UNIT_WORD[m[1]!.toLowerCase()] : undefined;
}

/** The cells of one CSV line: split at the file's separator, quotes around a cell taken off. */
function cellsOf(line: string, sep: string): string[] {
  return line.split(sep).map((c) =>
    c
      .trim()
      .replace(/^"(.*)"$/, '$1')
      .trim(),
  );
}

const isNumber = (cell: string) => cell !== '' && Number.isFinite(Number(cell));

type Read =
  { ok: true; text: string; value: PointValue[]; notice: string } | { ok: false; message: string };

/**
 * The points of a CSV file's text, as one line the points question reads (`x y; x y; ...`, in
 * the case's length unit). Fails naming the file and the line: no separator, a cell that is not
 * a number, a column that is not there, fewer than 3 points.
 * @example readPointsCsv('pts.csv', 'E_m,N_m\n0,0\n3,0.1\n6,0.4', {}, 'metric')
 * // { ok: true, text: '0 0; 3 0.1; 6 0.4', ... }
 */
export function readPointsCsv(
  file: string,
  content: string,
  req: Omit<FileRequest, 'path'>,
  units: UnitSystem,
): Read {
  const lines = content
    .replace(/^\uFEFF/, '')
    .split(/\r\n|\r|\n/)
    .map((raw, n) => ({ raw, n: n + 1 }))
    .filter((l) => l.raw.trim() !== '');
  const first = lines[0];
  if (!first) return { ok: false, message: `${file} is empty: give ${POINTS_SYNTAX}` };
  const sep = ['\t', ';', ','].find((s) => first.raw.includes(s));
  if (!sep)
    return {
      ok: false,
      message: `${file} line ${first.n}: no comma, semicolon or tab between columns; is it a CSV file?`,
    };
  const head = cellsOf(first.raw, sep);
  const hasHeader = head.some((c) => !isNumber(c));
  const rows = hasHeader ? lines.slice(1) : lines;
  const firstRow = rows[0] ? cellsOf(rows[0].raw, sep) : [];
  const pick = (word: string): number | undefined => {
    const byName = hasHeader ? head.findIndex((h) => h.toLowerCase() === word.toLowerCase()) : -1;
    if (byName >= 0) return byName;
    const n = Number(word);
    return Number.isInteger(n) && n >= 1 && n <= Math.max(head.length, firstRow.length)
      ? n - 1
      : undefined;
  };
  let cols: number[];
  if (req.columns) {
    const got = req.columns.map(pick);
    const bad = got.findIndex((c) => c === undefined);
    if (bad >= 0)
      return {
        ok: false,
        message: `${file}: no column "${req.columns[bad]}"${hasHeader ? ` (its columns: ${head.join(', ')})` : ''}; name a column by its header or its number`,
      };
    cols = got as number[];
  } else {
    cols = firstRow.flatMap((c, k) => (isNumber(c) ? [k] : [])).slice(0, 2);
    if (cols.length < 2)
      return {
        ok: false,
        message: `${file} line ${rows[0]?.n ?? first.n}: fewer than two numeric columns; name the columns after the file (@${file} E N)`,
      };
  }
  const name = (k: number) => (hasHeader ? `"${head[k]}"` : `column ${k + 1}`);
  const unitOf = (k: number) => req.unit ?? (hasHeader ? headerUnit(head[k] ?? '') : undefined);
  const caseUnit = units === 'metric' ? 'm' : 'ft';
  const notes: string[] = [];
  const unsaid = cols.filter((k) => unitOf(k) === undefined);
  if (unsaid.length)
    notes.push(
      `${unsaid.map(name).join(' and ')} give${unsaid.length === 1 ? 's' : ''} no unit: read in ${caseUnit}, the case's unit (add m or ft after the columns to say otherwise)`,
    );
  const value: PointValue[] = [];
  for (const { raw, n } of rows) {
    const cells = cellsOf(raw, sep);
    const xy: number[] = [];
    for (const k of cols) {
      const cell = cells[k] ?? '';
      if (!isNumber(cell))
        return {
          ok: false,
          message: `${file} line ${n}: ${name(k)} is ${cell === '' ? 'empty' : `"${cell}"`}, not a number`,
        };
      const u = unitOf(k);
      const r = readQuantity(
        `${cell}${u ?? ''}`,
        {
          kind: 'length',
          rule: { what: k === cols[0] ? 'x' : 'y', min: -10_000_000, max: 10_000_000 },
          range: false,
        },
        units,
      );
      if (!r.ok) return { ok: false, message: `${file} line ${n}: ${r.message}` };
      xy.push(r.value as number);
    }
    value.push([xy[0]!, xy[1]!]);
  }
  if (value.length < 3)
    return {
      ok: false,
      message: `${file}: only ${value.length} point${value.length === 1 ? '' : 's'} read; at least 3 are needed for a circle`,
    };
  const converted = cols.some((k) => unitOf(k) !== undefined && unitOf(k) !== caseUnit);
  const round = (v: number) => (converted ? Number(v.toFixed(4)) : v);
  notes.unshift(
    `${value.length} points read from ${file} (columns ${cols.map(name).join(', ')}${converted ? `, converted to ${caseUnit}` : ''})`,
  );
  const rounded = value.map(([x, y]): PointValue => [round(x), round(y)]);
  return {
    ok: true,
    value: rounded,
    text: rounded.map(([x, y]) => `${x} ${y}`).join('; '),
    notice: notes.join('; '),
  };
}

/**
 * What the screen does with an `@file` answer: `read` is the file's text (or why it could not be
 * read), and the action is the points as one line to answer with, or the refusal naming the file
 * and line (the answer already given stays).
 */
export function fileAnswer(
  typed: string,
  units: UnitSystem,
  read: (path: string) => { ok: true; text: string } | { ok: false; message: string },
):
  | { type: 'answer'; text: string; note: string }
  | { type: 'refuse'; text: string; message: string }
  | undefined {
  const req = fileRequest(typed);
  if (!req) return undefined;
  if ('message' in req) return { type: 'refuse', text: typed, message: req.message };
  const got = read(req.path);
  if (!got.ok) return { type: 'refuse', text: typed, message: got.message };
  const r = readPointsCsv(req.path, got.text, req, units);
  return r.ok
    ? { type: 'answer', text: r.text, note: r.notice }
    : { type: 'refuse', text: typed, message: r.message };
}
