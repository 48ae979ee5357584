import { CHECKPOINT_KIND_LABELS, isAnswered, type Checkpoint } from '../contracts/checkpoints';
import type { CheckpointAnswer, CheckpointGradeDto } from '../contracts/student-checkpoints';
import { gradeMultipleChoice, gradeNumericAnswer, gradePrediction, gradeShortText, gradeSign, type Verdict } from './grade-answers';
import { AnswerMismatchError } from './grade-errors';
import type { VariableValues } from '../physics/units/types';

export { AnswerMismatchError, CheckpointNotGradableError } from './grade-errors';

export interface GradeOptions {
  /** The same seed the student view was built with: numeric answers are checked against these drawn values. */
  seed: string;
  /** The school's BCP 47 locale (a decimal-comma locale reads 6,3 as 6.3). */
  locale?: string;
  /** 1 for the first try. Earlier tries are taken as wrong: a right answer ends the checkpoint. */
  attempt: number;
  /** The values stored for this student at this (numeric) checkpoint; drawn from `seed` when absent. */
  values?: VariableValues;
}

/** A graded attempt with what the record keeps besides the reply. */
export interface GradedAttempt {
  grade: CheckpointGradeDto;
  /** A numeric answer's value in SI units; null otherwise or when it could not be read. */
  parsedSi: number | null;
}

function verdictFor(checkpoint: Checkpoint, answer: CheckpointAnswer, options: GradeOptions): Verdict {
  if (!isAnswered(checkpoint)) throw new AnswerMismatchError(`${CHECKPOINT_KIND_LABELS[checkpoint.kind]} checkpoints take no answer.`);
  if (answer.kind !== checkpoint.kind) {
    throw new AnswerMismatchError(
      `This checkpoint is a ${CHECKPOINT_KIND_LABELS[checkpoint.kind].toLowerCase()} question; the answer sent is for ${CHECKPOINT_KIND_LABELS[answer.kind].toLowerCase()}.`,
    );
  }
  // The kinds match (checked above); TypeScript cannot narrow the two unions together.
  switch (checkpoint.kind) {
    case 'multiple-choice':
      return gradeMultipleChoice(checkpoint, answer as Extract<CheckpointAnswer, { kind: 'multiple-choice' }>);
    case 'numeric':
      return gradeNumericAnswer(checkpoint, answer as Extract<CheckpointAnswer, { kind: 'numeric' }>, options);
    case 'short-text':
      return gradeShortText(checkpoint, answer as Extract<CheckpointAnswer, { kind: 'short-text' }>);
    case 'sign':
      return gradeSign(checkpoint, answer as Extract<CheckpointAnswer, { kind: 'sign' }>);
    case 'prediction':
      return gradePrediction(checkpoint, answer as Extract<CheckpointAnswer, { kind: 'prediction' }>);
  }
}

/**
 * Grades one attempt at a checkpoint. An answer that cannot be read (empty, unknown unit, wrong
 * dimension) is `invalid` and does not use up the attempt. After k wrong attempts the first k hints
 * are unlocked. The answer and explanation are revealed only on a right answer or on the last
 * attempt, never before. Throws AnswerMismatchError for an answer that does not fit the checkpoint,
 * and CheckpointNotGradableError for a draft checkpoint that cannot be graded yet.
 */
export function gradeCheckpoint(checkpoint: Checkpoint, answer: CheckpointAnswer, options: GradeOptions): CheckpointGradeDto {
  return gradeAttempt(checkpoint, answer, options).grade;
}

/** gradeCheckpoint with the parsed SI value the response record stores. */
export function gradeAttempt(checkpoint: Checkpoint, answer: CheckpointAnswer, options: GradeOptions): GradedAttempt {
  const verdict = verdictFor(checkpoint, answer, options);
  if (!isAnswered(checkpoint)) throw new AnswerMismatchError('This checkpoint takes no answer.');
  const attempt = Math.max(1, Math.floor(options.attempt));
  const used = verdict.invalid ? attempt - 1 : attempt;
  const wrongSoFar = verdict.invalid || verdict.correct !== false ? attempt - 1 : attempt;
  const finished = !verdict.invalid && (verdict.correct === true || attempt >= checkpoint.attempts);
  const grade: CheckpointGradeDto = {
    correct: verdict.invalid ? false : verdict.correct,
    score: verdict.invalid ? 0 : verdict.score,
    feedback: verdict.feedback,
    mistake: verdict.invalid ? null : verdict.mistake,
    invalid: verdict.invalid,
    attemptsLeft: Math.max(0, checkpoint.attempts - used),
    hints: checkpoint.hints.slice(0, Math.max(0, wrongSoFar)),
    reveal: finished ? { answer: verdict.answerText, explanation: verdict.explanation } : null,
  };
  return { grade, parsedSi: verdict.parsedSi ?? null };
}
