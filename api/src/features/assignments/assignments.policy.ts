import type { Actor } from '../../auth/actor';

/** The stored facts assignment access depends on: the assignment's row and its class's (never ids from the request). */
export interface AssignmentAccessFacts {
  schoolId: string;
  createdBy: string | null;
  classTeacherId: string | null;
  classDepartmentId: string | null;
}

/**
 * Who may open an assignment: the teacher of its class and the teacher who made it, a coordinator of
 * the class's department (or of the whole school, as for classes), and the school's admins.
 * Substitutes see none yet (cover plans will give them theirs); students reach it through the watch routes.
 */
export function canViewAssignment(actor: Actor, row: AssignmentAccessFacts): boolean {
  const { schoolId, roles, departmentId } = actor.active;
  if (row.schoolId !== schoolId) return false;
  if (roles.includes('admin')) return true;
  if (roles.includes('teacher') && (row.classTeacherId === actor.userId || row.createdBy === actor.userId)) return true;
  return roles.includes('coordinator') && (departmentId === null || departmentId === row.classDepartmentId);
}

/** Who may change its dates and policies, move it to a corrected version or delete it: its maker, the class's teacher, an admin. */
export function canManageAssignment(actor: Actor, row: AssignmentAccessFacts): boolean {
  if (!canViewAssignment(actor, row)) return false;
  return actor.active.roles.includes('admin') || row.createdBy === actor.userId || row.classTeacherId === actor.userId;
}
