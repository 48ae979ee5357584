import { MODEL_IDS, type LiveModel, type ModelInput } from '../../contracts/checkpoints';
import { LIVE_MODELS } from './definitions';
import { evaluateLiveModel, formatWithUnit, LiveModelError } from './evaluate';
import type { LiveModelDefinition, LiveModelInputDefinition } from './types';

type Problem = { path: string; message: string };

/** What a value must be for this input, or null when it is fine. */
function domainProblem(input: LiveModelInputDefinition, value: number, what: string): string | null {
  const unit = input.unit ? ` ${input.unit}` : '';
  if (input.domain === 'positive' && value <= 0) return `${what} of ${input.label.toLowerCase()} must be above 0${unit}.`;
  if (input.domain === 'non-negative' && value < 0) return `${what} of ${input.label.toLowerCase()} cannot be negative.`;
  return null;
}

function inputProblems(definition: LiveModelDefinition, input: ModelInput, index: number, seen: Set<string>): Problem[] {
  const path = `inputs.${index}`;
  const known = definition.inputs.find((entry) => entry.name === input.name);
  if (!known) {
    const names = definition.inputs.map((entry) => entry.name).join(', ');
    return [{ path: `${path}.name`, message: `“${input.name}” is not an input of ${definition.label}; its inputs are ${names}.` }];
  }
  if (seen.has(input.name)) return [{ path: `${path}.name`, message: `${input.name} is listed twice; keep one entry per input.` }];
  seen.add(input.name);
  const problems: Problem[] = [];
  const show = (value: number) => formatWithUnit(value, known.unit);
  const valueDomain = domainProblem(known, input.value, 'The value');
  if (valueDomain) problems.push({ path: `${path}.value`, message: valueDomain });
  if (!input.slider) return problems;
  const minDomain = domainProblem(known, input.min, 'The smallest value');
  if (minDomain) problems.push({ path: `${path}.min`, message: minDomain });
  if (input.min > input.max) {
    problems.push({
      path: `${path}.max`,
      message: `The largest value (${show(input.max)}) is below the smallest (${show(input.min)}).`,
    });
  } else if (input.min === input.max) {
    problems.push({ path: `${path}.max`, message: `A slider needs a range: make the largest value above ${show(input.min)}.` });
  } else {
    if (input.value < input.min || input.value > input.max) {
      problems.push({
        path: `${path}.value`,
        message: `The starting value ${show(input.value)} is outside the slider’s range ${show(input.min)} to ${show(input.max)}.`,
      });
    }
    if (input.step > input.max - input.min) {
      problems.push({ path: `${path}.step`, message: `The step (${show(input.step)}) is larger than the slider’s range.` });
    }
  }
  return problems;
}

function plotProblems(definition: LiveModelDefinition, plot: NonNullable<LiveModel['plot']>): Problem[] {
  const input = definition.inputs.find((entry) => entry.name === plot.input);
  if (!input) {
    const names = definition.inputs.filter((entry) => entry.plottable).map((entry) => entry.name);
    return [{ path: 'plot.input', message: `“${plot.input}” is not an input of ${definition.label}; plot one of ${names.join(', ')}.` }];
  }
  if (!input.plottable) return [{ path: 'plot.input', message: `${input.label} cannot be swept along the plot’s axis.` }];
  const problems: Problem[] = [];
  const fromDomain = domainProblem(input, plot.from, 'The start');
  if (fromDomain) problems.push({ path: 'plot.from', message: fromDomain });
  if (plot.from >= plot.to) {
    problems.push({
      path: 'plot.to',
      message: `The plot must end above its start (${formatWithUnit(plot.from, input.unit)}).`,
    });
  }
  return problems;
}

/**
 * Publish rules for a live equation card, with paths relative to the model (`inputs.0.max`,
 * `plot.to`): every input a real input of the model and listed once, no more inputs than the model
 * has, slider ranges the right way round and holding their starting value, values the physics
 * allows, a plot over a plottable input with from < to, and the engine able to evaluate the card
 * at its starting values.
 */
export function liveModelProblems(model: LiveModel): Problem[] {
  if (!(MODEL_IDS as readonly string[]).includes(model.modelId)) {
    return [{ path: 'modelId', message: `“${String(model.modelId)}” is not one of the live models.` }];
  }
  const definition = LIVE_MODELS[model.modelId];
  const problems: Problem[] = [];
  if (model.inputs.length > definition.inputs.length) {
    problems.push({
      path: 'inputs',
      message: `${definition.label} has ${definition.inputs.length} inputs; this card lists ${model.inputs.length}.`,
    });
  }
  const seen = new Set<string>();
  model.inputs.forEach((input, index) => problems.push(...inputProblems(definition, input, index, seen)));
  if (model.plot) problems.push(...plotProblems(definition, model.plot));
  if (problems.length === 0) {
    try {
      evaluateLiveModel(model, {});
    } catch (error) {
      if (!(error instanceof LiveModelError)) throw error;
      problems.push({ path: 'inputs', message: `The model cannot be evaluated at the starting values: ${error.message}` });
    }
  }
  return problems;
}
