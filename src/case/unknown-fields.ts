import type { CaseV1 } from './v1/schema.js';

/**
 * Fields a case holds that version 1 does not define. They are kept on save; `solve` warns with
 * their paths so that a misspelt field (`middleOrdinat`) shows instead of silently not counting.
 */
/** The fields version 1 defines, by object kind: one list for solve's warnings and the interview. */
export const KNOWN = {
  top: [
    'format',
    'version',
    'id',
    'created',
    'updated',
    'units',
    'details',
    'postedLimit',
    'sampling',
    'vehicle',
    'analyses',
    'interview',
    'revisions',
    'revisionsDropped',
  ],
  details: ['reference', 'occurred', 'location', 'investigator', 'notes'],
  vehicle: ['label', 'frontAxleShare', 'trackWidth', 'brakes'],
  brakes: {
    all: ['mode'],
    estimate: ['mode', 'efficiency', 'basis'],
    wheels: ['mode', 'frontLeft', 'frontRight', 'rearLeft', 'rearRight'],
  },
  drag: {
    entered: ['source', 'value', 'low', 'high', 'note', 'decimals'],
    table: ['source', 'surface', 'value', 'low', 'high', 'band', 'note', 'decimals'],
    'test-skids': ['source', 'tests', 'factors', 'gradeTakenOut', 'testGrade', 'note'],
    sled: ['source', 'weight', 'pulls', 'note'],
    decelerometer: ['source', 'readings', 'note'],
  },
  test: ['speed', 'distance'],
  skid: [
    'id',
    'kind',
    'label',
    'appearance',
    'marks',
    'distanceRule',
    'segments',
    'end',
    'timeDistance',
  ],
  yaw: [
    'id',
    'kind',
    'label',
    'chord',
    'middleOrdinate',
    'offsets',
    'points',
    'pointsLeftOut',
    'drag',
    'superelevation',
    'pathAdjustment',
  ],
  airborne: ['id', 'kind', 'label', 'distance', 'drop', 'takeoffGrade'],
  segment: ['label', 'length', 'drag', 'grade'],
  end: { stop: ['mode'], speed: ['mode', 'speed', 'basis'], analysis: ['mode', 'analysis'] },
  quantity: ['value', 'low', 'high', 'note', 'decimals'],
  sampling: ['shape', 'samples', 'seed'],
  timeDistance: ['reactionTime', 'conflictAt'],
  offsets: ['chord', 'stations'],
  station: ['at', 'offset'],
  revision: ['at', 'by', 'changes', 'note', 'changesDropped', 'sha256'],
  change: ['field', 'from', 'to'],
} as const;

type Obj = Record<string, unknown>;

function extra(o: unknown, known: readonly string[], path: string, out: string[]) {
  if (typeof o !== 'object' || o === null) return;
  for (const k of Object.keys(o)) if (!known.includes(k)) out.push(path ? `${path}.${k}` : k);
}
function qty(o: unknown, path: string, out: string[]) {
  if (typeof o === 'object' && o !== null) extra(o, KNOWN.quantity, path, out);
}
function drag(d: Obj, path: string, out: string[]) {
  const src = d.source as keyof typeof KNOWN.drag;
  extra(d, KNOWN.drag[src], path, out);
  if (Array.isArray(d.tests))
    d.tests.forEach((t: Obj, i: number) => {
      extra(t, KNOWN.test, `${path}.tests[${i}]`, out);
      qty(t.speed, `${path}.tests[${i}].speed`, out);
      qty(t.distance, `${path}.tests[${i}].distance`, out);
    });
  if (d.testGrade !== undefined) qty(d.testGrade, `${path}.testGrade`, out);
  if (d.weight !== undefined) qty(d.weight, `${path}.weight`, out);
  for (const list of ['pulls', 'readings'] as const)
    if (Array.isArray(d[list]))
      (d[list] as unknown[]).forEach((p, i) => qty(p, `${path}.${list}[${i}]`, out));
}

/** Paths of every field the v1 contract does not name, in file order. */
export function unknownFields(c: CaseV1): string[] {
  const out: string[] = [];
  const o = c as unknown as Obj;
  extra(o, KNOWN.top, '', out);
  if (c.details) extra(c.details, KNOWN.details, 'details', out);
  qty(c.postedLimit, 'postedLimit', out);
  if (c.sampling) extra(c.sampling, KNOWN.sampling, 'sampling', out);
  extra(c.vehicle, KNOWN.vehicle, 'vehicle', out);
  qty(c.vehicle.frontAxleShare, 'vehicle.frontAxleShare', out);
  qty(c.vehicle.trackWidth, 'vehicle.trackWidth', out);
  const b = c.vehicle.brakes as Obj | undefined;
  if (b) {
    extra(b, KNOWN.brakes[b.mode as keyof typeof KNOWN.brakes], 'vehicle.brakes', out);
    for (const k of ['efficiency', 'frontLeft', 'frontRight', 'rearLeft', 'rearRight'])
      qty(b[k], `vehicle.brakes.${k}`, out);
  }
  c.analyses.forEach((a, i) => {
    const p = `analyses[${i}]`;
    if (a.kind === 'skid') {
      extra(a, KNOWN.skid, p, out);
      a.marks?.forEach((m, j) => qty(m, `${p}.marks[${j}]`, out));
      a.segments.forEach((s, j) => {
        const sp = `${p}.segments[${j}]`;
        extra(s, KNOWN.segment, sp, out);
        qty(s.length, `${sp}.length`, out);
        qty(s.grade, `${sp}.grade`, out);
        drag(s.drag as Obj, `${sp}.drag`, out);
      });
      if (a.end) {
        extra(a.end, KNOWN.end[a.end.mode], `${p}.end`, out);
        if (a.end.mode === 'speed') qty(a.end.speed, `${p}.end.speed`, out);
      }
      if (a.timeDistance) extra(a.timeDistance, KNOWN.timeDistance, `${p}.timeDistance`, out);
    } else if (a.kind === 'airborne') {
      extra(a, KNOWN.airborne, p, out);
      for (const k of ['distance', 'drop', 'takeoffGrade'] as const) qty(a[k], `${p}.${k}`, out);
    } else {
      extra(a, KNOWN.yaw, p, out);
      qty(a.chord, `${p}.chord`, out);
      qty(a.middleOrdinate, `${p}.middleOrdinate`, out);
      qty(a.superelevation, `${p}.superelevation`, out);
      if (a.offsets) {
        extra(a.offsets, KNOWN.offsets, `${p}.offsets`, out);
        qty(a.offsets.chord, `${p}.offsets.chord`, out);
        a.offsets.stations.forEach((st, j) =>
          extra(st, KNOWN.station, `${p}.offsets.stations[${j}]`, out),
        );
      }
      drag(a.drag as Obj, `${p}.drag`, out);
    }
  });
  c.revisions?.forEach((r, i) => {
    extra(r, KNOWN.revision, `revisions[${i}]`, out);
    r.changes.forEach((ch, j) => extra(ch, KNOWN.change, `revisions[${i}].changes[${j}]`, out));
  });
  return out;
}
