import type { z } from 'zod';
import { printable } from './printable.js';

/** One thing wrong with a file or an answer: where (a path such as `analyses[0].marks[2]`) and what. */
export interface FieldIssue {
  path: string;
  message: string;
}

/**
 * `['analyses', 0, 'marks', 2]` -> `analyses[0].marks[2]`. A key is written with its control
 * characters escaped: a field name comes from the file and may be anything.
 */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const p of path) {
    if (typeof p === 'number') out += `[${p}]`;
    else out += out ? `.${printable(String(p))}` : printable(String(p));
  }
  return out || '(file)';
}

/** Flattens zod issues into path + message, descending into union branches for the real cause. */
export function fromZod(error: z.ZodError): FieldIssue[] {
  const out: FieldIssue[] = [];
  const walk = (issues: readonly z.core.$ZodIssue[], prefix: readonly PropertyKey[]) => {
    for (const iss of issues) {
      const path = [...prefix, ...iss.path];
      if (iss.code === 'invalid_union' && iss.errors.length > 0) {
        walk(iss.errors.flat(), path);
        continue;
      }
      out.push({ path: formatPath(path), message: iss.message });
    }
  };
  walk(error.issues, []);
  return out;
}

/** `analyses[0].marks[2]: length must be greater than 0` */
export function describeIssue(i: FieldIssue): string {
  return `${i.path}: ${i.message}`;
}
