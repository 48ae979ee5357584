import type { Actor } from '../../auth/actor';
import type { ClassRow } from './classes.repository';

/** Who may see a class's roster: its teacher, a coordinator of its department (or of the whole school), an admin. */
export function canViewClass(actor: Actor, cls: ClassRow): boolean {
  const { roles, departmentId, schoolId } = actor.active;
  if (cls.schoolId !== schoolId) return false;
  if (roles.includes('admin')) return true;
  if (roles.includes('teacher') && cls.teacherId === actor.userId) return true;
  return roles.includes('coordinator') && (departmentId === null || departmentId === cls.departmentId);
}

/** Enrolling and removing students is an admin's job in this version. */
export function canManageEnrolments(actor: Actor, cls: ClassRow): boolean {
  return cls.schoolId === actor.active.schoolId && actor.active.roles.includes('admin');
}
