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

/** JSON with object keys sorted, so that two cases compare by content and not by key order. */
export function canonicalJson(x: unknown): string {
  return JSON.stringify(x, (_k, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(
          Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : 1)),
        )
      : v,
  );
}

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

/** A key as a path part: `.name`, or `["odd key"]` when it is not a plain name. */
const keyPart = (path: string, k: string) =>
  /^[A-Za-z_$][\w$]*$/.test(k) ? (path ? `${path}.${k}` : k) : `${path}[${JSON.stringify(k)}]`;

function change(field: string, from: unknown, to: unknown): ChangeV1 {
  const c: ChangeV1 = { field };
  if (from !== undefined) c.from = from;
  if (to !== undefined) c.to = to;
  return c;
}

function walk(path: string, a: unknown, b: unknown, out: ChangeV1[]): void {
  if (a === undefined && b === undefined) return;
  const full = (v: unknown) =>
    v !== undefined && (Array.isArray(v) ? v.length > 0 : Object.keys(v as object).length > 0);
  // Down into objects (and lists) while there is something inside to compare; an empty one added
  // or removed is a change of its own.
  if (
    (isObject(a) || a === undefined) &&
    (isObject(b) || b === undefined) &&
    (full(a) || full(b))
  ) {
    const ao = (a ?? {}) as Record<string, unknown>;
    const bo = (b ?? {}) as Record<string, unknown>;
    const keys = [...Object.keys(ao), ...Object.keys(bo).filter((k) => !(k in ao))];
    for (const k of keys) walk(keyPart(path, k), ao[k], bo[k], out);
    return;
  }
  if (
    (Array.isArray(a) || a === undefined) &&
    (Array.isArray(b) || b === undefined) &&
    (full(a) || full(b))
  ) {
    const al = (a ?? []) as unknown[];
    const bl = (b ?? []) as unknown[];
    for (let i = 0; i < Math.max(al.length, bl.length); i++)
      walk(`${path}[${i}]`, al[i], bl[i], out);
    return;
  }
  if (canonicalJson(a) !== canonicalJson(b)) out.push(change(path, a, b));
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
  walk('', caseFieldsOf(before), caseFieldsOf(after), out);
  return out;
}
