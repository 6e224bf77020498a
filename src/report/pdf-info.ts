/**
 * Reads one text entry of a PDF's document information dictionary (Title, Subject, ...), which
 * stays uncompressed where the page text does not: the PDF report keeps its provenance sentence
 * in Subject, and `skidcase verify` reads it back from there. PDF 1.7 (ISO 32000-1) 7.3.4 and
 * 14.3.3: the trailer names the dictionary (`/Info N G R`); an entry is a string, literal `(…)`
 * or hexadecimal `<…>`, or a reference to an object holding one; UTF-16BE when it starts FE FF.
 */

/** Whether the bytes are a PDF file (its header, PDF 1.7 7.5.2). */
export const isPdf = (bytes: Uint8Array) =>
  Buffer.from(bytes.subarray(0, 5)).toString('latin1') === '%PDF-';

const ESCAPES: Record<string, string> = { n: '\n', r: '\r', t: '\t', b: '\b', f: '\f' };

/** The string that starts at `at` in `raw`, as bytes in a latin1 string; undefined if none. */
function stringAt(raw: string, at: number): string | undefined {
  const i = raw.slice(at).search(/\S/) + at;
  if (raw[i] === '<' && raw[i + 1] !== '<') {
    const end = raw.indexOf('>', i);
    if (end < 0) return undefined;
    const hex = raw.slice(i + 1, end).replace(/\s+/g, '');
    return Buffer.from(hex.length % 2 ? `${hex}0` : hex, 'hex').toString('latin1');
  }
  if (raw[i] !== '(') return undefined;
  let out = '';
  let depth = 1;
  for (let j = i + 1; j < raw.length; j++) {
    const c = raw[j]!;
    if (c === '\\') {
      const e = raw[++j] ?? '';
      const octal = /^[0-7]{1,3}/.exec(raw.slice(j, j + 3));
      if (octal) {
        out += String.fromCharCode(parseInt(octal[0], 8) & 0xff);
        j += octal[0].length - 1;
      } else if (e === '\r' || e === '\n') {
        if (e === '\r' && raw[j + 1] === '\n') j++;
      } else out += ESCAPES[e] ?? e;
      continue;
    }
    if (c === '(') depth++;
    if (c === ')' && --depth === 0) return out;
    out += c;
  }
  return undefined;
}

/** The body of indirect object `n g`, or undefined. */
function objectBody(raw: string, n: string, g: string): string | undefined {
  const m = new RegExp(`(?:^|\\s)${n}\\s+${g}\\s+obj\\b`).exec(raw);
  if (!m) return undefined;
  const start = m.index + m[0].length;
  const end = raw.indexOf('endobj', start);
  return raw.slice(start, end < 0 ? undefined : end);
}

/**
 * The text of `/key` in the PDF's document information, or undefined when it has none.
 * @example pdfInfoString(readFileSync('report.pdf'), 'Subject') // 'Made from case ...'
 */
export function pdfInfoString(bytes: Uint8Array, key: string): string | undefined {
  const raw = Buffer.from(bytes).toString('latin1');
  // The last trailer counts (a file updated in place appends a new one).
  const info = [...raw.matchAll(/\/Info\s+(\d+)\s+(\d+)\s+R/g)].pop();
  const dict = info && objectBody(raw, info[1]!, info[2]!);
  if (!dict) return undefined;
  const entry = new RegExp(`/${key}(?![\\w#])\\s*`).exec(dict);
  if (!entry) return undefined;
  const after = entry.index + entry[0].length;
  const ref = /^(\d+)\s+(\d+)\s+R/.exec(dict.slice(after));
  const body = ref ? objectBody(raw, ref[1]!, ref[2]!) : undefined;
  const bin = ref ? body && stringAt(body, 0) : stringAt(dict, after);
  if (bin === undefined) return undefined;
  if (bin.startsWith('\xfe\xff')) {
    const be = Buffer.from(bin.slice(2), 'latin1');
    return be
      .subarray(0, be.length - (be.length % 2))
      .swap16()
      .toString('utf16le');
  }
  return bin;
}
