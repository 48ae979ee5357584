import type { AssignmentDto } from '@core/contracts';
import { assignmentPhase } from '@core/assignments';
import type { Actor } from '../../auth/actor';
import { canManageAssignment } from './assignments.policy';
import type { AssignmentView } from './assignments.read-model';

const iso = (date: Date | string) => new Date(date).toISOString();

// Staff accounts are never deleted today; should one be, the assignment still lists (RFC 9562's nil UUID names nobody).
const FORMER_MEMBER = { id: '00000000-0000-0000-0000-000000000000', name: 'A former member of staff' };

/** An assignment as teachers, coordinators and admins see it, with whether the caller may manage it. */
export function presentAssignment(row: AssignmentView, actor: Actor, now: Date): AssignmentDto {
  const dates = {
    opensAt: new Date(row.opensAt),
    dueAt: new Date(row.dueAt),
    lateUntil: row.lateUntil === null ? null : new Date(row.lateUntil),
  };
  return {
    id: row.id,
    lesson: { id: row.lessonId, title: row.lessonTitle, latestVersion: row.lessonLatestVersion },
    versionNumber: row.versionNumber,
    class: { id: row.classId, name: row.className },
    opensAt: iso(row.opensAt),
    dueAt: iso(row.dueAt),
    lateUntil: row.lateUntil === null ? null : iso(row.lateUntil),
    timeZone: row.timeZone,
    feedback: row.feedback,
    reveal: row.reveal,
    completionWatchShare: row.completionWatchShare,
    createdBy: row.createdBy !== null && row.createdByName !== null ? { id: row.createdBy, name: row.createdByName } : FORMER_MEMBER,
    createdAt: iso(row.createdAt),
    phase: assignmentPhase(dates, now),
    counts: { students: row.students, started: row.started, done: row.done },
    canManage: canManageAssignment(actor, row),
  };
}
