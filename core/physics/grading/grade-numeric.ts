/** The numeric grader: one student's typed answer against a teacher's spec. */
import { describeDimension } from '../units/dimensions';
import { parseQuantity } from '../units/parse-quantity';
import type { EngineError, ParsedQuantity } from '../units/types';
import { compileSpec } from './compile-spec';
import {
  CORRECT_FEEDBACK,
  emptyMessage,
  missingUnitMessage,
  roundedFeedback,
  sigFigFeedback,
  WRONG_FEEDBACK,
  wrongDimensionMessage,
} from './feedback';
import { detectMistake } from './mistakes';
import { figuresAllowed } from './sig-figs';
import { withinTolerance } from './tolerance';
import type { GradeContext, GradeErrorCode, NumericGrade, NumericSpec } from './types';

const PARSE_CODES: ReadonlySet<string> = new Set<GradeErrorCode>([
  'empty',
  'not-a-number',
  'unknown-unit',
  'wrong-dimension',
  'missing-unit',
]);

function refused(expected: NumericGrade['expected'], parsed: ParsedQuantity | null, code: GradeErrorCode, message: string): NumericGrade {
  return {
    correct: false,
    score: 0,
    withinTolerance: false,
    expected,
    parsed,
    relativeError: null,
    error: { code, message },
    feedback: message,
  };
}

/** Parser errors keep their own message; a code outside the grader's list reads as "not a number". */
function fromParseError(error: EngineError): { code: GradeErrorCode; message: string } {
  return { code: PARSE_CODES.has(error.code) ? (error.code as GradeErrorCode) : 'not-a-number', message: error.message };
}

/**
 * Grades `answerText` against `spec`. The spec's expected answer is a quantity ('62.8 uT') or a formula over
 * the declared variables, evaluated with `context.values` (the student's drawn values). Student problems come
 * back as `error` ('empty', 'not-a-number', 'unknown-unit', 'wrong-dimension', 'missing-unit'); a spec that
 * cannot be graded throws GradingSetupError (check specs on save with numericSpecProblem).
 */
export function gradeNumeric(spec: NumericSpec, answerText: string, context: GradeContext = {}): NumericGrade {
  const compiled = compileSpec(spec);
  const e = compiled.expectedFor(context.values);
  const expected = { value: e.value, unit: describeDimension(e.dimension).symbol, dimension: e.dimension };

  if (typeof answerText !== 'string' || answerText.trim() === '') return refused(expected, null, 'empty', emptyMessage(e.dimension));
  const result = parseQuantity(
    answerText,
    context.locale === undefined ? { expected: e.dimension } : { locale: context.locale, expected: e.dimension },
  );
  if (!result.ok) {
    const { code, message } = fromParseError(result.error);
    return refused(expected, null, code, message);
  }

  let parsed: ParsedQuantity = result;
  if (parsed.unit === '' && parsed.dimension === 'dimensionless' && e.dimension !== 'dimensionless') {
    if (compiled.requireUnit ?? true) return refused(expected, parsed, 'missing-unit', missingUnitMessage(e.dimension));
    // No unit required: the bare number is read in the unit the teacher wrote the answer in.
    parsed = { ...parsed, value: parsed.magnitude * e.unitScale, dimension: e.dimension };
  }
  if (parsed.dimension !== e.dimension) {
    return refused(expected, parsed, 'wrong-dimension', wrongDimensionMessage(answerText, parsed.dimension, e.dimension));
  }

  const relativeError = e.value !== 0 ? Math.abs(parsed.value - e.value) / Math.abs(e.value) : null;
  const within = withinTolerance(parsed, e.value, compiled.tolerance, compiled.rule);
  // Literal objects, no spreads: this is the hot path of every graded answer.
  if (within !== false) {
    const rule = compiled.rule;
    if (rule && !figuresAllowed(parsed.sigFigs, rule)) {
      const score = 1 - (rule.penalty ?? 0);
      return {
        correct: false,
        score,
        withinTolerance: true,
        expected,
        parsed,
        relativeError,
        mistake: 'sig-figs',
        feedback: sigFigFeedback(rule),
      };
    }
    if (within === true)
      return { correct: true, score: 1, withinTolerance: true, expected, parsed, relativeError, feedback: CORRECT_FEEDBACK };
    return {
      correct: true,
      score: 1,
      withinTolerance: true,
      expected,
      parsed,
      relativeError,
      roundedTo: within,
      feedback: roundedFeedback(within),
    };
  }
  const slip = detectMistake(parsed, e.value, compiled, context.values);
  if (slip)
    return {
      correct: false,
      score: 0,
      withinTolerance: false,
      expected,
      parsed,
      relativeError,
      mistake: slip.kind,
      feedback: slip.feedback,
    };
  return { correct: false, score: 0, withinTolerance: false, expected, parsed, relativeError, feedback: WRONG_FEEDBACK };
}
