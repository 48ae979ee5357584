import type { Db } from '../../db/knex';
import type { PeopleQuery } from '@core/contracts';
import type { Role } from '@core/roles';

export interface PersonRow {
  userId: string;
  email: string;
  name: string;
  roles: Role[];
  status: 'invited' | 'active';
  departmentId: string | null;
  departmentName: string | null;
  classNames: string[];
  lastSignInAt: Date | null;
}

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

function membersOf(db: Db, schoolId: string) {
  return db('memberships as m')
    .join('users as u', 'u.id', 'm.user_id')
    .leftJoin('departments as d', 'd.id', 'm.department_id')
    .where('m.school_id', schoolId);
}

function personColumns(db: Db) {
  return [
    'u.id as userId',
    'u.email',
    'u.name',
    'm.roles',
    'm.status',
    'm.department_id as departmentId',
    'd.name as departmentName',
    'u.last_sign_in_at as lastSignInAt',
    // The classes someone teaches or is enrolled in, in this school.
    db.raw(`ARRAY(
      SELECT c.name FROM classes c
      WHERE c.school_id = m.school_id AND c.archived_at IS NULL
        AND (c.teacher_id = u.id OR EXISTS (SELECT 1 FROM enrolments e WHERE e.class_id = c.id AND e.student_id = u.id))
      ORDER BY c.name) AS "classNames"`),
  ];
}

/** One page of a school's people, searched by name or e-mail and filtered by role. */
export async function listPeople(db: Db, schoolId: string, query: PeopleQuery): Promise<{ rows: PersonRow[]; total: number }> {
  const filtered = membersOf(db, schoolId);
  if (query.q) {
    const pattern = `%${escapeLike(query.q)}%`;
    filtered.where((w) => w.whereILike('u.name', pattern).orWhereILike('u.email', pattern));
  }
  if (query.role) filtered.whereRaw('? = ANY(m.roles)', [query.role]);
  const [counted] = (await filtered.clone().count({ total: '*' })) as { total: number }[];
  const rows = await filtered
    .select(personColumns(db))
    .orderBy([{ column: 'u.name' }, { column: 'u.email' }])
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  return { rows: rows as PersonRow[], total: counted?.total ?? 0 };
}

export async function findPerson(db: Db, schoolId: string, userId: string): Promise<PersonRow | undefined> {
  return (await membersOf(db, schoolId).where('u.id', userId).first(personColumns(db))) as PersonRow | undefined;
}
