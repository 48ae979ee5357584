/** Shapes shared by the units, formula and grading parts of the physics engine. */

/** A physical dimension by name: 'magnetic-field', 'length', 'current', 'dimensionless', … (see dimensions.ts). */
export type Dimension = string;

/** A problem with a student's or a teacher's input, with a message a 15-year-old understands. */
export interface EngineError {
  code: string;
  message: string;
}

export type Failure = { ok: false; error: EngineError };

export interface ParsedQuantity {
  ok: true;
  /** The value in SI units (63 µT → 6.3e-5). */
  value: number;
  /** The unit as written, normalised ('µT' for 'uT'); '' for a bare number. */
  unit: string;
  dimension: Dimension;
  /** The number as typed, in its own unit (63 for '63 µT'). */
  magnitude: number;
  /** Significant figures of the typed number; min < max when trailing zeros have no decimal point ('6300' → 2..4). */
  sigFigs: { min: number; max: number };
  /** Whether the unit carries an SI prefix (mT, µT, kA, cm). */
  prefixed: boolean;
}

export type ParseResult = ParsedQuantity | Failure;

export interface ParseOptions {
  /** BCP 47 locale of the school, e.g. 'en-GB' or 'fr-FR'; a comma locale reads the comma as the decimal sign. */
  locale?: string;
  /** The dimension the question asks for, so a message can say what was expected ('did you mean T (tesla)?'). */
  expected?: Dimension;
}

export type FormulaResult = { ok: true; value: number; unit: string; dimension: Dimension } | Failure;

/** A teacher-declared per-student variable: a count when it has no unit. */
export interface VariableSpec {
  name: string;
  min: number;
  max: number;
  step: number;
  /** The unit the range is given in and the student sees ('cm'); absent for a plain count. */
  unit?: string;
  /** What a mistake check may change: a radius (doubled or halved) or a number of turns (set to 1). */
  role?: 'radius' | 'turns';
}

/** A value per variable: a quantity string ('4.5 cm') or a plain number for a count. */
export type VariableValues = Record<string, number | string>;
