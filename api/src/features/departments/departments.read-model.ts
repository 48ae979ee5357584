import type { Db } from '../../db/knex';
import type { DepartmentDto } from '@core/contracts';

export async function listDepartments(db: Db, schoolId: string): Promise<DepartmentDto[]> {
  return db('departments as d')
    .where('d.school_id', schoolId)
    .orderBy('d.name')
    .select(
      'd.id',
      'd.name',
      db.raw('(SELECT count(*) FROM classes c WHERE c.department_id = d.id AND c.archived_at IS NULL)::int AS "classCount"'),
      db.raw('(SELECT count(*) FROM memberships m WHERE m.department_id = d.id)::int AS "memberCount"'),
    );
}

/** Staff of some departments (everyone in them who is not only a student). */
export async function listDepartmentStaff(db: Db, schoolId: string, departmentIds: string[]) {
  return db('memberships as m')
    .join('users as u', 'u.id', 'm.user_id')
    .where('m.school_id', schoolId)
    .whereIn('m.department_id', departmentIds)
    .whereRaw("m.roles <> ARRAY['student']::text[]")
    .orderBy('u.name')
    .select<{ id: string; name: string; email: string; roles: string[]; departmentId: string }[]>(
      'u.id',
      'u.name',
      'u.email',
      'm.roles',
      'm.department_id as departmentId',
    );
}
