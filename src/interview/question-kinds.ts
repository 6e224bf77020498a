/**
 * Builders for each kind of question, so that the question lists read as data. `validate` is
 * always `parse` without the value, so the two can never disagree.
 */
import type {
  Answers,
  AnswerContext,
  AnswerReader,
  Choice,
  Help,
  ParseResult,
  Question,
} from './types.js';
import { readQuantity, type QuantitySpec } from './read-quantity.js';
import { withTypedDecimals } from '../input/index.js';
import { readMarks, readValues } from './read-list.js';
import { caseUnitOf, parseCount, type QuantityKind } from '../input/index.js';
import type { UnitSystem } from '../engine/types.js';

/** What every question has; the builders add kind, parse and validate. */
export interface QuestionBase {
  id: string;
  section: string;
  title: string;
  prompt: string;
  help: Help;
  appliesWhen(answers: Answers): boolean;
  defaultText?(answers: Answers, read: AnswerReader): string | undefined;
  explainChoice?(answers: Answers, read: AnswerReader): string | undefined;
  example?: string;
  /** The example for a metric case, when the imperial one would mislead (45 m is no chord). */
  metricExample?: string;
  optional?: boolean;
  usesPreference?: 'reactionTime';
  lines?: boolean;
}

function finish(
  base: QuestionBase,
  kind: Question['kind'],
  parse: Question['parse'],
  extra: Partial<Question> = {},
): Question {
  return {
    ...base,
    ...extra,
    kind,
    parse,
    validate: (text, ctx) => {
      const r = parse(text, ctx);
      return r.ok ? undefined : r.message;
    },
  };
}

/** The words of a text, lower case: `"feet and mph"` → `['feet', 'and', 'mph']`. */
const wordsOf = (text: string): string[] =>
  text
    .toLowerCase()
    .split(/[^a-z0-9]+/)
    .filter(Boolean);

/** Words too common to tell one choice from another. */
const FILLER = new Set(['a', 'an', 'and', 'the', 'of', 'at', 'by', 'on', 'one', 'i', 'no', 'yes']);

/**
 * The choice a typed text names: its key, its value or its label (any case), else the one choice
 * whose label and value hold every typed word (a word may be the start of one: `feet`, `down`,
 * `locked`). Undefined when no choice, or more than one, fits.
 * @example matchChoice(units, 'feet') // the "feet and mph" choice
 */
export function matchChoice(choices: readonly Choice[], text: string): Choice | undefined {
  const fits = choicesFitting(choices, text);
  return fits.length === 1 ? fits[0] : undefined;
}

/** Every choice the typed text could name (one when it names a choice; several when unclear). */
function choicesFitting(choices: readonly Choice[], text: string): Choice[] {
  const t = text.trim().toLowerCase();
  if (!t) return [];
  const exact = choices.find(
    (c) => c.key.toLowerCase() === t || c.value.toLowerCase() === t || c.label.toLowerCase() === t,
  );
  if (exact) return [exact];
  const typed = wordsOf(t);
  // At least one word that says something, and of two letters or more (one letter is a key).
  if (!typed.some((w) => w.length > 1 && !FILLER.has(w))) return [];
  return choices.filter((c) => {
    const words = [...wordsOf(c.label), ...wordsOf(c.value)];
    return typed.every((w) => words.some((x) => x.startsWith(w)));
  });
}

/** "o (one surface), s (several ...)": the choices with their keys, for a refusal. */
export function choicesList(choices: readonly Choice[]): string {
  return choices.map((x) => `${x.key} (${x.label})`).join(', ');
}

/**
 * A choice among `choices`; the answer is a key, a value or a label (or words of it), stored as
 * the value. `other` reads a typed text that is no choice (the grade's signed percent) first.
 */
export function choiceQuestion(
  base: QuestionBase,
  choices: Choice[],
  kind: 'choice' | 'confirm' = 'choice',
  other?: (text: string, ctx: AnswerContext) => ParseResult | undefined,
): Question {
  const parse = (text: string, ctx: AnswerContext): ParseResult => {
    const fits = choicesFitting(choices, text);
    if (fits.length === 1) return { ok: true, value: fits[0]!.value };
    const read = other?.(text, ctx);
    if (read) return read;
    if (fits.length > 1)
      return {
        ok: false,
        message: `"${text.trim()}" fits more than one choice: ${choicesList(fits)}; type more of its words, or press its letter`,
      };
    return {
      ok: false,
      message: `"${text.trim()}" is not one of the choices: press ${choicesList(choices)}`,
    };
  };
  return finish(base, kind, parse, { choices });
}

/** The two answers of a confirm question. */
export const YES_NO: Choice[] = [
  { value: 'yes', key: 'y', label: 'yes' },
  { value: 'no', key: 'n', label: 'no' },
];

/** A yes/no question (`yes` or `no`). */
export function confirmQuestion(base: QuestionBase): Question {
  return choiceQuestion(base, YES_NO, 'confirm');
}

/** Free text, trimmed; required unless `optional`. */
export function textQuestion(base: QuestionBase): Question {
  const parse = (text: string): ParseResult => {
    const t = text.trim();
    if (t === '' && !base.optional) return { ok: false, message: 'an answer is needed here' };
    if (t.length > 2000) return { ok: false, message: 'keep this under 2000 characters' };
    return { ok: true, value: t };
  };
  return finish(base, 'text', parse);
}

/** An empty answer to an optional question: stored as an empty text, value undefined. */
const emptyOptional = (base: QuestionBase, text: string): ParseResult | undefined =>
  base.optional && text.trim() === '' ? { ok: true, value: undefined } : undefined;

/**
 * A number question. `check` adds rules that depend on other answers (e.g. the middle ordinate
 * must be less than half the chord).
 */
export function quantityQuestion(
  base: QuestionBase,
  spec: QuantitySpec,
  check?: (value: unknown, ctx: AnswerContext) => string | undefined,
  /** A note shown with an accepted answer (a flag, not a refusal). */
  flag?: (value: unknown, ctx: AnswerContext) => string | undefined,
): Question {
  const parse = (text: string, ctx: AnswerContext): ParseResult => {
    const empty = emptyOptional(base, text);
    if (empty) return empty;
    const r = readQuantity(text, spec, ctx.units);
    if (!r.ok) return r;
    const extra = check?.(r.value, ctx);
    if (extra) return { ok: false, message: extra };
    const notice = [r.notice, flag?.(r.value, ctx)].filter(Boolean).join(' ');
    // Kept as typed (`0.70`) for the record; a converted figure (with its notice) was not typed so.
    const value = r.notice ? r.value : withTypedDecimals(r.value, text);
    return notice ? { ok: true, value, notice } : { ok: true, value };
  };
  return finish(base, 'quantity', parse, { unitKind: spec.kind });
}

/** Mark lengths on one line; `count` (the number of marks answered) lets one length stand for all. */
export function marksQuestion(
  base: QuestionBase,
  count: (answers: Answers) => number | undefined,
): Question {
  return finish(base, 'list', (text, ctx) => readMarks(text, ctx.units, count(ctx.answers)), {
    unitKind: 'length',
  });
}

/** Several values of one kind on one line (sled pulls, decelerometer readings). */
export function listQuestion(base: QuestionBase, spec: QuantitySpec, item: string): Question {
  return finish(base, 'list', (text, ctx) => readValues(text, spec, ctx.units, item), {
    unitKind: spec.kind,
  });
}

/** A whole number from `min` to `max` (counts of marks, segments). */
export function countQuestion(
  base: QuestionBase,
  what: string,
  min: number,
  max: number,
): Question {
  const parse = (text: string): ParseResult =>
    emptyOptional(base, text) ?? parseCount(text, { field: `number of ${what}`, min, max });
  return finish(base, 'quantity', parse, { unitKind: 'count' });
}

/** Any other kind with its own parser (quick entry, test skids). */
export function customQuestion(
  base: QuestionBase,
  kind: Question['kind'],
  parse: Question['parse'],
): Question {
  return finish(base, kind, parse);
}

/** The unit a question's answer is read in, for the prompt's hint: `ft`, `km/h`, `%`, `decimal`. */
export function unitHintOf(kind: QuantityKind, units: UnitSystem): string | undefined {
  if (kind === 'factor') return 'decimal';
  if (kind === 'count') return undefined;
  return caseUnitOf(kind, units);
}
