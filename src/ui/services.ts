/**
 * What the screens need from the world outside them: the store, preferences, the report writer
 * and the clock. run.tsx passes the real ones; tests pass the same ones on a temp folder. Keeping
 * them behind this port leaves the screens free of file handling.
 */
import type { ReportFormat } from '../report/render.js';
import type { Case } from '../case/load.js';
import type { FieldIssue } from '../case/issues.js';
import type { InterviewMode } from '../interview/types.js';

/** One row of the home list. */
export interface CaseRow {
  id: string;
  file: string;
  /** ISO time of the last save, for the newest-first order. */
  updated?: string;
  reference?: string;
  /** Answered of applicable questions. */
  progress?: { answered: number; applicable: number };
  /** Title of the question it stopped at; undefined when complete. */
  stoppedAt?: string;
  /** "at least 41 mph" when complete and solved. */
  result?: string;
  /** Set when the file cannot be read: what is wrong and where. */
  problem?: { message: string; hasBackup: boolean };
}

/** A case opened for work. `readOnly` says why saves are refused (open elsewhere). */
export interface OpenCase {
  case: Case;
  file: string;
  readOnly?: string;
  migratedFrom?: number;
  /** Just created: the interview starts from its first question. */
  isNew?: boolean;
  /** Warnings about the file as read (a key given twice), shown when the case opens. */
  warnings?: string[];
  release(): Promise<void>;
}

export type Opened =
  { ok: true; open: OpenCase } | { ok: false; message: string; issues?: FieldIssue[] };

export type Saved =
  | {
      ok: true;
      /** When the write was done and checked. */
      at: Date;
      /** What else the save did, in sentences for the screen (a broken file moved aside ...). */
      notes: string[];
    }
  | {
      ok: false;
      message: string;
      /** full, short, denied, read-only, gone, io: what the user can do about it. */
      problem?: string;
      /** The file was changed outside skidcase: their version, for the user's choice. */
      theirs?: Case;
    };

export interface Services {
  sessionsDir: string;
  /** Where the folder choice came from: "--sessions", "SKIDCASE_SESSIONS", "preference", "default". */
  sessionsFrom: string;
  listCases(): Promise<CaseRow[]>;
  /** Opens by id in the sessions folder, or by a file path. */
  openCase(ref: { id: string } | { path: string }): Promise<Opened>;
  /** A new empty case with a fresh id, locked for this process. */
  newCase(): Promise<Opened>;
  /** A fresh copy of the demo case, in the sessions folder. */
  openDemo(): Promise<Opened>;
  /**
   * Writes the case to its file before it returns (the interview moves on only after this).
   * `overwriteChanged`: write over a version changed outside skidcase, keeping it beside.
   */
  saveCase(open: OpenCase, c: Case, opts?: { overwriteChanged?: boolean }): Saved;
  /** The case saved under a new id in the sessions folder, and opened there for writing. */
  saveCopy(c: Case): Promise<(Opened & { ok: true }) | { ok: false; message: string }>;
  restoreBackup(id: string): Promise<{ ok: true } | { ok: false; message: string }>;
  /** Writes the report for a case; the path written, or why not. */
  writeReport(
    open: OpenCase,
    c: Case,
    form?: ReportFormat,
  ): Promise<{ ok: true; path: string } | { ok: false; message: string }>;
  /**
   * A text file the investigator names in an answer (surveyed points exported as CSV), read in
   * full before it returns; refused over a size cap or when it is not text, naming the file.
   */
  readTextFile(file: string): { ok: true; text: string } | { ok: false; message: string };
  initialMode: InterviewMode;
  /** The preferred perception-reaction time, s, for the comparison at the posted limit. */
  reactionTime?: number;
  saveMode(mode: InterviewMode): void;
  now(): Date;
}
