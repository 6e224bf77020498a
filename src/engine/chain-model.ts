import type { AnalysisModel, ModelInput } from './types.js';

/**
 * The model of a phase whose end speed is another analysis's start speed, as one model: the
 * inputs of this phase (without its end speed `endKey`) followed by the next phase's inputs, keyed
 * `<next id>:<key>` and labelled with the next phase's id. `evaluate` computes the next phase's
 * speed from its inputs, then this phase's speed with it as the end speed; undefined where either
 * cannot be computed. Sensitivity and sampling then treat the whole chain as one calculation.
 * @example chainModel(slideModel, yawModel, 'yaw-1').inputs.map((i) => i.key) // ['d', 'f[0]', 'n', 'yaw-1:C', ...]
 */
export function chainModel(
  own: AnalysisModel,
  next: AnalysisModel,
  nextId: string,
  endKey = 'Send',
): AnalysisModel {
  const prefix = `${nextId}:`;
  const nextKeys = next.inputs.map((i) => i.key);
  const outerKeys = nextKeys.map((k) => prefix + k);
  const inputs: ModelInput[] = [
    ...own.inputs.filter((i) => i.key !== endKey),
    ...next.inputs.map((i) => ({ ...i, key: prefix + i.key, label: `${i.label} (${nextId})` })),
  ];
  return {
    inputs,
    evaluate(x) {
      const inner: Record<string, number> = {};
      for (let j = 0; j < nextKeys.length; j++) {
        const v = x[outerKeys[j]!];
        if (v !== undefined) inner[nextKeys[j]!] = v;
      }
      const end = next.evaluate(inner);
      if (end === undefined) return undefined;
      return own.evaluate({ ...x, [endKey]: end });
    },
  };
}
