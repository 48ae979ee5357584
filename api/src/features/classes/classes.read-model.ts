import type { Db } from '../../db/knex';
import type { ClassDto, ClassMemberDto, StudentClassDto } from '@core/contracts';

interface ClassFilter {
  schoolId: string;
  teacherId?: string;
  departmentIds?: string[];
  classId?: string;
}

/** Classes of one school with their department, teacher and head count. */
export async function listClasses(db: Db, filter: ClassFilter): Promise<ClassDto[]> {
  const query = db('classes as c')
    .leftJoin('departments as d', 'd.id', 'c.department_id')
    .leftJoin('users as t', 't.id', 'c.teacher_id')
    .where('c.school_id', filter.schoolId)
    .whereNull('c.archived_at')
    .select(
      'c.id',
      'c.name',
      'c.join_code as joinCode',
      'c.department_id as departmentId',
      'd.name as departmentName',
      't.id as teacherId',
      't.name as teacherName',
      't.email as teacherEmail',
      'c.created_at as createdAt',
      db.raw('(SELECT count(*) FROM enrolments e WHERE e.class_id = c.id)::int AS "studentCount"'),
    )
    .orderBy('c.name');
  if (filter.teacherId) query.where('c.teacher_id', filter.teacherId);
  if (filter.departmentIds) query.whereIn('c.department_id', filter.departmentIds);
  if (filter.classId) query.where('c.id', filter.classId);
  const rows = await query;
  return rows.map((row) => ({
    id: row.id,
    name: row.name,
    joinCode: row.joinCode,
    departmentId: row.departmentId,
    departmentName: row.departmentName,
    teacher: row.teacherId ? { id: row.teacherId, name: row.teacherName, email: row.teacherEmail } : null,
    studentCount: row.studentCount,
    createdAt: new Date(row.createdAt).toISOString(),
  }));
}

export async function listClassStudents(db: Db, classId: string): Promise<ClassMemberDto[]> {
  const rows = await db('enrolments as e')
    .join('users as u', 'u.id', 'e.student_id')
    .where('e.class_id', classId)
    .orderBy('u.name')
    .select('u.id as userId', 'u.name', 'u.email', 'e.created_at as enrolledAt');
  return rows.map((row) => ({ ...row, enrolledAt: new Date(row.enrolledAt).toISOString() }));
}

/** The classes a student is enrolled in, in the active school only. */
export async function listStudentClasses(db: Db, schoolId: string, studentId: string): Promise<StudentClassDto[]> {
  const rows = await db('enrolments as e')
    .join('classes as c', 'c.id', 'e.class_id')
    .leftJoin('departments as d', 'd.id', 'c.department_id')
    .leftJoin('users as t', 't.id', 'c.teacher_id')
    .where({ 'e.student_id': studentId, 'c.school_id': schoolId })
    .whereNull('c.archived_at')
    .orderBy('c.name')
    .select('c.id', 'c.name', 'd.name as departmentName', 't.name as teacherName', 'e.created_at as enrolledAt');
  return rows.map((row) => ({ ...row, enrolledAt: new Date(row.enrolledAt).toISOString() }));
}
