import type { AnalysisKind } from '../engine/types.js';

/**
 * What each kind of analysis is called, in one place for `solve`, the review and the report:
 * `short` in the glance and the phase line, `heading` in the review's headings, `marks` beside an id, `title` in headings.
 */
export const KIND_NAMES: Record<
  AnalysisKind,
  { short: string; heading: string; marks: string; title: string }
> = {
  skid: { short: 'slide', heading: 'slide', marks: 'skid marks', title: 'slide (skid marks)' },
  yaw: {
    short: 'critical speed',
    heading: 'critical speed (yaw)',
    marks: 'yaw marks',
    title: 'critical speed (yaw marks)',
  },
  airborne: {
    short: 'airborne',
    heading: 'airborne (take-off to landing)',
    marks: 'airborne: take-off to landing',
    title: 'airborne (take-off to first landing)',
  },
};
