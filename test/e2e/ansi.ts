/**
 * Finds the escape codes that set a colour in raw terminal output. Bold, dim, inverse and cursor
 * movement are not colour; NO_COLOR (https://no-color.org) asks only that colour be left out.
 */

// eslint-disable-next-line no-control-regex -- matches terminal escape codes, which begin with ESC
const SGR = /\u001B\[([0-9;:]*)m/g;

/** True for an SGR parameter list that sets or resets a foreground or background colour. */
function setsColour(params: string): boolean {
  const p = params === '' ? [0] : params.split(/[;:]/).map((x) => Number(x));
  for (let i = 0; i < p.length; i++) {
    const n = p[i]!;
    if (
      (n >= 30 && n <= 39) ||
      (n >= 40 && n <= 49) ||
      (n >= 90 && n <= 97) ||
      (n >= 100 && n <= 107)
    )
      return true;
    if (n === 58 || n === 59) return true; // underline colour
  }
  return false;
}

/** Every colour escape code in `raw`, as written (e.g. `\u001B[31m`), in order. */
export function colourCodes(raw: string): string[] {
  const found: string[] = [];
  for (const m of raw.matchAll(SGR)) if (setsColour(m[1]!)) found.push(m[0]);
  return found;
}

/** Removes every escape sequence, leaving the text a person reads. */
export function stripAnsi(raw: string): string {
  return raw.replace(
    // eslint-disable-next-line no-control-regex -- terminal escape codes begin with ESC and may end with BEL
    /\u001B\[[0-?]*[ -/]*[@-~]|\u001B\][^\u0007\u001B]*(\u0007|\u001B\\)|\u001B[@-Z\\-_]/g,
    '',
  );
}
