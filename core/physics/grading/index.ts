/** The grading engine's public surface (re-exported by core/physics/index.ts). */
export { gradeNumeric } from './grade-numeric';
export { GradingSetupError, numericSpecProblem } from './compile-spec';
export { itemAnalysis, pearson, type ItemAnalysis, type ItemStatistics, type ScoredResponse } from './item-analysis';
export { roundToSigFigs, figuresAllowed, correctlyRoundedAt, type SigFigRule } from './sig-figs';
export { DEFAULT_RELATIVE_TOLERANCE } from './tolerance';
export type { DistractorSpec, GradeContext, GradeErrorCode, MistakeKind, NumericGrade, NumericSpec, ToleranceSpec } from './types';
