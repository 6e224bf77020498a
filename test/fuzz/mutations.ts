/**
 * Random damage to valid case files, as fast-check arbitraries: the kinds of mistake a hand edit,
 * a half-copied file or a buggy exporter makes. Each mutation says what it did, so a failing run
 * reads as "set analyses[0].segments[1].grade to 1e309" rather than as a blob of JSON.
 */
import fc from 'fast-check';
import { ENUM_POOL, SEEDS } from './seeds.js';

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
type PathPart = string | number;

/** Every path in a JSON value (objects' keys and arrays' indices), the root excluded. */
export function allPaths(v: Json, prefix: PathPart[] = []): PathPart[][] {
  const out: PathPart[][] = [];
  if (Array.isArray(v))
    v.forEach((x, i) => out.push([...prefix, i], ...allPaths(x, [...prefix, i])));
  else if (v !== null && typeof v === 'object')
    for (const [k, x] of Object.entries(v))
      out.push([...prefix, k], ...allPaths(x, [...prefix, k]));
  return out;
}

/** `['analyses', 0, 'marks', 2]` -> `analyses[0].marks[2]`, the way messages name a field. */
export function pathText(p: readonly PathPart[]): string {
  return p.reduce<string>(
    (s, x) => (typeof x === 'number' ? `${s}[${x}]` : s ? `${s}.${x}` : x),
    '',
  );
}

function parentOf(doc: Json, p: PathPart[]): Json | undefined {
  let cur: Json | undefined = doc;
  for (const k of p.slice(0, -1))
    cur = cur && typeof cur === 'object' ? (cur as Record<PathPart, Json>)[k] : undefined;
  return cur;
}

/** A value that cannot go in JSON as it is; replaced in the text after serialising. */
const INFINITE = '__fuzz_1e309__';

export type Mutation =
  | { op: 'delete'; pick: number }
  | { op: 'set'; pick: number; value: Json | typeof INFINITE; label: string }
  | { op: 'swap-enum'; pick: number; value: string }
  | { op: 'tweak'; pick: number; how: (typeof TWEAKS)[number] }
  | { op: 'duplicate-id' }
  | { op: 'duplicate-analysis'; pick: number };

const badValues: fc.Arbitrary<{ value: Json | typeof INFINITE; label: string }> = fc.oneof(
  fc
    .constantFrom(-1, 0, 1, -0.5, 2.5, 99.9, 100, 1e6)
    .map((n) => ({ value: n as Json, label: String(n) })),
  fc.constant({ value: INFINITE, label: '1e309' }),
  fc
    .constantFrom('NaN', 'Infinity', '80 ft', '', '0.72', 'abc')
    .map((s) => ({ value: s as Json, label: JSON.stringify(s) })),
  fc
    .constantFrom<Json>(
      null,
      true,
      false,
      [],
      {},
      [1, 2],
      { value: 1, low: 2, high: 0 },
      { value: 'x' },
      { low: 1 },
    )
    .map((v) => ({
      value: v,
      label: JSON.stringify(v),
    })),
);

/**
 * Changes to a number that often leave the file valid, so that runs also reach the engine: a
 * steep downhill (exit 3), no brakes, a tiny drag factor, a scaled length.
 */
const TWEAKS = ['x0.1', 'x0.5', 'x2', 'x10', 'negate', '-45', '-80', '0.01'] as const;

function tweak(v: number, how: (typeof TWEAKS)[number]): number {
  if (how === 'negate') return -v;
  if (how.startsWith('x')) return Math.round(v * Number(how.slice(1)) * 1000) / 1000;
  return Number(how);
}

export const mutationArb: fc.Arbitrary<Mutation> = fc.oneof(
  { weight: 3, arbitrary: fc.nat().map((pick): Mutation => ({ op: 'delete', pick })) },
  {
    weight: 5,
    arbitrary: fc
      .tuple(fc.nat(), badValues)
      .map(([pick, b]): Mutation => ({ op: 'set', pick, ...b })),
  },
  {
    weight: 2,
    arbitrary: fc
      .tuple(fc.nat(), fc.constantFrom(...ENUM_POOL))
      .map(([pick, value]): Mutation => ({ op: 'swap-enum', pick, value })),
  },
  {
    weight: 6,
    arbitrary: fc
      .tuple(fc.nat(), fc.constantFrom(...TWEAKS))
      .map(([pick, how]): Mutation => ({ op: 'tweak', pick, how })),
  },
  { weight: 1, arbitrary: fc.constant<Mutation>({ op: 'duplicate-id' }) },
  { weight: 1, arbitrary: fc.nat().map((pick): Mutation => ({ op: 'duplicate-analysis', pick })) },
);

/** Applies one mutation in place; returns what it did, in words. */
export function applyMutation(doc: Json, m: Mutation): string {
  const paths = allPaths(doc);
  const analyses = (doc as { analyses?: Json }).analyses;
  if (m.op === 'duplicate-id' || m.op === 'duplicate-analysis') {
    if (!Array.isArray(analyses) || analyses.length === 0) return 'no analyses to duplicate';
    if (m.op === 'duplicate-analysis') {
      const a = analyses[m.pick % analyses.length]!;
      analyses.push(structuredClone(a));
      return `duplicated analyses[${m.pick % analyses.length}] (same id twice)`;
    }
    // An earlier mutation may have made analyses[0] null or a number: it then has no id.
    const first = analyses[0];
    const firstId =
      first !== null && typeof first === 'object' ? (first as { id?: Json }).id : null;
    analyses.push({
      ...(structuredClone(analyses[analyses.length - 1]) as object),
      id: firstId ?? null,
    } as Json);
    return `added an analysis with the id of analyses[0]`;
  }
  const want = m.op === 'swap-enum' ? 'string' : m.op === 'tweak' ? 'number' : undefined;
  const candidates = want ? paths.filter((p) => typeof get(doc, p) === want) : paths;
  if (candidates.length === 0) return 'nothing to mutate';
  const p = candidates[m.pick % candidates.length]!;
  const parent = parentOf(doc, p) as Record<PathPart, Json> | Json[];
  const key = p[p.length - 1]!;
  if (m.op === 'delete') {
    if (Array.isArray(parent)) parent.splice(key as number, 1);
    else delete (parent as Record<string, Json>)[key];
    return `deleted ${pathText(p)}`;
  }
  if (m.op === 'tweak') {
    const before = get(doc, p) as number;
    (parent as Record<PathPart, Json>)[key] = tweak(before, m.how);
    return `changed ${pathText(p)} from ${before} to ${tweak(before, m.how)}`;
  }
  // A copy: the pool's objects are shared by every run, and a later mutation inside one set
  // here would otherwise change the pool (or make the document refer to itself).
  (parent as Record<PathPart, Json>)[key] = structuredClone(m.value) as Json;
  return `set ${pathText(p)} to ${m.op === 'set' ? m.label : JSON.stringify(m.value)}`;
}

function get(doc: Json, p: PathPart[]): Json | undefined {
  let cur: Json | undefined = doc;
  for (const k of p)
    cur = cur && typeof cur === 'object' ? (cur as Record<PathPart, Json>)[k] : undefined;
  return cur;
}

/** Does a path named in a message exist in the document, or at least its parent? */
export function pathIsReal(doc: unknown, text: string): boolean {
  if (text === '(file)') return true;
  const parts: PathPart[] = [];
  for (const m of text.matchAll(/([^.[\]]+)|\[(\d+)\]/g))
    parts.push(m[2] !== undefined ? Number(m[2]) : m[1]!);
  if (parts.length === 0) return false;
  const parent = parts.length === 1 ? doc : get(doc as Json, parts.slice(0, -1));
  return parent !== null && typeof parent === 'object';
}

export interface MutatedCase {
  seed: string;
  text: string;
  /** The document after mutation, before serialising (undefined when the text was truncated). */
  doc: unknown;
  did: string[];
}

/** A seed, one to three mutations, and now and then a truncated text. */
export const mutatedCaseArb: fc.Arbitrary<MutatedCase> = fc
  .record({
    seed: fc.constantFrom(...Object.keys(SEEDS)),
    mutations: fc.oneof(
      { weight: 3, arbitrary: fc.array(mutationArb, { minLength: 1, maxLength: 1 }) },
      { weight: 1, arbitrary: fc.array(mutationArb, { minLength: 2, maxLength: 3 }) },
    ),
    // about one file in eight cut short (fc.option's freq is the odds of *no* value, hence nil: 7)
    truncateAt: fc.oneof(
      { weight: 7, arbitrary: fc.constant(null) },
      { weight: 1, arbitrary: fc.double({ min: 0, max: 1, noNaN: true }) },
    ),
    pretty: fc.boolean(),
  })
  .map(({ seed, mutations, truncateAt, pretty }) => {
    const doc = structuredClone(SEEDS[seed]) as Json;
    const did = mutations.map((m) => applyMutation(doc, m));
    let text = JSON.stringify(doc, null, pretty ? 2 : undefined).replaceAll(
      `"${INFINITE}"`,
      '1e309',
    );
    let finalDoc: unknown = doc;
    if (truncateAt !== null) {
      const at = Math.floor(truncateAt * (text.length - 1));
      did.push(`truncated the text at ${at} of ${text.length} characters`);
      text = text.slice(0, at);
      finalDoc = undefined;
    }
    return { seed, text, doc: finalDoc, did };
  });
