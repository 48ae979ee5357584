import { isAnswered, SIGN_CHOICES, type Checkpoint } from '../contracts/checkpoints';
import type { CheckpointGradeDto } from '../contracts/student-checkpoints';
import type { VariableValues } from '../physics/units/types';
import {
  gradeMultipleChoice,
  gradeNumericAnswer,
  gradePrediction,
  gradeShortText,
  gradeSign,
  type Verdict,
} from '../lessons/grade-answers';

export interface RevealOptions {
  /** The seed the student's view was built with. */
  seed: string;
  locale?: string;
  /** This student's stored values at this (numeric) checkpoint. */
  values?: VariableValues;
}

/**
 * The checkpoint's answer and explanation as the engine states them in a reveal, without a
 * student's answer: for a policy that shows them after the close to a student who had attempts
 * left or never answered. Null for a checkpoint that takes no answer. Each kind's grader is asked
 * with a blank answer (a sign question with its first choice) only to read the right answer.
 */
export function revealFor(checkpoint: Checkpoint, options: RevealOptions): NonNullable<CheckpointGradeDto['reveal']> | null {
  if (!isAnswered(checkpoint)) return null;
  let verdict: Verdict;
  switch (checkpoint.kind) {
    case 'multiple-choice':
      verdict = gradeMultipleChoice(checkpoint, { kind: 'multiple-choice', optionIds: [] });
      break;
    case 'numeric':
      verdict = gradeNumericAnswer(checkpoint, { kind: 'numeric', text: '' }, options);
      break;
    case 'short-text':
      verdict = gradeShortText(checkpoint, { kind: 'short-text', text: '' });
      break;
    case 'sign':
      verdict = gradeSign(checkpoint, { kind: 'sign', choice: SIGN_CHOICES[checkpoint.choiceSet][0] });
      break;
    case 'prediction':
      verdict = gradePrediction(checkpoint, { kind: 'prediction', optionId: null, text: null, explanation: null });
      break;
  }
  return { answer: verdict.answerText, explanation: verdict.explanation };
}
