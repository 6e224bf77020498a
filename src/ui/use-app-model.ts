/**
 * The app's state and the commands that change it: which screen, the home list, the open case
 * and its autosave, the overlays, and leaving. Keys are mapped to these commands elsewhere
 * (use-app-input.ts); this hook does not know about keys.
 */
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
  const saving = useRef<Promise<unknown>>(Promise.resolve());
  /** The answers last written (or loaded): a save is due when the session's differ. */
  const savedAnswers = useRef<unknown>(undefined);

  // Applied to the ref at once, not in React's deferred updater, so that a save or a key that
  // follows in the same tick sees the state this update made.
  const update = useCallback((f: (m: Model) => Model) => {
    const n = f(ref.current);
    ref.current = n;
    setModel(n);
  }, []);
  const setHome = (h: Partial<HomeState>) => update((m) => ({ ...m, home: { ...m.home, ...h } }));

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
      if (!opened.open.isNew) session.summary = port.summary(state);
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
    [port, update],
  );

  /** Builds and writes the case when its answers changed; a failure keeps the answers in memory. */
  const save = useCallback(async () => {
    const s = ref.current.session;
    if (!s || s.open.readOnly || s.state.answers === savedAnswers.current) return;
    const answers = s.state.answers;
    const built = port.build(s.state, s.open.case);
    if (!built.ok) {
      const message = `not saved yet: ${built.message}`;
      update((m) => (m.session ? { ...m, session: { ...m.session, saveError: message } } : m));
      return;
    }
    const result = await services.saveCase(s.open, built.case);
    update((m) => {
      if (!m.session) return m;
      const { saveError: _e, ...rest } = m.session;
      if (result.ok) {
        savedAnswers.current = answers;
        return { ...m, session: { ...rest, savedAt: result.at } };
      }
      return { ...m, session: { ...rest, saveError: result.message } };
    });
  }, [port, services, update]);

  const queueSave = useCallback(() => {
    saving.current = saving.current.then(save, save);
  }, [save]);

  const act = useCallback(
    (action: Action) => {
      const before = ref.current.session;
      if (!before) return;
      const after = applyAction(port, before, action);
      if (after === before) return;
      update((m) => ({ ...m, session: after }));
      if (after.state.answers !== before.state.answers) queueSave();
    },
    [port, queueSave, update],
  );

  /** Set after a leave found unsaved answers: the next leave goes without them. */
  const leaveArmed = useRef(false);

  const leave = useCallback(async () => {
    if (ref.current.leaving) return;
    update((m) => ({ ...m, leaving: true }));
    queueSave();
    await saving.current.catch(() => undefined);
    const s = ref.current.session;
    const unsaved = s && !s.open.readOnly && s.state.answers !== savedAnswers.current;
    if (unsaved && !leaveArmed.current) {
      // Never drop answers silently: say so, and leave only when asked again.
      leaveArmed.current = true;
      const saveError = `${s.saveError ?? 'not saved'}; press ${keysFor('save-leave')} again to leave without saving`;
      update((m) => ({
        ...m,
        leaving: false,
        session: m.session ? { ...m.session, saveError } : m.session,
      }));
      return;
    }
    await s?.open.release().catch(() => undefined);
    exit(0);
  }, [exit, queueSave, update]);

  const closeCase = useCallback(async () => {
    queueSave();
    await saving.current.catch(() => undefined);
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
  }, [queueSave, refresh, update]);

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
        const id = start.id ?? ref.current.home.rows?.find((r) => !r.problem)?.id;
        if (id) enter(await services.openCase({ id }));
        else setHome({ error: 'There is no case to resume yet.' });
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
    queueSave,
    emptyLine: EMPTY_LINE,
  };
}

export type AppModel = ReturnType<typeof useAppModel>;
