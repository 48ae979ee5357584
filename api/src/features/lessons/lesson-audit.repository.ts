import type { Db } from '../../db/knex';
import { recordAudit, type LessonAuditAction } from '../audit/audit.repository';

/** A lesson event in the school's audit log; the title is kept so a deleted lesson still reads in the log. */
export async function recordLessonAudit(
  db: Db,
  event: { schoolId: string; actorId: string; action: LessonAuditAction; lessonId: string; title: string; data?: Record<string, unknown> },
): Promise<void> {
  await recordAudit(db, {
    schoolId: event.schoolId,
    actorId: event.actorId,
    subjectId: null,
    action: event.action,
    data: { lessonId: event.lessonId, title: event.title, ...event.data },
  });
}
