import { describe, expect, it } from 'vitest';
import type { LiveModel, ModelInput } from '../../contracts/checkpoints';
import { MODEL_IDS } from '../../contracts/checkpoints';
import { defaultLiveModel, liveModelProblems } from './index';

const input = (overrides: Partial<ModelInput> & { name: string }): ModelInput => ({
  slider: true,
  min: 1,
  max: 10,
  step: 1,
  value: 5,
  ...overrides,
});
const coil = (inputs: ModelInput[], plot: LiveModel['plot'] = null): LiveModel => ({ modelId: 'coil-on-axis', inputs, plot });

describe('liveModelProblems', () => {
  it('finds nothing wrong with each model’s starting card', () => {
    for (const id of MODEL_IDS) expect(liveModelProblems(defaultLiveModel(id))).toEqual([]);
  });

  it('names an input the model does not have, and lists the real ones', () => {
    expect(liveModelProblems(coil([input({ name: 'q' })]))).toEqual([
      { path: 'inputs.0.name', message: '“q” is not an input of Flat coil, on its axis; its inputs are N, a, I, z.' },
    ]);
  });

  it('refuses an input listed twice and more inputs than the model has', () => {
    const five = ['N', 'a', 'I', 'z', 'z'].map((name) => input({ name }));
    expect(liveModelProblems(coil(five))).toEqual([
      { path: 'inputs', message: 'Flat coil, on its axis has 4 inputs; this card lists 5.' },
      { path: 'inputs.4.name', message: 'z is listed twice; keep one entry per input.' },
    ]);
  });

  it('refuses a slider whose smallest value is above its largest, or with no range', () => {
    expect(liveModelProblems(coil([input({ name: 'z', min: 5, max: -5, value: 0 })]))).toEqual([
      { path: 'inputs.0.max', message: 'The largest value (−5 cm) is below the smallest (5 cm).' },
    ]);
    expect(liveModelProblems(coil([input({ name: 'z', min: 5, max: 5, value: 5 })]))[0]?.path).toBe('inputs.0.max');
  });

  it('refuses a starting value outside the slider range and a step wider than it', () => {
    expect(liveModelProblems(coil([input({ name: 'a', value: 12 })]))).toEqual([
      { path: 'inputs.0.value', message: 'The starting value 12 cm is outside the slider’s range 1 cm to 10 cm.' },
    ]);
    expect(liveModelProblems(coil([input({ name: 'a', step: 20 })]))).toEqual([
      { path: 'inputs.0.step', message: 'The step (20 cm) is larger than the slider’s range.' },
    ]);
  });

  it('refuses values the physics does not allow (a radius of zero or less)', () => {
    expect(liveModelProblems(coil([input({ name: 'a', slider: false, value: 0 })]))).toEqual([
      { path: 'inputs.0.value', message: 'The value of coil radius must be above 0 cm.' },
    ]);
    expect(liveModelProblems(coil([input({ name: 'a', min: -2, value: 3 })]))).toEqual([
      { path: 'inputs.0.min', message: 'The smallest value of coil radius must be above 0 cm.' },
    ]);
  });

  it('ignores the range of a fixed input', () => {
    expect(liveModelProblems(coil([input({ name: 'z', slider: false, min: 9, max: 1, value: 20 })]))).toEqual([]);
  });

  it('refuses a plot over an unknown input or from ≥ to', () => {
    expect(liveModelProblems(coil([], { input: 'q', from: 0, to: 1 }))).toEqual([
      { path: 'plot.input', message: '“q” is not an input of Flat coil, on its axis; plot one of N, a, I, z.' },
    ]);
    expect(liveModelProblems(coil([], { input: 'z', from: 10, to: 10 }))).toEqual([
      { path: 'plot.to', message: 'The plot must end above its start (10 cm).' },
    ]);
    expect(liveModelProblems({ modelId: 'straight-wire', inputs: [], plot: { input: 'd', from: 0, to: 5 } })).toEqual([
      { path: 'plot.from', message: 'The start of distance from the wire must be above 0 cm.' },
    ]);
  });

  it('reports a card the engine cannot evaluate at its starting values', () => {
    const problems = liveModelProblems({ modelId: 'dipole-on-axis', inputs: [input({ name: 'z', slider: false, value: 0 })], plot: null });
    expect(problems).toHaveLength(1);
    expect(problems[0]?.path).toBe('inputs');
    expect(problems[0]?.message).toMatch(/^The model cannot be evaluated at the starting values: The point is at the dipole itself/);
  });

  it('refuses a model id that is not in the registry', () => {
    expect(liveModelProblems({ modelId: 'magic' as LiveModel['modelId'], inputs: [], plot: null })).toEqual([
      { path: 'modelId', message: '“magic” is not one of the live models.' },
    ]);
  });
});
