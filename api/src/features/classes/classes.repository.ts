import type { Db } from '../../db/knex';
import type { Role } from '@core/roles';

export interface ClassRow {
  id: string;
  schoolId: string;
  departmentId: string | null;
  teacherId: string | null;
  name: string;
  joinCode: string;
}

const CLASS_COLUMNS = [
  'id',
  'school_id as schoolId',
  'department_id as departmentId',
  'teacher_id as teacherId',
  'name',
  'join_code as joinCode',
];

/** A class of one school by id: never by id alone. */
export async function findClass(db: Db, schoolId: string, classId: string): Promise<ClassRow | undefined> {
  return db('classes').select(CLASS_COLUMNS).where({ id: classId, school_id: schoolId }).whereNull('archived_at').first();
}

/** The one lookup that crosses schools: a join code is what tells us the school. */
export async function findClassByJoinCode(
  db: Db,
  joinCode: string,
): Promise<(ClassRow & { schoolName: string; emailDomains: string[] }) | undefined> {
  return db('classes as c')
    .join('schools as s', 's.id', 'c.school_id')
    .where('c.join_code', joinCode)
    .whereNull('c.archived_at')
    .first(CLASS_COLUMNS.map((column) => `c.${column}`).concat(['s.name as schoolName', 's.email_domains as emailDomains']));
}

export async function insertClass(db: Db, row: Omit<ClassRow, 'id'>): Promise<ClassRow> {
  const [created] = await db('classes')
    .insert({
      school_id: row.schoolId,
      department_id: row.departmentId,
      teacher_id: row.teacherId,
      name: row.name,
      join_code: row.joinCode,
    })
    .returning(CLASS_COLUMNS);
  return created as ClassRow;
}

/** Enrols students, ignoring those already in the class; returns how many were added. */
export async function insertEnrolments(db: Db, classId: string, studentIds: string[]): Promise<number> {
  if (studentIds.length === 0) return 0;
  const rows = await db('enrolments')
    .insert(studentIds.map((studentId) => ({ class_id: classId, student_id: studentId })))
    .onConflict(['class_id', 'student_id'])
    .ignore()
    .returning('id');
  return rows.length;
}

export async function deleteEnrolment(db: Db, classId: string, studentId: string): Promise<number> {
  return db('enrolments').where({ class_id: classId, student_id: studentId }).delete();
}

/** Which of these users hold the given role in the school. */
export async function usersWithRole(db: Db, schoolId: string, userIds: string[], role: Role): Promise<string[]> {
  if (userIds.length === 0) return [];
  const rows = await db('memberships')
    .where({ school_id: schoolId })
    .whereIn('user_id', userIds)
    .whereRaw('? = ANY(roles)', [role])
    .select<{ user_id: string }[]>('user_id');
  return rows.map((row) => row.user_id);
}
