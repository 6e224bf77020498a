import type { Case } from '../case/load.js';
import type { AnalysisSolution, Units } from '../engine/types.js';
import { sampleSpeeds, type SampleShape } from '../extras/sampling.js';
import { sensitivityBars } from '../extras/sensitivity-bars.js';
import { sensitivity, type SensitivityRow } from '../extras/sensitivity.js';
import { formatNumber } from '../format/numbers.js';
import { fileSafe, para, section, table, type Block, type Section } from './doc.js';
import { speedText } from './figures-text.js';
import { TEXT_WIDTH } from './render-text.js';

/** Settings of the draws: the case's own `sampling` field wins over these. */
export interface ReportSampling {
  shape?: SampleShape;
  samples?: number;
  seed?: number;
}

/** Settings of the further sections. */
export interface ReportExtrasOptions {
  /** Perception-reaction time in seconds for the time-distance section; default 1.5. */
  reactionTime?: number;
  /** Sample the inputs even when the case does not ask for it. */
  sampling?: ReportSampling;
}

/** A change of speed with its sign; a change that rounds to zero shows as 0.0, unsigned. */
function signedSpeed(n: number): string {
  const t = formatNumber(n, 'speed');
  return n > 0 && /[1-9]/.test(t) ? `+${t}` : t;
}

/** An input's own number without float noise, close to how it was entered (6 significant digits). */
const plain = (n: number) => String(Number(n.toPrecision(6)));

function inputRange(r: SensitivityRow): string {
  const u = r.unit === '%' ? '%' : r.unit ? ` ${r.unit}` : '';
  return `${plain(r.inputValue)}${u} (${plain(r.inputLow)} to ${plain(r.inputHigh)})`;
}

function sensitivityTable(rows: SensitivityRow[], u: Units): Block {
  return table(
    'Speed at each end of one input, all others at their value',
    [
      'Input',
      'Range of the input',
      `At its low end (${u.speed})`,
      `At its high end (${u.speed})`,
      'Change',
    ],
    rows.map((r) => {
      const at = (s: number | undefined) =>
        s === undefined ? 'not computable' : formatNumber(s, 'speed');
      return [
        `${r.key}: ${r.label}`,
        inputRange(r),
        at(r.atLow),
        at(r.atHigh),
        `${signedSpeed(r.down)} / ${signedSpeed(r.up)}`,
      ];
    }),
    ['left', 'right', 'right', 'right', 'right'],
  );
}

function sensitivitySection(s: AnalysisSolution, id: string, u: Units): Section | undefined {
  const rows = sensitivity(s);
  if (rows.length === 0) return undefined;
  const bars = sensitivityBars(rows, TEXT_WIDTH - 4, { speedUnit: u.speed });
  return section(`${id}-sensitivity`, 'Which measurement moves the speed most', [
    para(
      `Each input in turn set to the low and then the high end of its range, every other input at its value; largest swing first. The base figure is ${speedText(rows[0]!.base, u.speed)}. Re-measuring the input at the top narrows the range most.`,
    ),
    sensitivityTable(rows, u),
    {
      kind: 'figure',
      name: fileSafe(`${s.id}-sensitivity`),
      caption: `Sensitivity of ${s.id}`,
      svg: '',
      textLines: bars,
    },
  ]);
}

/** The case's own `sampling` field (proposed for the schema), read defensively, else the options. */
function samplingSettings(c: Case, opts: ReportExtrasOptions): ReportSampling | undefined {
  const raw = (c as Record<string, unknown>).sampling;
  if (raw && typeof raw === 'object') {
    const o = raw as Record<string, unknown>;
    return {
      ...(o.shape === 'uniform' || o.shape === 'normal' ? { shape: o.shape } : {}),
      ...(typeof o.samples === 'number' ? { samples: o.samples } : {}),
      ...(typeof o.seed === 'number' ? { seed: o.seed } : {}),
    };
  }
  return opts.sampling;
}

function samplingSection(
  c: Case,
  s: AnalysisSolution,
  id: string,
  u: Units,
  opts: ReportExtrasOptions,
): Section | undefined {
  const set = samplingSettings(c, opts);
  if (!set) return undefined;
  const r = sampleSpeeds(s.model, {
    ...(set.samples !== undefined ? { n: set.samples } : {}),
    ...(set.seed !== undefined ? { seed: set.seed } : {}),
    ...(set.shape !== undefined ? { shape: set.shape } : {}),
  });
  if (!r.ok)
    return section(`${id}-sampling`, 'Spread of the speed by sampling', [
      para(`Not sampled: ${r.reason}.`),
    ]);
  const v = r.value;
  const sp = (n: number) => formatNumber(n, 'speed');
  return section(`${id}-sampling`, 'Spread of the speed by sampling', [
    para(
      `${v.samples} draws, ${v.method}; seed ${v.seed}, so the same file gives the same figures. ${v.skipped ? `${v.skipped} draws gave no speed and are left out.` : ''}`.trim(),
    ),
    table(
      `Percentiles of the start speed (${u.speed}) beside the bounds`,
      ['Low bound', '5th', '50th', '95th', 'High bound'],
      [[sp(s.speed.low), sp(v.p5), sp(v.p50), sp(v.p95), sp(s.speed.high)]],
      ['right', 'right', 'right', 'right', 'right'],
    ),
    para(
      'The percentiles depend on the assumed shape of each input\u2019s spread; the bounds do not. The minimum stated above rests on the bounds.',
      'note',
    ),
  ]);
}

/** The further sections of one analysis (sensitivity, sampling, time and distance, pictures). */
export function extrasSections(
  c: Case,
  s: AnalysisSolution,
  i: number,
  units: Units,
  opts: ReportExtrasOptions = {},
): Section[] {
  const id = `analysis-${i + 1}`;
  return [sensitivitySection(s, id, units), samplingSection(c, s, id, units, opts)].filter(
    (x): x is Section => x !== undefined,
  );
}
