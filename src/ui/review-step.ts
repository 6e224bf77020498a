/** Lines of one step of a chain and wrapped text, shared by the review's parts. */
import type { Step } from '../engine/types.js';
import { stepResultText } from '../format/step-text.js';
import { wrap } from '../report/wrap.js';
import type { TONE } from './theme.js';

/** One screen line and the meaning it is drawn with. */
export interface ShownLine {
  text: string;
  tone?: keyof typeof TONE;
  bold?: boolean;
}

/**
 * How far the lines after the first go in, so that they start under the first line's text: past
 * a list marker (`- `, `! `, `* `, `3. `) or a label column (`numbers  `), else not at all.
 */
export function hangOf(text: string): number {
  const m = /^(?:[-!*•] |\d+\. |[a-z]+ {2,})/.exec(text);
  return m ? m[0].length : 0;
}

/**
 * Appends `text` wrapped to `width`, its first line after `indent`, the rest under the first
 * line's text (past its marker or label, see hangOf).
 */
export function pushWrapped(
  out: ShownLine[],
  text: string,
  width: number,
  indent: string,
  style: Omit<ShownLine, 'text'> = {},
): void {
  const hang = hangOf(text);
  // The marker or label kept as written; the text after it wrapped in the column it starts.
  const body = wrap(text.slice(hang), Math.max(10, width - indent.length - hang));
  const pad = indent + ' '.repeat(hang);
  body.forEach((l, i) =>
    out.push({ text: (i === 0 ? indent + text.slice(0, hang) : pad) + l, ...style }),
  );
}

/** A step as numbered lines: its name, formula, numbers substituted, result and why. */
export function stepLines(
  out: ShownLine[],
  step: Step,
  n: number,
  width: number,
  indent: string,
): void {
  const inner = indent + '   ';
  pushWrapped(out, `${n}. ${step.name}`, width, indent, { bold: true });
  pushWrapped(out, `formula  ${step.formula}`, width, inner);
  pushWrapped(out, `numbers  ${step.substituted}`, width, inner);
  pushWrapped(out, `result   ${stepResultText(step)}`, width, inner, {
    tone: 'result',
  });
  if (step.why) pushWrapped(out, `why      ${step.why}`, width, inner, { tone: 'muted' });
}
