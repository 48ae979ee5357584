/** Tolerance bands for numeric answers (2 % relative by default: common practice, no published source). */
import { correctlyRoundedAt, type SigFigRule } from './sig-figs';

export const DEFAULT_RELATIVE_TOLERANCE = 0.02;

/** A resolved tolerance: the relative share and the absolute slack in SI units (0 when none). */
export interface Tolerance {
  relative: number;
  absolute: number;
}

// Floating-point slack so an answer exactly on the band's edge (e.g. 1.02 × expected) passes on both sides.
const EDGE = 1e-12;

/**
 * Whether `answer` is within the band around `target`: |answer − target| ≤ max(relative·|target|, absolute·absScale).
 * Symmetric in the answer about the target. `absScale` rescales the absolute slack for slipped targets
 * (a power-of-ten slip moves the absolute band with it).
 */
export function withinBand(answer: number, target: number, tolerance: Tolerance, absScale = 1): boolean {
  const slack = Math.max(tolerance.relative * Math.abs(target), tolerance.absolute * absScale);
  const diff = Math.abs(answer - target);
  return diff <= slack + EDGE * Math.max(Math.abs(target), Math.abs(answer));
}

/** The typed answer as the tolerance check needs it. */
export interface AnswerForTolerance {
  value: number;
  magnitude: number;
  sigFigs: { min: number; max: number };
}

/**
 * The band check, plus the sig-fig allowance: an answer correctly rounded to an allowed number of figures counts
 * as within tolerance even outside the band. Returns false, true, or the figures at which rounding was accepted.
 */
export function withinTolerance(
  answer: AnswerForTolerance,
  target: number,
  tolerance: Tolerance,
  rule: SigFigRule | undefined,
  absScale = 1,
): boolean | number {
  if (withinBand(answer.value, target, tolerance, absScale)) return true;
  if (!rule || answer.magnitude === 0 || answer.value === 0) return false;
  const unitScale = answer.value / answer.magnitude;
  return correctlyRoundedAt(answer.magnitude, answer.sigFigs, target, unitScale, rule) ?? false;
}
