import { formatPath } from './issues.js';

/** What `scanJson` found in a file's text before it is parsed. */
export interface JsonScan {
  /** True when objects and lists nest deeper than the limit given (the scan stops there). */
  tooDeep: boolean;
  /** Paths of keys given twice in one object (`JSON.parse` silently keeps the last). */
  duplicateKeys: string[];
}

type Frame =
  | { list: true; index: number }
  | { list: false; keys: Set<string>; key: string | undefined; expectKey: boolean };

/**
 * One pass over JSON text that tracks only its structure: how deep objects and lists nest (so a
 * file nested thousands of levels deep is refused before anything recurses into it) and which
 * keys repeat within one object. It does not check the syntax; `JSON.parse` does that after it.
 * @example scanJson('{"units":"imperial","units":"metric"}', 64).duplicateKeys // ['units']
 */
export function scanJson(text: string, maxDepth: number): JsonScan {
  const stack: Frame[] = [];
  const duplicateKeys: string[] = [];
  const pathOf = (last: string) => {
    const parts: (string | number)[] = [];
    for (let k = 0; k < stack.length - 1; k++) {
      const f = stack[k]!;
      parts.push(f.list ? f.index : (f.key ?? ''));
    }
    parts.push(last);
    return formatPath(parts);
  };
  const n = text.length;
  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x22 /* " */) {
      const start = i;
      for (i++; i < n; i++) {
        const d = text.charCodeAt(i);
        if (d === 0x5c /* \ */) i++;
        else if (d === 0x22) break;
      }
      const top = stack[stack.length - 1];
      if (top && !top.list && top.expectKey) {
        const raw = text.slice(start, i + 1);
        let key = raw.slice(1, -1);
        if (key.includes('\\'))
          try {
            key = JSON.parse(raw) as string;
          } catch {
            // Broken escape: JSON.parse reports the file's syntax afterwards.
          }
        if (top.keys.has(key)) duplicateKeys.push(pathOf(key));
        else top.keys.add(key);
        top.key = key;
        top.expectKey = false;
      }
    } else if (c === 0x7b /* { */ || c === 0x5b /* [ */) {
      if (stack.length >= maxDepth) return { tooDeep: true, duplicateKeys };
      stack.push(
        c === 0x5b
          ? { list: true, index: 0 }
          : { list: false, keys: new Set(), key: undefined, expectKey: true },
      );
    } else if (c === 0x7d /* } */ || c === 0x5d /* ] */) {
      stack.pop();
    } else if (c === 0x2c /* , */) {
      const top = stack[stack.length - 1];
      if (top?.list) top.index++;
      else if (top) top.expectKey = true;
    }
  }
  return { tooDeep: false, duplicateKeys };
}
