import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import ts from 'typescript';

/** One static import or re-export of a source file. */
export interface ImportEdge {
  /** The imported file, relative to the source root, with `/` separators. */
  to: string;
  /** `import type ...`, `export type ... from`, or every named binding marked `type`. */
  typeOnly: boolean;
  /** The specifier as written. */
  spec: string;
}

/** Module graph: file (relative to the root) to the files it imports. */
export type ImportGraph = Map<string, ImportEdge[]>;

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory()
      ? sourceFiles(join(dir, e.name))
      : /\.tsx?$/.test(e.name) && !e.name.endsWith('.d.ts')
        ? [join(dir, e.name)]
        : [],
  );
}

/** `./x.js` written in TypeScript's ESM style names `./x.ts` or `./x.tsx` (or `./x/index.ts`). */
function resolveRelative(from: string, spec: string): string | undefined {
  const base = resolve(dirname(from), spec);
  const stem = base.replace(/\.(js|jsx|ts|tsx|mjs)$/, '');
  const candidates = [
    base,
    `${stem}.ts`,
    `${stem}.tsx`,
    join(base, 'index.ts'),
    join(base, 'index.tsx'),
  ];
  return candidates.find((c) => /\.tsx?$/.test(c) && existsSync(c));
}

function namedAllTypes(
  named: ts.NamedImportBindings | ts.NamedExportBindings | undefined,
): boolean {
  if (!named) return false;
  if (ts.isNamedImports(named) || ts.isNamedExports(named))
    return named.elements.length > 0 && named.elements.every((e) => e.isTypeOnly);
  return false;
}

/** The static imports of one file's text (dynamic `import()` is not a static edge). */
export function importsOf(fileName: string, text: string): { spec: string; typeOnly: boolean }[] {
  const sf = ts.createSourceFile(fileName, text, ts.ScriptTarget.Latest, false);
  const out: { spec: string; typeOnly: boolean }[] = [];
  for (const st of sf.statements) {
    if (ts.isImportDeclaration(st) && ts.isStringLiteral(st.moduleSpecifier)) {
      const clause = st.importClause;
      const typeOnly =
        !!clause && (clause.isTypeOnly || (!clause.name && namedAllTypes(clause.namedBindings)));
      out.push({ spec: st.moduleSpecifier.text, typeOnly });
    } else if (
      ts.isExportDeclaration(st) &&
      st.moduleSpecifier &&
      ts.isStringLiteral(st.moduleSpecifier)
    ) {
      out.push({
        spec: st.moduleSpecifier.text,
        typeOnly: st.isTypeOnly || namedAllTypes(st.exportClause),
      });
    }
  }
  return out;
}

/** Reads every .ts/.tsx file under `root` and its relative imports. */
export function readGraph(root: string): ImportGraph {
  const graph: ImportGraph = new Map();
  const rel = (f: string) => relative(root, f).split('\\').join('/');
  for (const file of sourceFiles(root)) {
    const edges: ImportEdge[] = [];
    for (const imp of importsOf(file, readFileSync(file, 'utf8'))) {
      if (!imp.spec.startsWith('.')) continue;
      const target = resolveRelative(file, imp.spec);
      if (!target) throw new Error(`${rel(file)}: cannot resolve ${imp.spec}`);
      edges.push({ to: rel(target), typeOnly: imp.typeOnly, spec: imp.spec });
    }
    graph.set(rel(file), edges);
  }
  return graph;
}

/**
 * The import cycles of a graph: each strongly connected component with more than one file (or a
 * file importing itself), as a sorted list of its files (Tarjan's algorithm).
 */
export function findCycles(graph: Map<string, readonly string[]>): string[][] {
  let index = 0;
  const idx = new Map<string, number>();
  const low = new Map<string, number>();
  const onStack = new Set<string>();
  const stack: string[] = [];
  const out: string[][] = [];
  const visit = (v: string) => {
    idx.set(v, index);
    low.set(v, index);
    index++;
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!idx.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, idx.get(w)!));
    }
    if (low.get(v) === idx.get(v)) {
      const comp: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        comp.push(w);
      } while (w !== v);
      if (comp.length > 1 || (graph.get(v) ?? []).includes(v)) out.push(comp.sort());
    }
  };
  for (const v of [...graph.keys()].sort()) if (!idx.has(v)) visit(v);
  return out.sort((a, b) => a[0]!.localeCompare(b[0]!));
}

/** The graph reduced to file names (all edges, type-only ones included). */
export function plain(graph: ImportGraph): Map<string, string[]> {
  return new Map([...graph].map(([k, es]) => [k, [...new Set(es.map((e) => e.to))]]));
}
