import type { CheckpointOf } from '../contracts/checkpoints';
import { compileSpec, GradingSetupError, numericSpecProblem } from '../physics/grading/compile-spec';
import type { NumericSpec } from '../physics/grading/types';
import { drawVariables } from '../physics/units/draw-variables';
import { PhysicsError } from '../physics/units/errors';
import { parseQuantity } from '../physics/units/parse-quantity';
import type { VariableSpec, VariableValues } from '../physics/units/types';
import { dimensionPhrase, formatInUnit, readAskedUnit } from './numeric-format';

export type NumericCheckpoint = CheckpointOf<'numeric'>;
/** The fields of a numeric checkpoint the engine needs (the form passes its current values). */
export type NumericCheckpointSpec = Pick<
  NumericCheckpoint,
  | 'key'
  | 'expected'
  | 'askedUnit'
  | 'variables'
  | 'relativeTolerancePercent'
  | 'absoluteTolerance'
  | 'sigFigs'
  | 'requireUnit'
  | 'distractors'
>;

/** The engine's variable specs: a unit only when one is written, a role only when it is not 'none'. */
export function toVariableSpecs(checkpoint: Pick<NumericCheckpoint, 'variables'>): VariableSpec[] {
  return checkpoint.variables.map((v) => {
    const spec: VariableSpec = { name: v.name, min: v.min, max: v.max, step: v.step };
    if (v.unit.trim() !== '') spec.unit = v.unit.trim();
    if (v.role !== 'none') spec.role = v.role;
    return spec;
  });
}

/** The engine's NumericSpec for a checkpoint: percent becomes a fraction; empty tolerances are left out. */
export function toNumericSpec(checkpoint: NumericCheckpointSpec): NumericSpec {
  const tolerance: NonNullable<NumericSpec['tolerance']> = {};
  if (checkpoint.relativeTolerancePercent !== null) tolerance.relative = checkpoint.relativeTolerancePercent / 100;
  const absolute = checkpoint.absoluteTolerance?.trim() ?? '';
  if (absolute !== '') tolerance.absolute = absolute;
  const spec: NumericSpec = {
    expected: checkpoint.expected,
    variables: toVariableSpecs(checkpoint),
    tolerance,
    requireUnit: checkpoint.requireUnit,
    distractors: checkpoint.distractors.map((d) => ({ id: d.id, formula: d.formula, feedback: d.feedback })),
  };
  if (checkpoint.sigFigs) spec.sigFigs = { ...checkpoint.sigFigs };
  return spec;
}

/**
 * One student's values. Seeded by `${seed}:${key}` so a student keeps the same numbers for the same
 * checkpoint in every version of the lesson. Throws the engine's PhysicsError for a bad variable.
 */
export function drawnValuesFor(checkpoint: Pick<NumericCheckpoint, 'key' | 'variables'>, seed: string): VariableValues {
  return drawVariables(toVariableSpecs(checkpoint), `${seed}:${checkpoint.key}`);
}

export interface SampleExpected {
  /** The drawn values as the student sees them ('4.5 cm', '120'). */
  values: Record<string, string>;
  /** The expected answer for these values in the asked unit ('62.83 µT'), or null with a problem. */
  expectedText: string | null;
  /** Why there is no expected value, or why it cannot be the answer asked for; null when all is well. */
  problem: string | null;
}

function messageOf(error: unknown): string {
  if (error instanceof PhysicsError || error instanceof GradingSetupError) return error.message;
  throw error;
}

/**
 * The expected answer for sample drawn values, for the numeric form and the publish rules: a problem
 * when the formula does not evaluate or its dimension is not the asked unit's.
 */
export function sampleExpected(checkpoint: NumericCheckpointSpec, seed: string): SampleExpected {
  let drawn: VariableValues;
  try {
    drawn = drawnValuesFor(checkpoint, seed);
  } catch (error) {
    return { values: {}, expectedText: null, problem: messageOf(error) };
  }
  const values = Object.fromEntries(Object.entries(drawn).map(([name, value]) => [name, String(value)]));
  const none = (problem: string): SampleExpected => ({ values, expectedText: null, problem });
  if (checkpoint.expected.trim() === '')
    return none('Write the expected answer: a quantity such as 62.8 µT or a formula over the variables.');
  const percent = checkpoint.relativeTolerancePercent;
  if (percent !== null && percent >= 100) return none('A relative tolerance must be below 100 %.');
  const spec = toNumericSpec(checkpoint);
  const specProblem = numericSpecProblem(spec);
  if (specProblem) return none(specProblem);
  let expected;
  try {
    expected = compileSpec(spec).expectedFor(drawn);
  } catch (error) {
    return none(messageOf(error));
  }
  const asked = readAskedUnit(checkpoint.askedUnit);
  if (!asked.ok) return none(`The asked unit cannot be read: ${asked.message}`);
  if (expected.dimension !== asked.dimension) {
    const what = parseQuantity(checkpoint.expected).ok ? 'The expected answer is' : 'The formula gives';
    return none(`${what} ${dimensionPhrase(expected.dimension, false)}; the question asks for ${dimensionPhrase(asked.dimension, true)}.`);
  }
  return { values, expectedText: formatInUnit(expected.value, asked), problem: null };
}
