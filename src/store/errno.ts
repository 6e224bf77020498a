/** The errno code of a failed file operation (`ENOENT`, `EEXIST`, ...), or undefined. */
export const errCode = (e: unknown) => (e as NodeJS.ErrnoException).code;
