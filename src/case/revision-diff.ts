/**
 * What changed between two versions of a case, field by field, for its trail of revisions
 * (docs/case-file.md, "Revisions"). Pure: no clock, no file.
 */
import type { Case } from './load.js';
import type { ChangeV1 } from './v1/schema.js';

/** Top-level fields a revision never lists: the save's own stamp, the interview, the trail. */
const NOT_RECORDED = new Set(['updated', 'interview', 'revisions', 'revisionsDropped']);

/** The case fields a revision compares: the case without `updated`, `interview` and the trail. */
export function caseFieldsOf(c: Case): Record<string, unknown> {
  return Object.fromEntries(Object.entries(c).filter(([k]) => !NOT_RECORDED.has(k)));
}

/**
 * JSON with object keys sorted (by code unit), so that two cases compare by content and not by
 * key order: what JSON.stringify writes, without spaces, with every object's keys in order.
 */
export function canonicalJson(x: unknown): string {
  if (x === null || typeof x !== 'object') return JSON.stringify(x) ?? 'null';
  if (Array.isArray(x)) return `[${x.map(canonicalJson).join(',')}]`;
  const o = x as Record<string, unknown>;
  const parts: string[] = [];
  for (const k of Object.keys(o).sort())
    if (o[k] !== undefined) parts.push(`${JSON.stringify(k)}:${canonicalJson(o[k])}`);
  return `{${parts.join(',')}}`;
}

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

/** A key as a path part: `.name`, or `["odd key"]` when it is not a plain name. */
const PLAIN_KEY = /^[A-Za-z_$][\w$]*$/;
function pathText(parts: readonly (string | number)[]): string {
  let out = '';
  for (const p of parts)
    if (typeof p === 'number') out += `[${p}]`;
    else if (PLAIN_KEY.test(p)) out += out ? `.${p}` : p;
    else out += `[${JSON.stringify(p)}]`;
  return out;
}

function change(field: string, from: unknown, to: unknown): ChangeV1 {
  const c: ChangeV1 = { field };
  if (from !== undefined) c.from = from;
  if (to !== undefined) c.to = to;
  return c;
}

const isPlain = (v: unknown) => v === null || typeof v !== 'object';

/** Has something inside to compare (an object with a key, a list with an item). */
function full(v: unknown): boolean {
  if (v === undefined) return false;
  if (Array.isArray(v)) return v.length > 0;
  for (const _k in v as object) return true;
  return false;
}

/** The changes from `a` to `b` under `parts` (a path kept as a stack: text made only for a change). */
function walk(parts: (string | number)[], a: unknown, b: unknown, out: ChangeV1[]): void {
  if (a === b) return;
  if (isPlain(a) && isPlain(b)) {
    out.push(change(pathText(parts), a, b));
    return;
  }
  // Down into objects (and lists) while there is something inside to compare; an empty one added
  // or removed is a change of its own.
  const objects = (isObject(a) || a === undefined) && (isObject(b) || b === undefined);
  if (objects && (full(a) || full(b))) {
    const ao = (a ?? {}) as Record<string, unknown>;
    const bo = (b ?? {}) as Record<string, unknown>;
    for (const k of Object.keys(ao)) {
      parts.push(k);
      walk(parts, ao[k], bo[k], out);
      parts.pop();
    }
    for (const k of Object.keys(bo))
      if (!(k in ao)) {
        parts.push(k);
        walk(parts, undefined, bo[k], out);
        parts.pop();
      }
    return;
  }
  const lists = (Array.isArray(a) || a === undefined) && (Array.isArray(b) || b === undefined);
  if (lists && (full(a) || full(b))) {
    const al = (a ?? []) as unknown[];
    const bl = (b ?? []) as unknown[];
    for (let i = 0; i < Math.max(al.length, bl.length); i++) {
      parts.push(i);
      walk(parts, al[i], bl[i], out);
      parts.pop();
    }
    return;
  }
  if (canonicalJson(a) !== canonicalJson(b)) out.push(change(pathText(parts), a, b));
}

/**
 * Every field that differs between two cases, as `{ field, from, to }` with the field's path as
 * a reader writes it (`analyses[0].segments[1].length`, `vehicle.brakes.mode`) and the values as
 * stored; `from` absent means the field was not there, `to` absent that it is gone. Objects and
 * lists are compared item by item down to their plain values; a value that changes kind (a plain
 * number that becomes a quantity with a range) is one change with both whole values. `updated`,
 * `interview` and the trail itself are never listed.
 * @example diffCases(a, { ...a, postedLimit: 45 }) // [{ field: 'postedLimit', from: 35, to: 45 }]
 */
export function diffCases(before: Case, after: Case): ChangeV1[] {
  const out: ChangeV1[] = [];
  walk([], caseFieldsOf(before), caseFieldsOf(after), out);
  return out;
}
