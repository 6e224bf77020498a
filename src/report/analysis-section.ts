import type { AnalysisV1 } from '../case/v1/schema.js';
import type {
  AnalysisKind,
  AnalysisOutcome,
  AnalysisSolution,
  Phase,
  Step,
  Units,
} from '../engine/types.js';
import { KIND_NAMES } from '../format/kind-names.js';
import { phasesLines } from '../format/phases-text.js';
import { formatRange } from '../format/numbers.js';
import { formatNumber } from '../engine/number-text.js';
import {
  fileSafe,
  para,
  list,
  section,
  table,
  type Block,
  type Figure,
  type Section,
  type StepBlock,
} from './doc.js';
import { phasesSvg } from '../pictures/pictures-svg.js';
import { dragSourceLines } from './drag-source.js';
import { atLeastText } from './figures-text.js';
import { stepResultText } from '../format/step-text.js';

/** The analysis's heading: number, id, label and which chain it uses. */
export function analysisTitle(i: number, a: { id: string; kind: AnalysisKind; label?: string }) {
  return `Analysis ${i + 1}: ${a.id}${a.label ? `, ${a.label}` : ''} — ${KIND_NAMES[a.kind].title}`;
}

/** Steps, one block each, numbered in the order the chain runs. */
export function stepBlocks(steps: readonly Step[]): StepBlock[] {
  return steps.map((st, k) => ({
    kind: 'step',
    number: k + 1,
    name: st.name,
    formula: st.formula,
    substituted: st.substituted,
    result: stepResultText(st),
    why: st.why,
  }));
}

/** Where each drag factor of the analysis came from. */
function dragLines(a: AnalysisV1): string[] {
  if (a.kind === 'yaw') return dragSourceLines(a.drag, 'Lateral drag factor');
  if (a.kind === 'airborne') return [];
  return a.segments.flatMap((s, j) =>
    dragSourceLines(
      s.drag,
      a.segments.length > 1 ? `Segment ${j + 1}${s.label ? ` (${s.label})` : ''}` : 'Drag factor',
    ),
  );
}

/** Speed at the start, at each segment boundary and at the end of a slide, from the engine. */
function boundaryTable(s: AnalysisSolution, units: Units): Block[] {
  if (!s.boundaries || s.boundaries.length === 0) return [];
  return [
    table(
      'Speed along the slide',
      ['Point', `From start of marks (${units.length})`, `Speed (${units.speed})`, 'Range'],
      s.boundaries.map((b) => [
        b.label,
        formatNumber(b.at, 'length'),
        formatNumber(b.speed.value, 'speed'),
        `${formatNumber(b.speed.low, 'speed')} to ${formatNumber(b.speed.high, 'speed')}`,
      ]),
      ['left', 'right', 'right', 'right'],
    ),
  ];
}

/**
 * The chain drawn: a box a phase, in order of travel, with the speed where each begins. The text
 * forms have the list above it; the picture is the SVG (Markdown and text beside them, HTML and
 * PDF inside).
 */
function phasesFigure(id: string, phases: readonly Phase[], units: Units): Figure {
  return {
    kind: 'figure',
    name: fileSafe(`${id}-phases`),
    caption: `Phases in order of travel, from ${id}: each box a phase, with the speed where it begins`,
    svg: phasesSvg(
      phases.map((p) => ({
        name: `${p.id}, ${KIND_NAMES[p.kind].short}`,
        speed: formatRange(p.speed, 'speed', units.speed),
      })),
    ),
    textLines: [],
  };
}

/**
 * One analysis: the "at least" statement, the chain step by step, the speed along the slide, the
 * drag factor's sources, any further sections (`more`: pictures, sensitivity, ...), assumptions
 * and warnings. A failed
 * analysis says why it could not be computed, naming the field when the engine does.
 */
export function analysisSection(
  i: number,
  a: AnalysisV1,
  o: AnalysisOutcome,
  units: Units,
  more: Section[] = [],
): Section {
  const id = `analysis-${i + 1}`;
  if (!o.ok)
    return section(id, analysisTitle(i, a), [
      para(`Not computed: ${o.reason}${o.path ? ` (field ${o.path})` : ''}.`, 'strong'),
      ...(a.kind === 'airborne' ? [] : [list(dragLines(a))]),
    ]);
  const s = o.solution;
  const blocks: Block[] = [
    para(atLeastText(s.minimum, s.speed, units.speed), 'strong'),
    para(
      'The range comes from setting every input at the matching end of its own range; the "at least" figure is the low end rounded down to a whole unit.',
      'note',
    ),
  ];
  if (s.distance)
    blocks.push(
      para(
        `${s.kind === 'airborne' ? 'Horizontal distance, take-off to landing' : 'Slide distance used'}: ${formatRange(s.distance, 'length', units.length)}.`,
      ),
    );
  if (s.radius) blocks.push(para(`Radius used: ${formatRange(s.radius, 'length', units.length)}.`));
  const drag = dragLines(a);
  return section(id, analysisTitle(i, a), blocks, [
    ...(s.phases
      ? [
          section(`${id}-phases`, 'Phases in order of travel', [
            para(
              'Each phase begins at the speed shown; the speed where a phase begins is the speed at the end of the one before it.',
              'note',
            ),
            list(phasesLines(s.phases, units)),
            phasesFigure(s.id, s.phases, units),
          ]),
        ]
      : []),
    section(`${id}-chain`, 'The chain, step by step', stepBlocks(s.steps)),
    ...(s.boundaries?.length
      ? [section(`${id}-along`, 'Speed along the slide', boundaryTable(s, units))]
      : []),
    ...(drag.length
      ? [section(`${id}-drag`, 'Where the drag factor comes from', [list(drag)])]
      : []),
    ...more,
    section(`${id}-assumptions`, 'Assumptions', [
      s.assumptions.length ? list(s.assumptions) : para('None recorded beyond the method itself.'),
    ]),
    section(`${id}-warnings`, 'Warnings', [s.warnings.length ? list(s.warnings) : para('None.')]),
  ]);
}
