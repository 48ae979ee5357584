import type { Actor } from '../../auth/actor';

/** The stored facts lesson access depends on (always the loaded row, never ids from the request). */
export interface LessonAccessFacts {
  schoolId: string;
  ownerId: string | null;
  departmentId: string | null;
  shared: boolean;
}

/** Teachers and substitutes keep a library of their own (a substitute's duplicates). */
function ownsLesson(actor: Actor, row: LessonAccessFacts): boolean {
  const { roles } = actor.active;
  return row.ownerId !== null && row.ownerId === actor.userId && (roles.includes('teacher') || roles.includes('substitute'));
}

function sameDepartment(actor: Actor, row: LessonAccessFacts): boolean {
  return row.departmentId !== null && row.departmentId === actor.active.departmentId;
}

/**
 * Who may open a lesson (read-only unless canEditLesson): its owner (a teacher, or a substitute for
 * their own copies) and the school's admins; a
 * coordinator for every lesson of their department; colleagues of the department once it is
 * shared; substitutes of the school once it is shared (they cover any department's classes).
 * Students reach lessons only through assignments.
 */
export function canViewLesson(actor: Actor, row: LessonAccessFacts): boolean {
  const { schoolId, roles } = actor.active;
  if (row.schoolId !== schoolId) return false;
  if (ownsLesson(actor, row)) return true;
  if (roles.includes('admin')) return true;
  if (roles.includes('coordinator') && sameDepartment(actor, row)) return true;
  if (!row.shared) return false;
  if (roles.includes('substitute')) return true;
  return roles.includes('teacher') && sameDepartment(actor, row);
}

/** Who may change it (draft, publish, share, archive, delete): its owner, or an admin of the school. */
export function canEditLesson(actor: Actor, row: LessonAccessFacts): boolean {
  if (!canViewLesson(actor, row)) return false;
  return actor.active.roles.includes('admin') || ownsLesson(actor, row);
}

/** Who may copy it into their own library: anyone who can see it and keeps a library (teachers, substitutes). */
export function canDuplicateLesson(actor: Actor, row: LessonAccessFacts): boolean {
  const { roles } = actor.active;
  return canViewLesson(actor, row) && (roles.includes('teacher') || roles.includes('substitute'));
}
