import type { CheckpointOf } from '../contracts/checkpoints';
import type { LessonProblem } from '../contracts/lessons';
import { compileFormula } from '../physics/units/evaluate-formula';
import { parseQuantity } from '../physics/units/parse-quantity';
import type { Dimension, VariableValues } from '../physics/units/types';
import { parseUnit } from '../physics/units/unit-parser';
import { dimensionPhrase, readAskedUnit } from './numeric-format';
import { drawnValuesFor, sampleExpected } from './numeric-spec';
import { placeholderNames } from './placeholders';

const CONSTANTS = new Set(['pi', 'e', 'mu0']);
const SAMPLE_SEED = 'publish-check';

function declaredList(names: string[]): string {
  return names.length === 0 ? 'no variables are declared yet' : `declared: ${names.join(', ')}`;
}

function variableProblems(checkpoint: CheckpointOf<'numeric'>): LessonProblem[] {
  const problems: LessonProblem[] = [];
  const seen = new Set<string>();
  checkpoint.variables.forEach((v, j) => {
    const at = (field: string, message: string) => problems.push({ path: `variables.${j}.${field}`, message });
    if (seen.has(v.name)) at('name', `Another variable is already called ${v.name}: give each its own name.`);
    seen.add(v.name);
    if (CONSTANTS.has(v.name)) at('name', `${v.name} is a constant in formulas (pi, e, mu0): give this variable another name.`);
    if (v.min > v.max) at('max', `The largest value (${v.max}) is smaller than the smallest (${v.min}).`);
    else if ((v.max - v.min) / v.step > 1e9) at('step', 'The step is too small for this range (more than a billion values).');
    if (v.unit.trim() !== '') {
      const unit = parseUnit(v.unit.trim());
      if (!unit.ok) at('unit', unit.error.message);
    }
  });
  return problems;
}

/** A formula's compile problem, or the variables it uses that are not declared. */
function formulaProblem(formula: string, declared: string[], what: string): string | null {
  if (parseQuantity(formula).ok) return null;
  const compiled = compileFormula(formula);
  if (!compiled.ok) return `${what} cannot be used: ${compiled.error.message}`;
  const unknown = compiled.symbols.filter((s) => !declared.includes(s));
  if (unknown.length === 0) return null;
  const names = unknown.join(', ');
  return `${what} uses ${names}, which ${unknown.length === 1 ? 'is not a declared variable' : 'are not declared variables'} (${declaredList(declared)}).`;
}

/** The dimension of a quantity or formula for the sample values, or a message. */
function dimensionFor(formula: string, values: VariableValues): { ok: true; dimension: Dimension } | { ok: false; message: string } {
  const quantity = parseQuantity(formula);
  if (quantity.ok) return { ok: true, dimension: quantity.dimension };
  const compiled = compileFormula(formula);
  if (!compiled.ok) return { ok: false, message: compiled.error.message };
  const result = compiled.evaluate(values);
  return result.ok ? { ok: true, dimension: result.dimension } : { ok: false, message: result.error.message };
}

/**
 * A numeric checkpoint's publish problems, at paths inside the checkpoint ('expected',
 * 'variables.1.max', 'distractors.0.formula'): the prompt's placeholders, the variables, the
 * tolerances, the expected answer (it evaluates and has the asked unit's dimension) and the distractors.
 */
export function numericProblems(checkpoint: CheckpointOf<'numeric'>): LessonProblem[] {
  const problems: LessonProblem[] = [];
  const add = (path: string, message: string) => problems.push({ path, message });
  const declared = checkpoint.variables.map((v) => v.name);

  for (const name of placeholderNames(checkpoint.prompt)) {
    if (!declared.includes(name)) add('prompt', `{{${name}}} is not a declared variable (${declaredList(declared)}).`);
  }
  const variables = variableProblems(checkpoint);
  problems.push(...variables);

  const asked = readAskedUnit(checkpoint.askedUnit);
  if (!asked.ok) add('askedUnit', `The asked unit cannot be read: ${asked.message}`);
  const percent = checkpoint.relativeTolerancePercent;
  if (percent !== null && percent >= 100) add('relativeTolerancePercent', 'A relative tolerance must be below 100 %.');
  if (checkpoint.sigFigs && checkpoint.sigFigs.min > checkpoint.sigFigs.max) {
    add('sigFigs.max', `The most figures allowed (${checkpoint.sigFigs.max}) is fewer than the fewest (${checkpoint.sigFigs.min}).`);
  }

  let expectedOk = false;
  if (checkpoint.expected.trim() === '') {
    add('expected', 'Write the expected answer: a quantity such as 62.8 µT or a formula over the variables.');
  } else {
    const problem = formulaProblem(checkpoint.expected, declared, 'The expected formula');
    if (problem) add('expected', problem);
    else expectedOk = true;
  }

  let values: VariableValues | null = null;
  try {
    values = variables.length === 0 ? drawnValuesFor(checkpoint, SAMPLE_SEED) : null;
  } catch (error) {
    add('variables', error instanceof Error ? error.message : 'The variables cannot be drawn.');
  }
  const expectedDimension = expectedOk && values !== null ? dimensionFor(checkpoint.expected, values) : null;
  const dimension = expectedDimension?.ok ? expectedDimension.dimension : null;

  const absolute = checkpoint.absoluteTolerance?.trim() ?? '';
  if (absolute !== '') {
    const tolerance = parseQuantity(absolute);
    if (!tolerance.ok) add('absoluteTolerance', `The absolute tolerance cannot be read: ${tolerance.error.message}`);
    else if (tolerance.value < 0) add('absoluteTolerance', 'The absolute tolerance cannot be negative.');
    else if (dimension !== null && tolerance.dimension !== dimension) {
      add(
        'absoluteTolerance',
        `The absolute tolerance is ${dimensionPhrase(tolerance.dimension, false)}, but the answer is ${dimensionPhrase(dimension, false)}.`,
      );
    }
  }

  const ids = new Set<string>();
  checkpoint.distractors.forEach((d, j) => {
    if (ids.has(d.id)) add(`distractors.${j}.id`, `Two distractors share the id ${d.id}.`);
    ids.add(d.id);
    if (d.formula.trim() === '') return add(`distractors.${j}.formula`, "Write the distractor's formula, or remove the distractor.");
    const problem = formulaProblem(d.formula, declared, 'This formula');
    if (problem) return add(`distractors.${j}.formula`, problem);
    if (values === null) return;
    const result = dimensionFor(d.formula, values);
    if (!result.ok) add(`distractors.${j}.formula`, `This formula does not evaluate: ${result.message}`);
    else if (dimension !== null && result.dimension !== dimension) {
      add(
        `distractors.${j}.formula`,
        `This formula gives ${dimensionPhrase(result.dimension, false)}, but the answer is ${dimensionPhrase(dimension, false)}: no answer could match it.`,
      );
    }
  });

  // Everything the fields above allow: the engine evaluates the spec for sample values in the asked unit.
  if (problems.length === 0) {
    const sample = sampleExpected(checkpoint, SAMPLE_SEED);
    if (sample.problem) add('expected', sample.problem);
  }
  return problems;
}
