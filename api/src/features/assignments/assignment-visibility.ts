import type { Knex } from 'knex';
import type { Actor } from '../../auth/actor';

/**
 * canViewAssignment (assignments.policy.ts) as a WHERE clause on `assignments as a` joined with
 * `classes as c`, so lists filter in SQL. assignments.policy.test.ts checks the two agree.
 */
export function whereAssignmentViewable(query: Knex.QueryBuilder, actor: Actor): Knex.QueryBuilder {
  const { schoolId, roles, departmentId } = actor.active;
  query.where('a.school_id', schoolId);
  if (roles.includes('admin')) return query;
  return query.where((any) => {
    // Starts false, so a caller with none of the roles below sees nothing (an empty group would match all).
    any.whereRaw('false');
    if (roles.includes('teacher')) any.orWhere('c.teacher_id', actor.userId).orWhere('a.created_by', actor.userId);
    if (roles.includes('coordinator')) {
      if (departmentId === null) any.orWhereRaw('true');
      else any.orWhere('c.department_id', departmentId);
    }
  });
}
