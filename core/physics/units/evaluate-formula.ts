/** evaluateFormula / compileFormula: a teacher's formula over declared variables, evaluated in SI with dimensions. */
import { dimensionFromVector, siUnitFor } from './dimensions.ts';
import { fail, PhysicsError } from './errors.ts';
import { compileTree, ZERO, type Compiled, type DimValue, type Scope } from './formula-tree.ts';
import { FORMULA_CONSTANTS, parseFormulaTree } from './math.ts';
import { parseQuantity } from './parse-quantity.ts';
import type { Failure, FormulaResult, VariableValues } from './types.ts';
import { normaliseCharacters, plainSuperscripts } from './unit-text.ts';
import { parseUnit } from './unit-parser.ts';

/** A compiled formula: evaluate it with many variable sets; `symbols` are the variables it needs. */
export interface CompiledFormula {
  ok: true;
  evaluate(variables: VariableValues): FormulaResult;
  symbols: string[];
}

const MAX_FORMULA = 500;
const CACHE_LIMIT = 2000;
const compiledCache = new Map<string, CompiledFormula | Failure>();
const variableCache = new Map<string, DimValue | Failure>();

const constants: Scope = Object.fromEntries(
  Object.entries(FORMULA_CONSTANTS).map(([name, { value, unit }]) => {
    const parsed = parseUnit(unit);
    if (!parsed.ok) throw new Error(`Engine constant ${name} has a bad unit`);
    return [name, { v: value, d: parsed.dims }];
  }),
);

function remember<T>(cache: Map<string, T>, key: string, value: T): T {
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(key, value);
  return value;
}

function normaliseFormula(expression: string): string {
  return normaliseCharacters(expression)
    .replace(/[×]/g, '*')
    .replace(/π/g, 'pi')
    .replace(/µ0|μ0|µ_0|mu_0/g, 'mu0')
    .replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹⁻⁺]+/g, (run) => `^(${plainSuperscripts(run)})`);
}

function variableValue(name: string, raw: number | string): DimValue | Failure {
  if (typeof raw === 'number') {
    if (!Number.isFinite(raw)) return fail('invalid-variable', `The value of ${name} is not a finite number.`);
    return { v: raw, d: ZERO };
  }
  const hit = variableCache.get(raw);
  if (hit) return hit;
  const parsed = parseQuantity(raw);
  const value: DimValue | Failure = parsed.ok
    ? { v: parsed.value, d: parseUnitDims(parsed.unit) }
    : fail('invalid-variable', `The value of ${name} ("${raw}") cannot be read: ${parsed.error.message}`);
  return remember(variableCache, raw, value);
}

function parseUnitDims(unit: string): readonly number[] {
  const parsed = parseUnit(unit);
  if (!parsed.ok) throw new Error('a parsed unit did not parse again');
  return parsed.dims;
}

function run(compiled: Compiled, symbols: string[], variables: VariableValues): FormulaResult {
  const scope: Record<string, DimValue> = {};
  for (const name of symbols) {
    if (!Object.hasOwn(variables, name)) {
      return fail('unknown-variable', `The formula uses "${name}", but no variable called ${name} has been given.`);
    }
    const value = variableValue(name, variables[name] as number | string);
    if ('ok' in value) return value;
    scope[name] = value;
  }
  try {
    const { v, d } = compiled(scope);
    if (Number.isNaN(v)) return fail('not-finite', 'The formula has no real value for these numbers.');
    if (!Number.isFinite(v)) return fail('not-finite', 'The formula gives a number too large to work with.');
    return { ok: true, value: v === 0 ? 0 : v, unit: siUnitFor(d), dimension: dimensionFromVector(d) };
  } catch (error) {
    if (error instanceof PhysicsError) return fail(error.code, error.message);
    throw error;
  }
}

function compileUncached(expression: string): CompiledFormula | Failure {
  const text = normaliseFormula(expression).trim();
  if (text === '') return fail('empty', 'The formula is empty.');
  if (text.length > MAX_FORMULA) return fail('formula-too-long', `A formula may have at most ${MAX_FORMULA} characters.`);
  let tree;
  try {
    tree = parseFormulaTree(text);
  } catch (error) {
    const detail = error instanceof Error ? ` (${error.message})` : '';
    return fail('formula-syntax', `The formula cannot be read${detail}. Check the brackets and the operators.`);
  }
  const symbols = new Set<string>();
  let compiled: Compiled;
  try {
    compiled = compileTree(tree, constants, symbols);
  } catch (error) {
    if (error instanceof PhysicsError) return fail(error.code, error.message);
    throw error;
  }
  const list = [...symbols].sort();
  return { ok: true, symbols: list, evaluate: (variables) => run(compiled, list, variables) };
}

/**
 * Compiles a formula once (cached by its text). Allowed: numbers, declared variables, pi, e, mu0 (CODATA 2018),
 * + - * / ^, brackets, sqrt sin cos tan asin acos atan atan2 exp log log10 abs pow. Errors: 'empty',
 * 'formula-syntax', 'formula-not-allowed', 'formula-too-long'.
 */
export function compileFormula(expression: string): CompiledFormula | Failure {
  return compiledCache.get(expression) ?? remember(compiledCache, expression, compileUncached(expression));
}

/**
 * Evaluates a formula with variables given as quantity strings ('5 cm') or plain numbers (counts); the value is in
 * SI with its SI unit ('T') and dimension. Errors as compileFormula, plus 'unknown-variable', 'invalid-variable',
 * 'wrong-dimension', 'division-by-zero', 'not-finite' (never NaN or Infinity).
 */
export function evaluateFormula(expression: string, variables: VariableValues): FormulaResult {
  const compiled = compileFormula(expression);
  return compiled.ok ? compiled.evaluate(variables) : compiled;
}
