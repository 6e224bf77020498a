import { stat } from 'node:fs/promises';
import { readFile } from 'node:fs/promises';
import { loadCaseText } from '../case/load.js';
import { MAX_CASE_BYTES, tooLargeMessage } from '../case/limits.js';
import { printable, printableIo } from '../case/printable.js';
import { provenanceOf } from '../report/doc.js';
import { isPdf, pdfInfoString } from '../report/pdf-info.js';
import { readCaseFile } from './read-case.js';
import { resolveTarget } from './report.js';

/** Exit codes of `skidcase verify`. */
export const VERIFY_EXIT = { matches: 0, differs: 1, invalid: 2 } as const;

export interface VerifyIo {
  out(s: string): void;
  err(s: string): void;
}

/** The text of a report file (of a PDF, its Subject), or why it cannot be read. */
async function readReport(file: string): Promise<{ text: string } | { message: string }> {
  try {
    const st = await stat(file);
    if (st.isDirectory()) return { message: `${printable(file)}: is a folder, not a report` };
    // A report is far smaller than the largest case it can be made from, with its pictures.
    if (st.size > MAX_CASE_BYTES * 4)
      return { message: `${printable(file)}: ${tooLargeMessage(st.size)}` };
    const bytes = await readFile(file);
    // A PDF's page text is compressed: its provenance sentence is kept in its Subject.
    if (isPdf(bytes)) return { text: pdfInfoString(bytes, 'Subject') ?? '' };
    return { text: bytes.toString('utf8') };
  } catch (e) {
    const code = (e as { code?: string }).code;
    return {
      message:
        code === 'ENOENT'
          ? `${printable(file)}: no such file`
          : `${printable(file)}: cannot be read (${code ?? 'read error'})`,
    };
  }
}

/**
 * `skidcase verify REPORT [CASE]`: whether a report was made from a case file, by the SHA-256 of
 * the file's bytes that every report records. CASE is a file or a case id in the sessions folder;
 * without it, the case the report names is looked up there. Exit 0 the file is the one the
 * report was made from; 1 it differs (saying how); 2 the report or the case cannot be read, or the
 * report records no file.
 * @example await verifyCommand('harbor.md', 'harbor.json', 'sessions', io) // 0
 */
export async function verifyCommand(
  reportFile: string,
  caseTarget: string | undefined,
  sessionsDir: string,
  rawIo: VerifyIo,
): Promise<number> {
  const io = printableIo(rawIo);
  const report = await readReport(reportFile);
  if ('message' in report) {
    io.err(`skidcase: ${report.message}\n`);
    return VERIFY_EXIT.invalid;
  }
  const made = provenanceOf(report.text);
  if (!made) {
    io.err(
      `skidcase: ${printable(reportFile)}: records no case file (not a skidcase report, or one made without a case file on disk)\n`,
    );
    return VERIFY_EXIT.invalid;
  }
  const where = await resolveTarget(caseTarget ?? made.caseId, sessionsDir);
  if ('message' in where) {
    io.err(`skidcase: ${where.message}\n`);
    return VERIFY_EXIT.invalid;
  }
  const read = await readCaseFile(where.file);
  if ('message' in read) {
    io.err(`skidcase: ${read.message}\n`);
    return VERIFY_EXIT.invalid;
  }
  const name = printable(where.file);
  if (read.sha256 === made.sha256) {
    io.out(
      `${printable(reportFile)} was made from ${name}: case ${made.caseId}, SHA-256 ${made.sha256}\n`,
    );
    return VERIFY_EXIT.matches;
  }
  const lines = [
    `${printable(reportFile)} was not made from ${name} as it is now:`,
    `  the report's case file: SHA-256 ${made.sha256}, case ${made.caseId}, last saved ${made.saved}`,
  ];
  const loaded = loadCaseText(read.text);
  if (loaded.ok) {
    const c = loaded.case;
    lines.push(
      `  ${name}: SHA-256 ${read.sha256}, case ${c.id}, last saved ${c.updated ?? 'not recorded'}`,
    );
    if (c.id !== made.caseId) lines.push(`  it holds another case (${c.id}, not ${made.caseId})`);
    else if (c.updated && c.updated !== made.saved)
      lines.push('  the case was saved again after the report was made: make the report again');
    else lines.push('  the file was changed without a save by skidcase (edited by hand?)');
  } else lines.push(`  ${name}: SHA-256 ${read.sha256}, and it is not a valid case file now`);
  io.out(`${lines.join('\n')}\n`);
  return VERIFY_EXIT.differs;
}
