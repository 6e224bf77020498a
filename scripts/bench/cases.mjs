// Case files for the benchmark. Invented scenarios with invented numbers (no real crash, no
// published example): a three-surface slide, and the same shape stretched to many segments.

const SURFACES = [
  {
    label: 'asphalt lane',
    drag: { source: 'entered', value: 0.72, low: 0.66, high: 0.78 },
    grade: 1.5,
  },
  {
    label: 'gravel shoulder',
    drag: { source: 'entered', value: 0.48, low: 0.4, high: 0.55 },
    grade: 0,
  },
  {
    label: 'grass verge',
    drag: { source: 'entered', value: 0.35, low: 0.28, high: 0.42 },
    grade: -2,
  },
];

/** A skid case sliding over `n` segments (cycling three surfaces), ending at rest. */
export function slideCase(n, id = `bench-${n}-segments`) {
  const segments = [];
  for (let i = 0; i < n; i++) {
    const s = SURFACES[i % SURFACES.length];
    const length = 12 + ((i * 7) % 19) + 0.5;
    segments.push({
      label: `${s.label} ${i + 1}`,
      length: { value: length, low: length - 0.5, high: length + 0.5 },
      drag: { ...s.drag },
      grade: s.grade,
    });
  }
  return {
    format: 'skidcase-case',
    version: 1,
    id,
    created: '2026-10-03T09:15:00Z',
    updated: '2026-10-03T10:40:00Z',
    units: 'imperial',
    details: {
      reference: `BENCH-${n}`,
      occurred: '2026-10-03 08:50',
      location: 'Invented benchmark road',
      investigator: 'Benchmark',
      notes: 'Invented case for timing only.',
    },
    postedLimit: 40,
    vehicle: { label: 'Invented sedan', frontAxleShare: 0.6, brakes: { mode: 'all' } },
    analyses: [
      { id: 'skid-1', kind: 'skid', label: 'bench slide', segments, end: { mode: 'stop' } },
    ],
  };
}
