import type { Knex } from 'knex';
import type { Actor } from '../../auth/actor';

/**
 * canViewLesson (lessons.policy.ts) as a WHERE clause on `lessons as l`, so the list filters in SQL
 * instead of loading the school's every lesson. The policy stays the rule for single rows;
 * lesson-visibility.test.ts checks the two agree for every role and row.
 */
export function whereViewable(query: Knex.QueryBuilder, actor: Actor): Knex.QueryBuilder {
  const { schoolId, roles, departmentId } = actor.active;
  query.where('l.school_id', schoolId);
  if (roles.includes('admin')) return query;
  return query.where((any) => {
    // Starts false, so a caller with none of the roles below sees nothing (an empty group would match all).
    any.whereRaw('false');
    if (roles.includes('teacher') || roles.includes('substitute')) any.orWhere('l.owner_id', actor.userId);
    if (roles.includes('coordinator') && departmentId) any.orWhere('l.department_id', departmentId);
    if (roles.includes('substitute')) any.orWhere('l.shared', true);
    if (roles.includes('teacher') && departmentId) {
      any.orWhere((colleague) => colleague.where('l.shared', true).andWhere('l.department_id', departmentId));
    }
  });
}
