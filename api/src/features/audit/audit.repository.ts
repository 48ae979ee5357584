import type { Db } from '../../db/knex';

export type AuditAction =
  | 'sign_in'
  | 'sign_in_refused'
  | 'sign_out'
  | 'invitation_sent'
  | 'roles_changed'
  | 'department_changed'
  | 'joined_class'
  | LessonAuditAction
  | AssignmentAuditAction;

/** Lesson events; subject_id names users only, so the lesson's id and title go in `data`. */
export type LessonAuditAction = 'lesson_published' | 'lesson_shared' | 'lesson_unshared' | 'lesson_deleted';

/** Assignment events; the assignment, lesson and class are named in `data` (see assignment-audit.ts). */
export type AssignmentAuditAction = 'assignment_created' | 'assignment_updated' | 'assignment_moved' | 'assignment_deleted';

export interface AuditEvent {
  schoolId: string | null;
  actorId: string | null;
  subjectId: string | null;
  action: AuditAction;
  data?: Record<string, unknown>;
  ip?: string;
}

/** Appends to the audit log; rows are never updated. */
export async function recordAudit(db: Db, event: AuditEvent): Promise<void> {
  await db('audit_events').insert({
    school_id: event.schoolId,
    actor_id: event.actorId,
    subject_id: event.subjectId,
    action: event.action,
    data: JSON.stringify(event.data ?? {}),
    ip: event.ip ?? null,
  });
}
