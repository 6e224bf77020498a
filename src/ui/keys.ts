/**
 * Every key binding of the screens, as data. The help overlay and the footer hints render this
 * table, and the one input hook dispatches from it, so what the screen says a key does is what
 * it does.
 */
import type { Key } from 'ink';

/** Where a binding is live. `question` is the interview screen; `choice` adds to it for choices. */
export type KeyContext =
  | 'home'
  | 'question'
  | 'choice'
  | 'review'
  | 'jump'
  | 'help'
  | 'path'
  /** The case file was changed outside skidcase: the three ways on. */
  | 'conflict'
  /** "Write report" was pressed in the review: which form to write. */
  | 'report-form';

/** What a key asks for; the app maps each command to an action. */
export type Command =
  | 'help'
  | 'save-leave'
  | 'save-now'
  | 'load-theirs'
  | 'keep-mine'
  | 'copy-mine'
  | 'quit'
  | 'submit'
  | 'back'
  | 'forward'
  | 'jump'
  | 'undo'
  | 'review'
  | 'explain'
  | 'mode'
  | 'up'
  | 'down'
  | 'page-up'
  | 'page-down'
  | 'close'
  | 'new-case'
  | 'open-path'
  | 'demo'
  | 'restore'
  | 'report'
  | 'report-md'
  | 'report-txt'
  | 'report-html'
  | 'report-pdf'
  | 'report-json'
  | 'report-cancel'
  | 'to-question'
  | 'to-list'
  | 'pick'
  | 'line-start'
  | 'line-end'
  | 'line-clear';

/**
 * One key: a named key (`return`, `escape`, `up`, `down`, `pageup`, `pagedown`, `home`, `end`,
 * `tab`), a
 * printable character, or `digit` (any of 1-9). `ctrl` binds the chord; without it the key
 * fires only when no modifier is held.
 */
export interface KeySpec {
  name: string;
  ctrl?: boolean;
}

export interface KeyBinding {
  command: Command;
  keys: KeySpec[];
  /** Short label for the footer. */
  label: string;
  /** Sentence for the help overlay. */
  description: string;
  when: KeyContext[];
  /** Shown in the footer of these contexts (the rest are listed in the help only). */
  footer?: KeyContext[];
  /**
   * Footer rank: lower is kept first when the line is short of room (the help key is 0 and is
   * always kept). Table order breaks ties.
   */
  rank?: number;
  /** The footer label in a read-only window, where the key cannot save (Ctrl+Q only leaves). */
  labelReadOnly?: string;
  /** A footer label for one context where the key does something else (Enter opens a case). */
  labelIn?: Partial<Record<KeyContext, string>>;
}

const ctrl = (name: string): KeySpec => ({ name, ctrl: true });
const plain = (name: string): KeySpec => ({ name });

const EVERYWHERE: KeyContext[] = [
  'home',
  'question',
  'choice',
  'review',
  'jump',
  'path',
  'conflict',
  'report-form',
];
/** Where a line of text is being typed: an answer, the go-to filter, a file's path. */
const TEXT: KeyContext[] = ['question', 'jump', 'path'];
const CASE: KeyContext[] = ['question', 'choice', 'review'];

export const KEY_TABLE: readonly KeyBinding[] = [
  {
    command: 'help',
    keys: [ctrl('k')],
    label: 'all keys',
    description: 'Show or hide this list of keys',
    when: [...EVERYWHERE, 'help'],
    footer: [...EVERYWHERE, 'help'],
    rank: 0,
    labelIn: { help: 'hide keys' },
  },
  {
    command: 'save-leave',
    keys: [ctrl('q'), ctrl('c')],
    label: 'save & leave',
    labelReadOnly: 'leave (not saved)',
    description: 'Save the case and leave skidcase',
    when: [...EVERYWHERE, 'help'],
    footer: CASE,
    rank: 1,
  },
  {
    command: 'quit',
    keys: [plain('q')],
    label: 'quit',
    description: 'Leave skidcase',
    when: ['home'],
    footer: ['home'],
    rank: 5,
  },
  {
    command: 'submit',
    keys: [plain('return')],
    label: 'accept',
    description:
      'Accept the answer as typed; with nothing typed, accept the offered default. In the case list, open the case picked',
    when: ['question', 'choice', 'jump', 'home', 'path'],
    footer: ['question', 'choice', 'home', 'jump', 'path'],
    rank: 1,
    labelIn: { home: 'open', jump: 'go there', path: 'open' },
  },
  {
    command: 'pick',
    keys: [plain('choice')],
    label: 'pick',
    description:
      'Pick a choice by its letter (shown in brackets beside it); or type its words (or, at a grade, a signed percent such as -3) and press Enter',
    when: ['choice'],
  },
  {
    command: 'back',
    // Ctrl+P first (the footer shows it): inside tmux, Ctrl+B is tmux's own prefix key and never
    // reaches the program; Ctrl+B still works everywhere else.
    keys: [ctrl('p'), ctrl('b')],
    label: 'back',
    description:
      'Go to the previous question (later answers are kept). Ctrl+B does the same outside tmux, which keeps Ctrl+B for itself',
    when: ['question', 'choice'],
    footer: ['question', 'choice'],
    rank: 2,
  },
  {
    command: 'forward',
    keys: [ctrl('f')],
    label: 'next',
    description: 'Go to the next question without changing this answer',
    when: ['question', 'choice'],
  },
  {
    command: 'jump',
    keys: [ctrl('g')],
    label: 'go to',
    description: 'Go to any question: type part of its name, then Enter',
    when: CASE,
    footer: ['question', 'choice'],
    rank: 6,
  },
  {
    command: 'undo',
    keys: [ctrl('z')],
    label: 'undo',
    description: 'Undo the last answer',
    when: ['question', 'choice', 'review'],
  },
  {
    command: 'review',
    keys: [ctrl('r')],
    label: 'review',
    description: 'Open the review of the case from any question',
    when: ['question', 'choice'],
    footer: ['question', 'choice'],
    rank: 5,
  },
  {
    command: 'explain',
    keys: [ctrl('e')],
    label: 'why/how',
    description: 'Show or hide why the question is asked and how to measure it',
    when: ['question', 'choice'],
    footer: ['question', 'choice'],
    rank: 3,
  },
  {
    command: 'mode',
    keys: [ctrl('t')],
    label: 'guided/brisk',
    description: 'Switch between guided mode (explanations open) and brisk mode (remembered)',
    when: ['question', 'choice', 'review'],
  },
  {
    command: 'up',
    keys: [plain('up')],
    label: 'up',
    description: 'Move up in a list, or scroll up',
    when: ['home', 'choice', 'jump', 'review', 'help'],
  },
  {
    command: 'down',
    keys: [plain('down')],
    label: 'down',
    description: 'Move down in a list, or scroll down',
    when: ['home', 'choice', 'jump', 'review', 'help'],
  },
  {
    command: 'page-up',
    keys: [plain('pageup')],
    label: 'page up',
    description: 'Scroll up one page',
    when: ['review', 'help'],
  },
  {
    command: 'page-down',
    keys: [plain('pagedown'), plain(' ')],
    label: 'page down',
    description: 'Scroll down one page (Space does the same)',
    when: ['review', 'help'],
    footer: ['review', 'help'],
    rank: 3,
  },
  {
    command: 'close',
    keys: [plain('escape')],
    label: 'close',
    description:
      'Close the list or overlay; from the review, return to the questions; on a question, put back the answer as it was before typing',
    when: ['jump', 'help', 'review', 'path', 'question', 'choice'],
    footer: ['jump', 'help', 'review', 'path'],
    rank: 2,
    labelIn: { review: 'back to questions' },
  },
  {
    command: 'new-case',
    keys: [plain('n')],
    label: 'new case',
    description: 'Start a new case',
    when: ['home'],
    footer: ['home'],
    rank: 2,
  },
  {
    command: 'open-path',
    keys: [plain('o')],
    label: 'open file',
    description: 'Open a case file by its path',
    when: ['home'],
    footer: ['home'],
    rank: 2,
  },
  {
    command: 'demo',
    keys: [plain('d')],
    label: 'demo',
    description: 'Open a copy of the demo case',
    when: ['home'],
    footer: ['home'],
    rank: 3,
  },
  {
    command: 'restore',
    keys: [plain('b')],
    label: 'use backup',
    description: 'For a damaged case file, restore its backup copy',
    when: ['home'],
  },
  {
    command: 'report',
    keys: [plain('w')],
    label: 'write report',
    description:
      'Write the case report beside the case file: then pick its form (Markdown, text, HTML, PDF or JSON)',
    when: ['review'],
    footer: ['review'],
    rank: 1,
  },
  {
    command: 'report-md',
    keys: [plain('m'), plain('return')],
    label: 'Markdown',
    description:
      'Report form: Markdown, its pictures as SVG files beside it (Enter takes this one)',
    when: ['report-form'],
    footer: ['report-form'],
    rank: 1,
  },
  {
    command: 'report-txt',
    keys: [plain('t')],
    label: 'text',
    description: 'Report form: plain text, 80 columns',
    when: ['report-form'],
    footer: ['report-form'],
    rank: 1,
  },
  {
    command: 'report-html',
    keys: [plain('h')],
    label: 'HTML',
    description: 'Report form: one printable HTML page, its pictures inside it',
    when: ['report-form'],
    footer: ['report-form'],
    rank: 1,
  },
  {
    command: 'report-pdf',
    keys: [plain('p')],
    label: 'PDF',
    description:
      'Report form: PDF for printing and filing (US Letter for a case in feet, A4 for one in metres)',
    when: ['report-form'],
    footer: ['report-form'],
    rank: 1,
  },
  {
    command: 'report-json',
    keys: [plain('j')],
    label: 'JSON',
    description: 'Report form: the report document as JSON',
    when: ['report-form'],
    footer: ['report-form'],
    rank: 2,
  },
  {
    command: 'report-cancel',
    keys: [plain('escape')],
    label: 'no report',
    description: 'Report form: write no report after all, back to the review',
    when: ['report-form'],
    footer: ['report-form'],
    rank: 2,
  },
  {
    command: 'to-question',
    keys: [plain('g')],
    label: 'go to',
    description: 'Go to any question from the review',
    when: ['review'],
  },
  {
    command: 'to-list',
    keys: [ctrl('l')],
    label: 'case list',
    description: 'Save the case and go back to the list of cases',
    when: CASE,
  },
  {
    command: 'save-now',
    keys: [ctrl('s')],
    label: 'save now',
    labelReadOnly: 'save as new case',
    description:
      'Save now (again, after a save failed). In a read-only window it saves the answers as a new case under a new id',
    when: CASE,
    footer: CASE,
    rank: 7,
  },
  {
    command: 'load-theirs',
    keys: [plain('l')],
    label: 'load theirs',
    description:
      'Changed-file choice: load the version changed outside skidcase (answers given here since the last save are dropped)',
    when: ['conflict'],
    footer: ['conflict'],
    rank: 1,
  },
  {
    command: 'keep-mine',
    keys: [plain('k')],
    label: 'keep mine',
    description:
      'Changed-file choice: save these answers over it (the other version is kept beside it)',
    when: ['conflict'],
    footer: ['conflict'],
    rank: 1,
  },
  {
    command: 'copy-mine',
    keys: [plain('c')],
    label: 'mine as a copy',
    description:
      'Changed-file choice: save these answers as a new case under a new id, leaving that file as it is',
    when: ['conflict'],
    footer: ['conflict'],
    rank: 1,
  },
  {
    command: 'line-start',
    keys: [ctrl('a'), plain('home')],
    label: 'line start',
    description: 'Move the cursor to the start of the text being typed',
    when: TEXT,
  },
  {
    command: 'line-end',
    keys: [plain('end')],
    label: 'line end',
    description: 'Move the cursor to the end of the text being typed',
    when: TEXT,
  },
  {
    command: 'line-clear',
    keys: [ctrl('u')],
    label: 'clear line',
    description: 'Clear the text being typed',
    when: TEXT,
  },
];

/** How a key is written for people: `Ctrl+G`, `Enter`, `Esc`, `q`. */
export function keyLabel(k: KeySpec): string {
  const names: Record<string, string> = {
    return: 'Enter',
    escape: 'Esc',
    up: '↑',
    down: '↓',
    pageup: 'PgUp',
    pagedown: 'PgDn',
    home: 'Home',
    end: 'End',
    tab: 'Tab',
    ' ': 'Space',
    choice: 'letter',
  };
  const base = names[k.name] ?? k.name;
  return k.ctrl ? `Ctrl+${base.toUpperCase()}` : base;
}

/** All keys of a binding, for the help: `Ctrl+Q / Ctrl+C`. */
export function bindingKeys(b: KeyBinding): string {
  return b.keys.map(keyLabel).join(' / ');
}

const NAMED: Record<string, (k: Key) => boolean> = {
  return: (k) => k.return,
  escape: (k) => k.escape,
  up: (k) => k.upArrow,
  down: (k) => k.downArrow,
  pageup: (k) => k.pageUp,
  pagedown: (k) => k.pageDown,
  home: (k) => k.home,
  end: (k) => k.end,
  tab: (k) => k.tab,
};

/** Whether an Ink key event is this key. `choice` and letters never match a modified key. */
export function matches(spec: KeySpec, input: string, key: Key): boolean {
  const named = NAMED[spec.name];
  if (named) return named(key) && !key.ctrl && !(key.meta && !key.escape);
  if (spec.ctrl) return key.ctrl && input === spec.name;
  if (key.ctrl || key.meta) return false;
  return input === spec.name;
}

/** The binding a key fires in a context, if any (`choice` bindings are matched by the caller). */
export function findBinding(ctx: KeyContext, input: string, key: Key): KeyBinding | undefined {
  const contexts: KeyContext[] = ctx === 'choice' ? ['choice', 'question'] : [ctx];
  return KEY_TABLE.find(
    (b) =>
      b.when.some((w) => contexts.includes(w)) &&
      b.keys.some((k) => k.name !== 'choice' && matches(k, input, key)),
  );
}

/** The bindings to hint in a context's footer, in table order. */
export function footerBindings(ctx: KeyContext): KeyBinding[] {
  return KEY_TABLE.filter((b) => b.footer?.includes(ctx));
}

/** One footer hint: the binding's first key and its label for the context, e.g. `Ctrl+B back`. */
export function footerHint(b: KeyBinding, ctx: KeyContext, readOnly = false): string {
  const label = (readOnly ? b.labelReadOnly : undefined) ?? b.labelIn?.[ctx] ?? b.label;
  return `${keyLabel(b.keys[0]!)} ${label}`;
}

/** Columns between two footer hints. */
export const FOOTER_GAP = 2;

/**
 * The footer's hints for a context, as many as fit on one line of `width` columns: kept by rank
 * (the help key first, always), shown in that order too. What is left out is in the help overlay.
 * `omit` drops hints that would mislead on this screen (Enter "open" with no case to open).
 * @example footerLine('question', 80) // ['Ctrl+K all keys', 'Enter accept', 'Ctrl+B back', ...]
 */
export function footerLine(
  ctx: KeyContext,
  width: number,
  omit: readonly Command[] = [],
  readOnly = false,
): string[] {
  const all = footerBindings(ctx).filter((b) => !omit.includes(b.command));
  const byRank = [...all].sort((x, y) => (x.rank ?? 9) - (y.rank ?? 9));
  const kept = new Set<KeyBinding>();
  let used = 0;
  for (const b of byRank) {
    const w = [...footerHint(b, ctx, readOnly)].length + (kept.size ? FOOTER_GAP : 0);
    if (kept.size && used + w > width) continue;
    kept.add(b);
    used += w;
  }
  return byRank.filter((b) => kept.has(b)).map((b) => footerHint(b, ctx, readOnly));
}

/** The keys of a command as written for people, e.g. `keysFor('explain')` is `Ctrl+E`. */
export function keysFor(command: Command): string {
  const b = KEY_TABLE.find((x) => x.command === command);
  return b ? bindingKeys(b) : '';
}
