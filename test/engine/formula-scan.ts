/**
 * Source text reduced to its code: comments and the text of string and template literals are
 * blanked (a template's `${...}` expressions are kept), so a formula quoted in a comment or a
 * step's wording does not count as a copy. Line breaks are kept.
 */
export function codeOnly(src: string): string {
  let out = '';
  let i = 0;
  const depth: number[] = []; // brace depth of each open `${` inside a template
  let inTemplate = false;
  while (i < src.length) {
    const c = src[i]!;
    const next = src[i + 1];
    if (inTemplate) {
      if (c === '\\') i += 2;
      else if (c === '`') {
        inTemplate = false;
        out += ' ';
        i++;
      } else if (c === '$' && next === '{') {
        depth.push(0);
        inTemplate = false;
        out += ' ';
        i += 2;
      } else {
        out += c === '\n' ? '\n' : ' ';
        i++;
      }
      continue;
    }
    if (c === '/' && next === '/') {
      while (i < src.length && src[i] !== '\n') i++;
    } else if (c === '/' && next === '*') {
      const end = src.indexOf('*/', i + 2);
      const stop = end < 0 ? src.length : end + 2;
      out += src.slice(i, stop).replace(/[^\n]/g, ' ');
      i = stop;
    } else if (c === "'" || c === '"') {
      i++;
      while (i < src.length && src[i] !== c && src[i] !== '\n') i += src[i] === '\\' ? 2 : 1;
      out += ' ';
      i++;
    } else if (c === '`') {
      inTemplate = true;
      out += ' ';
      i++;
    } else {
      if (depth.length && c === '{') depth[depth.length - 1]!++;
      if (depth.length && c === '}') {
        if (depth[depth.length - 1] === 0) {
          depth.pop();
          inTemplate = true;
          out += ' ';
          i++;
          continue;
        }
        depth[depth.length - 1]!--;
      }
      out += c;
      i++;
    }
  }
  return out;
}

/** The arithmetic of each formula that has one home in src/engine/formulas.ts. */
const PATTERNS: { kind: string; re: RegExp }[] = [
  // f * n + G / 100 and its variants (a product, then a term over 100 added or taken away).
  { kind: 'effective drag', re: /\*\s*[^;,=*]+?[+-]\s*[^;,=]*?\/\s*100\b/ },
  // R = C² / (8 M) + M / 2.
  { kind: 'radius', re: /\/\s*\(\s*8\s*\*/ },
  // C d (f n + G/100), forward or as the braking distance v² / (C e).
  { kind: 'slide energy', re: /\bC\s*\*\s*[\w.$[\]!?()]+\s*\*|\/\s*\(\s*C\s*\*/ },
  // sqrt(K R (f + e) / (1 − f e)).
  { kind: 'critical speed', re: /\bK\s*\*\s*R\b/ },
];

/** Each statement of the code (comments and literal text left out) that writes one of them. */
export function formulaCopies(src: string): { kind: string; code: string }[] {
  const out: { kind: string; code: string }[] = [];
  for (const line of codeOnly(src).split(/[;\n]/))
    for (const { kind, re } of PATTERNS)
      if (re.test(line)) out.push({ kind, code: line.trim().replace(/\s+/g, ' ') });
  return out;
}
