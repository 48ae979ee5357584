/**
 * Turns a validated mathjs expression tree into a closure over numbers with dimension vectors. Only numbers,
 * declared symbols, + - * / ^, parentheses and a whitelist of functions get through; everything else
 * (assignment, function definitions, property access, arrays, objects, ranges, conditionals, blocks, strings,
 * other functions such as import or evaluate) is refused with 'formula-not-allowed'.
 */
import type { MathNode } from 'mathjs';
import { describeDimension, dimensionFromVector } from './dimensions.ts';
import { PhysicsError } from './errors.ts';
import { math } from './math.ts';

/** A value in SI with the exponents of mathjs's base dimensions. */
export interface DimValue {
  v: number;
  d: readonly number[];
}

export type Scope = Readonly<Record<string, DimValue>>;
export type Compiled = (scope: Scope) => DimValue;

interface AnyNode {
  type: string;
  value?: unknown;
  name?: string;
  fn?: unknown;
  op?: string;
  args?: AnyNode[];
  content?: AnyNode;
}

const ANGLE_INDEX = math.Unit.BASE_DIMENSIONS.indexOf('ANGLE');
export const ZERO: readonly number[] = math.Unit.BASE_DIMENSIONS.map(() => 0);
const FUNCTION_NAMES = ['sqrt', 'sin', 'cos', 'tan', 'asin', 'acos', 'atan', 'atan2', 'exp', 'log', 'log10', 'abs', 'pow'] as const;
type FunctionName = (typeof FUNCTION_NAMES)[number];
const ALLOWED_FUNCTIONS: ReadonlySet<string> = new Set(FUNCTION_NAMES);
const OPERATORS = new Set(['add', 'subtract', 'multiply', 'divide', 'pow', 'unaryMinus', 'unaryPlus']);

const refuse = (what: string): PhysicsError =>
  new PhysicsError(
    'formula-not-allowed',
    `A formula may only use numbers, declared variables, + - * / ^, brackets and the usual functions; ${what} is not allowed.`,
  );
const wrongDimension = (message: string): PhysicsError => new PhysicsError('wrong-dimension', message);
const notReal = (what: string): PhysicsError => new PhysicsError('not-finite', `The formula has no real value here: ${what}.`);

const isZero = (d: readonly number[]): boolean => d.every((x) => x === 0);
const isAngleLike = (d: readonly number[]): boolean => d.every((x, k) => x === 0 || (k === ANGLE_INDEX && x === 1));
const sameDims = (a: readonly number[], b: readonly number[]): boolean => a.every((x, k) => x === b[k]);

function scaleDims(d: readonly number[], p: number): number[] {
  return d.map((x) => (x === 0 ? 0 : Number((x * p).toPrecision(12))));
}

function addDims(a: readonly number[], b: readonly number[], sign: 1 | -1): number[] {
  return a.map((x, k) => x + sign * (b[k] ?? 0));
}

function angleDims(template: readonly number[]): number[] {
  return template.map((_, k) => (k === ANGLE_INDEX ? 1 : 0));
}

function requireDimensionless(x: DimValue, fn: string): void {
  if (!isZero(x.d)) throw wrongDimension(`${fn}() needs a pure number (no unit) inside the brackets.`);
}

function power(base: DimValue, exp: DimValue): DimValue {
  requireDimensionless(exp, 'A power');
  if (base.v === 0 && exp.v < 0) throw new PhysicsError('division-by-zero', 'The formula divides by zero for these values.');
  const v = base.v ** exp.v;
  if (Number.isNaN(v)) throw notReal('a negative number to a fractional power');
  return { v, d: isZero(base.d) ? base.d : scaleDims(base.d, exp.v) };
}

// Sums allow an angle with a pure number (radians are dimensionless in SI); anything else must match.
function sum(a: DimValue, b: DimValue, sign: 1 | -1): DimValue {
  if (sameDims(a.d, b.d)) return { v: a.v + sign * b.v, d: a.d };
  if (isAngleLike(a.d) && isAngleLike(b.d)) return { v: a.v + sign * b.v, d: isZero(a.d) ? b.d : a.d };
  const [x, y] = [a.d, b.d].map((d) => {
    const name = describeDimension(dimensionFromVector(d)).name;
    return `${/^[aeiou]/.test(name) ? 'an' : 'a'} ${name}`;
  });
  throw wrongDimension(`The formula adds or subtracts quantities of different kinds: ${x} and ${y}.`);
}

function applyFunction(name: FunctionName, xs: DimValue[]): DimValue {
  const arity = name === 'atan2' || name === 'pow' ? 2 : name === 'log' ? xs.length : 1;
  if (xs.length !== arity || (name === 'log' && arity !== 1 && arity !== 2)) {
    throw new PhysicsError('formula-syntax', `${name}() was given the wrong number of values.`);
  }
  const [a, b] = xs as [DimValue, DimValue];
  switch (name) {
    case 'sqrt':
      if (a.v < 0) throw notReal('the square root of a negative number');
      return { v: Math.sqrt(a.v), d: scaleDims(a.d, 0.5) };
    case 'abs':
      return { v: Math.abs(a.v), d: a.d };
    case 'pow':
      return power(a, b);
    case 'sin':
    case 'cos':
    case 'tan':
      if (!isAngleLike(a.d)) throw wrongDimension(`${name}() needs an angle or a pure number.`);
      return { v: Math[name](a.v), d: ZERO };
    case 'asin':
    case 'acos':
      requireDimensionless(a, name);
      if (Math.abs(a.v) > 1) throw notReal(`${name}() of a number bigger than 1`);
      return { v: Math[name](a.v), d: angleDims(a.d) };
    case 'atan':
      requireDimensionless(a, name);
      return { v: Math.atan(a.v), d: angleDims(a.d) };
    case 'atan2':
      if (!sameDims(a.d, b.d)) throw wrongDimension('atan2() needs two quantities of the same kind.');
      return { v: Math.atan2(a.v, b.v), d: angleDims(a.d) };
    case 'exp':
      requireDimensionless(a, name);
      return { v: Math.exp(a.v), d: a.d };
    default: {
      requireDimensionless(a, name);
      if (!(a.v > 0)) throw notReal(`the logarithm of a number that is not positive`);
      let v = name === 'log10' ? Math.log10(a.v) : Math.log(a.v);
      if (b) {
        requireDimensionless(b, name);
        v /= Math.log(b.v);
      }
      return { v, d: a.d };
    }
  }
}

/** Checks every node of a parsed formula and compiles it; collects the free symbols it reads. */
export function compileTree(root: MathNode, constants: Scope, symbols: Set<string>): Compiled {
  const walk = (node: AnyNode): Compiled => {
    switch (node.type) {
      case 'ConstantNode': {
        if (typeof node.value !== 'number' || !Number.isFinite(node.value)) throw refuse('text or a special value');
        const value: DimValue = { v: node.value, d: ZERO };
        return () => value;
      }
      case 'SymbolNode': {
        const name = node.name ?? '';
        const constant = Object.hasOwn(constants, name) ? constants[name] : undefined;
        if (constant) return () => constant;
        if (!/^[A-Za-z][A-Za-z0-9_]*$/.test(name)) throw refuse(`the name "${name}"`);
        symbols.add(name);
        return (scope) => scope[name] as DimValue;
      }
      case 'ParenthesisNode':
        if (!node.content) throw refuse('empty brackets');
        return walk(node.content);
      case 'OperatorNode': {
        const fn = typeof node.fn === 'string' ? node.fn : '';
        if (!OPERATORS.has(fn)) throw refuse(`the operator "${node.op ?? fn}"`);
        const [x, y] = (node.args ?? []).map(walk);
        if (!x || (fn !== 'unaryMinus' && fn !== 'unaryPlus' && !y)) throw refuse('an incomplete operator');
        const y2 = y as Compiled;
        switch (fn) {
          case 'add':
            return (s) => sum(x(s), y2(s), 1);
          case 'subtract':
            return (s) => sum(x(s), y2(s), -1);
          case 'multiply':
            return (s) => {
              const a = x(s);
              const b = y2(s);
              return { v: a.v * b.v, d: addDims(a.d, b.d, 1) };
            };
          case 'divide':
            return (s) => {
              const a = x(s);
              const b = y2(s);
              if (b.v === 0) throw new PhysicsError('division-by-zero', 'The formula divides by zero for these values.');
              return { v: a.v / b.v, d: addDims(a.d, b.d, -1) };
            };
          case 'pow':
            return (s) => power(x(s), y2(s));
          case 'unaryMinus':
            return (s) => {
              const a = x(s);
              return { v: -a.v, d: a.d };
            };
          default:
            return x;
        }
      }
      case 'FunctionNode': {
        const fn = node.fn as AnyNode | undefined;
        const name = fn?.type === 'SymbolNode' ? (fn.name ?? '') : '';
        if (!ALLOWED_FUNCTIONS.has(name)) throw refuse(name ? `the function "${name}"` : 'this kind of function call');
        const allowed = name as FunctionName;
        const args = (node.args ?? []).map(walk);
        return (s) =>
          applyFunction(
            allowed,
            args.map((a) => a(s)),
          );
      }
      default:
        // AssignmentNode, FunctionAssignmentNode, AccessorNode, IndexNode, ObjectNode, ArrayNode, BlockNode,
        // RangeNode, ConditionalNode, RelationalNode, … : never evaluated.
        throw refuse(`"${describeNode(node.type)}"`);
    }
  };
  return walk(root as unknown as AnyNode);
}

function describeNode(type: string): string {
  const words: Record<string, string> = {
    AssignmentNode: 'assignment (=)',
    FunctionAssignmentNode: 'defining a function',
    AccessorNode: 'reading a property or index',
    IndexNode: 'an index',
    ObjectNode: 'an object { }',
    ArrayNode: 'a list [ ]',
    BlockNode: 'several statements',
    RangeNode: 'a range (:)',
    ConditionalNode: 'a condition (? :)',
    RelationalNode: 'a comparison',
  };
  return words[type] ?? type;
}
