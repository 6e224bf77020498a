import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { findCycles, importsOf, plain, readGraph, type ImportGraph } from './import-graph.js';

// A typed answer travels one way: key press, interview, case file, engine, the figure shown. An
// import cycle would let a lower layer reach back up; this walks every static import and re-export
// under src/ (type-only ones too) and lists each cycle found. The engine sits at the bottom: it
// imports engine files only, type-only imports included: it reads its own input types
// (src/engine/input.ts), which the validated case satisfies, never the file's schema.

/** Each import of an engine file that breaks the engine's rule, as `from -> to`. */
function engineViolations(graph: ImportGraph): string[] {
  const out: string[] = [];
  for (const [from, edges] of graph) {
    if (!from.startsWith('engine/')) continue;
    for (const e of edges) {
      if (e.to.startsWith('engine/')) continue;
      out.push(`${from} -> ${e.to}${e.typeOnly ? ' (type-only)' : ''}`);
    }
  }
  return out.sort();
}

/** Files reached from `start` through imports that load at run time (type-only ones skipped). */
function runtimeClosure(graph: ImportGraph, start: string): Set<string> {
  const seen = new Set<string>([start]);
  const todo = [start];
  while (todo.length) {
    for (const e of graph.get(todo.pop()!) ?? [])
      if (!e.typeOnly && !seen.has(e.to)) {
        seen.add(e.to);
        todo.push(e.to);
      }
  }
  return seen;
}

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));

describe('the cycle finder', () => {
  it('finds a three-file ring, a self-import and leaves a chain alone', () => {
    const g = new Map<string, string[]>([
      ['a.ts', ['b.ts']],
      ['b.ts', ['c.ts', 'd.ts']],
      ['c.ts', ['a.ts']],
      ['d.ts', ['e.ts']],
      ['e.ts', []],
      ['s.ts', ['s.ts']],
    ]);
    expect(findCycles(g)).toEqual([['a.ts', 'b.ts', 'c.ts'], ['s.ts']]);
    g.set('c.ts', []);
    expect(findCycles(g)).toEqual([['s.ts']]);
  });

  it('reads imports, re-exports and type-only imports, not dynamic imports', () => {
    const text = [
      "import { a } from './a.js';",
      "import type { B } from './b.js';",
      "import { type C } from './c.js';",
      "export { d } from './d.js';",
      "export * from './e.js';",
      "const f = await import('./f.js');",
    ].join('\n');
    expect(importsOf('x.ts', text)).toEqual([
      { spec: './a.js', typeOnly: false },
      { spec: './b.js', typeOnly: true },
      { spec: './c.js', typeOnly: true },
      { spec: './d.js', typeOnly: false },
      { spec: './e.js', typeOnly: false },
    ]);
  });
});

describe('src/ has no import cycles', () => {
  const graph = readGraph(SRC);

  it('sees the whole tree (the walk is not empty)', () => {
    expect(graph.size).toBeGreaterThan(100);
    expect(graph.get('interview/reducer.ts')!.map((e) => e.to)).toContain('interview/questions.ts');
  });

  it('no file reaches itself through its imports', () => {
    expect(findCycles(plain(graph))).toEqual([]);
  });
});

describe('the engine imports only the engine', () => {
  const graph = readGraph(SRC);

  it('the rule catches a format import, a schema import and a type-only import', () => {
    const g: ImportGraph = new Map([
      [
        'engine/a.ts',
        [
          { to: 'engine/b.ts', typeOnly: false, spec: './b.js' },
          { to: 'format/numbers.ts', typeOnly: false, spec: '../format/numbers.js' },
          { to: 'case/v1/schema.ts', typeOnly: false, spec: '../case/v1/schema.js' },
          { to: 'case/v1/schema.ts', typeOnly: true, spec: '../case/v1/schema.js' },
          { to: 'report/doc.ts', typeOnly: true, spec: '../report/doc.js' },
        ],
      ],
      ['ui/x.ts', [{ to: 'format/numbers.ts', typeOnly: false, spec: '../format/numbers.js' }]],
    ]);
    expect(engineViolations(g)).toEqual([
      'engine/a.ts -> case/v1/schema.ts',
      'engine/a.ts -> case/v1/schema.ts (type-only)',
      'engine/a.ts -> format/numbers.ts',
      'engine/a.ts -> report/doc.ts (type-only)',
    ]);
  });

  it('no engine file imports src/format, the schema (not even its types) or anything above it', () => {
    expect(engineViolations(graph)).toEqual([]);
  });

  it('loading the engine loads engine files only (no zod, no schema, no formatting)', () => {
    const reached = [...runtimeClosure(graph, 'engine/index.ts')];
    expect(reached.length).toBeGreaterThan(20);
    expect(reached.filter((f) => !f.startsWith('engine/'))).toEqual([]);
  });
});

/**
 * The layer table of DEVELOPERS.md: what each folder of src/ may import at run time, and what it
 * may import for types only. The engine's own rule is checked above, file by file.
 */
const LAYERS: Record<string, { imports: string[]; types?: string[] }> = {
  engine: { imports: [] },
  case: { imports: [] },
  prefs: { imports: ['engine'] },
  io: { imports: [] },
  store: { imports: ['case', 'io'] },
  input: { imports: ['case', 'engine'] },
  extras: { imports: ['case', 'engine'] },
  pictures: { imports: ['engine'], types: ['extras'] },
  format: { imports: ['engine', 'extras'], types: ['case'] },
  interview: { imports: ['case', 'engine', 'extras', 'input', 'prefs'] },
  report: { imports: ['engine', 'extras', 'format', 'io', 'pictures'], types: ['case'] },
  commands: { imports: ['case', 'engine', 'extras', 'format', 'io', 'report', 'store'] },
  ui: {
    imports: [
      'case',
      'engine',
      'extras',
      'format',
      'input',
      'interview',
      'io',
      'pictures',
      'prefs',
      'report',
      'store',
    ],
  },
};

/** Each import across folders that the table does not allow, as `from -> to`. */
function layerViolations(graph: ImportGraph): string[] {
  const folder = (f: string) => (f.includes('/') ? f.split('/')[0]! : f);
  const out = new Set<string>();
  for (const [from, edges] of graph) {
    const a = folder(from);
    const rule = LAYERS[a];
    if (!rule) continue; // cli.ts, the entry point, sits above every layer
    for (const e of edges) {
      const b = folder(e.to);
      if (b === a || rule.imports.includes(b)) continue;
      if (e.typeOnly && rule.types?.includes(b)) continue;
      out.add(`${from} -> ${e.to}${e.typeOnly ? ' (type-only)' : ''}`);
    }
  }
  return [...out].sort();
}

describe('the layers of DEVELOPERS.md', () => {
  const graph = readGraph(SRC);

  it('the check catches an upward import and a run-time import allowed for types only', () => {
    const g: ImportGraph = new Map([
      ['extras/a.ts', [{ to: 'format/numbers.ts', typeOnly: false, spec: '../format/numbers.js' }]],
      ['report/b.ts', [{ to: 'case/load.ts', typeOnly: false, spec: '../case/load.js' }]],
      ['report/c.ts', [{ to: 'case/load.ts', typeOnly: true, spec: '../case/load.js' }]],
      ['ui/d.ts', [{ to: 'store/index.ts', typeOnly: false, spec: '../store/index.js' }]],
    ]);
    expect(layerViolations(g)).toEqual([
      'extras/a.ts -> format/numbers.ts',
      'report/b.ts -> case/load.ts',
    ]);
  });

  it('every folder imports only what the table says', () => {
    expect(layerViolations(graph)).toEqual([]);
  });

  it('the table names every folder of src/', () => {
    const folders = new Set(
      [...graph.keys()].filter((f) => f.includes('/')).map((f) => f.split('/')[0]!),
    );
    expect([...folders].sort()).toEqual(Object.keys(LAYERS).sort());
  });
});
