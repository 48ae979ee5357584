import type { LiveModel, ModelId } from '../../contracts/checkpoints';
import { LIVE_MODELS } from './definitions';

/** The input a new card sweeps along its plot: the distance where there is one, else the current. */
const PLOT_INPUT: Record<ModelId, string> = {
  'coil-on-axis': 'z',
  'helmholtz-on-axis': 'z',
  'solenoid-on-axis': 'z',
  'straight-wire': 'd',
  'dipole-on-axis': 'z',
  'needle-deflection': 'I',
};

/**
 * The live model a teacher starts from: every input listed at its default, a slider on the
 * plotted input and on the current (or moment), and a plot over the plotted input's range.
 */
export function defaultLiveModel(modelId: ModelId): LiveModel {
  const definition = LIVE_MODELS[modelId];
  const plotted = PLOT_INPUT[modelId];
  const plotInput = definition.inputs.find((input) => input.name === plotted);
  return {
    modelId,
    inputs: definition.inputs.map((input) => ({
      name: input.name,
      slider: input.name === plotted || input.name === 'I' || input.name === 'm',
      min: input.min,
      max: input.max,
      step: input.step,
      value: input.defaultValue,
    })),
    plot: plotInput ? { input: plotInput.name, from: plotInput.min, to: plotInput.max } : null,
  };
}
