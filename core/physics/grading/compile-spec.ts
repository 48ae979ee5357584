/**
 * Turns a NumericSpec into what grading needs, once: the expected quantity parsed or its formula compiled,
 * the tolerance resolved to SI, the distractor formulas compiled. Cached per spec object and per spec content.
 */
import { describeDimension } from '../units/dimensions';
import { compileFormula } from '../units/evaluate-formula';
import { parseQuantity } from '../units/parse-quantity';
import type { Dimension, FormulaResult, VariableValues } from '../units/types';
import { withArticle } from './feedback';
import { sigFigRuleProblem, type SigFigRule } from './sig-figs';
import { DEFAULT_RELATIVE_TOLERANCE, type Tolerance } from './tolerance';
import type { NumericSpec } from './types';

/** A spec (or the values for it) that cannot be graded: a teacher's or a caller's problem, never a student's. */
export class GradingSetupError extends Error {
  readonly code: 'invalid-spec' | 'missing-values';

  constructor(code: 'invalid-spec' | 'missing-values', message: string) {
    super(message);
    this.name = 'GradingSetupError';
    this.code = code;
  }
}

type Compiled = Extract<ReturnType<typeof compileFormula>, { ok: true }>;

export interface CompiledDistractor {
  id: string;
  feedback: string;
  formula: Compiled;
}

export interface ExpectedValue {
  value: number;
  dimension: Dimension;
  /** SI value of one "expected unit": how a bare number is read when no unit is required (1e-6 for '62.8 uT'). */
  unitScale: number;
}

export interface CompiledSpec {
  /** The expected value for one student's values. Throws GradingSetupError when they do not fit the formula. */
  expectedFor(values: VariableValues | undefined): ExpectedValue;
  formula: Compiled | null;
  tolerance: Tolerance;
  /** Absolute tolerance as written, checked against the expected dimension on first use. */
  absoluteDimension: Dimension | null;
  rule: SigFigRule | undefined;
  requireUnit: boolean | undefined;
  distractors: CompiledDistractor[];
  radiusVariables: string[];
  turnsVariables: string[];
}

function fail(message: string): never {
  throw new GradingSetupError('invalid-spec', message);
}

function compileOrFail(expression: string, what: string): Compiled {
  const compiled = compileFormula(expression);
  if (!compiled.ok) fail(`${what} "${expression}" cannot be used: ${compiled.error.message}`);
  return compiled;
}

function fromFormula(result: FormulaResult): ExpectedValue {
  if (!result.ok) throw new GradingSetupError('missing-values', `The expected formula could not be worked out: ${result.error.message}`);
  if (!Number.isFinite(result.value))
    throw new GradingSetupError('missing-values', 'The expected formula gives no finite value for these values.');
  return { value: result.value, dimension: result.dimension, unitScale: 1 };
}

function compile(spec: NumericSpec): CompiledSpec {
  if (typeof spec.expected !== 'string' || spec.expected.trim() === '') fail('The expected answer is empty.');
  const declared = new Set((spec.variables ?? []).map((v) => v.name));
  const quantity = parseQuantity(spec.expected);
  let formula: Compiled | null = null;
  let fixed: ExpectedValue | null = null;
  if (quantity.ok) {
    fixed = {
      value: quantity.value,
      dimension: quantity.dimension,
      unitScale: quantity.magnitude !== 0 ? quantity.value / quantity.magnitude : 1,
    };
  } else {
    formula = compileOrFail(spec.expected, 'The expected formula');
    const unknown = formula.symbols.filter((s: string) => !declared.has(s));
    if (unknown.length > 0 && spec.variables !== undefined)
      fail(`The expected formula uses ${unknown.join(', ')}, which is not a declared variable.`);
    if (formula.symbols.length === 0) fixed = fromFormula(formula.evaluate({}));
  }

  const rel = spec.tolerance?.relative;
  const absText = spec.tolerance?.absolute;
  if (rel !== undefined && !(rel >= 0 && rel < 1)) fail(`A relative tolerance must be from 0 to less than 1 (0.02 is 2 %); got ${rel}.`);
  let absolute = 0;
  let absoluteDimension: Dimension | null = null;
  if (absText !== undefined) {
    const abs = parseQuantity(absText);
    if (!abs.ok) fail(`The absolute tolerance "${absText}" cannot be read: ${abs.error.message}`);
    if (!(abs.value >= 0)) fail(`The absolute tolerance "${absText}" must not be negative.`);
    absolute = abs.value;
    absoluteDimension = abs.dimension;
  }
  const tolerance: Tolerance = { relative: rel ?? (absText === undefined ? DEFAULT_RELATIVE_TOLERANCE : 0), absolute };

  if (spec.sigFigs) {
    const problem = sigFigRuleProblem(spec.sigFigs);
    if (problem) fail(problem);
  }
  const ids = new Set<string>();
  const distractors = (spec.distractors ?? []).map((d) => {
    if (!d.id || ids.has(d.id)) fail(`Each distractor needs its own id; "${d.id}" is empty or used twice.`);
    ids.add(d.id);
    return { id: d.id, feedback: d.feedback, formula: compileOrFail(d.formula, `Distractor "${d.id}"`) };
  });
  const checkAbsolute = (dimension: Dimension) => {
    if (absoluteDimension === null || absoluteDimension === dimension) return;
    const name = (d: Dimension) => withArticle(describeDimension(d).name);
    fail(`The absolute tolerance "${absText}" is ${name(absoluteDimension)}, but the answer is ${name(dimension)}.`);
  };
  if (fixed) checkAbsolute(fixed.dimension);
  const byRole = (role: 'radius' | 'turns') => (spec.variables ?? []).filter((v) => v.role === role).map((v) => v.name);

  const compiled: CompiledSpec = {
    expectedFor(values) {
      let e = fixed;
      if (!e) {
        if (!values) throw new GradingSetupError('missing-values', `The expected formula needs values for ${formula!.symbols.join(', ')}.`);
        e = fromFormula(formula!.evaluate(values));
      }
      checkAbsolute(e.dimension);
      return e;
    },
    formula,
    tolerance,
    absoluteDimension,
    rule: spec.sigFigs,
    requireUnit: spec.requireUnit,
    distractors,
    radiusVariables: byRole('radius'),
    turnsVariables: byRole('turns'),
  };
  return compiled;
}

const byObject = new WeakMap<NumericSpec, CompiledSpec>();
const byContent = new Map<string, CompiledSpec>();
const CONTENT_CACHE_SIZE = 500;

/** The compiled form of a spec: the same object is compiled once; equal specs rebuilt per request share one too. */
export function compileSpec(spec: NumericSpec): CompiledSpec {
  const hit = byObject.get(spec);
  if (hit) return hit;
  const key = JSON.stringify(spec);
  let compiled = byContent.get(key);
  if (!compiled) {
    compiled = compile(spec);
    if (byContent.size >= CONTENT_CACHE_SIZE) byContent.delete(byContent.keys().next().value!);
    byContent.set(key, compiled);
  }
  byObject.set(spec, compiled);
  return compiled;
}

/** Checks a spec before it is saved: null when it can be graded, else a message for the teacher. */
export function numericSpecProblem(spec: NumericSpec): string | null {
  try {
    compileSpec(spec);
    return null;
  } catch (error) {
    if (error instanceof GradingSetupError) return error.message;
    throw error;
  }
}
