import type { AnalysisSolution, Range, Units } from '../engine/types.js';
import type { AnalysisExtras } from '../extras/analysis-extras.js';
import type { LimitComparison } from '../extras/limit-comparison.js';
import { formatRange } from '../format/numbers.js';
import { limitFraming, verdictSentence } from '../format/verdict.js';
import { stepBlocks } from './analysis-section.js';
import { list, para, section, table, type Section } from './doc.js';

const asChosen = (t: number) => String(Number(t.toPrecision(4)));

const rangeText = (r: Range, kind: 'length' | 'seconds' | 'speed', unit: string) =>
  formatRange(r, kind, unit);

function figuresTable(t: LimitComparison, u: Units) {
  const L = (r: Range) => rangeText(r, 'length', u.length);
  const one = (n: number) => ({ value: n, low: n, high: n });
  return table(
    'Time and distance',
    ['Figure', 'Value (range)'],
    [
      ['This vehicle: distance during perception-reaction', L(t.reactionDistance)],
      ['This vehicle: duration of the slide', rangeText(t.slideDuration, 'seconds', 's')],
      ['At the limit: distance during perception-reaction', L(one(t.atLimit.reactionDistance))],
      [
        'At the limit: braking starts (from start of marks; minus = before)',
        L(t.atLimit.brakingStartsAt),
      ],
      ['At the limit: braking distance', L(t.atLimit.brakingDistance)],
      ['At the limit: stopping distance from perception', L(t.atLimit.stoppingDistance)],
      ['At the limit: comes to rest (from start of marks)', L(t.atLimit.restAt)],
    ],
    ['left', 'right'],
  );
}

/**
 * Time and distance at the posted limit for a slide: this vehicle's reaction distance and slide
 * duration, and what a vehicle at the limit perceiving at the same point would have needed to
 * stop; every figure from the result document's extras. Only where the extras hold it (a skid
 * analysis in a case with a limit or a conflict point).
 */
export function timeDistanceSection(
  s: AnalysisSolution,
  x: AnalysisExtras,
  id: string,
  u: Units,
): Section | undefined {
  const r = x.limit;
  if (!r) return undefined;
  const title = 'Time and distance at the posted limit';
  if (!r.ok)
    return section(`${id}-time`, title, [
      para(`Not computed: ${r.reason}${r.path ? ` (field ${r.path})` : ''}.`),
    ]);
  const t = r.value;
  return section(`${id}-time`, title, [
    // The time as chosen (1.25 s stays 1.25 s), not rounded like a computed time.
    ...limitFraming(t, s.speed, u).map((l) => para(l)),
    para(`Perception-reaction time ${asChosen(t.reactionTime)} s (${t.reactionSource}).`),
    para(verdictSentence(t.endOfMarks, u), 'strong'),
    ...(t.conflict ? [para(verdictSentence(t.conflict, u), 'strong')] : []),
    figuresTable(t, u),
    ...stepBlocks(t.steps),
    ...(t.assumptions.length ? [list(t.assumptions)] : []),
    para(
      'A comparison of distances at a chosen speed and reaction time. It does not say what the driver did or could have done, and it does not state fault.',
      'note',
    ),
  ]);
}
