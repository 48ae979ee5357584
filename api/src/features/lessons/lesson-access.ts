import type { Db } from '../../db/knex';
import type { Actor } from '../../auth/actor';
import { ForbiddenError, NotFoundError } from '../../errors';
import { canEditLesson, canViewLesson, type LessonAccessFacts } from './lessons.policy';

export interface LessonAccessRow extends LessonAccessFacts {
  id: string;
  recordingId: string;
}

async function findAccessRow(db: Db, schoolId: string, lessonId: string): Promise<LessonAccessRow | undefined> {
  return db('lessons')
    .where({ id: lessonId, school_id: schoolId })
    .first<LessonAccessRow | undefined>(
      'id',
      'school_id as schoolId',
      'owner_id as ownerId',
      'department_id as departmentId',
      'shared',
      'recording_id as recordingId',
    );
}

/** A lesson of the caller's school the caller may open; anything else (other schools included) is the same 404. */
export async function loadViewableLesson(db: Db, actor: Actor, lessonId: string): Promise<LessonAccessRow> {
  const row = await findAccessRow(db, actor.active.schoolId, lessonId);
  if (!row || !canViewLesson(actor, row)) throw new NotFoundError('That lesson');
  return row;
}

/** A lesson the caller may change: its owner, or an admin of the school. */
export async function loadEditableLesson(db: Db, actor: Actor, lessonId: string): Promise<LessonAccessRow> {
  const row = await loadViewableLesson(db, actor, lessonId);
  if (!canEditLesson(actor, row)) {
    throw new ForbiddenError('Only the teacher who made this lesson, or an admin of the school, can change it. You can duplicate it.');
  }
  return row;
}
