/**
 * The screens' services bound to the real store (src/store) and preferences (src/prefs).
 * Tests use this same binding on a temporary sessions folder.
 */
import fs from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Case } from '../case/load.js';
import { loadCaseText } from '../case/load.js';
import { z } from 'zod';
import {
  caseFiles,
  newestFirst,
  checkBackup,
  openCase,
  openListIndex,
  readCaseEntry,
  stampOf,
  restoreBackup,
  saveCase,
  saveCaseSync,
  uniqueId,
  type OpenResult,
} from '../store/index.js';
import { loadPrefs, type PrefsOptions } from '../prefs/prefs.js';
import type { InterviewMode } from '../interview/types.js';
import type { InterviewPort } from './interview-port.js';
import type { CaseRow, Opened, OpenCase, Saved, Services } from './services.js';
import { atLeast } from './review-lines.js';
import { writeCaseReport } from './write-report.js';
import { caseFromSavedAnswers } from '../interview/from-case.js';
import { readTextFile } from '../io/read-text.js';

export interface LiveOptions {
  sessionsDir: string;
  sessionsFrom: string;
  port: InterviewPort;
  /** The demo case to copy from; by default the `sessions/` folder shipped beside the program. */
  demoFile?: string;
  prefs?: PrefsOptions;
  /** Writes a report; by default the Markdown report beside the case file. */
  writeReport?: Services['writeReport'];
  now?: () => Date;
  /**
   * The list index (store/list-index.ts): its file and the build that may read it. Without it
   * every case is read on every list (tests, and runs from the sources).
   */
  listIndex?: { file: string; key: string };
}

/** What the list index keeps of a row (the file path is the one listed, never a kept one). */
const keptRow = z.object({
  id: z.string(),
  updated: z.string(),
  reference: z.string().optional(),
  progress: z.object({ answered: z.number(), applicable: z.number() }).optional(),
  stoppedAt: z.string().optional(),
  result: z.string().optional(),
});

/** The rows of the case list, newest `updated` first (the order of store's `listCases`). */
async function listRows(dir: string, o: LiveOptions): Promise<CaseRow[]> {
  const index = o.listIndex && openListIndex(o.listIndex.file, o.listIndex.key, dir);
  const rows = await Promise.all(
    (await caseFiles(dir)).map(async (file): Promise<CaseRow> => {
      if (index) {
        const st = await fs.stat(file).catch(() => undefined);
        const kept = st?.isFile() ? keptRow.safeParse(index.get(file, stampOf(st))) : undefined;
        if (kept?.success) return { ...withoutUndefined(kept.data), file };
      }
      const e = await readCaseEntry(file);
      if (e.case) {
        const row = summarise(o.port, e.case, e.path, e.updated);
        if (index && e.stamp) {
          const { file: _f, ...keep } = row;
          index.set(file, e.stamp, keep);
        }
        return row;
      }
      const bak = await checkBackup(e.path);
      return {
        id: e.id,
        file: e.path,
        updated: e.updated,
        problem: { message: e.problem ?? 'cannot be read', hasBackup: !!bak?.loadable },
      };
    }),
  );
  // after the list is drawn: the index only speeds up the next list
  if (index) setImmediate(() => index.save());
  return rows.sort(newestFirst);
}

const withoutUndefined = <T extends object>(o: T): T =>
  Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;

/** The demo case shipped with skidcase: `sessions/demo*.json` beside dist/ or src/. */
export async function findDemoFile(): Promise<string | undefined> {
  const here = path.dirname(fileURLToPath(import.meta.url));
  for (const dir of [
    path.resolve(here, '..', 'sessions'),
    path.resolve(here, '..', '..', 'sessions'),
  ]) {
    const names = await fs.readdir(dir).catch(() => [] as string[]);
    const demo = names.filter((n) => /^demo[a-z0-9-]*\.json$/.test(n)).sort()[0];
    if (demo) return path.join(dir, demo);
  }
  return undefined;
}

function opened(r: OpenResult): Opened {
  if (!r.ok) return { ok: false, message: r.message, issues: r.issues };
  const open: OpenCase = { case: r.case, file: r.path, release: r.release };
  if (r.readOnly) open.readOnly = r.readOnlyReason ?? 'this case is open in another skidcase.';
  if (r.migratedFrom !== undefined) open.migratedFrom = r.migratedFrom;
  if (r.duplicateKeys.length)
    open.warnings = r.duplicateKeys.map(
      (k) => `Warning: ${k} is given twice in the file; the last one is used.`,
    );
  return { ok: true, open };
}

/** A home row for a valid case: progress, where it stopped, and the result when complete. */
export function summarise(port: InterviewPort, c: Case, file: string, updated: string): CaseRow {
  const row: CaseRow = { id: c.id, file, updated };
  if (c.details?.reference) row.reference = c.details.reference;
  const state = port.fromCase(c, 'brisk');
  row.progress = port.progress(state);
  const q = port.current(state);
  if (q) row.stoppedAt = q.title;
  else {
    const sol = port.solve(c);
    const done = sol.analyses.flatMap((a) => (a.ok ? [atLeast(a.solution, sol.units.speed)] : []));
    if (done.length) row.result = done.join('; ');
  }
  return row;
}

export function liveServices(o: LiveOptions): Services {
  const dir = o.sessionsDir;
  const now = o.now ?? (() => new Date());
  const prefs = loadPrefs(o.prefs ?? {}).prefs;
  const fresh = (id: string): Case =>
    ({
      format: 'skidcase-case',
      version: 1,
      id,
      units: prefs.units,
      vehicle: {},
      analyses: [],
    }) as Case;
  const createAndOpen = async (c: Case, isNew: boolean): Promise<Opened> => {
    const saved = await saveCase(dir, c);
    if (!saved.ok) return { ok: false, message: saved.message };
    const o = opened(await openCase(dir, { id: c.id }));
    if (o.ok && isNew) o.open.isNew = true;
    return o;
  };
  return {
    sessionsDir: dir,
    sessionsFrom: o.sessionsFrom,
    initialMode: prefs.mode,
    readTextFile: (file) => readTextFile(file),
    reactionTime: prefs.reactionTime,
    now,
    async listCases() {
      return listRows(dir, o);
    },
    async openCase(ref) {
      return opened('id' in ref ? await openCase(dir, { id: ref.id }) : await openCase(ref.path));
    },
    async newCase() {
      const d = now();
      const stamp = d.toISOString().slice(0, 16).replace(/[-:]/g, '').replace('T', '-');
      // Written with its interview section from the start, so that a case left before its first
      // answer resumes on its first question, with no answer made up from the empty fields.
      const base = fresh(uniqueId(dir, `case-${stamp}`));
      const built = o.port.build(o.port.fresh(prefs.mode), base);
      return createAndOpen(built.ok ? built.case : base, true);
    },
    async openDemo() {
      const file = o.demoFile ?? (await findDemoFile());
      if (!file)
        return {
          ok: false,
          message: 'The demo case is not installed (sessions/demo.json next to skidcase).',
        };
      const loaded = loadCaseText(await fs.readFile(file, 'utf8').catch(() => ''));
      if (!loaded.ok)
        return {
          ok: false,
          message: `The demo case ${file} cannot be read`,
          issues: loaded.issues,
        };
      return createAndOpen({ ...loaded.case, id: uniqueId(dir, 'demo-copy') }, false);
    },
    saveCase(open, c, opts = {}) {
      // Back to the file it was opened from (its lock and backup), whatever the file is called.
      const r = saveCaseSync(path.dirname(open.file), c, {
        ...opts,
        file: open.file,
        // For a hand edit found in the file as opened: what the interview last wrote to it.
        lastWritten: () => caseFromSavedAnswers(open.case),
      });
      if (!r.ok) {
        const failed: Saved = { ok: false, message: r.message };
        if (r.problem) failed.problem = r.problem;
        if (r.theirs) failed.theirs = r.theirs;
        return failed;
      }
      const notes: string[] = [];
      if (r.keptBroken)
        notes.push(
          `The file on disk was no longer a case: it was moved beside it as ${path.basename(r.keptBroken)}, and your answers were saved.`,
        );
      if (r.keptOutside)
        notes.push(
          `The version changed outside skidcase was kept beside it as ${path.basename(r.keptOutside)}.`,
        );
      if (r.keptOriginal)
        notes.push(
          `The original of the older format was kept beside it as ${path.basename(r.keptOriginal)}.`,
        );
      // This save found the file changed outside skidcase: its trail now says so.
      const saved = r.case.revisions ?? [];
      const at = saved.at(-1)?.at;
      const edit = saved.find((e) => e.at === at && e.by === 'hand edit');
      if (edit)
        notes.push(
          `The file had been changed outside skidcase (${edit.changes.length ? `${edit.changes.length} field${edit.changes.length === 1 ? '' : 's'}` : 'what changed is not known'}): recorded as a hand edit in the case's trail (skidcase history ${r.case.id}).`,
        );
      return { ok: true, at: now(), notes };
    },
    async saveCopy(c) {
      const { created: _c, updated: _u, ...rest } = c;
      const id = uniqueId(dir, `${c.id.replace(/-copy(-\d+)?$/, '')}-copy`);
      const o = await createAndOpen({ ...rest, id } as Case, false);
      return o.ok ? o : { ok: false, message: o.message };
    },
    async restoreBackup(id) {
      const r = await restoreBackup(dir, id);
      return r.ok ? { ok: true } : { ok: false, message: r.message };
    },
    writeReport:
      o.writeReport ??
      ((open, c, form) => writeCaseReport(open, c, now(), prefs.reactionTime, form)),
    saveMode(mode: InterviewMode) {
      // conf (and its validator) is loaded only when a preference is written, not at start-up.
      void import('../prefs/save.js').then(({ savePref }) => savePref('mode', mode, o.prefs ?? {}));
    },
  };
}
