import type { Quantity } from '../case/quantity.js';
import type { Case } from '../case/load.js';
import type { AirborneV1, DragV1, SkidV1, VehicleV1, YawV1 } from '../case/v1/schema.js';
import { typedText } from '../engine/number-text.js';
import { table, type Table } from './doc.js';

/** One row of the measurements table: a number (or a choice) exactly as the case file holds it. */
type Row = [item: string, entered: string, range: string, unit: string, note: string];

const NO_RANGE = 'none';

/** A quantity as entered: the plain number as written, its low/high if any, and its note. */
function q(item: string, v: Quantity, unit: string): Row {
  if (typeof v === 'number') return [item, String(v), NO_RANGE, unit, ''];
  const t = (n: number) => typedText(n, v.decimals);
  const range =
    v.low === undefined && v.high === undefined
      ? NO_RANGE
      : `${t(v.low ?? v.value)} to ${t(v.high ?? v.value)}`;
  return [item, t(v.value), range, unit, v.note ?? ''];
}

const choice = (item: string, text: string, note = ''): Row => [item, text, '', '', note];

/** Adds the drag factor's own note to the first of its rows. */
function withNote(rows: Row[], note: string): Row[] {
  if (!note || rows.length === 0) return rows;
  const [first, ...rest] = rows as [Row, ...Row[]];
  return [
    [first[0], first[1], first[2], first[3], [first[4], note].filter(Boolean).join('; ')],
    ...rest,
  ];
}

function dragRows(prefix: string, d: DragV1, speed: string, length: string): Row[] {
  switch (d.source) {
    case 'entered':
    case 'table': {
      const t = (n: number) => typedText(n, d.decimals);
      const range =
        d.low === undefined && d.high === undefined
          ? NO_RANGE
          : `${t(d.low ?? d.value)} to ${t(d.high ?? d.value)}`;
      const where =
        d.source === 'table'
          ? [
              `${d.surface ? `table surface "${d.surface}"` : 'table, surface not named'}${d.band ? `, band ${d.band}` : ''}`,
            ]
          : [];
      const note = [...where, d.note ?? ''].filter(Boolean).join('; ');
      return [[`${prefix}drag factor (${d.source})`, t(d.value), range, '', note]];
    }
    case 'test-skids':
      if (d.factors)
        return withNote(
          d.factors.map((f, i) => q(`${prefix}test skid ${i + 1} drag factor`, f, '')),
          d.note ?? '',
        );
      return withNote(
        (d.tests ?? []).flatMap((t, i) => [
          q(`${prefix}test skid ${i + 1} speed`, t.speed, speed),
          q(`${prefix}test skid ${i + 1} distance`, t.distance, length),
        ]),
        d.note ?? '',
      );
    case 'sled':
      return withNote(
        [
          q(`${prefix}sled weight`, d.weight, ''),
          ...d.pulls.map((p, i) => q(`${prefix}sled pull ${i + 1}`, p, '')),
        ],
        d.note ?? '',
      );
    case 'decelerometer':
      return withNote(
        d.readings.map((r, i) => q(`${prefix}decelerometer reading ${i + 1}`, r, 'g')),
        d.note ?? '',
      );
  }
}

function vehicleRows(v: VehicleV1, length: string): Row[] {
  const rows: Row[] = [];
  if (v.frontAxleShare !== undefined) rows.push(q('Front axle share', v.frontAxleShare, ''));
  if (v.trackWidth !== undefined) rows.push(q('Track width', v.trackWidth, length));
  const b = v.brakes;
  if (b?.mode === 'all') rows.push(choice('Brakes', 'all working'));
  if (b?.mode === 'estimate') {
    rows.push(q('Braking efficiency', b.efficiency, ''));
    if (b.basis) rows.push(choice('Efficiency basis', b.basis));
  }
  if (b?.mode === 'wheels') {
    const names = {
      frontLeft: 'front left',
      frontRight: 'front right',
      rearLeft: 'rear left',
      rearRight: 'rear right',
    } as const;
    for (const k of Object.keys(names) as (keyof typeof names)[])
      rows.push(q(`Brake, ${names[k]} (0-1)`, b[k], ''));
  }
  return rows;
}

function yawRows(a: YawV1, speed: string, length: string): Row[] {
  return [
    // A yaw measured by offsets along the chord has its own section (offsets-section.ts).
    ...(a.chord !== undefined ? [q('Chord', a.chord, length)] : []),
    ...(a.middleOrdinate !== undefined ? [q('Middle ordinate', a.middleOrdinate, length)] : []),
    ...(a.points ?? []).map(([x, y], k): Row => [
      `Point ${k + 1} (x, y)`,
      `${x}, ${y}`,
      NO_RANGE,
      length,
      '',
    ]),
    // Surveyed but left out of the fit: listed after the fitted ones, numbered on from them.
    ...(a.pointsLeftOut ?? []).map(([x, y], k): Row => [
      `Point ${(a.points?.length ?? 0) + k + 1} (x, y), left out of the fit`,
      `${x}, ${y}`,
      NO_RANGE,
      length,
      '',
    ]),
    ...(a.superelevation !== undefined ? [q('Superelevation', a.superelevation, '%')] : []),
    ...dragRows('', a.drag, speed, length),
    choice('Path adjustment', a.pathAdjustment === 'half-track' ? 'half-track' : 'none'),
  ];
}

function skidRows(a: SkidV1, speed: string, length: string): Row[] {
  const rows: Row[] = (a.marks ?? []).map((m, i) => q(`Mark ${i + 1}`, m, length));
  if (a.marks && a.marks.length > 1)
    rows.push(choice('Distance rule', a.distanceRule ?? 'average'));
  a.segments.forEach((s, j) => {
    const sp = a.segments.length > 1 ? `Segment ${j + 1} ` : '';
    if (s.length !== undefined) rows.push(q(`${sp}length`.trim(), s.length, length));
    rows.push(...dragRows(sp, s.drag, speed, length));
    if (s.grade !== undefined) rows.push(q(`${sp}grade (+ up)`, s.grade, '%'));
  });
  if (a.end?.mode === 'analysis')
    rows.push(choice('End of marks', `ran on into analysis "${a.end.analysis}"`));
  else if (a.end?.mode === 'speed') {
    rows.push(q('Speed at end of marks', a.end.speed, speed));
    if (a.end.basis) rows.push(choice('End speed basis', a.end.basis));
  } else rows.push(choice('End of marks', 'came to rest'));
  return rows;
}

function airborneRows(a: AirborneV1, length: string): Row[] {
  return [
    q('Distance, take-off to first landing', a.distance, length),
    q('Drop, take-off to landing (+ landed lower)', a.drop, length),
    a.takeoffGrade !== undefined
      ? q('Take-off grade (+ up)', a.takeoffGrade, '%')
      : choice('Take-off grade', 'not given: level'),
  ];
}

const capital = (r: Row): Row => [
  r[0].charAt(0).toUpperCase() + r[0].slice(1),
  r[1],
  r[2],
  r[3],
  r[4],
];

const COLUMNS = ['Item', 'As entered', 'Range', 'Unit', 'Note'];
const ALIGN: ('left' | 'right')[] = ['left', 'right', 'right', 'left', 'left'];

/**
 * The measurements tables: every number the case holds, as entered (not rounded, not
 * converted), with its unit, its range when one was given, and its note. One table for the case
 * and vehicle, then one per analysis (segments are numbered in order of travel, with their label).
 */
export function measurementTables(c: Case, units: { length: string; speed: string }): Table[] {
  const top: Row[] = [];
  if (c.postedLimit !== undefined) top.push(q('Posted limit', c.postedLimit, units.speed));
  top.push(...vehicleRows(c.vehicle, units.length));
  const tables = top.length ? [table('Case and vehicle', COLUMNS, top, ALIGN)] : [];
  c.analyses.forEach((a, i) => {
    const rows =
      a.kind === 'yaw'
        ? yawRows(a, units.speed, units.length)
        : a.kind === 'airborne'
          ? airborneRows(a, units.length)
          : skidRows(a, units.speed, units.length);
    const segs =
      a.kind === 'skid' && a.segments.length > 1
        ? `; segments: ${a.segments.map((s, j) => `${j + 1} ${s.label ?? '(no label)'}`).join(', ')}`
        : '';
    tables.push(table(`Analysis ${i + 1}, ${a.id}${segs}`, COLUMNS, rows.map(capital), ALIGN));
  });
  return tables;
}
