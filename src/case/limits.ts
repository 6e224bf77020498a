/**
 * What a case file may hold (docs/case-file.md, "Limits"). A file beyond them is refused with a
 * message naming the limit, before it can take the memory or the output of the whole machine.
 */

/** Largest case file read, in bytes (32 MiB). A real case is a few kilobytes. */
export const MAX_CASE_BYTES = 32 * 1024 * 1024;

/** Deepest nesting of objects and lists in a case file. A real case nests about ten levels. */
export const MAX_DEPTH = 64;

/** Most items in any one list of a case (marks, segments, analyses, points, tests, stations, ...). */
export const MAX_ITEMS = 1000;

/** The message for a file over `MAX_CASE_BYTES`. */
export function tooLargeMessage(bytes: number): string {
  const mb = (n: number) => `${Math.round((n / 1024 / 1024) * 10) / 10} MB`;
  return `the file is too large: ${mb(bytes)}, more than the ${mb(MAX_CASE_BYTES)} a case file may have`;
}

/** The message for a file nested deeper than `MAX_DEPTH`. */
export const TOO_DEEP = `nested too deeply: more than ${MAX_DEPTH} levels of objects and lists`;

/** The message for a list over `MAX_ITEMS`, naming it: "marks must have at most 1000 items". */
export function tooManyMessage(what: string): string {
  return `${what} must have at most ${MAX_ITEMS} items`;
}
