import type { Case } from '../case/load.js';
import type { AnalysisSolution, Units } from '../engine/types.js';
import type { AnalysisExtras } from '../extras/analysis-extras.js';
import { sensitivitySvg } from '../pictures/pictures-svg.js';
import { sensitivityBars } from '../pictures/sensitivity-bars.js';
import type { SensitivityRow } from '../extras/sensitivity.js';
import { formatNumber } from '../engine/number-text.js';
import { para, section, table, type Block, type Section } from './doc.js';
import { speedText } from './figures-text.js';
import { figureName, picturesSection } from './pictures-section.js';
import { TEXT_WIDTH } from './render-text.js';
import { timeDistanceSection } from './time-distance-section.js';
import { offsetsSection } from './offsets-section.js';

/** A change of speed with its sign; a change that rounds to zero shows as 0.0, unsigned. */
function signedSpeed(n: number): string {
  const t = formatNumber(n, 'speed');
  return n > 0 && /[1-9]/.test(t) ? `+${t}` : t;
}

/**
 * An input's own number without float noise: 4 significant digits (one decimal from 100 up), so
 * an entered 17.95 stays 17.95 and a mean of test skids reads 0.6924.
 */
const plain = (n: number) => (Math.abs(n) >= 100 ? n.toFixed(1) : String(Number(n.toPrecision(4))));

function inputRange(r: SensitivityRow): string {
  const u = r.unit === '%' ? '%' : r.unit ? ` ${r.unit}` : '';
  return `${plain(r.inputValue)}${u} (${plain(r.inputLow)} to ${plain(r.inputHigh)})`;
}

function sensitivityTable(rows: SensitivityRow[], u: Units): Block {
  const at = (s: number | undefined) =>
    s === undefined ? 'not computable' : formatNumber(s, 'speed');
  return table(
    'Speed at each end of one input, all others at their value',
    [
      'Input',
      'Range of the input',
      `At its low end (${u.speed})`,
      `At its high end (${u.speed})`,
      'Change',
    ],
    rows.map((r) => [
      r.label,
      inputRange(r),
      at(r.atLow),
      at(r.atHigh),
      `${signedSpeed(r.down)} / ${signedSpeed(r.up)}`,
    ]),
    ['left', 'right', 'right', 'right', 'right'],
  );
}

function sensitivitySection(
  c: Case,
  s: AnalysisSolution,
  rows: SensitivityRow[],
  id: string,
  u: Units,
): Section | undefined {
  if (rows.length === 0) return undefined;
  return section(`${id}-sensitivity`, 'Which measurement moves the speed most', [
    para(
      `Each input in turn set to the low and then the high end of its range, every other input at its value; largest swing first. The base figure is ${speedText(rows[0]!.base, u.speed)}. Re-measuring the input at the top narrows the range most.`,
    ),
    sensitivityTable(rows, u),
    {
      kind: 'figure',
      name: figureName(c, s.id, 'sensitivity'),
      caption: `Sensitivity of ${s.id}: change in speed with each input at the ends of its range`,
      svg: sensitivitySvg(rows, { speedUnit: u.speed }),
      textLines: sensitivityBars(rows, TEXT_WIDTH - 4, { speedUnit: u.speed }),
    },
  ]);
}

function samplingSection(
  s: AnalysisSolution,
  x: AnalysisExtras,
  id: string,
  u: Units,
): Section | undefined {
  const title = 'Spread of the speed by sampling';
  const r = x.sampling;
  if (!r) return undefined;
  if (!r.ok)
    return section(`${id}-sampling`, title, [
      para(`Not sampled: ${r.reason}${r.path ? ` (field ${r.path})` : ''}.`),
    ]);
  const v = r.value;
  const sp = (n: number) => formatNumber(n, 'speed');
  const skipped = v.skipped ? ` ${v.skipped} draws gave no speed and are left out.` : '';
  return section(`${id}-sampling`, title, [
    para(
      `${v.samples} draws, ${v.method}; seed ${v.seed}, so the same file gives the same figures.${skipped}`,
    ),
    table(
      `Percentiles of the start speed (${u.speed}) beside the bounds`,
      ['Low bound', '5th', '50th', '95th', 'High bound'],
      [[sp(s.speed.low), sp(v.p5), sp(v.p50), sp(v.p95), sp(s.speed.high)]],
      ['right', 'right', 'right', 'right', 'right'],
    ),
    para(
      'The percentiles depend on the assumed shape of each input’s spread; the bounds do not. The minimum stated above rests on the bounds.',
      'note',
    ),
  ]);
}

/**
 * The further sections of one analysis, each where it applies, from the result document: the
 * picture (speed along a slide, or the yaw arc), the circle fitted to offsets where a yaw
 * analysis has them, sensitivity (any input with a range), sampling (when the case or the report
 * asks for it), time and distance at the posted limit (a slide in a case with a limit).
 */
export function extrasSections(
  c: Case,
  s: AnalysisSolution,
  x: AnalysisExtras,
  i: number,
  units: Units,
): Section[] {
  const id = `analysis-${i + 1}`;
  return [
    picturesSection(c, s, id, units),
    offsetsSection(s, id, units),
    sensitivitySection(c, s, x.sensitivity, id, units),
    samplingSection(s, x, id, units),
    timeDistanceSection(s, x, id, units),
  ].filter((y): y is Section => y !== undefined);
}
