import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { findCycles, importsOf, plain, readGraph } from './import-graph.js';

// A typed answer travels one way: key press, interview, case file, engine, the figure shown. An
// import cycle would let a lower layer reach back up; this walks every static import and re-export
// under src/ (type-only ones too) and lists each cycle found.

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
