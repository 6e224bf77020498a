// Loads TypeScript modules from src/ for the in-process figures, through tsx's loader (a
// devDependency). The cost of transpiling is paid at import, never inside a timed loop.
import { register } from 'tsx/esm/api';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

let registered = false;

/**
 * Finds the exported function `name` in the folder `dir` (relative to the project root): the
 * folder's index.ts when it exports it, else the first file that declares it. Returns undefined
 * while the code is not written yet, so the figure can say "not available yet".
 */
export async function findExport(root, dir, name) {
  if (!registered) {
    register();
    registered = true;
  }
  const abs = join(root, dir);
  if (!existsSync(abs)) return undefined;
  const files = readdirSync(abs).filter((f) => /\.tsx?$/.test(f) && !f.endsWith('.d.ts'));
  const declares = new RegExp(
    `export\\s+(async\\s+)?(function\\*?|const|let)\\s+${name}\\b|export\\s*\\{[^}]*\\b${name}\\b`,
  );
  const ordered = [
    ...files.filter((f) => /^index\.tsx?$/.test(f)),
    ...files.filter((f) => !/^index\.tsx?$/.test(f)),
  ];
  for (const f of ordered) {
    const file = join(abs, f);
    if (!declares.test(readFileSync(file, 'utf8'))) continue;
    const mod = await import(pathToFileURL(file).href);
    if (typeof mod[name] === 'function') return mod[name];
  }
  return undefined;
}
