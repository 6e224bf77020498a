// An independent reader of docs/case-file.md's formulas, written from that text alone
// (it does not import src/engine). Ranges are found by brute force over every corner of the
// inputs' ranges, so the engine's "each input at its matching end" shortcut is checked, not copied.

/** A quantity in the contract's two forms. */
type Q = number | { value: number; low?: number; high?: number; note?: string };
type Ends = [value: number, low: number, high: number];
type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

const ends = (q: Q): Ends =>
  typeof q === 'number' ? [q, q, q] : [q.value, q.low ?? q.value, q.high ?? q.value];
const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;

/** Every way of taking each input at its low or high end (value ignored). */
function corners(inputs: Ends[]): number[][] {
  let out: number[][] = [[]];
  for (const [, lo, hi] of inputs)
    out = out.flatMap((c) => [...new Set([lo, hi])].map((x) => [...c, x]));
  return out;
}

/** value, low, high of fn over ranged inputs; undefined when fn is undefined at any corner. */
function overCorners(inputs: Ends[], fn: (xs: number[]) => number | undefined) {
  const value = fn(inputs.map((e) => e[0]));
  const all = corners(inputs).map(fn);
  if (value === undefined || all.some((x) => x === undefined)) return undefined;
  const xs = all as number[];
  return { value, low: Math.min(...xs), high: Math.max(...xs) };
}

/**
 * Drag factor: entered/table as given; tests, sled and decelerometer as mean, min, max. Test skids
 * with a `testGrade` G_t: value = mean − G_t.value/100, low = min − G_t.high/100,
 * high = max − G_t.low/100.
 */
export function oracleDrag(d: Json, metric: boolean): Ends {
  if (d.source === 'entered' || d.source === 'table')
    return [d.value, d.low ?? d.value, d.high ?? d.value];
  const C = metric ? 254 : 30;
  const fs: number[] =
    d.source === 'test-skids'
      ? d.tests.map((t: Json) => ends(t.speed)[0] ** 2 / (C * ends(t.distance)[0]))
      : d.source === 'sled'
        ? d.pulls.map((p: Q) => ends(p)[0] / ends(d.weight)[0])
        : d.readings.map((r: Q) => ends(r)[0]);
  const [gv, gl, gh] = d.source === 'test-skids' ? ends(d.testGrade ?? 0) : [0, 0, 0];
  return [mean(fs) - gv / 100, Math.min(...fs) - gh / 100, Math.max(...fs) - gl / 100];
}

/** Braking efficiency n as a list of ranged inputs and the formula over them. */
function oracleBrakes(v: Json): { inputs: Ends[]; n: (xs: number[]) => number } {
  const b = v.brakes;
  if (b.mode === 'all') return { inputs: [], n: () => 1 };
  if (b.mode === 'estimate') return { inputs: [ends(b.efficiency)], n: ([e]) => e! };
  const w = [v.frontAxleShare, b.frontLeft, b.frontRight, b.rearLeft, b.rearRight].map(ends);
  return {
    inputs: w,
    n: ([s, fl, fr, rl, rr]) => (s! / 2) * (fl! + fr!) + ((1 - s!) / 2) * (rl! + rr!),
  };
}

/**
 * Slide distance from marks: average (mean of each end), longest (largest of each end), shortest
 * (smallest of each end), spread (mean of the values, smallest low, largest high).
 */
function markDistance(marks: Q[], rule: string): Ends {
  const es = marks.map(ends);
  const max = (xs: number[]) => Math.max(...xs);
  const min = (xs: number[]) => Math.min(...xs);
  const [pv, pl, ph] =
    rule === 'longest'
      ? [max, max, max]
      : rule === 'shortest'
        ? [min, min, min]
        : rule === 'spread'
          ? [mean, min, max]
          : [mean, mean, mean];
  return [pv(es.map((e) => e[0])), pl(es.map((e) => e[1])), ph(es.map((e) => e[2]))];
}

export interface OracleAnalysis {
  speed?: { value: number; low: number; high: number };
  minimum?: number;
  /** Only for skid: true when the marks and the segments' sum differ by more than 5%. */
  mismatch?: boolean;
  /**
   * The plausibility warnings docs/case-file.md promises ("Warnings `solve` gives"): a drag factor
   * with any end above 1.0, marks whose longest value is more than 1.25 times the shortest, a yaw
   * radius (of the mark or of the path) under 50 ft or 15 m at its value.
   */
  warns: { drag: boolean; marks: boolean; radius: boolean };
}

const dragAboveOne = (ds: Ends[]) => ds.some((d) => Math.max(...d) > 1);
function marksDisagree(marks: Q[] | undefined): boolean {
  const vs = (marks ?? []).map((m) => ends(m)[0]);
  return vs.length >= 2 && Math.max(...vs) > 1.25 * Math.min(...vs);
}

function oracleSkid(c: Json, a: Json): OracleAnalysis {
  const metric = c.units === 'metric';
  const C = metric ? 254 : 30;
  const segs: Json[] = a.segments;
  const fromMarks = a.marks?.length
    ? markDistance(a.marks, a.distanceRule ?? 'average')
    : undefined;
  const lengths: Ends[] =
    segs.length === 1 && segs[0]!.length === undefined
      ? [fromMarks!]
      : segs.map((s) => ends(s.length));
  const sum = lengths.reduce((t, l) => t + l[0], 0);
  const mismatch =
    fromMarks && !(segs.length === 1 && segs[0]!.length === undefined)
      ? Math.abs(sum - fromMarks[0]) / fromMarks[0] > 0.05
      : false;
  const brakes = oracleBrakes(c.vehicle);
  const endQ: Q = a.end?.mode === 'speed' ? a.end.speed : 0;
  // Input order: n's inputs, S_end, then per segment d, f, G.
  const inputs: Ends[] = [...brakes.inputs, ends(endQ)];
  for (const [i, s] of segs.entries())
    inputs.push(lengths[i]!, oracleDrag(s.drag, metric), ends(s.grade ?? 0));
  const k = brakes.inputs.length;
  const speed = overCorners(inputs, (xs) => {
    const n = brakes.n(xs.slice(0, k));
    let s2 = xs[k]! ** 2;
    for (let i = 0; i < segs.length; i++) {
      const [d, f, G] = xs.slice(k + 1 + 3 * i, k + 4 + 3 * i) as [number, number, number];
      if (!(f * n + G / 100 > 0)) return undefined; // could not slow there: not a number
      s2 += C * d * (f * n + G / 100);
    }
    return Math.sqrt(s2);
  });
  const warns = {
    drag: dragAboveOne(segs.map((s) => oracleDrag(s.drag, metric))),
    marks: marksDisagree(a.marks),
    radius: false,
  };
  return speed ? { speed, minimum: Math.floor(speed.low), mismatch, warns } : { mismatch, warns };
}

function oracleYaw(c: Json, a: Json): OracleAnalysis {
  const K = c.units === 'metric' ? 127 : 15;
  const half = a.pathAdjustment === 'half-track';
  const inputs = [ends(a.chord), ends(a.middleOrdinate), oracleDrag(a.drag, c.units === 'metric')];
  inputs.push(ends(a.superelevation ?? 0), half ? ends(c.vehicle.trackWidth) : [0, 0, 0]);
  const speed = overCorners(inputs, ([ch, m, f, sup, t]) => {
    const R = ch! ** 2 / (8 * m!) + m! / 2 - t! / 2;
    const e = sup! / 100;
    if (!(m! < ch! / 2) || !(R > 0) || !(f! + e > 0) || !(1 - f! * e > 0)) return undefined;
    return Math.sqrt((K * R * (f! + e)) / (1 - f! * e));
  });
  const [ch, m] = [ends(a.chord)[0], ends(a.middleOrdinate)[0]];
  const R = ch ** 2 / (8 * m) + m / 2 - (half ? ends(c.vehicle.trackWidth)[0] / 2 : 0);
  const warns = {
    drag: dragAboveOne([inputs[2]!]),
    marks: false,
    radius: R < (c.units === 'metric' ? 15 : 50),
  };
  return speed ? { speed, minimum: Math.floor(speed.low), warns } : { warns };
}

/** The oracle's answer for a case: the contract's figures, and whether every one is computable. */
export interface OracleCase {
  units: { length: string; speed: string };
  analyses: OracleAnalysis[];
  computable: boolean;
  postedLimit?: { value: number; exceededAtMinimum: boolean };
}

/** What a careful reader of docs/case-file.md expects `solve --json` to print for a valid case. */
export function oracleCase(c: Json): OracleCase {
  const analyses = (c.analyses as Json[]).map((a) =>
    a.kind === 'skid' ? oracleSkid(c, a) : oracleYaw(c, a),
  );
  const metric = c.units === 'metric';
  const out: OracleCase = {
    units: { length: metric ? 'm' : 'ft', speed: metric ? 'km/h' : 'mph' },
    analyses,
    computable: analyses.every((a) => a.speed !== undefined),
  };
  if (c.postedLimit !== undefined) {
    const limit = ends(c.postedLimit)[0];
    out.postedLimit = {
      value: limit,
      exceededAtMinimum: analyses.some((a) => a.speed!.low > limit),
    };
  }
  return out;
}
