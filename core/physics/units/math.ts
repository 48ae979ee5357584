/**
 * The engine's one mathjs instance: only the factories it needs, the trade units mathjs lacks (gauss),
 * and the functions that could reach outside a formula disabled. User input never defines units.
 */
import { MU0 } from '../constants';
import {
  absDependencies,
  acosDependencies,
  addDependencies,
  asinDependencies,
  atan2Dependencies,
  atanDependencies,
  cosDependencies,
  create,
  createUnitDependencies,
  divideDependencies,
  eDependencies,
  expDependencies,
  log10Dependencies,
  logDependencies,
  multiplyDependencies,
  parseDependencies,
  piDependencies,
  powDependencies,
  sinDependencies,
  sqrtDependencies,
  subtractDependencies,
  tanDependencies,
  unaryMinusDependencies,
  unaryPlusDependencies,
  unitDependencies,
  type FactoryFunctionMap,
  type MathNode,
} from 'mathjs';

// mathjs's typings declare each *Dependencies as possibly undefined; at run time every one is a factory map.
const factories = {
  absDependencies,
  acosDependencies,
  addDependencies,
  asinDependencies,
  atan2Dependencies,
  atanDependencies,
  cosDependencies,
  createUnitDependencies,
  divideDependencies,
  eDependencies,
  expDependencies,
  log10Dependencies,
  logDependencies,
  multiplyDependencies,
  parseDependencies,
  piDependencies,
  powDependencies,
  sinDependencies,
  sqrtDependencies,
  subtractDependencies,
  tanDependencies,
  unaryMinusDependencies,
  unaryPlusDependencies,
  unitDependencies,
} as FactoryFunctionMap;
const instance = create(factories);

// Gauss, 1 G = 1e-4 T: BIPM SI Brochure 8th ed. (2006) Table 9; NIST SP 811 Table 10. 'G' takes the short
// prefixes (mG), 'gauss' the long ones (milligauss). Defined here, once, before createUnit is disabled.
instance.createUnit({
  G: { definition: '1e-4 T', prefixes: 'short' },
  gauss: { definition: '1e-4 T', prefixes: 'long' },
});

instance.import({ mu0: instance.unit(MU0, 'N / A^2') }, { override: true });

// Kept before the overrides below: the only parser the engine uses, and only on formula text that
// formula-tree.ts then checks node by node.
const parseExpression: (expression: string) => MathNode = instance.parse;

function disabled(name: string): () => never {
  return () => {
    throw new Error(`Function ${name} is disabled in Pinfield formulas`);
  };
}

// The standard mathjs hardening (mathjs docs, "Security"): anything that could define, parse or run code.
instance.import(
  {
    import: disabled('import'),
    createUnit: disabled('createUnit'),
    evaluate: disabled('evaluate'),
    parse: disabled('parse'),
    compile: disabled('compile'),
    simplify: disabled('simplify'),
    derivative: disabled('derivative'),
    resolve: disabled('resolve'),
    reviver: disabled('reviver'),
    parser: disabled('parser'),
  },
  { override: true },
);

/** The hardened mathjs instance (units, arithmetic, the whitelisted functions; import/createUnit/evaluate… throw). */
export const math = instance;

/** Parses formula text into a mathjs expression tree; callers must validate the tree before using it. */
export function parseFormulaTree(expression: string): MathNode {
  return parseExpression(expression);
}

/** Constants a formula may use, as values with their SI unit (dimension from dimensions.ts). */
export const FORMULA_CONSTANTS: Readonly<Record<string, { value: number; unit: string }>> = {
  pi: { value: Math.PI, unit: '' },
  e: { value: Math.E, unit: '' },
  mu0: { value: MU0, unit: 'N/A^2' },
};
