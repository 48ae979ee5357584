import type { Knex } from 'knex';
import type { CheckpointGradeDto, PreviewAnswer, StudentLessonView } from '@core/contracts';
import { toStudentView } from '@core/lessons/student-view';
import { AnswerMismatchError, CheckpointNotGradableError, gradeCheckpoint } from '@core/lessons/grade-checkpoint';
import type { Actor } from '../../auth/actor';
import { AppError, ConflictError, NotFoundError } from '../../errors';
import { loadLessonContent } from './lesson-transfer.read-model';

/** The same seed for every request of one previewing person: their drawn values and option order stay put. */
export const previewSeed = (actor: Actor) => `preview:${actor.userId}`;

/**
 * "Preview as student": the DRAFT as the student player receives it (no answer keys), and answers
 * graded by the same engine a student's are. Nothing is stored: the attempt number comes from the
 * preview itself.
 */
export function createLessonPreviewService({ db }: { db: Knex }) {
  return {
    async view(actor: Actor, lessonId: string): Promise<StudentLessonView> {
      const { content } = await loadLessonContent(db, actor, lessonId, { draft: true });
      return toStudentView(content, { seed: previewSeed(actor), locale: actor.active.locale });
    },

    async answer(actor: Actor, lessonId: string, key: string, input: PreviewAnswer): Promise<CheckpointGradeDto> {
      const { content } = await loadLessonContent(db, actor, lessonId, { draft: true });
      const checkpoint = content.checkpoints.find((candidate) => candidate.key === key);
      if (!checkpoint) throw new NotFoundError('That checkpoint (it may have been removed from the draft)');
      try {
        return gradeCheckpoint(checkpoint, input.answer, { seed: previewSeed(actor), locale: actor.active.locale, attempt: input.attempt });
      } catch (error) {
        if (error instanceof AnswerMismatchError) throw new AppError(400, 'answer_mismatch', error.message);
        // A draft may still hold a formula that does not evaluate: the teacher is told why.
        if (error instanceof CheckpointNotGradableError) throw new ConflictError('checkpoint_not_gradable', error.message);
        throw error;
      }
    },
  };
}

export type LessonPreviewService = ReturnType<typeof createLessonPreviewService>;
