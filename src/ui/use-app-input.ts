/**
 * The one keyboard handler of the app. It finds the binding for a key in the key table (for the
 * context on screen) and runs its command; keys that are not bindings go to the line being typed.
 * No other component calls useInput, so two handlers can never both act on a key.
 */
import { useRef } from 'react';
import { useInput, type Key } from 'ink';
import { findBinding, type Command, type KeyContext } from './keys.js';
import { EMPTY_LINE, editLine, lineCommand, pasteText, type Line } from './line-edit.js';
import { splitKeys } from './split-keys.js';
import { filterQuestions } from './jump-filter.js';
import { isChoice } from './question-view.js';
import { inputFor, submitAction } from './session.js';
import type { AppModel } from './use-app-model.js';
import type { InterviewPort } from './interview-port.js';
import type { Services } from './services.js';
import type { ReportFormat } from '../report/render.js';

const REPORT_FORMS = {
  'report-md': 'md',
  'report-txt': 'txt',
  'report-html': 'html',
  'report-pdf': 'pdf',
  'report-json': 'json',
} as const satisfies Record<string, ReportFormat>;

/** Which part of the key table is live, from what is on screen. */
export function contextOf(app: AppModel, port: InterviewPort): KeyContext {
  const model = app.current();
  if (model.overlay?.kind === 'help') return 'help';
  if (model.overlay?.kind === 'jump') return 'jump';
  const s = model.session;
  if (!s) return model.home.path ? 'path' : 'home';
  if (s.conflict) return 'conflict';
  if (s.choosingReport) return 'report-form';
  const q = port.current(s.state);
  if (!q) return 'review';
  return isChoice(q) ? 'choice' : 'question';
}

export interface InputDeps {
  app: AppModel;
  port: InterviewPort;
  services: Services;
  /** Rows the review and help can show at once, for paging. */
  page: number;
  /** The largest first line the review and the help can scroll to. */
  maxTop: { review: number; help: number };
  /** "Write report": asks for the form first (undefined), then writes it. */
  onReport(form?: ReportFormat): void;
}

export function useAppInput(deps: InputDeps) {
  // The handler reads the latest render's values: a key can arrive before Ink has swapped in
  // the handler of the render that just happened.
  const latest = useRef(deps);
  latest.current = deps;
  // The text of a bracketed paste (between ESC[200~ and ESC[201~) while it arrives, else undefined.
  const pasting = useRef<string | undefined>(undefined);
  const pasteTimer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  /** Ends the paste: what arrived goes into the field. */
  const endPaste = () => {
    clearTimeout(pasteTimer.current);
    const text = pasting.current;
    pasting.current = undefined;
    if (text !== undefined) pasted(text, latest.current);
  };
  // A paste whose end marker never comes (a terminal that drops it) must not swallow every key
  // after it: it ends after a pause, or at a key that saves and leaves.
  const waitForPasteEnd = () => {
    clearTimeout(pasteTimer.current);
    pasteTimer.current = setTimeout(endPaste, PASTE_PAUSE_MS);
  };
  useInput(
    (chunk, chunkKey) => {
      // One read can hold several keys (typing ahead, a paste); each is handled in turn against
      // the state the previous one left (the model's ref is updated synchronously).
      // While leaving, keys are dropped here rather than by turning the handler off: turning it
      // off leaves raw mode, and a second Ctrl+C would then reach the process as a signal.
      if (latest.current.app.current().leaving) return;
      // Bracketed paste: Ink hands the start marker, the text and the end marker one by one.
      if (chunk === PASTE_START) {
        pasting.current = '';
        return waitForPasteEnd();
      }
      if (pasting.current !== undefined) {
        if (chunk === PASTE_END) return endPaste();
        if (!(chunkKey.ctrl && (chunk === 'q' || chunk === 'c'))) {
          pasting.current += chunk;
          return waitForPasteEnd();
        }
        // Ctrl+Q or Ctrl+C inside a paste with no end: the paste ends, and the key is handled.
        endPaste();
      }
      // A block of lines pasted into a question that takes lines, without the markers (a
      // terminal that does not bracket pastes): its line breaks stay in the answer. Text then one
      // Enter is typing ahead, and is split into keys as usual.
      if (isLinesQuestion(latest.current) && /[\r\n]/.test(chunk.replace(/[\r\n]+$/, '')))
        return pasted(chunk, latest.current);
      const keys = splitKeys(chunk, chunkKey);
      while (keys.length) {
        const [input, key] = keys.shift()!;
        const d = latest.current;
        const ctx = contextOf(d.app, d.port);
        // On a choice each letter is a key of its own: "f56" typed ahead picks [f], then types 56.
        if (ctx === 'choice' && input.length > 1 && !key.ctrl && !key.meta) {
          keys.unshift(...[...input].map((ch): [string, Key] => [ch, key]));
          continue;
        }
        const binding = findBinding(ctx, input, key);
        if (binding) run(binding.command, ctx, d);
        else typed(ctx, input, key, d);
      }
    },
    { isActive: true },
  );
}

/** The markers a terminal puts around a paste once bracketed paste is on, as Ink hands them. */
const PASTE_START = '[200~';
const PASTE_END = '[201~';
/** How long a paste may pause before it is taken as ended without its end marker. */
const PASTE_PAUSE_MS = 400;

/** True when the question on screen takes several lines (surveyed points). */
function isLinesQuestion(d: InputDeps): boolean {
  const s = d.app.current().session;
  return !!s && !d.app.current().overlay && !!d.port.current(s.state)?.lines;
}

/** A pasted block: into the field on screen, its line breaks kept only where lines are taken. */
function pasted(text: string, d: InputDeps) {
  const ctx = contextOf(d.app, d.port);
  const lines = ctx === 'question' && isLinesQuestion(d);
  const s = d.app.current().session;
  const id = s && d.port.current(s.state)?.id;
  // A block pasted over the answer given before, unedited, replaces it (a new export).
  const given = lines && id !== undefined ? s?.state.answers[id]?.text : undefined;
  editField(ctx, d, (l) =>
    pasteText(given !== undefined && l.value === given ? EMPTY_LINE : l, text, lines),
  );
}

/** Ctrl+U, which empties the line being typed (line-edit.ts). */
const clearsLine = (input: string, key: Key): boolean => key.ctrl && input === 'u';

/** A key that is not a binding: a choice letter, or text for the field on screen. */
function typed(ctx: KeyContext, input: string, key: Key, d: InputDeps) {
  const { app, port } = d;
  const m = app.current();
  if (ctx === 'choice' && m.session) {
    const q = port.current(m.session.state)!;
    const typing = m.session.line.value !== '';
    // A choice's letter on an empty line picks it; anything else is typed on the choice's line
    // (words of a choice, or a number the question takes), read when Enter is pressed.
    const c =
      !typing && !key.ctrl && !key.meta
        ? q.choices!.find((c) => c.key.toLowerCase() === input.toLowerCase())
        : undefined;
    if (c) return app.act({ type: 'choose', value: c.value });
    // A space before anything is typed starts nothing (Space is no choice).
    if (!typing && input.trim() === '') return;
    const line = editLine(m.session.line, input, key);
    if (line !== m.session.line)
      app.update((x) => (x.session ? { ...x, session: { ...x.session, line } } : x));
    if (clearsLine(input, key) && m.session.state.error) app.act({ type: 'clear-error' });
    return;
  }
  editField(ctx, d, (l) => editLine(l, input, key));
}

/** Changes the line of text on screen (the answer, the go-to filter or the path) by `edit`. */
function editField(ctx: KeyContext, d: InputDeps, edit: (l: Line) => Line, clears = false) {
  const { app } = d;
  const m = app.current();
  if ((ctx === 'question' || ctx === 'choice') && m.session) {
    const line = edit(m.session.line);
    if (line !== m.session.line)
      app.update((x) => (x.session ? { ...x, session: { ...x.session, line } } : x));
    // Ctrl+U empties the line: the message about what was on it goes with it.
    if (clears && m.session.state.error) app.act({ type: 'clear-error' });
    return;
  }
  if (ctx === 'jump' && m.overlay?.kind === 'jump') {
    const filter = edit(m.overlay.filter);
    if (filter !== m.overlay.filter)
      app.update((x) => ({ ...x, overlay: { kind: 'jump', filter, selected: 0 } }));
    return;
  }
  if (ctx === 'path' && m.home.path) {
    const path = edit(m.home.path);
    if (path !== m.home.path) app.setHome({ path });
  }
}

/** Esc on a question: the message goes, and the line (or highlight) is back as the question began. */
function putBack(d: InputDeps) {
  d.app.update((x) => {
    if (!x.session) return x;
    const { error: _gone, ...state } = x.session.state;
    return { ...x, session: { ...x.session, state, ...inputFor(d.port, state) } };
  });
}

function move(d: InputDeps, ctx: KeyContext, by: number) {
  const { app } = d;
  const m = app.current();
  if (ctx === 'help' && m.overlay?.kind === 'help') {
    const top = Math.max(0, Math.min(d.maxTop.help, m.overlay.top + by));
    app.update((x) => ({ ...x, overlay: { kind: 'help', top } }));
  } else if (ctx === 'jump' && m.overlay?.kind === 'jump' && m.session) {
    const n = filterQuestions(d.port.states(m.session.state), m.overlay.filter.value).length;
    const selected = Math.max(0, Math.min(n - 1, m.overlay.selected + by));
    app.update((x) =>
      x.overlay?.kind === 'jump' ? { ...x, overlay: { ...x.overlay, selected } } : x,
    );
  } else if (ctx === 'review' && m.session) {
    const reviewTop = Math.max(0, Math.min(d.maxTop.review, m.session.reviewTop + by));
    app.update((x) => (x.session ? { ...x, session: { ...x.session, reviewTop } } : x));
  } else if (ctx === 'choice' && m.session) {
    const n = d.port.current(m.session.state)?.choices?.length ?? 1;
    const highlight = (m.session.highlight + by + n) % n;
    app.update((x) => (x.session ? { ...x, session: { ...x.session, highlight } } : x));
  } else if (ctx === 'home') {
    const n = m.home.rows?.length ?? 0;
    app.setHome({ selected: Math.max(0, Math.min(n - 1, m.home.selected + by)) });
  }
}

function run(command: Command, ctx: KeyContext, d: InputDeps) {
  const { app, services } = d;
  const m = app.current();
  switch (command) {
    case 'help':
      return app.update((x) => ({
        ...x,
        overlay: x.overlay?.kind === 'help' ? undefined : { kind: 'help', top: 0 },
      }));
    case 'save-leave':
    case 'quit':
      return void app.leave();
    case 'save-now':
      return void app.saveKey();
    case 'load-theirs':
      return void app.loadTheirs();
    case 'keep-mine':
      return app.keepMine();
    case 'copy-mine':
      return void app.saveAsCopy();
    case 'close':
      if (m.overlay) return app.update((x) => ({ ...x, overlay: undefined }));
      if (ctx === 'path') return app.setHome({ path: undefined });
      if (ctx === 'review') return app.act({ type: 'back' });
      if ((ctx === 'question' || ctx === 'choice') && m.session) return putBack(d);
      return;
    case 'up':
      return move(d, ctx, -1);
    case 'down':
      return move(d, ctx, 1);
    case 'page-up':
      return move(d, ctx, -d.page);
    case 'page-down':
      return move(d, ctx, d.page);
    case 'submit':
      return submit(ctx, d);
    case 'back':
      return app.act({ type: 'back' });
    case 'forward':
      return app.act({ type: 'forward' });
    case 'undo':
      return app.act({ type: 'undo' });
    case 'review':
      return app.act({ type: 'open-review' });
    case 'explain':
      return app.act({ type: 'toggle-explain' });
    case 'mode':
      return app.setMode(m.mode === 'guided' ? 'brisk' : 'guided');
    case 'jump':
    case 'to-question':
      return app.update((x) => ({
        ...x,
        overlay: { kind: 'jump', filter: app.emptyLine, selected: 0 },
      }));
    case 'new-case':
      return void services.newCase().then(app.enter);
    case 'demo':
      return void services.openDemo().then(app.enter);
    case 'open-path':
      return app.setHome({ path: app.emptyLine, error: undefined });
    case 'restore': {
      const row = m.home.rows?.[m.home.selected];
      if (!row?.problem)
        return app.setHome({ error: 'Only a damaged case file has a backup to restore.' });
      return void services.restoreBackup(row.id).then((r) => {
        app.setHome(
          r.ok
            ? { message: `Restored ${row.id} from its backup copy.`, error: undefined }
            : { error: r.message },
        );
        void app.refresh();
      });
    }
    case 'report':
      return d.onReport();
    case 'report-md':
    case 'report-txt':
    case 'report-html':
    case 'report-pdf':
    case 'report-json':
      return d.onReport(REPORT_FORMS[command]);
    case 'report-cancel':
      return app.update((m) =>
        m.session
          ? { ...m, session: { ...m.session, choosingReport: false, reportMessage: undefined } }
          : m,
      );
    case 'to-list':
      return void app.closeCase();
    case 'pick':
      return;
    case 'line-start':
    case 'line-end':
    case 'line-clear':
      return editField(ctx, d, (l) => lineCommand(l, command), command === 'line-clear');
  }
}

function submit(ctx: KeyContext, d: InputDeps) {
  const { app, port, services } = d;
  const m = app.current();
  if (ctx === 'question' || ctx === 'choice') {
    if (!m.session) return;
    // `@file`: the file is read here (a service), and the interview gets its points as typed.
    const fromFile =
      ctx === 'question'
        ? port.fileAnswer(m.session.state, m.session.line.value, services.readTextFile)
        : undefined;
    app.act(fromFile ?? submitAction(port, m.session));
  } else if (ctx === 'jump' && m.overlay?.kind === 'jump' && m.session) {
    const hit = filterQuestions(port.states(m.session.state), m.overlay.filter.value)[
      m.overlay.selected
    ];
    if (!hit) return;
    app.update((x) => ({ ...x, overlay: undefined }));
    app.act({ type: 'jump', id: hit.id });
  } else if (ctx === 'home') {
    const row = m.home.rows?.[m.home.selected];
    if (!row) return;
    if (row.problem)
      return app.setHome({ error: `${row.id} cannot be opened: ${row.problem.message}` });
    void services.openCase({ id: row.id }).then(app.enter);
  } else if (ctx === 'path' && m.home.path) {
    const path = m.home.path.value.trim();
    if (!path) return app.setHome({ error: 'Type the path of a case file, or Esc.' });
    void services.openCase({ path }).then(app.enter);
  }
}
