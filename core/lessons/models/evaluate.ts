import type { LiveModel } from '../../contracts/checkpoints';
import { FieldPointError } from '../../physics/fields/index';
import { LIVE_MODELS } from './definitions';
import type { LiveModelDefinition } from './types';

/** Why a live model gave no value: the engine refused the inputs, with a message a teacher can act on. */
export class LiveModelError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'LiveModelError';
  }
}

/** The definition of a live model's id. */
export function liveModelDefinition(model: Pick<LiveModel, 'modelId'>): LiveModelDefinition {
  const definition = LIVE_MODELS[model.modelId];
  if (!definition) throw new LiveModelError(`“${String(model.modelId)}” is not one of the live models.`);
  return definition;
}

/**
 * The display-unit value of every input of the model: `values` (slider positions) first, then the
 * card's configured value, then the model's default. Unknown names in `values` are ignored.
 */
export function liveModelValues(model: LiveModel, values: Readonly<Record<string, number>> = {}): Record<string, number> {
  const definition = liveModelDefinition(model);
  const resolved: Record<string, number> = {};
  for (const input of definition.inputs) {
    const configured = model.inputs.find((entry) => entry.name === input.name);
    resolved[input.name] = values[input.name] ?? configured?.value ?? input.defaultValue;
  }
  return resolved;
}

/** Formats a number to four significant figures, with ×10ⁿ outside 0.001 … 1 000 000. */
export function formatModelNumber(value: number): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e6) return String(Number(value.toPrecision(4))).replace('-', '−');
  const [mantissa, exponent] = value.toExponential(3).split('e') as [string, string];
  const superscript = String(Number(exponent)).replace(/[-0-9]/g, (c) => SUPERSCRIPT[c] ?? c);
  return `${String(Number(mantissa)).replace('-', '−')} × 10${superscript}`;
}

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/** The value with its display unit: "54.98 µT", "42°", a bare number for a count. */
export function formatWithUnit(value: number, unit: string): string {
  const number = formatModelNumber(value);
  if (!unit) return number;
  return unit === '°' ? `${number}°` : `${number} ${unit}`;
}

function computeDisplay(definition: LiveModelDefinition, display: Readonly<Record<string, number>>): number {
  const siValues: Record<string, number> = {};
  for (const input of definition.inputs) siValues[input.name] = (display[input.name] as number) * input.siFactor;
  try {
    return definition.compute(siValues) / definition.output.siFactor;
  } catch (error) {
    if (error instanceof FieldPointError) throw new LiveModelError(error.message);
    throw error;
  }
}

/**
 * The model's output in its display unit for the card's inputs, with `values` (display units, by
 * input name) overriding them — what a student sees beside the sliders. Throws LiveModelError when
 * the engine refuses the inputs (a point on the conductor, a radius of zero).
 */
export function evaluateLiveModel(model: LiveModel, values: Readonly<Record<string, number>>): { value: number; text: string } {
  const definition = liveModelDefinition(model);
  const value = computeDisplay(definition, liveModelValues(model, values));
  return { value, text: formatWithUnit(value, definition.output.unit) };
}

/**
 * The output along the plot's input, `points` evenly spaced samples from `plot.from` to `plot.to`
 * (display units), the other inputs at `values`. A sample the engine refuses (the dipole itself,
 * a wire distance of zero) is NaN, a gap in the curve. Throws LiveModelError without a plot.
 */
export function plotLiveModel(model: LiveModel, values: Readonly<Record<string, number>>, points = 101): { x: number[]; y: number[] } {
  const definition = liveModelDefinition(model);
  const plot = model.plot;
  if (!plot) throw new LiveModelError('This card has no plot.');
  if (!definition.inputs.some((input) => input.name === plot.input)) {
    throw new LiveModelError(`“${plot.input}” is not an input of ${definition.label}.`);
  }
  if (!Number.isInteger(points) || points < 2) throw new LiveModelError('A plot needs at least two points.');
  const base = liveModelValues(model, values);
  const x: number[] = [];
  const y: number[] = [];
  for (let i = 0; i < points; i += 1) {
    const at = plot.from + ((plot.to - plot.from) * i) / (points - 1);
    x.push(at);
    try {
      y.push(computeDisplay(definition, { ...base, [plot.input]: at }));
    } catch (error) {
      if (!(error instanceof LiveModelError)) throw error;
      y.push(Number.NaN);
    }
  }
  return { x, y };
}
