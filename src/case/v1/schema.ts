import { z } from 'zod';
import { decimalsIssue, finiteNumber, quantity, RULES } from '../quantity.js';
import { MAX_ITEMS, tooManyMessage } from '../limits.js';
import { offsetsFieldV1, samplingFieldV1, timeDistanceFieldV1 } from './extras-fields.js';
import {
  airborneV1,
  analysisId,
  chainIssues,
  endAnalysisV1,
  pointsFieldV1,
  pointsLeftOutFieldV1,
} from './phase-fields.js';
import { revisionsDroppedFieldV1, revisionsFieldV1 } from './revision-fields.js';

/** Case file version 1: the contract in docs/case-file.md. Unknown fields are kept (loose objects). */

const text = (what: string) => z.string({ error: `${what} must be text` });
/** Message for a missing field vs. a field of the wrong type. */
const need = (what: string, expected: string) => ({
  error: (iss: { input?: unknown }) =>
    iss.input === undefined ? `${what} is required` : `${what} must be ${expected}`,
});
const q = quantity;
/** How many decimals a figure was typed with (`0.70`: 2): for the record, never for the figures. */
const typedDecimals = finiteNumber('decimals', 'a whole number from 0 to 9').superRefine(
  (n, ctx) => {
    const issue = decimalsIssue(n);
    if (issue) ctx.addIssue({ code: 'custom', message: issue });
  },
);

/** value/low/high of a quantity that may not have passed its own checks; undefined if unusable. */
function endsOf(q: unknown): { value: number; low: number; high?: number } | undefined {
  if (typeof q === 'number') return Number.isFinite(q) ? { value: q, low: q } : undefined;
  if (typeof q !== 'object' || q === null) return undefined;
  const o = q as Record<string, unknown>;
  if (typeof o.value !== 'number') return undefined;
  const low = typeof o.low === 'number' ? o.low : o.value;
  return typeof o.high === 'number'
    ? { value: o.value, low, high: o.high }
    : { value: o.value, low };
}

/** Test skids come as `tests` or as `factors`; `gradeTakenOut` says what the factors' grade is. */
function testSkidsIssues(
  d: { tests?: unknown; factors?: unknown; gradeTakenOut?: boolean },
  ctx: z.RefinementCtx,
): void {
  const issue = (path: string, message: string) =>
    ctx.addIssue({ code: 'custom', path: [path], message });
  if (d.tests !== undefined && d.factors !== undefined)
    issue('factors', 'give either tests or factors, not both');
  else if (d.tests === undefined && d.factors === undefined)
    issue(
      'tests',
      'give tests (speed and distance) or factors (drag factors worked out from them)',
    );
  if (d.gradeTakenOut !== undefined && d.factors === undefined)
    issue(
      'gradeTakenOut',
      'gradeTakenOut goes with factors only (tests always have their grade taken off)',
    );
}

export const dragV1 = z
  .discriminatedUnion(
    'source',
    [
      z.looseObject({
        source: z.literal('entered'),
        value: finiteNumber('drag factor'),
        low: finiteNumber('drag factor (low)').optional(),
        high: finiteNumber('drag factor (high)').optional(),
        note: text('note').optional(),
        decimals: typedDecimals.optional(),
      }),
      z.looseObject({
        source: z.literal('table'),
        // A label for the report, never checked against the table (docs/case-file.md).
        surface: text('surface').optional(),
        value: finiteNumber('drag factor'),
        low: finiteNumber('drag factor (low)').optional(),
        high: finiteNumber('drag factor (high)').optional(),
        band: z.enum(['under-30mph', 'over-30mph']).optional(),
        note: text('note').optional(),
        decimals: typedDecimals.optional(),
      }),
      z.looseObject({
        source: z.literal('test-skids'),
        tests: z
          .array(
            z.looseObject(
              {
                speed: q(RULES.testSpeed),
                distance: q({ ...RULES.length, what: 'test distance' }),
              },
              need('test skid', 'an object { "speed": n, "distance": n }'),
            ),
            {
              error: 'tests must be a list of { "speed": n, "distance": n }',
            },
          )
          .min(1, 'at least one test skid is needed')
          .max(MAX_ITEMS, tooManyMessage('tests'))
          .optional(),
        /** Drag factors already worked out from the tests, instead of `tests` (docs/case-file.md). */
        factors: z
          .array(q(RULES.testFactor), { error: 'factors must be a list of numbers' })
          .min(1, 'at least one drag factor is needed')
          .max(MAX_ITEMS, tooManyMessage('factors'))
          .optional(),
        /**
         * `factors` only: true when the factors are level-ground already (the test grade was taken
         * out when they were worked out); `testGrade` is then a record, never taken off again.
         */
        gradeTakenOut: z.boolean({ error: 'gradeTakenOut must be true or false' }).optional(),
        /** Grade the tests were run on (signed percent, + uphill in their direction); default level. */
        testGrade: q({ ...RULES.grade, what: 'test grade' }).optional(),
        note: text('note').optional(),
      }),
      z.looseObject({
        source: z.literal('sled'),
        weight: q(RULES.sledWeight),
        pulls: z
          .array(q(RULES.sledPull), { error: 'pulls must be a list of numbers' })
          .min(1, 'at least one pull is needed')
          .max(MAX_ITEMS, tooManyMessage('pulls')),
        note: text('note').optional(),
      }),
      z.looseObject({
        source: z.literal('decelerometer'),
        readings: z
          .array(q(RULES.decel), { error: 'readings must be a list of numbers' })
          .min(1, 'at least one reading is needed')
          .max(MAX_ITEMS, tooManyMessage('readings')),
        note: text('note').optional(),
      }),
    ],
    {
      error: (iss: { input?: unknown }) =>
        iss.input === undefined
          ? 'drag is required'
          : 'drag.source must be one of entered, table, test-skids, sled, decelerometer',
    },
  )
  .superRefine((d, ctx) => {
    if (d.source === 'test-skids') return testSkidsIssues(d, ctx);
    if (d.source !== 'entered' && d.source !== 'table') return;
    for (const [k, n] of [
      ['value', d.value],
      ['low', d.low],
      ['high', d.high],
    ] as const) {
      if (n === undefined) continue;
      if (!(n > 0))
        ctx.addIssue({ code: 'custom', path: [k], message: 'drag factor must be greater than 0' });
      else if (n > 2)
        ctx.addIssue({ code: 'custom', path: [k], message: 'drag factor must be at most 2' });
    }
    if (d.low !== undefined && d.low > d.value)
      ctx.addIssue({
        code: 'custom',
        path: ['low'],
        message: 'drag factor: low must not be above value',
      });
    if (d.high !== undefined && d.high < d.value)
      ctx.addIssue({
        code: 'custom',
        path: ['high'],
        message: 'drag factor: high must not be below value',
      });
  });

export const brakesV1 = z.discriminatedUnion(
  'mode',
  [
    z.looseObject({ mode: z.literal('all') }),
    z.looseObject({
      mode: z.literal('estimate'),
      efficiency: q(RULES.efficiency),
      basis: text('basis').optional(),
    }),
    z.looseObject({
      mode: z.literal('wheels'),
      frontLeft: q(RULES.wheel),
      frontRight: q(RULES.wheel),
      rearLeft: q(RULES.wheel),
      rearRight: q(RULES.wheel),
    }),
  ],
  { error: 'brakes.mode must be one of all, estimate, wheels' },
);

export const vehicleV1 = z.looseObject(
  {
    label: text('label').optional(),
    frontAxleShare: q(RULES.share).optional(),
    trackWidth: q(RULES.trackWidth).optional(),
    brakes: brakesV1.optional(),
  },
  need('vehicle', 'an object'),
);

export const segmentV1 = z.looseObject(
  {
    label: text('label').optional(),
    length: q(RULES.length).optional(),
    drag: dragV1,
    grade: q(RULES.grade).optional(),
  },
  need('segment', 'an object with a drag factor'),
);

export const endV1 = z.discriminatedUnion(
  'mode',
  [
    z.looseObject({ mode: z.literal('stop') }),
    z.looseObject({
      mode: z.literal('speed'),
      speed: q(RULES.speed),
      basis: text('basis').optional(),
    }),
    endAnalysisV1,
  ],
  { error: 'end.mode must be stop, speed or analysis' },
);

export const skidV1 = z.looseObject({
  id: analysisId,
  kind: z.literal('skid'),
  label: text('label').optional(),
  /** How the marks looked: decides the caveats the chain carries (docs/case-file.md). */
  appearance: z
    .enum(['locked', 'abs', 'skip', 'gap'], {
      error: 'appearance must be locked, abs, skip or gap',
    })
    .optional(),
  marks: z
    .array(q(RULES.length), { error: 'marks must be a list of lengths' })
    .max(MAX_ITEMS, tooManyMessage('marks'))
    .optional(),
  distanceRule: z
    .enum(['average', 'longest', 'shortest', 'spread'], {
      error: 'distanceRule must be average, longest, shortest or spread',
    })
    .optional(),
  segments: z
    .array(segmentV1, { error: 'segments must be a list' })
    .min(1, 'at least one segment is needed')
    .max(MAX_ITEMS, tooManyMessage('segments')),
  end: endV1.optional(),
  timeDistance: timeDistanceFieldV1.optional(),
});

export const yawV1 = z.looseObject({
  id: analysisId,
  kind: z.literal('yaw'),
  label: text('label').optional(),
  // Chord + middleOrdinate, offsets or points: exactly one way (checked in caseV1's refinement).
  chord: q(RULES.length).optional(),
  middleOrdinate: q({ ...RULES.length, what: 'middle ordinate' }).optional(),
  offsets: offsetsFieldV1.optional(),
  points: pointsFieldV1.optional(),
  pointsLeftOut: pointsLeftOutFieldV1.optional(),
  drag: dragV1,
  superelevation: q(RULES.superelevation).optional(),
  pathAdjustment: z
    .enum(['none', 'half-track'], { error: 'pathAdjustment must be none or half-track' })
    .optional(),
});

export const analysisV1 = z.discriminatedUnion('kind', [skidV1, yawV1, airborneV1], {
  error: 'kind must be skid, yaw or airborne',
});

type Ctx = z.core.$RefinementCtx<unknown>;

const ONE_WAY = 'give exactly one of: chord and middleOrdinate, offsets, or points';

/**
 * A yaw analysis is measured one way: chord + middleOrdinate, offsets, or points. None, more than
 * one, or half of the first way is an issue naming the field; stations must lie inside the chord
 * (its low end, so that every corner of the chord's range is a valid fit).
 */
function yawMeasureIssues(a: z.infer<typeof yawV1>, i: number, ctx: Ctx) {
  const path = (...rest: (string | number)[]) => ['analyses', i, ...rest];
  const hasC = a.chord !== undefined;
  const hasM = a.middleOrdinate !== undefined;
  if (a.pointsLeftOut !== undefined && a.points === undefined)
    ctx.addIssue({
      code: 'custom',
      path: path('pointsLeftOut'),
      message: 'pointsLeftOut goes with points (the points fitted)',
    });
  if (a.points !== undefined) {
    if (hasC || hasM || a.offsets !== undefined)
      ctx.addIssue({ code: 'custom', path: path('points'), message: ONE_WAY });
    return;
  }
  if (a.offsets !== undefined) {
    if (hasC || hasM) ctx.addIssue({ code: 'custom', path: path('offsets'), message: ONE_WAY });
    // Only against a chord that passed its own checks (its issue is already reported).
    const C = endsOf(a.offsets.chord);
    if (C && C.low > 0 && C.low <= C.value)
      a.offsets.stations.forEach((st, j) => {
        if (typeof st.at === 'number' && st.at >= C.low)
          ctx.addIssue({
            code: 'custom',
            path: path('offsets', 'stations', j, 'at'),
            message: `at must be less than the chord (${C.low})`,
          });
      });
    return;
  }
  if (!hasC && !hasM)
    ctx.addIssue({
      code: 'custom',
      path: path('chord'),
      message: ONE_WAY,
    });
  else if (!hasC)
    ctx.addIssue({
      code: 'custom',
      path: path('chord'),
      message: 'chord is required with middleOrdinate (or give offsets or points instead)',
    });
  else if (!hasM)
    ctx.addIssue({
      code: 'custom',
      path: path('middleOrdinate'),
      message: 'middle ordinate is required with chord (or give offsets or points instead)',
    });
}

export const caseV1 = z
  .looseObject({
    format: z.literal('skidcase-case', { error: 'format must be "skidcase-case"' }),
    version: z.literal(1),
    id: z
      .string(need('id', 'text'))
      .regex(/^[a-z0-9-]{1,64}$/, 'id must be 1 to 64 lower-case letters, digits or dashes'),
    created: text('created').optional(),
    updated: text('updated').optional(),
    units: z.enum(['imperial', 'metric'], need('units', 'imperial or metric')),
    details: z
      .looseObject(
        {
          reference: text('reference').optional(),
          occurred: text('occurred').optional(),
          location: text('location').optional(),
          investigator: text('investigator').optional(),
          notes: text('notes').optional(),
        },
        need('details', 'an object'),
      )
      .optional(),
    postedLimit: q(RULES.postedLimit).optional(),
    sampling: samplingFieldV1.optional(),
    vehicle: vehicleV1,
    analyses: z
      .array(analysisV1, need('analyses', 'a list'))
      .max(MAX_ITEMS, tooManyMessage('analyses')),
    interview: z.unknown().optional(),
    revisions: revisionsFieldV1.optional(),
    revisionsDropped: revisionsDroppedFieldV1.optional(),
  })
  .superRefine((c, ctx) => {
    // Cross-field rules: each names the field that is wrong.
    const seen = new Set<string>();
    c.analyses.forEach((a, i) => {
      if (seen.has(a.id))
        ctx.addIssue({
          code: 'custom',
          path: ['analyses', i, 'id'],
          message: `id "${a.id}" is used twice`,
        });
      seen.add(a.id);
      if (a.kind === 'skid') {
        if (!c.vehicle.brakes)
          ctx.addIssue({
            code: 'custom',
            path: ['vehicle', 'brakes'],
            message: 'brakes are required for a skid analysis',
          });
        if (
          a.segments.length === 1 &&
          a.segments[0]!.length === undefined &&
          (!a.marks || a.marks.length === 0)
        )
          ctx.addIssue({
            code: 'custom',
            path: ['analyses', i, 'marks'],
            message: 'give the marks, or a length on the segment',
          });
        if (a.segments.length > 1)
          a.segments.forEach((s, j) => {
            if (s.length === undefined)
              ctx.addIssue({
                code: 'custom',
                path: ['analyses', i, 'segments', j, 'length'],
                message: 'length is required when there are several segments',
              });
          });
      } else if (a.kind === 'yaw') {
        if (a.pathAdjustment === 'half-track' && c.vehicle.trackWidth === undefined)
          ctx.addIssue({
            code: 'custom',
            path: ['vehicle', 'trackWidth'],
            message: `track width is required for the half-track adjustment of analyses[${i}]`,
          });
        yawMeasureIssues(a, i, ctx);
        // Checked against the chord's low end, so that every corner of the ranges is a valid arc.
        // The fields may themselves be invalid here (their own issues are already reported), so
        // they are read defensively.
        const C = endsOf(a.chord);
        const M = endsOf(a.middleOrdinate);
        if (C && M) {
          for (const k of ['value', 'low', 'high'] as const) {
            const m = M[k];
            if (m !== undefined && m >= C.low / 2)
              ctx.addIssue({
                code: 'custom',
                path: [
                  'analyses',
                  i,
                  'middleOrdinate',
                  ...(typeof a.middleOrdinate === 'number' ? [] : [k]),
                ],
                message: 'middle ordinate must be less than half the chord',
              });
          }
        }
      }
    });
    for (const issue of chainIssues(c.analyses)) ctx.addIssue({ code: 'custom', ...issue });
    if (c.vehicle.brakes?.mode === 'wheels' && c.vehicle.frontAxleShare === undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['vehicle', 'frontAxleShare'],
        message: 'front axle share is required when brakes are given per wheel',
      });
  });

export type CaseV1 = z.infer<typeof caseV1>;
export type DragV1 = z.infer<typeof dragV1>;
export type BrakesV1 = z.infer<typeof brakesV1>;
export type VehicleV1 = z.infer<typeof vehicleV1>;
export type SegmentV1 = z.infer<typeof segmentV1>;
export type SkidV1 = z.infer<typeof skidV1>;
export type YawV1 = z.infer<typeof yawV1>;
export type AnalysisV1 = z.infer<typeof analysisV1>;
export type { AirborneV1 } from './phase-fields.js';
export type { RevisionV1, ChangeV1 } from './revision-fields.js';
