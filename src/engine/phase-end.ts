import { chainModel } from './chain-model.js';
import type { SlideEnd } from './slide.js';
import type { AnalysisModel, AnalysisSolution, Phase } from './types.js';

/** What the speed where each kind of analysis begins is, in words. */
const START_OF = {
  skid: 'its speed where its slide marks begin',
  yaw: 'its critical speed where its yaw marks begin',
  airborne: 'its speed at take-off',
} as const;

/**
 * The end of a slide that ran on into the analysis `next` of the same case: its end speed is
 * `next`'s speed with its whole range (each formula is monotone in the end speed, so the low end
 * takes next's low end and the high end its high end). Also what the slide's solution adds: the
 * assumption naming which analysis fed which, next's warnings (they concern this figure too), the
 * phases from this one on, and the chain's model.
 */
export function phaseEnd(next: AnalysisSolution) {
  const basis = `analysis "${next.id}" (${START_OF[next.kind]}), the phase the marks ran into`;
  const end: SlideEnd = {
    mode: 'speed',
    speed: next.speed,
    basis,
    from: `S of analysis "${next.id}"`,
  };
  const assumption = `The marks ran straight on into the next phase, analysis "${next.id}": ${START_OF[next.kind]} is the speed at the end of these marks, with its whole range, so that analysis’s assumptions hold for this figure too.`;
  const warnings = next.warnings.map((w) => `From "${next.id}": ${w}`);
  const first = (s: AnalysisSolution): Phase => ({
    id: s.id,
    kind: s.kind,
    ...(s.label !== undefined ? { label: s.label } : {}),
    speed: s.speed,
  });
  const rest = next.phases ?? [first(next)];
  return {
    end,
    assumption,
    warnings,
    phases: (own: AnalysisSolution | Phase): Phase[] => [
      'model' in own ? first(own) : own,
      ...rest,
    ],
    model: (own: AnalysisModel): AnalysisModel => chainModel(own, next.model, next.id),
  };
}
