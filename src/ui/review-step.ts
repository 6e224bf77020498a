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

/** Appends `text` wrapped to `width`, its first line after `indent`, the rest two further in. */
export function pushWrapped(
  out: ShownLine[],
  text: string,
  width: number,
  indent: string,
  style: Omit<ShownLine, 'text'> = {},
): void {
  const lines = wrap(text, Math.max(10, width - indent.length - 2));
  lines.forEach((l, i) => out.push({ text: (i === 0 ? indent : indent + '  ') + l, ...style }));
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
