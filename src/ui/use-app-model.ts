/**
 * The app's state and the commands that change it: which screen, the home list, the open case
 * and its autosave, the overlays, and leaving. Keys are mapped to these commands elsewhere
 * (use-app-input.ts); this hook does not know about keys.
 */
import path from 'node:path';
import { useCallback, useEffect, useRef, useState } from 'react';
import type { Action, InterviewMode } from '../interview/types.js';
import type { InterviewPort } from './interview-port.js';
import { EMPTY_LINE, type Line } from './line-edit.js';
import type { CaseRow, Opened, Services } from './services.js';
import { applyAction, inputFor, type Session } from './session.js';
import { keysFor } from './keys.js';

export type Start =
  | { kind: 'home' }
  | { kind: 'resume'; id?: string }
  | { kind: 'new' }
  | { kind: 'open'; path: string };

export type Overlay =
  { kind: 'help'; top: number } | { kind: 'jump'; filter: Line; selected: number };

export interface HomeState {
  rows?: CaseRow[];
  selected: number;
  message?: string;
  error?: string;
  path?: Line;
}

export interface Model {
  home: HomeState;
  session?: Session;
  overlay?: Overlay;
  mode: InterviewMode;
  leaving: boolean;
}

export function useAppModel(
  services: Services,
  port: InterviewPort,
  start: Start,
  exit: (code: number) => void,
) {
  const [model, setModel] = useState<Model>({
    home: { selected: 0 },
    mode: services.initialMode,
    leaving: false,
  });
  const ref = useRef(model);
  /** The answers last written (or loaded): a save is due when the session's differ. */
  const savedAnswers = useRef<unknown>(undefined);

  // Applied to the ref at once, not in React's deferred updater, so that a save or a key that
  // follows in the same tick sees the state this update made.
  const update = useCallback((f: (m: Model) => Model) => {
    const n = f(ref.current);
    ref.current = n;
    setModel(n);
  }, []);
  const setHome = useCallback(
    (h: Partial<HomeState>) => update((m) => ({ ...m, home: { ...m.home, ...h } })),
    [update],
  );

  const refresh = useCallback(async () => {
    try {
      const rows = await services.listCases();
      update((m) => ({
        ...m,
        home: {
          ...m.home,
          rows,
          selected: Math.min(m.home.selected, Math.max(0, rows.length - 1)),
        },
      }));
    } catch (e) {
      update((m) => ({
        ...m,
        home: { ...m.home, rows: [], error: `The sessions folder cannot be read: ${String(e)}` },
      }));
    }
  }, [services, update]);

  /** Enters a case that opened, landing on its first open question. */
  const enter = useCallback(
    (opened: Opened) => {
      if (!opened.ok) {
        // The store's message already names the file and the first field; add the others.
        const more = (opened.issues ?? []).filter((i) => !opened.message.includes(i.message));
        const detail = more.map((i) => `${i.path}: ${i.message}`).join('; ');
        setHome({ error: detail ? `${opened.message} (${detail})` : opened.message });
        return;
      }
      const mode = ref.current.mode;
      const state = opened.open.isNew ? port.fresh(mode) : port.fromCase(opened.open.case, mode);
      savedAnswers.current = state.answers;
      const session: Session = { open: opened.open, state, reviewTop: 0, ...inputFor(port, state) };
      // Nothing answered yet: no "already done" list, the first question and its why.
      if (!opened.open.isNew && port.progress(state).answered > 0)
        session.summary = port.summary(state);
      if (opened.open.warnings?.length)
        session.summary = [...opened.open.warnings, ...(session.summary ?? [])];
      if (opened.open.migratedFrom !== undefined)
        session.summary = [
          `This file was written in case format version ${opened.open.migratedFrom}; it is saved in the current version once you change an answer, and the original is kept beside it.`,
          ...(session.summary ?? []),
        ];
      update((m) => ({
        ...m,
        session,
        overlay: undefined,
        home: { ...m.home, error: undefined, message: undefined, path: undefined },
      }));
    },
    [port, update, setHome],
  );

  /**
   * Writes the session's answers when they changed since the last write, before it returns: the
   * caller shows the next question only after this, so what the screen moved past is on disk.
   * A failure keeps the answers in memory and says why and what to do.
   */
  /** Set by persist: whether its write was refused or failed (not: skipped, or the case incomplete). */
  const writeFailed = useRef(false);
  const persist = useCallback(
    (s: Session, opts: { overwriteChanged?: boolean } = {}): Session => {
      writeFailed.current = false;
      if (s.open.readOnly || s.state.answers === savedAnswers.current) return s;
      const built = port.build(s.state, s.open.case);
      if (!built.ok) return { ...s, saveError: `not saved yet: ${built.message}` };
      const result = services.saveCase(s.open, built.case, opts);
      const { saveError: _e, conflict: _c, saveNote: _n, ...rest } = s;
      if (result.ok) {
        savedAnswers.current = s.state.answers;
        const done: Session = { ...rest, savedAt: result.at };
        if (result.notes.length) done.saveNote = result.notes.join(' ');
        return done;
      }
      writeFailed.current = true;
      if (result.theirs)
        return { ...rest, saveError: result.message, conflict: { theirs: result.theirs } };
      return { ...rest, saveError: failureText(result.message, result.problem) };
    },
    [port, services],
  );

  /** Saves now what is due (leaving, closing, or the save key after a failure). */
  const saveNow = useCallback(
    (opts: { overwriteChanged?: boolean } = {}) => {
      const s = ref.current.session;
      if (!s) return;
      // A failed save keeps savedAnswers behind the answers, so this writes again.
      const after = persist(s, opts);
      if (after !== s) update((m) => ({ ...m, session: after }));
    },
    [persist, update],
  );

  const act = useCallback(
    (action: Action) => {
      const before = ref.current.session;
      if (!before) return;
      let after = applyAction(port, before, action);
      if (after === before) return;
      if (after.state.answers !== before.state.answers || after.saveError) {
        after = persist(after);
        // What the screen moves past is on disk: when the write of a new answer failed (disk
        // full, the file changed outside), the answer is kept but the question stays on screen
        // with the reason and the answer as typed, until a save goes through.
        if (writeFailed.current && after.state.answers !== before.state.answers)
          after = {
            ...after,
            state: { ...after.state, cursor: before.state.cursor },
            line: before.line,
          };
      }
      update((m) => ({ ...m, session: after }));
    },
    [port, persist, update],
  );

  /** Set after a leave found unsaved answers: the next leave goes without them. */
  const leaveArmed = useRef(false);
  /** Set after a leave found typed text not yet accepted: the next leave goes without it. */
  const draftArmed = useRef(false);

  const leave = useCallback(async () => {
    if (ref.current.leaving) return;
    saveNow();
    const s = ref.current.session;
    const unsaved = s && s.state.answers !== savedAnswers.current;
    if (unsaved && !leaveArmed.current) {
      // Never drop answers silently: say so, and leave only when asked again.
      leaveArmed.current = true;
      const saveError = s.open.readOnly
        ? `these answers are not saved (read-only: ${s.open.readOnly.replace(/\.$/, '')}); press ${keysFor('save-now')} to save them as a new case, or ${keysFor('save-leave')} again to leave without saving`
        : `${s.saveError ?? 'not saved'}; press ${keysFor('save-leave')} again to leave without saving`;
      update((m) => (m.session ? { ...m, session: { ...m.session, saveError } } : m));
      return;
    }
    // Text typed but not accepted is no answer yet: say so once, rather than drop it unseen.
    const draft = s?.line.value.trim();
    // A held answer (its save failed) is in the answers already: the line only shows it.
    const held = s && draft === s.state.answers[s.state.cursor]?.text.trim();
    if (s && draft && !held && !draftArmed.current) {
      draftArmed.current = true;
      // pasted lines (surveyed points) shown on one line, as the field shows them
      const one = draft.split('\n').join('; ');
      const shown = one.length > 30 ? `${one.slice(0, 30)}…` : one;
      const saveNote = `"${shown}" is typed but not accepted: Enter accepts it; ${keysFor('save-leave')} again leaves without it.`;
      update((m) => (m.session ? { ...m, session: { ...m.session, saveNote } } : m));
      return;
    }
    update((m) => ({ ...m, leaving: true }));
    await s?.open.release().catch(() => undefined);
    exit(0);
  }, [exit, saveNow, update]);

  const closeCase = useCallback(async () => {
    saveNow();
    const s = ref.current.session;
    if (s && !s.open.readOnly && s.state.answers !== savedAnswers.current) {
      // The answers live only here until a save succeeds: keep the case open.
      const saveError = `${s.saveError ?? 'not saved'}; the case stays open`;
      update((m) => (m.session ? { ...m, session: { ...m.session, saveError } } : m));
      return;
    }
    await s?.open.release().catch(() => undefined);
    update((m) => ({ ...m, session: undefined, overlay: undefined }));
    void refresh();
  }, [saveNow, refresh, update]);

  /** The answers as a new case (new id) in the sessions folder; the session goes on there. */
  const saveAsCopy = useCallback(async () => {
    const s = ref.current.session;
    if (!s) return;
    const built = port.build(s.state, s.open.case);
    if (!built.ok) {
      const saveError = `no copy saved: ${built.message}`;
      update((m) => (m.session ? { ...m, session: { ...m.session, saveError } } : m));
      return;
    }
    const copy = await services.saveCopy(built.case);
    if (!copy.ok) {
      const saveError = `no copy saved: ${copy.message}`;
      update((m) => (m.session ? { ...m, session: { ...m.session, saveError } } : m));
      return;
    }
    if (!s.open.readOnly) await s.open.release().catch(() => undefined);
    leaveArmed.current = false;
    const state = port.fromCase(copy.open.case, ref.current.mode);
    savedAnswers.current = state.answers;
    const session: Session = {
      open: copy.open,
      state,
      reviewTop: 0,
      ...inputFor(port, state),
      savedAt: services.now(),
      saveNote: `Saved as a new case ${copy.open.case.id} (${path.basename(copy.open.file)}); ${path.basename(s.open.file)} was left as it is.`,
    };
    update((m) => ({ ...m, session, overlay: undefined }));
  }, [port, services, update]);

  /**
   * The save key: writes again after a failure; in a read-only window, or when the file was
   * changed outside, saves the answers as a new case under a new id and goes on there.
   */
  const saveKey = useCallback(async () => {
    const s = ref.current.session;
    if (!s) return;
    if (!s.open.readOnly && !s.conflict) {
      saveNow();
      return;
    }
    await saveAsCopy();
  }, [saveAsCopy, saveNow]);

  /** The file was changed outside: take their version into the interview (ours since is dropped). */
  const loadTheirs = useCallback(async () => {
    const s = ref.current.session;
    if (!s) return;
    const o = await services.openCase({ path: s.open.file });
    if (!o.ok) {
      const saveError = `cannot load the changed file: ${o.message}`;
      update((m) => (m.session ? { ...m, session: { ...m.session, saveError } } : m));
      return;
    }
    enter(o);
    update((m) =>
      m.session
        ? {
            ...m,
            session: { ...m.session, saveNote: `Loaded the version changed outside skidcase.` },
          }
        : m,
    );
  }, [enter, services, update]);

  /** The file was changed outside: write ours over it; theirs is kept beside it. */
  const keepMine = useCallback(() => saveNow({ overwriteChanged: true }), [saveNow]);

  const setMode = useCallback(
    (mode: InterviewMode) => {
      update((m) => ({ ...m, mode }));
      act({ type: 'set-mode', mode });
      services.saveMode(mode);
    },
    [act, services, update],
  );

  // The first screen: the list, or straight into a case.
  useEffect(() => {
    void (async () => {
      await refresh();
      if (start.kind === 'new') enter(await services.newCase());
      else if (start.kind === 'open') enter(await services.openCase({ path: start.path }));
      else if (start.kind === 'resume') {
        // Without an id: the most recently saved case that is not finished (rows are newest first).
        const rows = ref.current.home.rows ?? [];
        const id = start.id ?? rows.find((r) => !r.problem && r.stoppedAt !== undefined)?.id;
        if (id) enter(await services.openCase({ id }));
        else
          setHome({
            error: rows.some((r) => !r.problem)
              ? 'Every case here is finished: pick one from the list to open it.'
              : 'There is no case to resume yet.',
          });
      }
    })();
    // Runs once: the start is fixed for the life of the app.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);

  return {
    model,
    current: () => ref.current,
    update,
    setHome,
    refresh,
    enter,
    act,
    leave,
    closeCase,
    setMode,
    saveNow,
    saveKey,
    saveAsCopy,
    loadTheirs,
    keepMine,
    emptyLine: EMPTY_LINE,
  };
}

export type AppModel = ReturnType<typeof useAppModel>;

/** A failed save in words the user can act on; the answers are still in memory. */
export function failureText(message: string, problem?: string): string {
  const retry = `press ${keysFor('save-now')} to save again`;
  switch (problem) {
    case 'full':
    case 'short':
      return `${message}: the answers are kept in memory; free space, then ${retry}`;
    case 'denied':
    case 'read-only':
    case 'gone':
      return `${message}: the answers are kept in memory; ${retry} once it can be written`;
    default:
      return `${message}: the answers are kept in memory; ${retry}`;
  }
}
