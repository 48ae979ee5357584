/** Shapes of the numeric grader: the teacher's spec, the student's context and the grade. */
import type { Dimension, EngineError, ParsedQuantity, VariableSpec, VariableValues } from '../units/types';
import type { SigFigRule } from './sig-figs';

export interface ToleranceSpec {
  /** Fraction of the expected value, e.g. 0.02 for 2 %. Default 0.02 when no absolute tolerance is given (common practice). */
  relative?: number;
  /** A quantity with the answer's dimension, e.g. '0.5 uT'. An answer passes when within EITHER tolerance. */
  absolute?: string;
}

/** A teacher's wrong formula with the feedback a student who used it should see. */
export interface DistractorSpec {
  id: string;
  formula: string;
  feedback: string;
}

export interface NumericSpec {
  /** A quantity ('62.8 uT') or a formula over `variables` and constants ('mu0*N*I/(2*a)'). */
  expected: string;
  /** Per-student variables; the roles 'radius' and 'turns' enable those mistake checks. */
  variables?: VariableSpec[];
  tolerance?: ToleranceSpec;
  sigFigs?: SigFigRule;
  /** Default: true when the expected value has a dimension. When false, a bare number is read in the expected unit. */
  requireUnit?: boolean;
  distractors?: DistractorSpec[];
}

export interface GradeContext {
  /** The student's drawn values (drawVariables), needed when `expected` is a formula over variables. */
  values?: VariableValues;
  /** The school's BCP 47 locale; a comma locale reads the comma as the decimal sign. */
  locale?: string;
}

export type GradeErrorCode = 'empty' | 'not-a-number' | 'unknown-unit' | 'wrong-dimension' | 'missing-unit';

export type MistakeKind =
  | 'sign'
  | 'prefix'
  | 'power-of-ten'
  | 'factor-2'
  | 'factor-pi'
  | 'factor-2pi'
  | 'radius-diameter'
  | 'turns'
  | 'sig-figs'
  | `distractor:${string}`;

export interface NumericGrade {
  /** True only when the answer meets the whole spec: value within tolerance and figures allowed. Never with a mistake. */
  correct: boolean;
  /** Credit from 0 to 1: 1 when correct; 1 − penalty for a right value with the wrong number of figures; else 0. */
  score: number;
  /** The value is within tolerance (directly, or correctly rounded under the sig-fig rule). */
  withinTolerance: boolean;
  /** The expected answer in SI: value, the SI unit symbol and the dimension. For the API to show when it decides. */
  expected: { value: number; unit: string; dimension: Dimension };
  /** The answer as read; a bare number accepted under requireUnit false is given in the expected unit. */
  parsed: ParsedQuantity | null;
  /** |answer − expected| / |expected|; null when nothing was parsed or the expected value is 0. */
  relativeError: number | null;
  /** Figures at which a correctly rounded answer was accepted outside the relative band. */
  roundedTo?: number;
  mistake?: MistakeKind;
  error?: EngineError & { code: GradeErrorCode };
  /** Short, specific and kind; never states the expected value. */
  feedback: string;
}
