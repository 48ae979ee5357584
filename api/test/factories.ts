import { randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import type { Role } from '@core/roles';
import { newJoinCode } from '../src/features/classes/join-code';

const unique = () => randomBytes(4).toString('hex');

export async function buildSchool(db: Knex, overrides: { name?: string; emailDomains?: string[] } = {}) {
  const tag = unique();
  const [row] = await db('schools')
    .insert({
      name: overrides.name ?? `Test School ${tag}`,
      time_zone: 'Europe/London',
      locale: 'en-GB',
      email_domains: overrides.emailDomains ?? [`school-${tag}.example`],
    })
    .returning(['id', 'name', 'email_domains']);
  return row as { id: string; name: string; email_domains: string[] };
}

export async function buildDepartment(db: Knex, schoolId: string, name = `Physics ${unique()}`) {
  const [row] = await db('departments').insert({ school_id: schoolId, name }).returning(['id', 'name']);
  return row as { id: string; name: string };
}

/** A person with a membership; creates a fresh school unless one is given. */
export async function buildMember(
  db: Knex,
  options: { roles: Role[]; schoolId?: string; email?: string; name?: string; departmentId?: string | null; status?: 'invited' | 'active' },
) {
  const schoolId = options.schoolId ?? (await buildSchool(db)).id;
  const tag = unique();
  const [user] = await db('users')
    .insert({ email: options.email ?? `person-${tag}@test.example`, name: options.name ?? `Person ${tag}` })
    .onConflict('email')
    .merge({ email: options.email ?? `person-${tag}@test.example` })
    .returning(['id', 'email', 'name']);
  const { id, email, name } = user as { id: string; email: string; name: string };
  await db('memberships').insert({
    user_id: id,
    school_id: schoolId,
    roles: options.roles,
    department_id: options.departmentId ?? null,
    status: options.status ?? 'active',
  });
  return { id, email, name, schoolId };
}

/** A class with its school and teacher created when not given. */
export async function buildClass(
  db: Knex,
  options: { schoolId?: string; teacherId?: string | null; departmentId?: string | null; name?: string } = {},
) {
  const schoolId = options.schoolId ?? (await buildSchool(db)).id;
  const teacherId = options.teacherId === undefined ? (await buildMember(db, { roles: ['teacher'], schoolId })).id : options.teacherId;
  const [row] = await db('classes')
    .insert({
      school_id: schoolId,
      teacher_id: teacherId,
      department_id: options.departmentId ?? null,
      name: options.name ?? `Class ${unique()}`,
      join_code: newJoinCode(),
    })
    .returning(['id', 'name', 'join_code', 'school_id']);
  const cls = row as { id: string; name: string; join_code: string; school_id: string };
  return { id: cls.id, name: cls.name, joinCode: cls.join_code, schoolId: cls.school_id, teacherId };
}

export async function enrol(db: Knex, classId: string, studentId: string): Promise<void> {
  await db('enrolments').insert({ class_id: classId, student_id: studentId });
}
