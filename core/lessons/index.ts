/** Lessons logic shared by the API and the web app: publish rules, grading, the student view, versions. */
export { canonicalJson } from './canonical-json';
export { checkpointLabel } from './checkpoint-label';
export { checkpointProblems } from './checkpoint-problems';
export { SIGN_CHOICE_LABELS, SIGN_CHOICE_SET_LABELS, signChoiceLabel, signChoicesOf } from './choice-labels';
export { AnswerMismatchError, CheckpointNotGradableError, gradeCheckpoint, type GradeOptions } from './grade-checkpoint';
export { KATEX_OPTIONS } from './katex-options';
export { lessonProblems, type LessonProblemContext } from './lesson-problems';
export { latexProblem, markdownProblems, mathSpans } from './markdown-problems';
export { newChapter, newCheckpoint } from './new-checkpoint';
export { newKey } from './new-key';
export { formatInUnit, formatNumber, readAskedUnit } from './numeric-format';
export { numericProblems } from './numeric-problems';
export {
  drawnValuesFor,
  sampleExpected,
  toNumericSpec,
  toVariableSpecs,
  type NumericCheckpoint,
  type NumericCheckpointSpec,
  type SampleExpected,
} from './numeric-spec';
export { fillPlaceholders, placeholderNames } from './placeholders';
export { firstWords, markdownToPlain } from './plain-text';
export { suggestCautions, type Caution, type CautionTopic } from './safety-suggestions';
export { normaliseShortText, matchesAccepted } from './short-text-match';
export { seededShuffle } from './shuffle';
export { toStudentCheckpoint, toStudentView, type StudentViewOptions } from './student-view';
export { formatGap, formatTime } from './time-format';
export { diffContent } from './version-diff';
export * from './sign-derivation';
export * from './models/index';
