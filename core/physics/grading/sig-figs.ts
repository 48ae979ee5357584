/**
 * Significant-figure rules for numeric answers. Counting the figures of a typed number is parseQuantity's job
 * (ParsedQuantity.sigFigs, a { min, max } range because '6300' may have 2, 3 or 4); this module rounds and compares.
 * Conventions: OpenStax University Physics Volume 1, 1.6 Significant Figures; scoring is common practice.
 */

/** A teacher's rule: the answer should carry from `min` to `max` significant figures. */
export interface SigFigRule {
  min: number;
  max: number;
  /** Share of the score taken off for the wrong number of figures; default 0 (feedback only, full score: common practice). */
  penalty?: number;
}

/** The figures a typed number may have: min < max only when trailing zeros have no decimal point. */
export interface TypedFigures {
  min: number;
  max: number;
}

/** Checks a rule is usable; returns a message for the teacher, or null when it is fine. */
export function sigFigRuleProblem(rule: SigFigRule): string | null {
  if (!Number.isInteger(rule.min) || !Number.isInteger(rule.max) || rule.min < 1 || rule.max > 17) {
    return `A significant-figure rule needs whole numbers from 1 to 17; got ${rule.min} to ${rule.max}.`;
  }
  if (rule.min > rule.max) return `A significant-figure rule's minimum (${rule.min}) is above its maximum (${rule.max}).`;
  const penalty = rule.penalty ?? 0;
  if (!(penalty >= 0 && penalty <= 1)) return `A significant-figure penalty must be from 0 to 1; got ${penalty}.`;
  return null;
}

/** `value` rounded to `figures` significant figures (half away from zero, as taught); 0, NaN and ±Infinity pass through. */
export function roundToSigFigs(value: number, figures: number): number {
  if (!Number.isInteger(figures) || figures < 1 || figures > 100) {
    throw new RangeError(`Significant figures must be a whole number from 1 to 100; got ${figures}.`);
  }
  if (value === 0 || !Number.isFinite(value)) return value;
  // toPrecision rounds the exact binary value; nudging by a few ulps makes 0.125 → 0.13 at two figures as on paper.
  const nudged = value * (1 + 4 * Number.EPSILON);
  return Number(nudged.toPrecision(figures));
}

/** Whether the typed figures fit the rule; '6300' (2..4 figures) fits any rule that allows 2, 3 or 4. */
export function figuresAllowed(typed: TypedFigures, rule: SigFigRule): boolean {
  return typed.max >= rule.min && typed.min <= rule.max;
}

// Two numbers that are the same decimal written in the same unit differ only by conversion rounding.
const SAME = 1e-9;

/**
 * The number of figures, allowed by both the typed number and the rule, at which the typed magnitude is
 * exactly `expected` rounded — or null. Rounding happens in the student's own unit: `unitScale` is the SI
 * value of one of that unit (1e-6 for µT), so '10 mT' and '0.010 T' are both judged for an expected 0.01049 T.
 */
export function correctlyRoundedAt(
  magnitude: number,
  typed: TypedFigures,
  expected: number,
  unitScale: number,
  rule: SigFigRule,
): number | null {
  if (!(unitScale > 0) || !Number.isFinite(expected)) return null;
  const from = Math.max(typed.min, rule.min);
  const to = Math.min(typed.max, rule.max);
  if (from > to) return null;
  // Rounding to n figures moves a number by at most half a unit in its n-th figure, ≤ 0.5·|x|·10^(1−n):
  // anything further away cannot be a rounding of it (cheap test before any toPrecision).
  const inUnit = expected / unitScale;
  if (Math.abs(magnitude - inUnit) > 0.51 * Math.abs(inUnit) * 10 ** (1 - from)) return null;
  for (let n = from; n <= to; n++) {
    const rounded = roundToSigFigs(inUnit, n);
    if (rounded === magnitude || Math.abs(rounded - magnitude) <= SAME * Math.abs(rounded)) return n;
  }
  return null;
}

/** "2", "2 or 3", "2 to 4" — for feedback. */
export function describeFigureRange(rule: SigFigRule): string {
  if (rule.min === rule.max) return `${rule.min}`;
  if (rule.max === rule.min + 1) return `${rule.min} or ${rule.max}`;
  return `${rule.min} to ${rule.max}`;
}
