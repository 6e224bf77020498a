/**
 * Valid case files the fuzzer starts from: invented scenarios with invented numbers, chosen to
 * cover every branch of the format (each brakes mode, each drag source, several segments, an end
 * speed, a banked yaw with the half-track path, metric and imperial, unknown fields, notes).
 */
export const SEEDS: Record<string, unknown> = {
  'imperial skid, four marks, per-wheel brakes': {
    format: 'skidcase-case',
    version: 1,
    id: 'fuzz-wheels',
    units: 'imperial',
    details: { reference: 'FZ-1', location: 'Invented lane', investigator: 'Fuzz', notes: '' },
    postedLimit: 30,
    vehicle: {
      label: 'invented hatchback',
      frontAxleShare: { value: 0.6, low: 0.57, high: 0.63 },
      brakes: {
        mode: 'wheels',
        frontLeft: 1,
        frontRight: 1,
        rearLeft: 0,
        rearRight: { value: 0.4, low: 0.2, high: 0.6 },
      },
    },
    analyses: [
      {
        id: 'skid-1',
        kind: 'skid',
        marks: [61.5, { value: 60.2, low: 59.9, high: 60.5, note: 'tape' }, 62.0, 59.4],
        distanceRule: 'average',
        segments: [{ drag: { source: 'entered', value: 0.7, low: 0.64, high: 0.76 }, grade: 0 }],
        end: { mode: 'stop' },
      },
    ],
  },
  'imperial three surfaces, downhill, tests, sled and readings, end speed': {
    format: 'skidcase-case',
    version: 1,
    id: 'fuzz-three',
    units: 'imperial',
    vehicle: {
      brakes: {
        mode: 'estimate',
        efficiency: { value: 0.85, low: 0.8, high: 0.9 },
        basis: 'inspection',
      },
    },
    analyses: [
      {
        id: 'skid-a',
        kind: 'skid',
        label: 'three surfaces',
        segments: [
          {
            label: 'lane',
            length: { value: 41.0, low: 40.5, high: 41.5 },
            drag: {
              source: 'test-skids',
              tests: [
                { speed: 30, distance: 44.0 },
                { speed: 31, distance: 46.5 },
              ],
            },
            grade: { value: -2.5, low: -3, high: -2 },
          },
          {
            label: 'shoulder',
            length: 18,
            drag: { source: 'sled', weight: 60, pulls: [31, 33, 30] },
            grade: -2,
          },
          {
            label: 'verge',
            length: 9.5,
            drag: { source: 'decelerometer', readings: [0.41, 0.44] },
          },
        ],
        end: {
          mode: 'speed',
          speed: { value: 12, low: 8, high: 15 },
          basis: 'invented momentum estimate',
        },
      },
    ],
  },
  'metric banked yaw with half-track path and a table drag factor': {
    format: 'skidcase-case',
    version: 1,
    id: 'fuzz-yaw',
    units: 'metric',
    postedLimit: 60,
    vehicle: { label: 'invented estate car', trackWidth: { value: 1.55, low: 1.5, high: 1.6 } },
    analyses: [
      {
        id: 'yaw-1',
        kind: 'yaw',
        chord: { value: 14.2, low: 14.1, high: 14.3 },
        middleOrdinate: { value: 0.62, low: 0.6, high: 0.64 },
        drag: {
          source: 'table',
          surface: 'asphalt-dry-travelled',
          value: 0.68,
          low: 0.6,
          high: 0.75,
          band: 'over-30mph',
        },
        superelevation: { value: 3, low: 2.5, high: 3.5 },
        pathAdjustment: 'half-track',
      },
    ],
  },
  'two analyses (skid and yaw), longest rule, an unknown field': {
    format: 'skidcase-case',
    version: 1,
    id: 'fuzz-two',
    units: 'imperial',
    postedLimit: { value: 45 },
    extraNote: 'an unknown top-level field, kept',
    vehicle: { brakes: { mode: 'all' }, frontAxleShare: 0.58, trackWidth: 5.2 },
    analyses: [
      {
        id: 'skid-1',
        kind: 'skid',
        marks: [88, 90.5, 89],
        distanceRule: 'longest',
        segments: [{ drag: { source: 'entered', value: 0.74 }, grade: 1.5 }],
      },
      {
        id: 'yaw-1',
        kind: 'yaw',
        chord: 52,
        middleOrdinate: 4.1,
        drag: { source: 'entered', value: 0.7, low: 0.65, high: 0.75 },
        superelevation: -2,
        pathAdjustment: 'none',
      },
    ],
  },
};

/** Enum values the format knows, and a few it does not, for the swap mutation. */
export const ENUM_POOL = [
  'imperial',
  'metric',
  'skid',
  'yaw',
  'stop',
  'speed',
  'all',
  'estimate',
  'wheels',
  'entered',
  'table',
  'test-skids',
  'sled',
  'decelerometer',
  'average',
  'longest',
  'none',
  'half-track',
  'under-30mph',
  'over-30mph',
  'skidcase-case',
  'Imperial',
  'SKID',
  'feet',
  '',
  'metre',
];
