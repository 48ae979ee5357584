/**
 * Feedback and error messages for numeric answers: short, specific, kind, written for a 15-year-old, and never
 * stating the expected value (the API decides when to show it).
 */
import { describeDimension } from '../units/dimensions';
import type { Dimension } from '../units/types';
import { describeFigureRange, type SigFigRule } from './sig-figs';
import type { MistakeKind } from './types';

const VOWEL = /^[aeiou]/i;

const isPureNumber = (dimension: Dimension): boolean => dimension === 'dimensionless' || dimension === 'count';

/** 'a length', 'an electric current'. */
export function withArticle(noun: string): string {
  return `${VOWEL.test(noun) ? 'an' : 'a'} ${noun}`;
}

/** What the question asks for: "a magnetic field, in tesla" or "a plain number, with no unit". */
export function describeAsked(dimension: Dimension): string {
  if (isPureNumber(dimension)) return 'a plain number, with no unit';
  const d = describeDimension(dimension);
  return `${withArticle(d.name)}, in ${d.unitName}`;
}

/** The answer as typed, shortened so a long paste does not flood the message. */
function quote(answerText: string): string {
  const t = answerText.trim();
  return t.length > 32 ? 'Your answer' : t;
}

/** "63 m is a length; this question asks for a magnetic field, in tesla." */
export function wrongDimensionMessage(answerText: string, answerDimension: Dimension, expected: Dimension): string {
  const what = isPureNumber(answerDimension) ? 'a plain number' : withArticle(describeDimension(answerDimension).name);
  return `${quote(answerText)} is ${what}; this question asks for ${describeAsked(expected)}.`;
}

/** "Add a unit: this question asks for a magnetic field, in tesla (T)." */
export function missingUnitMessage(expected: Dimension): string {
  const d = describeDimension(expected);
  return `Add a unit: this question asks for ${withArticle(d.name)}, in ${d.unitName} (${d.symbol}).`;
}

export function emptyMessage(expected: Dimension): string {
  return isPureNumber(expected) ? 'Type your answer as a number.' : 'Type your answer as a number with its unit.';
}

export const CORRECT_FEEDBACK = 'Correct.';
export const WRONG_FEEDBACK = 'Not quite. Check your working and try again.';

export function roundedFeedback(figures: number): string {
  return `Correct, rounded to ${figures} significant figure${figures === 1 ? '' : 's'}.`;
}

export function sigFigFeedback(rule: SigFigRule): string {
  return `Right value. Now give it to ${describeFigureRange(rule)} significant figures.`;
}

/** Details a slip message may use: the variable a formula slip changed, the unit the student typed. */
export interface SlipDetail {
  variable?: string;
  /** For radius-diameter: 'doubled' (the diameter used for the radius) or 'halved'. */
  change?: 'doubled' | 'halved';
  unit?: string;
}

/** The feedback for a detected slip (distractors carry the teacher's own feedback instead). */
export function mistakeFeedback(kind: Exclude<MistakeKind, `distractor:${string}` | 'sig-figs'>, detail: SlipDetail = {}): string {
  switch (kind) {
    case 'sign':
      return 'The size looks right, but check the sign: which way does it point?';
    case 'turns':
      return `It looks as if you worked out the field of a single turn. Check you used the number of turns${detail.variable ? ` (${detail.variable})` : ''}.`;
    case 'radius-diameter':
      return detail.change === 'halved'
        ? `Check the radius${detail.variable ? ` (${detail.variable})` : ''}: it looks as if you halved it.`
        : `Check the radius${detail.variable ? ` (${detail.variable})` : ''}: it looks as if you used the diameter instead.`;
    case 'prefix':
      return `The digits look right. Check the prefix on your unit${detail.unit ? ` (${detail.unit})` : ''}.`;
    case 'power-of-ten':
      return 'The digits look right, but the size is out by a power of ten. Check your powers of ten and unit conversions.';
    case 'factor-2':
      return 'You are out by a factor of 2. Check your formula for a missing or extra 2.';
    case 'factor-pi':
      return 'You are out by a factor of π. Check your formula for a missing or extra π.';
    case 'factor-2pi':
      return 'You are out by a factor of 2π. Check your formula for a missing or extra 2π.';
  }
}
