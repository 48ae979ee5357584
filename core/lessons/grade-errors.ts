/** The answer does not fit the checkpoint: another kind, an unknown option or choice, or a checkpoint that takes no answer. */
export class AnswerMismatchError extends Error {
  readonly code = 'answer_mismatch';

  constructor(message: string) {
    super(message);
    this.name = 'AnswerMismatchError';
  }
}

/**
 * The teacher's checkpoint cannot be graded as it stands (a formula that does not evaluate, a sign
 * geometry without a clear direction). Only a draft can be in this state: publishing needs none of
 * these problems. The message is for the teacher.
 */
export class CheckpointNotGradableError extends Error {
  readonly code = 'checkpoint_not_gradable';

  constructor(message: string) {
    super(message);
    this.name = 'CheckpointNotGradableError';
  }
}
