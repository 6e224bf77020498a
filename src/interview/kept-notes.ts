/**
 * Notes written beside figures in a hand-written case (`{ "value": 15, "note": "steel tape" }`,
 * a drag factor's note): no question asks for them, so they are kept in a hidden answer with the
 * figure they belong to, and put back when the case is built again, but only where that figure is
 * still exactly as it was (a note about a measurement must not stay on a different measurement).
 */
import type { Answers } from './types.js';

/** Hidden answer id of the kept notes. */
export const NOTES_KEEP = 'case.notes';

/** One kept note: where it was, what it was written beside (without the note), and the note. */
interface KeptNote {
  path: (string | number)[];
  print: string;
  note: string;
}

/** JSON with sorted keys and without `note`, so two figures compare by content. */
function print(x: unknown): string {
  const plain = (v: unknown): unknown => {
    if (typeof v === 'number') return { value: v };
    if (!v || typeof v !== 'object' || Array.isArray(v)) return v;
    const { note: _n, ...rest } = v as Record<string, unknown>;
    // Test skids read back from a file with no test grade are built with a level one (0): the
    // same figure, so a note beside them stays.
    if (rest.testGrade === 0) delete rest.testGrade;
    return rest;
  };
  return JSON.stringify(plain(x), (_k, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(
          Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : 1)),
        )
      : v,
  );
}

/** Every note in `c` below its top level (the interview's own answers left out). */
export function notesOf(c: object): KeptNote[] {
  const out: KeptNote[] = [];
  const walk = (v: unknown, path: (string | number)[]) => {
    if (Array.isArray(v)) return v.forEach((x, i) => walk(x, [...path, i]));
    if (!v || typeof v !== 'object') return;
    const o = v as Record<string, unknown>;
    if (path.length > 0 && typeof o.note === 'string')
      out.push({ path, print: print(o), note: o.note });
    for (const [k, x] of Object.entries(o)) if (k !== 'interview') walk(x, [...path, k]);
  };
  walk(c, []);
  return out;
}

const isKept = (x: unknown): x is KeptNote =>
  !!x &&
  typeof x === 'object' &&
  Array.isArray((x as KeptNote).path) &&
  typeof (x as KeptNote).print === 'string' &&
  typeof (x as KeptNote).note === 'string';

/** Puts the kept notes back into `c` (mutated: a case being built) where the figure is unchanged. */
export function restoreNotes(c: object, answers: Answers): void {
  const kept = answers[NOTES_KEEP]?.value;
  if (!Array.isArray(kept)) return;
  for (const k of kept.filter(isKept)) {
    const parent = k.path
      .slice(0, -1)
      .reduce<unknown>(
        (o, key) => (o && typeof o === 'object' ? (o as Record<string, unknown>)[key] : undefined),
        c,
      );
    const last = k.path[k.path.length - 1]!;
    if (!parent || typeof parent !== 'object') continue;
    const holder = parent as Record<string | number, unknown>;
    const here = holder[last];
    if (here === undefined || print(here) !== k.print) continue;
    holder[last] =
      typeof here === 'number'
        ? { value: here, note: k.note }
        : { ...(here as object), note: k.note };
  }
}
