import type { FeedbackPolicy, RevealPolicy } from '../contracts/assignments';
import type { CheckpointGradeDto } from '../contracts/student-checkpoints';

export interface VisibilityContext {
  feedback: FeedbackPolicy;
  reveal: RevealPolicy;
  /** No answer made now is accepted any more: now is past closesAt (see isClosed). */
  closed: boolean;
  /**
   * The checkpoint's answer and explanation (from revealFor), for when the policy shows them but the
   * engine's grade has none: after the close, for a student who still had attempts left.
   */
  revealText?: CheckpointGradeDto['reveal'];
}

/** Whether right/wrong, score, mistakes and hints are shown under the feedback policy now. */
export function feedbackShown(feedback: FeedbackPolicy, closed: boolean): boolean {
  return feedback === 'immediately' || (feedback === 'after-due' && closed);
}

function savedSentence(grade: CheckpointGradeDto, ctx: VisibilityContext): string {
  const when =
    ctx.feedback === 'after-due'
      ? 'You will see whether it was right after the lesson closes.'
      : 'Your teacher has chosen not to show whether answers are right.';
  const replace = grade.attemptsLeft > 0 && !ctx.closed ? ' You may change it: a new answer replaces this one.' : '';
  return `Your answer is saved. ${when}${replace}`;
}

/**
 * A grade cut down to what the assignment's policies let the student see now. With feedback hidden
 * the reply says only that the answer is saved (no right/wrong, score, mistake or hints; the
 * engine's sentence stays for an answer it could not read, which says nothing about rightness).
 * The reveal (answer and explanation) comes only when the student can no longer submit at this
 * checkpoint — attempts used up, a right answer they were told was right, or the close — and only
 * under a policy that allows it then; hidden feedback never reveals because an answer was right.
 */
export function visibleGrade(grade: CheckpointGradeDto, ctx: VisibilityContext): { grade: CheckpointGradeDto; feedbackHidden: boolean } {
  const shown = feedbackShown(ctx.feedback, ctx.closed);
  const finishedByRightAnswer = shown && grade.correct === true && !grade.invalid;
  const canStillSubmit = !ctx.closed && grade.attemptsLeft > 0 && !finishedByRightAnswer;
  const fullReveal = grade.reveal ?? ctx.revealText ?? null;
  let reveal: CheckpointGradeDto['reveal'] = null;
  if (!canStillSubmit) {
    if (ctx.reveal === 'after-last-attempt') reveal = fullReveal;
    else if (ctx.reveal === 'after-due' && ctx.closed) reveal = fullReveal;
  }
  if (shown) return { grade: { ...grade, reveal }, feedbackHidden: false };
  return {
    grade: {
      correct: null,
      score: 0,
      feedback: grade.invalid ? grade.feedback : savedSentence(grade, ctx),
      mistake: null,
      invalid: grade.invalid,
      attemptsLeft: grade.attemptsLeft,
      hints: [],
      reveal,
    },
    feedbackHidden: true,
  };
}
