/** Assignments logic shared by the API and the web app: school time, phases, policies, coverage, completion. */
export {
  acceptAnswer,
  assignmentPhase,
  closesAt,
  effectiveAnswerTime,
  isClosed,
  type Acceptance,
  type AssignmentDates,
} from './assignment-phase';
export { answerText } from './answer-text';
export { completionOf, type CompletionInput } from './completion';
export {
  END_ALLOWANCE_MS,
  addCoverage,
  audience,
  countWatched,
  coverageBytes,
  intervalProblems,
  isWatched,
  recordingSeconds,
} from './coverage';
export { feedbackShown, visibleGrade, type VisibilityContext } from './grade-visibility';
export { assertTimeZone, formatSchoolTime, instantToLocal, localToInstant } from './local-time';
export { revealFor, type RevealOptions } from './reveal-text';
export { studentState, type StudentStateInput } from './student-state';
export { changedAnswerableKeys, moveProblems } from './version-compat';
