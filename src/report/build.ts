import type { Case } from '../case/load.js';
import type { CaseSolution } from '../engine/types.js';
import { CAUTIONS } from '../format/cautions.js';
import { limitWord } from '../format/verdict.js';
import { analysisSection } from './analysis-section.js';
import {
  REPORT_FORMAT,
  REPORT_VERSION,
  list,
  para,
  provenanceLine,
  section,
  table,
  type Block,
  type ReportDoc,
  type Section,
} from './doc.js';
import type { CaseResult } from '../extras/analysis-extras.js';
import { extrasSections } from './extras-section.js';
import { speedText } from './figures-text.js';
import { formatNumber } from '../engine/number-text.js';
import { measurementTables } from './measurements.js';
import { revisionHeading, revisionLines, trailSummary } from '../format/revision-text.js';

/** What the report says about itself, and settings of its further sections. */
export interface ReportMeta {
  /** skidcase's version, printed in the report. */
  toolVersion: string;
  /** When the report was made, ISO 8601 (the caller's clock: the builder stays pure). */
  generatedAt: string;
  /** The case file the figures are recomputed from, as the user named it. */
  caseFile?: string;
  /** SHA-256 of that file's bytes, when the report is made from a file on disk. */
  caseSha256?: string;
}

function detailsSection(c: Case, meta: ReportMeta): Section {
  const d = c.details ?? {};
  const rows: string[][] = [
    ['Case id', c.id],
    ['Reference', d.reference ?? ''],
    ['Occurred', d.occurred ?? ''],
    ['Location', d.location ?? ''],
    ['Investigator', d.investigator ?? ''],
    ['Vehicle', c.vehicle.label ?? ''],
    ['Units', c.units === 'imperial' ? 'imperial (feet, mph)' : 'metric (metres, km/h)'],
    ['Case file', meta.caseFile ?? `${c.id}.json`],
    ['Case file SHA-256', meta.caseSha256 ?? ''],
    ['Case created', c.created ?? ''],
    ['Case last changed', c.updated ?? ''],
  ];
  const blocks: Block[] = [
    table(
      '',
      ['Field', 'Entry'],
      rows.filter((r) => r[1] !== ''),
    ),
  ];
  if (d.notes) blocks.push(para(`Notes: ${d.notes}`));
  return section('details', 'Case details', blocks);
}

function summarySection(c: Case, sol: CaseSolution): Section {
  const rows = sol.analyses.map((o, i) => {
    const label = `${i + 1}. ${o.ok ? o.solution.id : o.id}`;
    if (!o.ok) return [label, o.kind, 'not computed', '', ''];
    const s = o.solution;
    return [
      label,
      s.kind,
      `at least ${s.minimum} ${sol.units.speed}`,
      speedText(s.speed.value, sol.units.speed),
      `${formatNumber(s.speed.low, 'speed')} to ${speedText(s.speed.high, sol.units.speed)}`,
    ];
  });
  const blocks: Block[] = [
    table('', ['Analysis', 'Kind', 'Minimum', 'Computed', 'Range'], rows, [
      'left',
      'left',
      'left',
      'right',
      'right',
    ]),
  ];
  if (c.analyses.length === 0) blocks.push(para('The case holds no analysis yet.'));
  return section('results', 'Results', blocks);
}

/** The posted limit set against each analysis's lowest figure: numbers compared, nothing more. */
function limitSection(sol: CaseSolution): Section | undefined {
  const lim = sol.postedLimit;
  if (!lim) return undefined;
  const u = sol.units.speed;
  const lines = sol.analyses.map((o, i) => {
    if (!o.ok) return `${i + 1}. ${o.id}: not computed, so not compared.`;
    const low = o.solution.speed.low;
    return `${i + 1}. ${o.solution.id}: the low end of the range, ${speedText(low, u)}, is ${limitWord(low, lim.value)} the posted limit of ${lim.value} ${u}.`;
  });
  return section('posted-limit', 'Comparison with the posted limit', [
    para(
      `Posted limit: ${lim.value} ${u}. Exceeded at the minimum: ${lim.exceededAtMinimum ? 'yes' : 'no'} (${lim.exceededAtMinimum ? 'the low end of at least one analysis is above the limit' : 'no analysis has its low end above the limit'}).`,
      'strong',
    ),
    list(lines),
    para(
      'This is a comparison of numbers. It does not say why the vehicle travelled at that speed, and it does not state fault.',
      'note',
    ),
  ]);
}

/** The case's trail of revisions, oldest first: one heading and its changes per revision. */
function revisionsSection(c: Case): Section {
  const first = (c.revisionsDropped ?? 0) + 1;
  return section('revisions', 'Revisions', [
    para(trailSummary(c)),
    ...(c.revisions ?? []).flatMap((r, i): Block[] => [
      para(revisionHeading(r, first + i), 'strong'),
      list(revisionLines(r)),
    ]),
  ]);
}

/**
 * The case report as a document: details, results, measurements as entered, each analysis step by
 * step (with sensitivity, sampling, time and distance and pictures where they apply), the posted
 * limit comparison, file warnings, the cautions, where the figures come from and, last, the
 * case's trail of revisions. Pure: every
 * figure is read from the result document (the engine's steps and ranges, and the extras built
 * once by caseResult); nothing is computed here.
 * @example
 * const doc = buildReport(caseResult(c, solveCase(c)), { toolVersion: '0.1.0', generatedAt: new Date().toISOString(), caseFile: 'harbor.json' });
 * renderText(doc) // 'Speed from tire marks: ...', 80 columns
 */
export function buildReport(result: CaseResult, meta: ReportMeta): ReportDoc {
  const { case: c, solution } = result;
  const units = solution.units;
  const source =
    meta.caseSha256 !== undefined ? { sha256: meta.caseSha256, saved: c.updated ?? '' } : undefined;
  const sections: Section[] = [detailsSection(c, meta), summarySection(c, solution)];
  sections.push(section('measurements', 'Measurements as entered', measurementTables(c, units)));
  c.analyses.forEach((a, i) => {
    const r = result.analyses[i];
    if (!r) return;
    const o = r.outcome;
    const extra = o.ok && r.extras ? extrasSections(c, o.solution, r.extras, i, units) : [];
    sections.push(analysisSection(i, a, o, units, extra));
  });
  const lim = limitSection(solution);
  if (lim) sections.push(lim);
  if (solution.warnings.length)
    sections.push(
      section('file-warnings', 'Warnings about the case file', [list(solution.warnings)]),
    );
  sections.push(section('cautions', 'Cautions', [list([...CAUTIONS])]));
  sections.push(
    section('about', 'About this report', [
      para(
        `Every figure in this report is recomputed by skidcase ${meta.toolVersion} from the case file ${meta.caseFile ?? `${c.id}.json`}; none is typed in by hand. Recomputing the same file gives the same figures.`,
      ),
      para(`Generated ${meta.generatedAt}.`),
      ...(source
        ? [
            para(provenanceLine(c.id, source, meta.toolVersion)),
            para(
              `skidcase verify REPORT CASE-FILE says whether a case file is the one this report was made from.`,
              'note',
            ),
          ]
        : []),
    ]),
  );
  sections.push(revisionsSection(c));
  return {
    format: REPORT_FORMAT,
    version: REPORT_VERSION,
    title: `Speed from tire marks: ${c.details?.reference || c.id}`,
    caseId: c.id,
    toolVersion: meta.toolVersion,
    generatedAt: meta.generatedAt,
    ...(source ? { source } : {}),
    sections,
  };
}
