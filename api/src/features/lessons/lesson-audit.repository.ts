import type { Db } from '../../db/knex';

/** Lesson events kept in the school's audit log (the shared AuditAction union covers people and sign-in only). */
export type LessonAuditAction = 'lesson_published' | 'lesson_shared' | 'lesson_unshared' | 'lesson_deleted';

/**
 * Appends a lesson event to `audit_events`, as recordAudit does; subject_id names users only, so the
 * lesson's id and title go in `data` (a deleted lesson still reads in the log).
 */
export async function recordLessonAudit(
  db: Db,
  event: { schoolId: string; actorId: string; action: LessonAuditAction; lessonId: string; title: string; data?: Record<string, unknown> },
): Promise<void> {
  await db('audit_events').insert({
    school_id: event.schoolId,
    actor_id: event.actorId,
    subject_id: null,
    action: event.action,
    data: JSON.stringify({ lessonId: event.lessonId, title: event.title, ...event.data }),
  });
}
