/**
 * Plain-text layout helpers for the 80-column text report. Widths count code points, which is
 * right for the characters the report uses (letters, digits, ×, ±, √, box-drawing blocks).
 */

const SURROGATE = /[\uD800-\uDFFF]/;

/** Display width of a line, in columns (code points; one per UTF-16 unit when none is astral). */
export function width(s: string): number {
  return SURROGATE.test(s) ? [...s].length : s.length;
}

/** Pads (or leaves) `s` to `w` columns, on the right or on the left. */
export function pad(s: string, w: number, align: 'left' | 'right' = 'left'): string {
  const gap = Math.max(0, w - width(s));
  return align === 'right' ? ' '.repeat(gap) + s : s + ' '.repeat(gap);
}

/**
 * Word-wraps `text` into lines of at most `w` columns. A word longer than the line is cut, so
 * no line ever runs past the margin. Empty text gives one empty line.
 * @example wrap('at least 41 mph', 8) // ['at least', '41 mph']
 */
export function wrap(text: string, w: number): string[] {
  const out: string[] = [];
  for (const paragraph of text.split('\n')) {
    let line = '';
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
      let rest = word;
      while (width(rest) > w) {
        if (line) {
          out.push(line);
          line = '';
        }
        const cps = [...rest];
        out.push(cps.slice(0, w).join(''));
        rest = cps.slice(w).join('');
      }
      if (!rest) continue;
      if (!line) line = rest;
      else if (width(line) + 1 + width(rest) <= w) line += ' ' + rest;
      else {
        out.push(line);
        line = rest;
      }
    }
    out.push(line);
  }
  return out;
}

/**
 * Wraps with a first-line prefix and a hanging indent for the lines after it.
 * @example hang('- ', 'a long item', 10) // ['- a long', '  item']
 */
export function hang(prefix: string, text: string, w: number, indent = width(prefix)): string[] {
  const lines = wrap(text, Math.max(8, w - indent));
  return lines.map((l, i) => (i === 0 ? pad(prefix, indent) : ' '.repeat(indent)) + l);
}
