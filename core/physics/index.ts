/**
 * Pinfield's physics and grading engine: pure, isomorphic functions with SI units in and out.
 * The API grades every answer with it; the web app uses it for live equation cards and previews.
 * See core/physics/README.md for each function's conventions.
 */
export { MU0, MU0_TEXTBOOK } from './constants';
export type { Vec3 } from './vector';
export * from './fields/index';
export { parseQuantity } from './units/parse-quantity';
export { compileFormula, evaluateFormula, type CompiledFormula } from './units/evaluate-formula';
export { drawVariables } from './units/draw-variables';
export { describeDimension, dimensionOf, type DimensionInfo } from './units/dimensions';
export type * from './units/types';
export * from './grading/index';
